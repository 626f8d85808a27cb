package dev.ampsieve.advice;

/**
 * What to check with a chopper or auto-zero part (error-model.md, "Self-correcting parts";
 * practitioner-notes.md item 10), in numbers; {@code report} words each.
 */
public sealed interface Caveat {

    /**
     * Charge-injection bias current.
     *
     * @param ib        the catalog's |IB| (max, else typ), A; null when the catalog has none
     * @param worstAtC  the temperature where the budget's bias term is worst, °C; NaN when it is
     *                  the 25 °C figure (or there is no bias term)
     * @param ibAtWorst the current the budget uses there, A; NaN with {@code worstAtC}
     * @param outputV   the bias term at the output, V; NaN when the budget has no bias term
     * @param limitV    the stage limit at the output, V
     */
    record Bias(Double ib, double worstAtC, double ibAtWorst, double outputV, double limitV) implements Caveat {}

    /**
     * Current noise (raised by charge injection) through the resistance at the inputs.
     *
     * @param in the catalog's current noise density, A/√Hz; null when the catalog has none
     * @param r  the larger resistance seen by an input, ohms
     * @param en the catalog's voltage noise density, V/√Hz; null when the catalog has none
     */
    record CurrentNoise(Double in, double r, Double en) implements Caveat {}

    /**
     * The chopping frequency against the band.
     *
     * @param frequency the catalog's chopping frequency, Hz; null when the catalog has none
     * @param bandHigh  the stage's band edge, Hz
     * @param ratio     frequency / bandHigh; NaN without a frequency
     * @param position  where the chopping lands
     */
    record Chopping(Double frequency, double bandHigh, double ratio, Position position) implements Caveat {}

    /** Where the chopping frequency lies against the band. */
    enum Position {
        /** Not in the catalog. */
        UNKNOWN,
        /** At or below the band edge: ripple and intermodulation land in the signal. */
        INSIDE,
        /** Above the band edge but within {@link Advisor#CHOP_CLEARANCE} times it. */
        NEAR,
        /** At least {@link Advisor#CHOP_CLEARANCE} times the band edge. */
        CLEAR
    }
}
