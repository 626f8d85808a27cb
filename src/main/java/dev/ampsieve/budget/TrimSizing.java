package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Topology;
import dev.ampsieve.stage.TrimCircuit;
import dev.ampsieve.units.E96;

/**
 * Sizes the stage's trim circuit for one part: the range it must reach, the injection resistor,
 * the resolution, the drift it adds and what the injection resistor does to the gains. Pure; the
 * drift formulas live in their terms ({@link NullPinDriftTerm}, {@link InjectionDriftTerm},
 * {@link DacDriftTerm}), the noise-gain and gain effects in {@link InjectionGainTerm}.
 *
 * <p>Sizing (superposition on the one DC model {@code Vout = NG (vos - IB+ R+) + IB- Rf},
 * {@link DcModel}; Franco, <i>Design with Operational Amplifiers</i>, 4th ed., ch. 5, offset
 * nulling networks [from memory]):
 * <ul>
 * <li>A voltage u at the driven end of Rinj into the inverting input (minus node) pushes a current
 * u/Rinj into the summing node, which the feedback resistor carries: the output moves by
 * u·Rf/Rinj (transfer K = Rf/Rinj). Rinj is a new conductance from the summing node to an AC
 * ground (the reference and the DAC are low-impedance sources), so the noise gain rises by Rf/Rinj
 * (Rinj in parallel with Rg).</li>
 * <li>Into the non-inverting input (plus node), Rinj and the resistance R+ already at that pin
 * divide u: the output moves by NG·u·R+/(R+ + Rinj); the noise gain does not change.</li>
 * <li>The injection network: a trimmer across -reference..+reference about the node's reference,
 * wiper to Rinj: u reaches +-reference at the trimmer's ends (where the wiper's own resistance is
 * 0); the DAC: midscale injects nothing, u reaches +-(dac reference)/2.</li>
 * <li>Rinj: the largest E96 value (IEC 60063, {@link E96#atMost}) whose range u_max·K covers
 * {@code margin} times the worst untrimmed offset, at most {@link #MAX_RESISTANCE}; below
 * {@link #MIN_RESISTANCE} the circuit is unusable.</li>
 * <li>Resolution: the trimmer's settability times the whole travel (2 x range); a DAC's LSB,
 * 2 x range / 2^bits.</li>
 * <li>Null pins: the catalog gives no null range, so the range is taken as the part's offset maximum
 * times the noise gain (common practice: makers size the pins' range to cover at least the
 * maximum offset); what lies beyond it (bias-current and operating-point offsets) is not reached.</li>
 * </ul>
 */
public final class TrimSizing {
    private TrimSizing() {}

    /** No injection resistor below 10 ohm (common practice: wiring and contacts are of that order, as the advice's floor). */
    public static final double MIN_RESISTANCE = 10.0;

    /** No injection resistor above 10 Mohm (common practice: beyond it board leakage competes with the injected current). */
    public static final double MAX_RESISTANCE = 10e6;

    /**
     * The worst untrimmed offset at 25 °C that a trim must cover, output volts: the initial offset
     * NG·vos.max ({@link OffsetTerm}), the bias currents' error at their 25 °C limits ({@link BiasTerm})
     * and the offset's move to the operating point ({@link OperatingPointTerm}), each at its bound
     * with the same sign (worst case).
     */
    public static double offsetToCover(Stage s, PartValues v) {
        return OffsetTerm.magnitude(s, v)
                + BiasTerm.magnitude(s, v.ib().bound(), v.ios().bound())
                + s.noiseGain() * OperatingPointTerm.inputShift(s, v);
    }

    /** The stage's trim circuit sized for the part with values {@code v}. */
    public static SizedTrim of(Stage s, PartValues v) {
        TrimCircuit c = BudgetCalculator.trimOf(s).circuit();
        double offset = offsetToCover(s, v);
        double nan = Double.NaN;
        switch (c.kind()) {
            case STORED -> {
                return new SizedTrim(
                        c.kind(),
                        offset,
                        nan,
                        BudgetCalculator.trimOf(s).resolution(),
                        0,
                        0,
                        nan,
                        nan,
                        nan,
                        nan,
                        nan,
                        nan,
                        nan,
                        0,
                        SizedTrim.Unusable.NONE,
                        c.partsCost());
            }
            case NULL_PINS -> {
                return nullPins(s, v, c, offset);
            }
            default -> {
                return injected(s, c, offset);
            }
        }
    }

