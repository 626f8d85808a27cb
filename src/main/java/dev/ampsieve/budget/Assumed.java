package dev.ampsieve.budget;

/**
 * The defaults that stand in for catalog values the user did not give. All are chosen
 * pessimistic, so that a missing value never makes a part look better than a typed-in one
 * would, and every use is reported as a warning.
 */
final class Assumed {
    private Assumed() {
    }

    /** Common-mode rejection when none is given: 60 dB, below any general-purpose datasheet minimum we know of [from memory]. */
    static final double CMRR_DB = 60.0;

    /** Supply rejection when none is given: 60 dB, same reasoning as {@link #CMRR_DB}. */
    static final double PSRR_DB = 60.0;

    /** Open-loop gain when none is given: 80 dB (10^4), low for a precision DC amplifier [from memory]. */
    static final double AOL_DB = 80.0;

    /**
     * Headroom to each rail when the catalog gives none: 1.5 V, what a classic non-rail-to-rail
     * bipolar input or output stage needs (two junction drops plus a saturating transistor)
     * [from memory]. Pessimistic for modern parts, so a missing value can only reject a part.
     */
    static final double HEADROOM_V = 1.5;
}
