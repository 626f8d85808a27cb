package dev.ampsieve.budget;

/**
 * Decibel conversions for amplitude ratios: ratio = 10^(dB/20). A rejection ratio of R dB
 * lets through 10^(-R/20) of the disturbance, e.g. 100 dB is 10 µV/V (Franco, <i>Design
 * with Operational Amplifiers</i>, 4th ed., ch. 5 [from memory]; IEC 60027-3 amplitude
 * level convention).
 */
public final class Decibels {
    private Decibels() {}

    /** Amplitude ratio of {@code db} decibels: 10^(dB/20). */
    public static double toRatio(double db) {
        return Math.pow(10.0, db / 20.0);
    }

    /** Fraction let through by a rejection of {@code db} decibels: 10^(-dB/20). */
    public static double rejected(double db) {
        return Math.pow(10.0, -db / 20.0);
    }

    /** Decibels of an amplitude ratio: 20 log10(ratio). */
    public static double of(double ratio) {
        return 20.0 * Math.log10(ratio);
    }
}
