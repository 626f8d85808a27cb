package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;

/**
 * Term 3, bias and offset currents through the stage resistors:
 * <pre>
 *   |NG*R+ - Rf| * IB + (NG*R+ + Rf) * IOS/2
 * </pre>
 * volts at the output, with IB and IOS (A) at the worst temperature of the range, R+ and
 * Rf in ohms: {@link DcModel#currentBound}, the worst-case magnitude of the DC model's current
 * terms with IB± = IB ± IOS/2; when NG*R+ = Rf (R+ = Rf || Rg) it reduces to Rf * IOS
 * (Eggleston, <i>Basic Electronics for Scientists and Engineers</i>, CUP 2011, §6.4, eqs.
 * 6.16-6.18; Franco, 4th ed., ch. 5 [from memory]). Temperature rule: see
 * {@link PartValues#biasAt}.
 */
public final class BiasTerm implements ErrorTerm {
    public static final String KEY = "bias";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "bias current";
    }

    @Override
    public boolean dc() {
        return true;
    }

    /** The formula above for given IB and IOS limits, V. */
    public static double magnitude(Stage s, double ib, double ios) {
        return DcModel.of(s).currentBound(ib, ios);
    }

    /**
     * What a one-point trim at 25 °C leaves of the term, V: the largest over both ends of the
     * range of the change of the current error from 25 °C, bounded by the datasheet alone (not by
     * an assumption that a unit's currents scale with their limits):
     * <ul>
     * <li>IOS can change sign between 25 °C and the range end, so its change is bounded by
     * IOS(T) + IOS(25 °C) (triangle inequality on |IOS(T) - IOS(25)|);</li>
     * <li>IB of a plain bipolar input keeps its sign, so its change is at most the larger of
     * IB(T) and IB(25 °C); any other input's IB may cross zero: IB(T) + IB(25 °C);</li>
     * <li>a current known only as an over-temperature maximum is not trimmed at all (its 25 °C
     * value is unknown): IB(T), IOS(T).</li>
     * </ul>
     * Without an over-temperature figure IB(T) is the 25 °C maximum (bipolar) or the doubling
     * rule (FET, CMOS, zero-drift), so the residual is an estimate, never zero over a range that
     * leaves 25 °C.
     */
    static double afterTrim(Stage s, PartValues v) {
        DcModel m = DcModel.of(s);
        double ib25 = v.ib().bound();
        double ios25 = v.ios().bound();
        double worst = 0;
        for (double t : new double[] {s.tMin(), s.tMax()}) {
            if (t == Stage.T_REF) {
                continue;
            }
            double ibT = v.ibAt(t);
            double iosT = v.iosAt(t);
            double dIb = !v.ibKnownAt25() ? ibT : v.biasSignKnown() ? Math.max(ibT, ib25) : ibT + ib25;
            double dIos = !v.iosKnownAt25() ? iosT : iosT + ios25;
            worst = Math.max(worst, m.currentBound(dIb, dIos));
        }
        return worst;
    }

    /**
     * What a two-temperature calibration ({@link CalibrationLine}) leaves of the term, V: each
     * unit's current error is read at both calibration temperatures and the line through the two
     * readings is subtracted.
     * <ul>
     * <li>FET, CMOS and zero-drift inputs with a 25 °C figure: a unit's current follows the engine's curve
     * ({@link PartValues#biasAt}) scaled by its own 25 °C value, |a| &lt;= 1 of the limit; what is
     * left is a times the curve's deviation from its chord, at most
     * {@link CalibrationLine#deviation} of the limit curve over the range;</li>
     * <li>plain bipolar inputs, and a current known only as an over-temperature maximum (no
     * shape in the engine, only a bound at each temperature): the three readings I(T), I(cold), I(hot) are bounded
     * independently, each in [lo, hi] at its temperature with lo = 0 where the sign is known, else
     * -hi; the residual I(T) - w1 I(cold) - w2 I(hot) is then at most
     * hi(T) - sum of min(w lo, w hi) (and its negative likewise), the shape-free bound of the
     * one-point rules ({@link #afterTrim}) carried to two points. Its largest value over the range
     * is at a range end (or 25 °C, where the bound changes).</li>
     * </ul>
     * IB and IOS are bounded separately and added ({@link DcModel#currentBound}).
     */
    static double afterTwoTemperature(Stage s, PartValues v, CalibrationLine line) {
        DcModel m = DcModel.of(s);
        double dIb;
        double dIos;
        dIb = ibShaped(v)
                ? line.deviation(v::ibAt, ibKnee(v), s.tMin(), s.tMax())
                : shapeFree(v::ibAt, v.biasSignKnown(), line, s);
        dIos = iosShaped(v)
                ? line.deviation(v::iosAt, iosKnee(v), s.tMin(), s.tMax())
                : shapeFree(v::iosAt, false, line, s);
        return m.currentBound(dIb, dIos);
    }

    /**
     * Whether a unit's IB follows the engine's curve: FET, CMOS and zero-drift inputs with a 25 °C
     * figure. A current known only as an over-temperature maximum has no curve (the engine holds it
     * flat), so it is bounded shape-free.
     */
    static boolean ibShaped(PartValues v) {
        return PartValues.exponential(v.part()) && v.ibKnownAt25();
    }

    /** The same for IOS. */
    static boolean iosShaped(PartValues v) {
        return PartValues.exponential(v.part()) && v.iosKnownAt25();
    }

    /** Where the IB curve stops growing, °C: the rated upper end when an over-temperature figure caps it, else NaN. */
    static double ibKnee(PartValues v) {
        return Double.isNaN(v.ibOverTemp()) ? Double.NaN : v.ratedHigh();
    }

    /** The same for IOS. */
    static double iosKnee(PartValues v) {
        return Double.isNaN(v.iosOverTemp()) ? Double.NaN : v.ratedHigh();
    }

    /** The bipolar rule above: the largest |I(T) - w1 I(cold) - w2 I(hot)| with each reading only bounded. */
    static double shapeFree(
            java.util.function.DoubleUnaryOperator hi, boolean signKnown, CalibrationLine line, Stage s) {
        double worst = 0;
        double hiC = hi.applyAsDouble(line.cold());
        double hiH = hi.applyAsDouble(line.hot());
        for (double t : new double[] {s.tMin(), s.tMax(), Stage.T_REF}) {
            if (t < s.tMin() || t > s.tMax()) {
                continue;
            }
            double hiT = hi.applyAsDouble(t);
            double w1 = line.w1(t);
            double w2 = line.w2(t);
            double loT = signKnown ? 0 : -hiT;
            double up = hiT - lowest(w1, hiC, signKnown) - lowest(w2, hiH, signKnown);
            double down = loT - highest(w1, hiC, signKnown) - highest(w2, hiH, signKnown);
            worst = Math.max(worst, Math.max(up, -down));
        }
        return worst;
    }

    /** min of w x I over I in [lo, hi]. */
    private static double lowest(double w, double hi, boolean signKnown) {
        double lo = signKnown ? 0 : -hi;
        return Math.min(w * lo, w * hi);
    }

    /** max of w x I over I in [lo, hi]. */
    private static double highest(double w, double hi, boolean signKnown) {
        double lo = signKnown ? 0 : -hi;
        return Math.max(w * lo, w * hi);
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        double lo = magnitude(s, v.ibAt(s.tMin()), v.iosAt(s.tMin()));
        double hi = magnitude(s, v.ibAt(s.tMax()), v.iosAt(s.tMax()));
        double out = Math.max(lo, hi);
        double at = hi >= lo ? s.tMax() : s.tMin();
        boolean dependsOnT = v.ibFactor(s.tMin()) != 1.0
                || v.ibFactor(s.tMax()) != 1.0
                || v.iosFactor(s.tMin()) != 1.0
                || v.iosFactor(s.tMax()) != 1.0;
        TermWorking.Builder w = TermWorking.of("bias")
                .put("ib", v.ibAt(at), Dimension.CURRENT)
                .put("ios", v.iosAt(at), Dimension.CURRENT);
        if (dependsOnT) {
            w.put("T", at, Dimension.TEMPERATURE);
        } else {
            w.remark(TermRemark.BIAS_25C_LIMITS_HOLD);
        }
        w.put("R+", s.rPlus(), Dimension.RESISTANCE)
                .put("Rf", s.rf(), Dimension.RESISTANCE)
                .remark(v.ib().basis() == Basis.ESTIMATED, TermRemark.IB_ESTIMATED);
        boolean est = v.ib().basis().uncertain() || v.ios().basis().uncertain() || dependsOnT && v.ibExtrapolated(at);
        return ErrorTerm.result(this, s, out, dependsOnT ? at : Double.NaN, est, w.build());
    }
}
