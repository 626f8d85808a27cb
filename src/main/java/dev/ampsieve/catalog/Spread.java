package dev.ampsieve.catalog;

/**
 * A datasheet parameter given as typical, maximum at 25 °C and maximum over the rated
 * temperature range. Any of them may be null (not given). Magnitudes: offsets and drifts
 * are read as ± limits.
 */
public record Spread(Double typ, Double max, Double maxOverTemp) {
    public static final Spread NONE = new Spread(null, null, null);

    public boolean isEmpty() {
        return typ == null && max == null && maxOverTemp == null;
    }
}
