package dev.ampsieve.rig;

/**
 * The E96 series of preferred resistor values (1 % tolerance), IEC 60063: 96 values per decade, each
 * {@code round(100 x 10^(i/96))} for i = 0..95 (the table below; E96 has none of the irregular
 * values of E24).
 */
public final class E96 {
    private E96() {}

    /** One decade, 100..976. */
    static final int[] DECADE = {
        100, 102, 105, 107, 110, 113, 115, 118, 121, 124, 127, 130, 133, 137, 140, 143, 147, 150, 154, 158, 162, 165,
        169, 174, 178, 182, 187, 191, 196, 200, 205, 210, 215, 221, 226, 232, 237, 243, 249, 255, 261, 267, 274, 280,
        287, 294, 301, 309, 316, 324, 332, 340, 348, 357, 365, 374, 383, 392, 402, 412, 422, 432, 442, 453, 464, 475,
        487, 499, 511, 523, 536, 549, 562, 576, 590, 604, 619, 634, 649, 665, 681, 698, 715, 732, 750, 768, 787, 806,
        825, 845, 866, 887, 909, 931, 953, 976
    };

    /** The E96 value nearest to {@code x} (> 0) by ratio (the geometric midpoint decides). */
    public static double nearest(double x) {
        double lo = atOrBelow(x);
        double hi = atOrAbove(x);
        return x / lo <= hi / x ? lo : hi;
    }

    /** The largest E96 value at or below {@code x} (> 0). */
    public static double atOrBelow(double x) {
        double decade = Math.pow(10, Math.floor(Math.log10(x)) - 2);
        for (int k = 0; k < 3; k++) { // guards the log's round-off at a decade's edge
            for (int i = DECADE.length - 1; i >= 0; i--) {
                double v = DECADE[i] * decade;
                if (v <= x * (1 + 1e-12)) {
                    return v;
                }
            }
            decade /= 10;
        }
        throw new IllegalArgumentException("no E96 value at or below " + x);
    }

    /** The smallest E96 value at or above {@code x} (> 0). */
    public static double atOrAbove(double x) {
        double decade = Math.pow(10, Math.floor(Math.log10(x)) - 2);
        for (int k = 0; k < 3; k++) {
            for (int v0 : DECADE) {
                double v = v0 * decade;
                if (v >= x * (1 - 1e-12)) {
                    return v;
                }
            }
            decade *= 10;
        }
        throw new IllegalArgumentException("no E96 value at or above " + x);
    }
}
