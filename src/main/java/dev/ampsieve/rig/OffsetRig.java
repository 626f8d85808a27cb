package dev.ampsieve.rig;

import dev.ampsieve.budget.Basis;
import dev.ampsieve.budget.Decibels;
import dev.ampsieve.budget.PartValues;
import dev.ampsieve.units.E96;
import java.util.ArrayList;
import java.util.List;

/**
 * The offset test circuit, sized for a part and a meter (issue 16, item 3): the part as a
 * non-inverting amplifier of its own offset, closed-loop gain G = 1 + R2/R1 with a small R1 from the
 * inverting input to ground, R2 from the output, and Rp = R1 || R2 from the non-inverting input to
 * ground, so both inputs see the same resistance and the bias currents leave only their difference
 * (IOS x Rp) at the input. The meter reads Vout; the offset is Vout / G. The circuit is common
 * practice in op amp test benches (no textbook is named here because none was checked).
 *
 * <p>With the offset as a source in series with the + input and the bias currents flowing into the
 * pins (the engine's convention, {@code budget.DcModel}), an amplifier of open-loop gain A gives
 * <pre>
 *   Vout = G (vos - IB+ Rp + IB- (R1||R2)) / (1 + G/A)           ({@link #reading})
 * </pre>
 * (node equations at both inputs; checked against ngspice in OffsetRigNgspiceTest). The error of
 * reading vos as Vout / G, input-referred, worst case over the part's 25 °C limits and resistors of
 * tolerance t:
 * <pre>
 *   gain:       |vos| ((G - 1)/G x 2t + G/Amin)                  (ratio R2/R1 off by up to 2t; 1/(1 + x) >= 1 - x)
 *   bias:       IOS (R1||R2)(1 + t) + IB (|Rp - R1||R2| + t (Rp + R1||R2))
 *   resolution: r / G                                             (one count of the meter)
 * </pre>
 * Sizing (each rule common practice): G as large as three caps allow, the worst datasheet offset
 * reading at most half the meter's range ({@link #RANGE_SHARE}: a unit at twice the maximum is still
 * read, not clipped), G/Amin at most 0.1 % ({@link #LOOP_SHARE}) and {@link #MAX_GAIN}; R1 the smallest
 * E96 value of at least 10 ohm that keeps R2 at or above 10 kohm (the output's load); R2 the E96 value
 * at or below R1 (G - 1), so the gain never exceeds its cap; Rp the E96 value nearest R1 || R2. Not
 * counted: the meter's own accuracy and the thermal EMFs of the fixture's junctions, which add directly
 * at the input.
 *
 * @param vosMax          the part's offset limit at 25 °C, V (after the budget's missing-value rules)
 * @param ibMax           bias current limit at 25 °C, A
 * @param iosMax          offset current limit at 25 °C, A
 * @param aolMin          open-loop gain minimum, V/V
 * @param meterRange      the meter's full scale, V
 * @param meterResolution one count of the meter, V
 * @param tolerance       the resistors' tolerance (fraction)
 * @param limitedBy       which cap set the gain
 * @param r1              ohm
 * @param r2              ohm
 * @param rp              ohm
 * @param gain            1 + R2/R1 of the chosen values
 * @param fullReading     the reading of a unit at the offset limit with the bias error added, V
 * @param inputResolution one meter count at the input, V
 * @param gainError       V at the input
 * @param biasError       V at the input
 * @param totalError      gain + bias + resolution, V at the input
 * @param estimated       the part's fields whose figure was estimated or typical-only (a planner on an
 *                        estimate may be off: say so)
 */
