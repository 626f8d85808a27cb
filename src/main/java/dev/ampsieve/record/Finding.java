package dev.ampsieve.record;

import java.util.List;

/** One way a recorded decision no longer holds against today's catalog and engine. */
public sealed interface Finding {

    /** The part's catalog entry changed: each field with its recorded and today's value (null: absent). */
    record EntryChanged(String id, List<FieldChange> fields) implements Finding {
        public EntryChanged {
            fields = List.copyOf(fields);
        }
    }

    /** One catalog field of an entry, then and now; null where the entry does not give it. */
    record FieldChange(String path, String was, String now) {}

    /** The part is no longer in the catalog. */
    record Disappeared(String id) implements Finding {}

    /**
     * A part now fits at a lower effective cost than the recorded cheapest fitting part (or
     * something fits where nothing did).
     *
     * @param was the recorded cheapest fitting part, or null when none fitted
     */
    record CheaperFits(PartFacts now, PartFacts was) implements Finding {}

    /** A recorded part's verdict is another today. */
    record VerdictChanged(String id, String was, String now) implements Finding {}

    /** A recorded part's largest (limiting) term is another today. */
    record LimitingChanged(String id, String was, String now) implements Finding {}
}
