package dev.ampsieve.budget;

import dev.ampsieve.catalog.InputType;
import dev.ampsieve.units.PhysicalConstants;

/**
 * The defaults that stand in for catalog values the user did not give: the one table of
 * conservative estimates by input type and architecture. Each value is a rule of common
 * practice (stated beside it), chosen at the unfavourable end of what parts of that kind
 * publish, so that a missing value never makes a part look better than a typed-in one
 * would. Every use is flagged estimated and reported as a warning.
 *
 * <pre>
 *   figure (missing)              bipolar        jfet           cmos           chopper / auto-zero
 *   ib at 25 °C                   500 nA         200 pA         200 pA         2 nA
 *   ios                           = ib (the pessimistic reading for bias-cancelled and FET inputs)
 *   en (white)                    30 nV/√Hz      40 nV/√Hz      60 nV/√Hz      60 nV/√Hz
 *   en 1/f corner                 100 Hz         1 kHz          5 kHz          0 (chopping removes 1/f)
 *   in (white)                    1 pA/√Hz       shot noise of ib, √(2 q ib)   1 pA/√Hz
 *   in 1/f corner                 1 kHz          0 (shot noise) 0              0
 *   long-term drift per √1000 h   5 µV           10 µV          10 µV          1 µV
 * </pre>
 */
final class Assumed {
    private Assumed() {}

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

    /**
     * Input capacitance (common-mode plus differential) when none is given: 20 pF, F (common
     * practice: general-purpose and precision inputs publish a few pF to about 15 pF, large-area
     * low-noise JFET inputs 20 pF and more [from memory]). It only enters a transimpedance stage,
     * where more capacitance raises the noise gain and lowers the phase margin: the large end.
     */
    static final double INPUT_CAPACITANCE = 20e-12;

    /**
     * Junction-to-ambient thermal resistance when none is given, °C/W (common practice: SO-8
     * packages publish about 100 to 160 °C/W on a standard test board, SOT-23 and SC-70 packages
     * 200 to 300 °C/W [from memory]): the small-package end.
     */
    static final double THETA_JA = 250.0;

    /**
     * Supply current per amplifier when none is given, A (common practice: precision amplifiers
     * draw from about 10 µA to a few mA [from memory]): the upper end, which heats the die most.
     */
    static final double QUIESCENT_CURRENT = 5e-3;

    /**
     * Input-referred ripple at the chopping frequency of a chopper or auto-zero part when none is
     * given, V peak (common practice: parts with ripple suppression publish a few µV, early chopper
     * designs without it tens of µV [from memory]): the large end.
     */
    static final double CHOPPING_RIPPLE = 20e-6;

    /**
     * Where a rail-to-rail input without a published crossover hands over between its pairs, V below
     * the positive rail (common practice: complementary-pair inputs switch about 0.8 to 1.5 V below
     * it [from memory]); a wider band, 0.5 to 2 V, is taken so the unknown place is covered.
     */
    static final double CROSSOVER_NEAREST = 0.5;

    /** The far end of that band, V below the positive rail (see {@link #CROSSOVER_NEAREST}). */
    static final double CROSSOVER_FARTHEST = 2.0;

    /** One thousand hours, s: the time base of long-term drift figures. */
    static final double THOUSAND_HOURS = 1000 * 3600.0;

    /**
     * Bias current at 25 °C when none is given, A (common practice): a general-purpose bipolar
     * input without bias cancellation reaches several hundred nA at its maximum; FET and CMOS
     * input leakage at 25 °C is specified in the tens to a few hundred pA; the charge injection of
     * chopper and auto-zero inputs reaches the nA range.
     */
    static double ib(InputType input, boolean selfCorrecting) {
        if (selfCorrecting) {
            return 2e-9;
        }
        return input == InputType.BIPOLAR ? 500e-9 : 200e-12;
    }

    /**
     * White voltage noise density when none is given, V/√Hz (common practice): general-purpose
     * bipolar inputs publish 10 to 30, JFET 15 to 40, CMOS and zero-drift 20 to 60 nV/√Hz or more
     * for micropower parts; the upper ends are taken.
     */
    static double en(InputType input, boolean selfCorrecting) {
        if (selfCorrecting) {
            return 60e-9;
        }
        return switch (input) {
            case BIPOLAR -> 30e-9;
            case JFET -> 40e-9;
            case CMOS -> 60e-9;
        };
    }

    /**
     * 1/f corner of the voltage noise when none is given, Hz (common practice): bipolar inputs
     * bend at 2 to 100 Hz, JFET inputs at 100 Hz to 1 kHz, CMOS inputs at 1 to 10 kHz; chopper
     * and auto-zero parts have no 1/f region, which is what they are for.
     */
    static double enCorner(InputType input, boolean selfCorrecting) {
        if (selfCorrecting) {
            return 0.0;
        }
        return switch (input) {
            case BIPOLAR -> 100.0;
            case JFET -> 1e3;
            case CMOS -> 5e3;
        };
    }

    /**
     * White current noise density when none is given, A/√Hz: the shot noise of the bias current,
     * √(2 q IB) (Schottky 1918; Motchenbacher &amp; Connelly, <i>Low-Noise Electronic System
     * Design</i>, ch. 2 [from memory]), never below 1 pA/√Hz for bipolar inputs (whose bias
     * cancellation hides the base currents' noise: common practice) and chopper or auto-zero parts
     * (switch charge injection: common practice).
     *
     * @param ib the bias current the budget uses at 25 °C, A
     */
    static double in(InputType input, boolean selfCorrecting, double ib) {
        double shot = Math.sqrt(2.0 * PhysicalConstants.ELEMENTARY_CHARGE * Math.max(0.0, ib));
        if (selfCorrecting || input == InputType.BIPOLAR) {
            return Math.max(shot, 1e-12);
        }
        return shot;
    }

    /**
     * 1/f corner of the current noise when none is given, Hz (common practice): bipolar inputs bend
     * near 100 Hz to 1 kHz; the shot noise of FET leakage and the switched inputs of zero-drift
     * parts are flat at low frequency.
     */
    static double inCorner(InputType input, boolean selfCorrecting) {
        return !selfCorrecting && input == InputType.BIPOLAR ? 1e3 : 0.0;
    }

    /**
     * Long-term offset drift per √(1000 h) when none is given, V, used as a bound (common practice:
     * precision bipolar parts publish about 0.2 to 1 µV, FET and CMOS parts several µV, typical;
     * the estimate is several times those; the correcting loop of a zero-drift part removes most
     * aging).
     */
    static double agingPer1000h(InputType input, boolean selfCorrecting) {
        if (selfCorrecting) {
            return 1e-6;
        }
        return input == InputType.BIPOLAR ? 5e-6 : 10e-6;
    }
}
