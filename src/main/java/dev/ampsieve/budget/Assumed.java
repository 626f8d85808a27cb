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
}
