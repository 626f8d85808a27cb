package dev.ampsieve.units;

import java.util.List;

/**
 * The E96 series of preferred resistor values (1 % tolerance), IEC 60063:2015, table 1: the 96
 * mantissas of each decade. The tool picks a resistor it sizes (a trim network's injection resistor)
 * from this series, so the value it reports is one a buyer can order.
 *
 * <p>Rules: {@link #nearest} is the value nearest on a logarithmic scale (the series is geometric,
 * so "nearest" means the smallest ratio, as IEC 60063 builds the series from 10^(i/96)); a value
 * exactly at the geometric mean of two neighbours goes to the larger. {@link #atMost} is the largest
 * series value not above the given one, for a resistor that must not exceed a bound.
 */
public final class E96 {
    private E96() {}

    /** IEC 60063 E96 mantissas, 100 to 976, in increasing order. */
    public static final List<Integer> MANTISSAS = List.of(
            100, 102, 105, 107, 110, 113, 115, 118, 121, 124, 127, 130, 133, 137, 140, 143, 147, 150, 154, 158, 162,
            165, 169, 174, 178, 182, 187, 191, 196, 200, 205, 210, 215, 221, 226, 232, 237, 243, 249, 255, 261, 267,
            274, 280, 287, 294, 301, 309, 316, 324, 332, 340, 348, 357, 365, 374, 383, 392, 402, 412, 422, 432, 442,
            453, 464, 475, 487, 499, 511, 523, 536, 549, 562, 576, 590, 604, 619, 634, 649, 665, 681, 698, 715, 732,
            750, 768, 787, 806, 825, 845, 866, 887, 909, 931, 953, 976);

    /** The two series values around {@code ohms}: {below-or-equal, above}. */
    private static double[] bracket(double ohms) {
        if (!(ohms > 0) || Double.isInfinite(ohms)) {
            throw new IllegalArgumentException("a resistance must be positive and finite: " + ohms);
        }
        int decade = (int) Math.floor(Math.log10(ohms)) - 2; // mantissa 100..976 times 10^decade
        for (int d = decade - 1; d <= decade + 1; d++) { // either side: log10 may round across a decade
            for (int i = 0; i < MANTISSAS.size(); i++) {
                double lo = value(MANTISSAS.get(i), d);
                double hi = i + 1 < MANTISSAS.size() ? value(MANTISSAS.get(i + 1), d) : value(100, d + 1);
                if (lo <= ohms && ohms < hi) {
                    return new double[] {lo, hi};
                }
            }
        }
        throw new IllegalStateException("no E96 bracket for " + ohms);
    }

    /** mantissa x 10^decade, rounded to the double nearest the decimal value (so 4.99e3 prints as such). */
    private static double value(int mantissa, int decade) {
        return decade >= 0 ? mantissa * Math.pow(10, decade) : mantissa / Math.pow(10, -decade);
    }

    /** The E96 value nearest to {@code ohms} by ratio; at the geometric mean of two neighbours, the larger. */
    public static double nearest(double ohms) {
        double[] b = bracket(ohms);
        if (b[0] == ohms) {
            return ohms;
        }
        // compare ohms/lo with hi/ohms, i.e. ohms^2 with lo*hi
        return ohms * ohms >= b[0] * b[1] ? b[1] : b[0];
    }

    /** The largest E96 value not above {@code ohms}. */
    public static double atMost(double ohms) {
        return bracket(ohms)[0];
    }

    /** The smallest E96 value not below {@code ohms}. */
    public static double atLeast(double ohms) {
        double[] b = bracket(ohms);
        return b[0] == ohms ? ohms : b[1];
    }
}
