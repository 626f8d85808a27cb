package dev.ampsieve.stage;

/**
 * Transimpedance stage: a current source (a photodiode or a sensor) with its shunt resistance
 * Rsh and capacitance Cs at the - input, Rf in parallel with Cf from the output, the + input at
 * the reference through an optional balance resistor Rp. At DC the noise gain is 1 + Rf/Rsh and
 * the signal gain -Rf (volts per ampere); above the zero set by Cs it rises toward 1 + Cs/Cf
 * (Graeme, <i>Photodiode Amplifiers: Op Amp Solutions</i>, McGraw-Hill 1996, ch. 2 [from memory]).
 *
 * @param rf  feedback resistor, ohm
 * @param cf  feedback capacitor, F
 * @param rsh source shunt resistance, ohm (a current source: very large)
 * @param cs  source capacitance, F
 * @param rp  balance resistor from the + input to the reference, ohm
 */
public record Transimpedance(double rf, double cf, double rsh, double cs, double rp) implements Network {
    @Override
    public Topology topology() {
        return Topology.TRANSIMPEDANCE;
    }

    @Override
    public double noiseGain() {
        return 1.0 + rf / rsh;
    }

    /** Volts per ampere of source current. */
    @Override
    public double signalGain() {
        return -rf;
    }

    @Override
    public double rPlus() {
        return rp;
    }

    @Override
    public double rMinus() {
        return Network.parallel(rf, rsh);
    }

    @Override
    public double feedback() {
        return rf;
    }

    /** The gain is Rf itself: the stage's resistor-ratio tolerance is read as Rf's own. */
    @Override
    public double ratioSensitivity() {
        return 1.0;
    }

    @Override
    public double commonModeShare() {
        return 1.0;
    }

    @Override
    public double sourceResistance() {
        return rsh;
    }

    @Override
    public Network withSourceResistance(double ohms) {
        return new Transimpedance(rf, cf, ohms, cs, rp);
    }

    @Override
    public boolean gainAdjustable() {
        return rf > 0;
    }

    /** Rf changed with Cf scaled so that the feedback pole 1/(2π Rf Cf) stays where it was. */
    @Override
    public Network withFeedback(double ohms) {
        return new Transimpedance(ohms, cf * rf / ohms, rsh, cs, rp);
    }

    @Override
    public double feedbackFor(double g) {
        return g;
    }
}
