package dev.ampsieve.stage;

/**
 * Difference amplifier (one amplifier, four resistors): the minus leg of the source (its
 * resistance Rs-) in series with R1 into the - input, R2 from the output to the - input; the
 * plus leg (Rs+) in series with R3 into the + input, R4 from the + input to the reference.
 *
 * <p>With a = R2/(R1 + Rs-) and b = R4/(R3 + Rs+), superposition on an ideal amplifier gives
 * <pre>
 *   Vout = V+ (1 + a) b/(1 + b) - V- a
 *        = Vdm [ (1 + a) b/(1 + b) + a ] / 2  +  Vcm (b - a)/(1 + b)
 * </pre>
 * with Vdm = V+ - V- and Vcm = (V+ + V-)/2 at the source (Franco, <i>Design with Operational
 * Amplifiers</i>, 4th ed., §2.2; Kitchin &amp; Counts, <i>A Designer's Guide to Instrumentation
 * Amplifiers</i>, 3rd ed., ch. 1 [both from memory]). NG = 1 + a, R+ = (R3 + Rs+) || R4,
 * R- = (R1 + Rs-) || R2.
 *
 * @param r1      inverting-side input resistor, ohm
 * @param r2      feedback resistor, ohm
 * @param r3      non-inverting-side input resistor, ohm
 * @param r4      non-inverting-side resistor to the reference, ohm
 * @param rsMinus source resistance of the leg driving R1, ohm
 * @param rsPlus  source resistance of the leg driving R3, ohm
 */
public record Difference(double r1, double r2, double r3, double r4, double rsMinus, double rsPlus) implements Network {

    /** R2/(R1 + Rs-). */
    public double a() {
        return r2 / (r1 + rsMinus);
    }

    /** R4/(R3 + Rs+). */
    public double b() {
        return r4 / (r3 + rsPlus);
    }

    @Override
    public Topology topology() {
        return Topology.DIFFERENCE;
    }

    @Override
    public double noiseGain() {
        return 1.0 + a();
    }

    /** The differential gain [ (1 + a) b/(1 + b) + a ] / 2: R2/R1 when the legs and ratios match. */
    @Override
    public double signalGain() {
        return differentialGain(a(), b());
    }

    /** Differential gain for ratios {@code a}, {@code b} (formula in the class comment). */
    public static double differentialGain(double a, double b) {
        return ((1.0 + a) * b / (1.0 + b) + a) / 2.0;
    }

    /** Common-mode gain (b - a)/(1 + b) for ratios {@code a}, {@code b}: volts out per volt of source common mode. */
    public static double commonModeGain(double a, double b) {
        return (b - a) / (1.0 + b);
    }

    /**
     * The largest |common-mode gain| when each ratio may be off by a relative {@code e} (the
     * stage's per-pair ratio tolerance, plus tempco times the temperature change): the gain falls
     * with a and rises with b, so its extremes are at a(1 + e), b(1 - e) and a(1 - e), b(1 + e).
     * Exact in the four resistors and both legs' source resistances, not first order.
     */
    public double worstCommonModeGain(double e) {
        double lo = commonModeGain(a() * (1 + e), b() * (1 - e));
        double hi = commonModeGain(a() * (1 - e), b() * (1 + e));
        return Math.max(Math.abs(lo), Math.abs(hi));
    }

    @Override
    public double rPlus() {
        return Network.parallel(r3 + rsPlus, r4);
    }

    @Override
    public double rMinus() {
        return Network.parallel(r1 + rsMinus, r2);
    }

    @Override
    public double feedback() {
        return r2;
    }

    /**
     * (a/G) dG/da + (b/G) dG/db with G the differential gain: exactly 1 when a = b (a ratio error
     * e in either pair moves G by e/2·(...) and the two add to e in the worst case).
     */
    @Override
    public double ratioSensitivity() {
        double a = a();
        double b = b();
        double dA = (1.0 + 2.0 * b) / (2.0 * (1.0 + b));
        double dB = (1.0 + a) / (2.0 * (1.0 + b) * (1.0 + b));
        return (a * dA + b * dB) / signalGain();
    }

    /** The + pin sits at V+ b/(1 + b), and the - pin follows it. */
    @Override
    public double commonModeShare() {
        double b = b();
        return b / (1.0 + b);
    }

    @Override
    public double sourceResistance() {
        return Math.max(rsMinus, rsPlus);
    }

    @Override
    public Network withSourceResistance(double ohms) {
        double now = sourceResistance();
        if (now == 0) {
            return new Difference(r1, r2, r3, r4, ohms, ohms);
        }
        double k = ohms / now;
        return new Difference(r1, r2, r3, r4, rsMinus * k, rsPlus * k);
    }

    @Override
    public boolean gainAdjustable() {
        return r2 > 0;
    }

    /** R2 changed and R4 with it, so the two ratios stay matched. */
    @Override
    public Network withFeedback(double ohms) {
        return new Difference(r1, ohms, r3, r4 * ohms / r2, rsMinus, rsPlus);
    }

    @Override
    public double feedbackFor(double g) {
        return g * (r1 + rsMinus);
    }
}
