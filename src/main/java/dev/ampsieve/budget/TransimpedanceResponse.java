package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Transimpedance;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.complex.Complex;

/**
 * Frequency response of a transimpedance stage (a current source with shunt Rsh and capacitance
 * Cs at the - input, Rf || Cf from the output), with the amplifier as a <b>single pole</b>:
 * <pre>
 *   A(f)  = A0 / (1 + j f/fa),  fa = GBW / A0          (dominant-pole amplifier)
 *   Zf    = Rf || 1/(j 2π f Cf)
 *   Zs    = Rsh || 1/(j 2π f (Cs + Cin))                (Cin: the amplifier's input capacitance)
 *   NG(f) = 1 + Zf/Zs                                   (noise gain, 1/β)
 *   T(f)  = A / NG                                      (loop gain)
 *   H(f)  = -Zf T / (1 + T)                             (closed-loop transimpedance, V/A)
 * </pre>
 * (Graeme, <i>Photodiode Amplifiers: Op Amp Solutions</i>, McGraw-Hill 1996, ch. 2 and 3;
 * Franco, <i>Design with Operational Amplifiers</i>, 4th ed., ch. 6 [from memory]). The single
 * pole is an assumption: an amplifier's second pole near its crossover lowers the phase margin
 * below what is computed here, so the check errs toward passing a part whose datasheet shows a
 * phase margin below 90° at unity gain; the 45° requirement leaves room for that.
 *
 * <p>Numbers found numerically (commons-math3 {@link BrentSolver} on log f or log Cf, bracketed by
 * a scan at {@link #PER_DECADE} points per decade, which finds the highest crossing): the -3 dB
 * signal bandwidth, the loop crossover |T| = 1 and its phase margin, and the Cf that gives a
 * phase margin. Units: ohm, F, Hz in; V/A, Hz, degrees out.
 *
 * @param rf  feedback resistor, ohm
 * @param cf  feedback capacitor, F (0: none)
 * @param rsh source shunt resistance, ohm
 * @param ct  total capacitance at the - input: the source's plus the amplifier's, F
 * @param a0  DC open-loop gain, V/V
 * @param gbw gain-bandwidth product, Hz (infinite: an ideal amplifier)
 */
public record TransimpedanceResponse(double rf, double cf, double rsh, double ct, double a0, double gbw) {

    /** Scan density used to bracket each crossing before the solver refines it. */
    static final int PER_DECADE = 40;

    private static final double TWO_PI = 2 * Math.PI;

    /**
     * The stage's network with the part's open-loop gain (its guaranteed minimum, or the assumed
     * one) and GBW (infinite when not given), and Cin the part's input capacitance (or the
     * assumed one, {@link PartValues#inputCapacitance()}).
     */
    public static TransimpedanceResponse of(Stage s, PartValues v) {
        Transimpedance t = (Transimpedance) s.network();
        double a0 = Decibels.toRatio(v.aolDb().bound());
        double gbw = Double.isNaN(v.gbw()) ? Double.POSITIVE_INFINITY : v.gbw();
        return new TransimpedanceResponse(
                t.rf(), t.cf(), t.rsh(), t.cs() + v.inputCapacitance().bound(), a0, gbw);
    }

    /** The same response with another feedback capacitor. */
    public TransimpedanceResponse withCf(double farads) {
        return new TransimpedanceResponse(rf, farads, rsh, ct, a0, gbw);
    }

    /** A(f), V/V. */
    public Complex amplifier(double f) {
        if (Double.isInfinite(gbw)) {
            return new Complex(a0, 0);
        }
        double fa = gbw / a0;
        return new Complex(a0, 0).divide(new Complex(1, f / fa));
    }

    /** Zf = Rf / (1 + j 2π f Rf Cf), ohm. */
    public Complex feedbackImpedance(double f) {
        return new Complex(rf, 0).divide(new Complex(1, TWO_PI * f * rf * cf));
    }

    /** 1/Zs = 1/Rsh + j 2π f Ct, siemens. */
    private Complex sourceAdmittance(double f) {
        return new Complex(1 / rsh, TWO_PI * f * ct);
    }

    /** NG(f) = 1 + Zf/Zs. */
    public Complex noiseGain(double f) {
        return feedbackImpedance(f).multiply(sourceAdmittance(f)).add(1);
    }

    /** T(f) = A/NG. */
    public Complex loopGain(double f) {
        return amplifier(f).divide(noiseGain(f));
    }

    /** T/(1 + T): the closed-loop factor every source at the amplifier's input shares. */
    public Complex closedLoopFactor(double f) {
        Complex t = loopGain(f);
        return t.divide(t.add(1));
    }

    /** H(f) = -Zf T/(1 + T), V/A. */
    public Complex transimpedance(double f) {
        return feedbackImpedance(f).multiply(closedLoopFactor(f)).negate();
    }

    /** |NG(f)|. */
    public double noiseGainMagnitude(double f) {
        return noiseGain(f).abs();
    }

    /** |H(f)|, ohm. */
    public double transimpedanceMagnitude(double f) {
        return transimpedance(f).abs();
    }

