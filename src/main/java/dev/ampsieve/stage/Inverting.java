package dev.ampsieve.stage;

/**
 * Inverting stage: the source (Rs) in series with Rg into the - input, Rf from the output, a
 * balance resistor Rp from the + input to the reference. NG = 1 + Rf/(Rg + Rs), signal gain
 * -Rf/(Rg + Rs), R+ = Rp, R- = Rf || (Rg + Rs) (Franco, 4th ed., ch. 1 [from memory]).
 */
public record Inverting(double rf, double rg, double rs, double rp) implements Network {
    /** Rg + Rs: the source is in series with the gain resistor. */
    public double rgEffective() {
        return rg + rs;
    }

    @Override
    public Topology topology() {
        return Topology.INVERTING;
    }

    @Override
    public double noiseGain() {
        return 1.0 + rf / rgEffective();
    }

    @Override
    public double signalGain() {
        return -rf / rgEffective();
    }

    @Override
    public double rPlus() {
        return rp;
    }

    @Override
    public double rMinus() {
        return Network.parallel(rf, rgEffective());
    }

    @Override
    public double feedback() {
        return rf;
    }

    /** G = -Rf/Rg: dG/G = δRf - δRg. */
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
        return rs;
    }

    @Override
    public Network withSourceResistance(double ohms) {
        return new Inverting(rf, rg, ohms, rp);
    }

    @Override
    public boolean gainAdjustable() {
        return rf > 0;
    }

    @Override
    public Network withFeedback(double ohms) {
        return new Inverting(ohms, rg, rs, rp);
    }

    @Override
    public double feedbackFor(double g) {
        return g * rgEffective();
    }
}
