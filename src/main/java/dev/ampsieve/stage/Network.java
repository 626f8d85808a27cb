package dev.ampsieve.stage;

/**
 * The resistor (and capacitor) network around the amplifier: what the engine needs to know about
 * a topology, supplied by each topology itself. Adding a topology means one new implementation
 * here, its {@link Topology} key and its stage keys; every method below is abstract, so the
 * compiler names what a new topology must answer (Java 17 has no switch over sealed types, so
 * code that must tell topologies apart switches over {@link #topology()}, an enum, without a
 * {@code default}: the compiler then checks that every topology is handled).
 *
 * <p>All values are DC (low-frequency) values in SI units. The DC error model shared by every
 * topology (budget.DcModel) is {@code Vout = NG (vos - IB+ R+) + IB- Rf} with NG
 * {@link #noiseGain()}, R+ {@link #rPlus()} and Rf {@link #feedback()}.
 */
public sealed interface Network permits NonInverting, Inverting, Follower, Difference, Transimpedance {

    /** The stage-file word for this network. */
    Topology topology();

    /** DC noise gain 1/β: the factor from the amplifier's own input errors (vos, en) to the output. */
    double noiseGain();

    /**
     * Signed signal gain from the signal source to the output: V/V, or V/A (ohms) for a
     * transimpedance stage.
     */
    double signalGain();

    /** DC resistance from the + pin to its reference, the source's share included, ohm. */
    double rPlus();

    /** DC (Thevenin) resistance seen from the - pin, ohm. */
    double rMinus();

    /** The resistor from the output to the - pin, ohm (0 for a follower wired with a short). */
    double feedback();

    /**
     * Relative change of the signal gain per relative change of the network's resistor ratio
     * (the stage's {@code resistor-ratio} tolerance): 0 when no resistor sets the gain.
     */
    double ratioSensitivity();

    /**
     * Volts of common-mode change at the amplifier's pins per volt of the common-mode change the
     * stage states ({@code common-mode-swing}); 1 where the stage states it at the pins.
     */
    double commonModeShare();

    /** The signal source's resistance as the stage states it (difference: the larger leg), ohm. */
    double sourceResistance();

    /** The same network with the source resistance changed (difference: both legs scaled alike). */
    Network withSourceResistance(double ohms);

    /**
     * Whether the signal gain is set by a resistor the advice may change ({@link #withFeedback}).
     */
    boolean gainAdjustable();

    /**
     * The same network with its gain-setting resistor changed to {@code ohms}: Rf (difference: R2
     * with R4 kept matched to it; transimpedance: Rf with Cf scaled so that Rf·Cf, the signal
     * bandwidth, stays).
     */
    Network withFeedback(double ohms);

    /** The gain-setting resistor that gives |signal gain| {@code g} with the rest kept, ohm. */
    double feedbackFor(double g);

    /** Parallel combination of two resistances; an infinite one drops out. */
    static double parallel(double a, double b) {
        if (Double.isInfinite(a)) {
            return b;
        }
        if (Double.isInfinite(b)) {
            return a;
        }
        return a * b / (a + b);
    }
}