    /** Highest frequency the scans look at: far above every corner, where |T| and |H| have fallen. */
    private double top() {
        double corner = Math.max(1 / (TWO_PI * rf * Math.max(ct, 1e-18)), 1 / (TWO_PI * rsh * Math.max(ct, 1e-18)));
        double fast = Double.isInfinite(gbw) ? 0 : gbw;
        if (cf > 0) {
            corner = Math.max(corner, 1 / (TWO_PI * rf * cf));
        }
        return 1e4 * Math.max(fast, corner);
    }

    /** Lowest frequency the scans look at. */
    private static final double BOTTOM = 1e-6;

    /**
     * The highest f in [BOTTOM, top] where g(log10 f) changes sign from ≥ 0 to &lt; 0, refined by
     * Brent on log10 f; NaN when g is never ≥ 0 there, +∞ when it stays ≥ 0 at the top.
     */
    private double lastFall(UnivariateFunction g) {
        double lo = Math.log10(BOTTOM);
        double hi = Math.log10(top());
        int n = (int) Math.ceil((hi - lo) * PER_DECADE);
        double prevX = hi;
        double prevV = g.value(hi);
        if (prevV >= 0) {
            return Double.POSITIVE_INFINITY;
        }
        for (int i = n - 1; i >= 0; i--) {
            double x = lo + (hi - lo) * i / n;
            double v = g.value(x);
            if (v >= 0) {
                double root = new BrentSolver(1e-13).solve(10_000, g, x, prevX);
                return Math.pow(10, root);
            }
            prevX = x;
            prevV = v;
        }
        return Double.NaN;
    }

    /**
     * -3 dB signal bandwidth, Hz: the highest f where |H(f)| falls through |H(0)|/√2 (above any
     * peaking). Infinite when the response never falls (an ideal amplifier with Cf = 0).
     */
    public double bandwidth() {
        double target = transimpedanceMagnitude(0) / Math.sqrt(2);
        return lastFall(x -> Math.log(transimpedanceMagnitude(Math.pow(10, x)) / target));
    }

    /** Loop crossover, Hz: the highest f where |T(f)| falls through 1; NaN when |T| never reaches 1. */
    public double crossover() {
        if (Double.isInfinite(gbw)) {
            return Double.POSITIVE_INFINITY;
        }
        return lastFall(x -> Math.log(loopGain(Math.pow(10, x)).abs()));
    }

    /**
     * Phase margin, degrees: 180° + arg T(fc) at the crossover fc, the phase of T taken
     * continuously from its DC value 0 (so it lies in (-270°, 0°]; Franco, 4th ed., ch. 8
     * [from memory]). 90° for an ideal amplifier (no crossover); NaN when |T| never reaches 1.
     */
    public double phaseMargin() {
        double fc = crossover();
        if (Double.isInfinite(fc)) {
            return 90.0;
        }
        if (Double.isNaN(fc)) {
            return Double.NaN;
        }
        return 180.0 + Math.toDegrees(loopPhase(fc));
    }

    /**
     * arg T(f), radians, continuous from 0 at DC: the sum of the factors' own phases
     * (-atan(f/fa) of the amplifier, minus the phase of NG, which lies in (-π/2, π/2)), so no
     * branch cut of atan2 folds it.
     */
    double loopPhase(double f) {
        double amp = Double.isInfinite(gbw) ? 0 : -Math.atan(f * a0 / gbw);
        return amp - noiseGain(f).getArgument();
    }

    /**
     * The Cf that gives a phase margin of {@code degrees}, F: the exact root of this model (Brent
     * on log Cf between 1 aF and the total input capacitance x 1000); NaN when even the largest
     * gives less (the amplifier is too slow for this Rf and Ct), 0 when none is needed.
     */
    public double cfForPhaseMargin(double degrees) {
        UnivariateFunction g = x -> withCf(Math.pow(10, x)).phaseMarginOrZero() - degrees;
        if (withCf(0).phaseMarginOrZero() >= degrees) {
            return 0.0;
        }
        double lo = -18;
        double hi = Math.log10(Math.max(ct, 1e-15) * 1000);
        if (g.value(hi) < 0) {
            return Double.NaN;
        }
        if (g.value(lo) >= 0) {
            return Math.pow(10, lo); // 1 aF already does: the scan below needs a bracket with g(lo) < 0
        }
        int n = (int) Math.ceil((hi - lo) * PER_DECADE);
        double prev = lo;
        for (int i = 1; i <= n; i++) {
            double x = lo + (hi - lo) * i / n;
            if (g.value(x) >= 0) {
                return Math.pow(10, new BrentSolver(1e-12).solve(10_000, g, prev, x));
            }
            prev = x;
        }
        return Math.pow(10, hi);
    }

    private double phaseMarginOrZero() {
        double pm = phaseMargin();
        return Double.isNaN(pm) ? 0.0 : pm;
    }

    /**
     * Graeme's rule for a 45° phase margin, F: {@code Cf = sqrt(Ct / (2π Rf GBW))} for Ct ≫ Cf and
     * Rsh ≫ Rf (Graeme, <i>Photodiode Amplifiers</i>, 1996, ch. 2 [from memory]): it puts the
     * feedback pole 1/(2π Rf Cf) where 1/β meets the amplifier's gain. An estimate beside the
     * exact {@link #cfForPhaseMargin}.
     */
    public static double graemeCf(double rf, double ct, double gbw) {
        return Math.sqrt(ct / (TWO_PI * rf * gbw));
    }
}
