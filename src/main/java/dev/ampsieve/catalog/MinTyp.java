package dev.ampsieve.catalog;

/** A parameter guaranteed as a minimum (rejection ratios, open-loop gain), in dB. */
public record MinTyp(Double min, Double typ) {
    public static final MinTyp NONE = new MinTyp(null, null);

    public boolean isEmpty() {
        return min == null && typ == null;
    }
}
