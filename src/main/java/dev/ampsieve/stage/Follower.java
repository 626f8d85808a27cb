package dev.ampsieve.stage;

/**
 * Voltage follower: the source (Rs) and a balance resistor (Rp) in series with the + input, the
 * output tied to the - input through Rf (often 0). NG = 1, gain 1, R+ = Rs + Rp, R- = Rf.
 */
public record Follower(double rf, double rs, double rp) implements Network {
    @Override
    public Topology topology() {
        return Topology.FOLLOWER;
    }

    @Override
    public double noiseGain() {
        return 1.0;
    }

    @Override
    public double signalGain() {
        return 1.0;
    }

    @Override
    public double rPlus() {
        return rs + rp;
    }

    @Override
    public double rMinus() {
        return rf;
    }

    @Override
    public double feedback() {
        return rf;
    }

    /** No resistor sets the gain. */
    @Override
    public double ratioSensitivity() {
        return 0.0;
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
        return new Follower(rf, ohms, rp);
    }

    @Override
    public boolean gainAdjustable() {
        return false;
    }

    @Override
    public Network withFeedback(double ohms) {
        return new Follower(ohms, rs, rp);
    }

    @Override
    public double feedbackFor(double g) {
        return Double.NaN;
    }
}
