package dev.ampsieve.stage;

/**
 * Non-inverting stage: the source (Rs) and a balance resistor (Rp) in series with the + input,
 * Rg from the - input to the reference, Rf from the output. NG = 1 + Rf/Rg, signal gain NG,
 * R+ = Rs + Rp, R- = Rf || Rg (Franco, <i>Design with Operational Amplifiers</i>, 4th ed., ch. 1
 * [from memory]).
 */
public record NonInverting(double rf, double rg, double rs, double rp) implements Network {
    @Override
    public Topology topology() {
        return Topology.NON_INVERTING;
    }

    @Override
    public double noiseGain() {
        return 1.0 + rf / rg;
    }

    @Override
    public double signalGain() {
        return noiseGain();
    }

    @Override
    public double rPlus() {
        return rs + rp;
    }

    @Override
    public double rMinus() {
        return Network.parallel(rf, rg);
    }

    @Override
    public double feedback() {
        return rf;
    }

    /** dG/G = (1 - 1/G)(δRf - δRg) (Sedra &amp; Smith, 7th ed., ch. 2 [from memory]). */
    @Override
    public double ratioSensitivity() {
        return (noiseGain() - 1.0) / noiseGain();
    }

    @Override
    public double commonModeShare() {
        return 1.0;
    }

    @Override
    public double sourceResistance() {
        return rs;
    }

    @Override
    public Network withSourceResistance(double ohms) {
        return new NonInverting(rf, rg, ohms, rp);
    }

    @Override
    public boolean gainAdjustable() {
        return rf > 0;
    }

    @Override
    public Network withFeedback(double ohms) {
        return new NonInverting(ohms, rg, rs, rp);
    }

    @Override
    public double feedbackFor(double g) {
        return (g - 1.0) * rg;
    }
}
