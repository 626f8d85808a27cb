package dev.ampsieve.record;

import java.util.List;

/**
 * What a decision record embeds to be re-run and re-checked.
 *
 * @param kind         {@link Kind#SHORTLIST} or {@link Kind#CHANGE} (from the first part to the second)
 * @param stagePath    the stage file as the user named it
 * @param stageYaml    the stage's values as a stage file ({@code StageWriter.toYaml}): reading it back gives the same stage
 * @param catalogPath  the catalog folder as given
 * @param date         when the record was written (ISO 8601, UTC)
 * @param toolVersion  the version of ampsieve that wrote it
 * @param parts        the shortlisted parts (for a change: from, then to)
 * @param cheapestFit  the first part of the ranking that fits (the cheapest), or null when none fits
 */
public record RecordFacts(
        Kind kind,
        String stagePath,
        String stageYaml,
        String catalogPath,
        String date,
        String toolVersion,
        List<PartFacts> parts,
        PartFacts cheapestFit,
        int candidates,
        int rejected) {

    public enum Kind {
        SHORTLIST("shortlist"),
        CHANGE("change");

        private final String key;

        Kind(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }

        public static Kind of(String key) {
            for (Kind k : values()) {
                if (k.key.equals(key)) {
                    return k;
                }
            }
            return null;
        }
    }

    public RecordFacts {
        parts = List.copyOf(parts);
    }

    public PartFacts part(String id) {
        return parts.stream().filter(p -> p.id().equals(id)).findFirst().orElse(null);
    }
}
