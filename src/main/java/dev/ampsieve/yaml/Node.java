package dev.ampsieve.yaml;

import java.util.List;
import java.util.Map;

/** A YAML value with the place it was written, so every message can point at it. */
public sealed interface Node permits Node.Scalar, Node.Seq, Node.Mapping {

    Located at();

    /** What kind of value this is, for "expected a mapping, found a list" messages. */
    String kind();

    /** A plain value; {@code text} is null for YAML null ({@code ~} or nothing). */
    record Scalar(Located at, String text, boolean quoted) implements Node {
        public String kind() {
            return text == null ? "nothing" : "a single value";
        }
    }

    record Seq(Located at, List<Node> items) implements Node {
        public Seq {
            items = List.copyOf(items);
        }

        public String kind() {
            return "a list";
        }
    }

    /** Keys in file order; {@code keyAt} holds where each key was written. */
    record Mapping(Located at, Map<String, Node> entries, Map<String, Located> keyAt) implements Node {
        public Mapping {
            entries = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(entries));
            keyAt = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(keyAt));
        }

        public String kind() {
            return "a mapping (key: value lines)";
        }
    }
}