    private static SizedTrim nullPins(Stage s, PartValues v, TrimCircuit c, double offset) {
        double nan = Double.NaN;
        if (!v.part().nullPins()) {
            return unusable(c, offset, SizedTrim.Unusable.NO_NULL_PINS);
        }
        double range = OffsetTerm.magnitude(s, v);
        double nulled = Math.min(offset, range);
        double drift = NullPinDriftTerm.perDegree(nulled, c.potTempco());
        return new SizedTrim(
                c.kind(),
                offset,
                range,
                c.potSettability() * 2 * range,
                drift,
                drift / s.sourceGain(),
                nan,
                nan,
                nan,
                nan,
                nan,
                nan,
                nan,
                Math.max(0, offset - range),
                SizedTrim.Unusable.NONE,
                c.partsCost());
    }

    private static SizedTrim injected(Stage s, TrimCircuit c, double offset) {
        boolean minus = c.node() == TrimCircuit.Node.MINUS;
        double rf = s.rf();
        double rPlus = s.rPlus();
        double ng = s.noiseGain();
        if (minus && !(rf > 0)) {
            return unusable(c, offset, SizedTrim.Unusable.NO_FEEDBACK_RESISTOR);
        }
        if (!minus && !(rPlus > 0)) {
            return unusable(c, offset, SizedTrim.Unusable.NO_PLUS_RESISTANCE);
        }
        double u = c.kind() == TrimCircuit.Kind.DAC ? c.dacReference() / 2 : c.reference();
        double needed = c.margin() * offset;
        // the largest Rinj with u·K(Rinj) >= needed
        double ideal = minus ? u * rf / needed : ng * u * rPlus / needed - rPlus;
        if (!(ideal >= MIN_RESISTANCE)) {
            return unusable(c, offset, SizedTrim.Unusable.RESISTOR_TOO_SMALL);
        }
        double rinj = E96.atMost(Math.min(ideal, MAX_RESISTANCE));
        double k = transfer(c.node(), rf, rPlus, ng, rinj);
        double range = u * k;
        double resolution = c.kind() == TrimCircuit.Kind.DAC
                ? 2 * range / Math.pow(2, c.dacBits())
                : c.potSettability() * 2 * range;
        double correction = Math.min(offset, range);
        double drift = c.kind() == TrimCircuit.Kind.DAC
                ? DacDriftTerm.perDegree(
                        correction, k, c.dacOffsetDrift(), c.dacGainDrift(), c.dacReference(), c.ratioTempco())
                : InjectionDriftTerm.perDegree(
                        correction, c.referenceTempco(), c.ratioTempco(), c.potTempco(), c.potResistance() / 4, rinj);
        double dNg = minus ? rf / rinj : 0.0;
        return new SizedTrim(
                c.kind(),
                offset,
                range,
                resolution,
                drift,
                drift / s.sourceGain(),
                ng + dNg,
                dNg,
                InjectionGainTerm.gainChange(s.topology(), c.node(), dNg, ng, rPlus, rinj),
                rinj,
                ideal,
                k,
                u,
                Math.max(0, offset - range),
                SizedTrim.Unusable.NONE,
                c.partsCost());
    }

    /**
     * Output volts per volt at the driven end of Rinj: Rf/Rinj into the minus node,
     * NG·R+/(R+ + Rinj) into the plus node (see the class comment).
     */
    public static double transfer(TrimCircuit.Node node, double rf, double rPlus, double ng, double rinj) {
        return switch (node) {
            case MINUS -> rf / rinj;
            case PLUS -> ng * rPlus / (rPlus + rinj);
        };
    }

    private static SizedTrim unusable(TrimCircuit c, double offset, SizedTrim.Unusable why) {
        double nan = Double.NaN;
        return new SizedTrim(
                c.kind(), offset, 0, nan, 0, 0, nan, nan, nan, nan, nan, nan, nan, offset, why, c.partsCost());
    }

    /** Whether {@code t} is a stage topology whose signal enters at the + pin (so a change there scales it). */
    static boolean signalAtPlus(Topology t) {
        return switch (t) {
            case NON_INVERTING, FOLLOWER, DIFFERENCE -> true;
            case INVERTING, TRANSIMPEDANCE -> false;
        };
    }
}