public record OffsetRig(
        double vosMax,
        double ibMax,
        double iosMax,
        double aolMin,
        double meterRange,
        double meterResolution,
        double tolerance,
        Limit limitedBy,
        double r1,
        double r2,
        double rp,
        double gain,
        double fullReading,
        double inputResolution,
        double gainError,
        double biasError,
        double totalError,
        List<String> estimated) {

    /** What set the gain. */
    public enum Limit {
        /** The worst offset must read within {@link #RANGE_SHARE} of the range. */
        METER_RANGE,
        /** G/Amin within {@link #LOOP_SHARE}. */
        OPEN_LOOP_GAIN,
        /** {@link #MAX_GAIN}. */
        MAX_GAIN
    }

    /** The worst datasheet offset reads at most this share of the meter's range (common practice). */
    public static final double RANGE_SHARE = 0.5;

    /** Largest G/Amin (common practice: the loop's error 0.1 % of the reading). */
    public static final double LOOP_SHARE = 1e-3;

    /** Largest gain (common practice: beyond it R1 nears the wiring's and contacts' resistance). */
    public static final double MAX_GAIN = 10_000;

    /** Smallest R1, ohm (common practice: wiring, contacts and tracks are of that order). */
    public static final double R1_MIN = 10;

    /** Smallest R2, ohm (common practice: a light load on the output). */
    public static final double R2_MIN = 10e3;

    /** Enough resolution: one count at the input at most this share of the offset limit (common practice). */
    public static final double RESOLUTION_SHARE = 0.01;

    /** Default resistor tolerance (0.1 %, common practice for a test fixture). */
    public static final double DEFAULT_TOLERANCE = 1e-3;

    public OffsetRig {
        estimated = List.copyOf(estimated);
    }

    /** Sizes the rig for {@code v}'s 25 °C figures and a meter of {@code range} and {@code resolution}. */
    public static OffsetRig plan(PartValues v, double range, double resolution, double tolerance) {
        List<String> est = new ArrayList<>();
        for (String f : List.of("vos", "ib", "ios", "aol")) {
            Basis b = switch (f) {
                case "vos" -> v.vos().basis();
                case "ib" -> v.ib().basis();
                case "ios" -> v.ios().basis();
                default -> v.aolDb().basis();
            };
            if (b != Basis.GUARANTEED) {
                est.add(f);
            }
        }
        double aol = Decibels.toRatio(v.aolDb().bound());
        return plan(v.vos().bound(), v.ib().bound(), v.ios().bound(), aol, range, resolution, tolerance, est);
    }

    /** Sizes the rig for plain figures (SI units; {@code aolMin} in V/V). */
    public static OffsetRig plan(
            double vosMax,
            double ibMax,
            double iosMax,
            double aolMin,
            double range,
            double resolution,
            double tolerance,
            List<String> estimated) {
        if (!(vosMax > 0) || !(range > 0) || !(resolution > 0) || !(resolution < range) || !(tolerance >= 0)) {
            throw new IllegalArgumentException("need vos > 0, 0 < resolution < range, tolerance >= 0");
        }
        double byRange = RANGE_SHARE * range / vosMax;
        double byLoop = LOOP_SHARE * aolMin;
        double cap = Math.min(byRange, Math.min(byLoop, MAX_GAIN));
        Limit limit = cap == byRange ? Limit.METER_RANGE : cap == byLoop ? Limit.OPEN_LOOP_GAIN : Limit.MAX_GAIN;
        // at least 2 (R2 = R1): a smaller cap means the offset alone nearly fills the range
        cap = Math.max(cap, 2.0);
        double r1 = E96.atLeast(Math.max(R1_MIN, R2_MIN / (cap - 1)));
        double r2 = E96.atMost(r1 * (cap - 1));
        double g = 1 + r2 / r1;
        double rpar = parallel(r1, r2);
        double rp = E96.nearest(rpar);
        double gainErr = vosMax * ((g - 1) / g * 2 * tolerance + g / aolMin);
        double biasErr = iosMax * rpar * (1 + tolerance) + ibMax * (Math.abs(rp - rpar) + tolerance * (rp + rpar));
        double res = resolution / g;
        double full = g * (vosMax + biasErr);
        return new OffsetRig(
                vosMax,
                ibMax,
                iosMax,
                aolMin,
                range,
                resolution,
                tolerance,
                limit,
                r1,
                r2,
                rp,
                g,
                full,
                res,
                gainErr,
                biasErr,
                gainErr + biasErr + res,
                estimated);
    }

    /** R1 || R2. */
    static double parallel(double a, double b) {
        return a * b / (a + b);
    }

    /**
     * The meter's reading for a unit of offset {@code vos} and pin currents {@code ibPlus}, {@code ibMinus}
     * (into the pins) in a rig of these resistors around an amplifier of open-loop gain {@code a}.
     */
    public static double reading(double vos, double ibPlus, double ibMinus, double r1, double r2, double rp, double a) {
        double g = 1 + r2 / r1;
        return g * (vos - ibPlus * rp + ibMinus * parallel(r1, r2)) / (1 + g / a);
    }

    /** The worst offset reads within the meter's range. */
    public boolean fitsRange() {
        return fullReading <= meterRange;
    }

    /** One meter count at the input is within {@link #RESOLUTION_SHARE} of the offset limit. */
    public boolean resolves() {
        return inputResolution <= RESOLUTION_SHARE * vosMax;
    }
}
