package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;

/**
 * Term 3, bias and offset currents through the stage resistors:
 * <pre>
 *   |NG*R+ - Rf| * IB + (NG*R+ + Rf) * IOS/2
 * </pre>
 * volts at the output, with IB and IOS (A) at the worst temperature of the range, R+ and
 * Rf in ohms. The worst-case magnitude of {@link DcModel}'s current terms with
 * IB± = IB ± IOS/2; when NG*R+ = Rf (R+ = Rf || Rg) it reduces to Rf * IOS
 * (Eggleston, <i>Basic Electronics for Scientists and Engineers</i>, CUP 2011, §6.4, eqs.
 * 6.16-6.18; Franco, 4th ed., ch. 5 [from memory]). Temperature rule: see
 * {@link PartValues#biasFactor}.
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
        double ngRp = s.noiseGain() * s.rPlus();
        return Math.abs(ngRp - s.rf()) * ib + (ngRp + s.rf()) * ios / 2.0;
    }

    /**
     * The term with the 25 °C limits (what a one-point trim at 25 °C removes); a current known only
     * as an over-temperature maximum contributes nothing here, since its 25 °C value is unknown.
     */
    static double at25(Stage s, PartValues v) {
        return magnitude(s, v.ibKnownAt25() ? v.ib().bound() : 0.0, v.iosKnownAt25() ? v.ios().bound() : 0.0);
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        double lo = magnitude(s, v.ibAt(s.tMin()), v.iosAt(s.tMin()));
        double hi = magnitude(s, v.ibAt(s.tMax()), v.iosAt(s.tMax()));
        double out = Math.max(lo, hi);
        double at = hi >= lo ? s.tMax() : s.tMin();
        boolean dependsOnT = v.ibFactor(s.tMin()) != 1.0 || v.ibFactor(s.tMax()) != 1.0
                || v.iosFactor(s.tMin()) != 1.0 || v.iosFactor(s.tMax()) != 1.0;
        String note = "ib " + Units.format(v.ibAt(at), Dimension.CURRENT) + ", ios "
                + Units.format(v.iosAt(at), Dimension.CURRENT)
                + (dependsOnT ? " at " + Units.format(at, Dimension.TEMPERATURE) : " (25 °C limits hold over the range)")
                + "; R+ " + Units.format(s.rPlus(), Dimension.RESISTANCE) + ", Rf " + Units.format(s.rf(), Dimension.RESISTANCE);
        boolean est = v.ib().basis().uncertain() || v.ios().basis().uncertain() || dependsOnT && v.ibExtrapolated(at);
        return ErrorTerm.result(this, s, out, dependsOnT ? at : Double.NaN, est, note);
    }
}
