package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stats.SequentialYield;
import dev.ampsieve.stats.TruncatedNormal;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;

/**
 * Monte Carlo yield of error-model.md "Yield": per simulated unit, draw the offset, drift,
 * bias and offset current, resistor ratio and aging; evaluate the signed DC output error
 * <pre>
 *   E(T) = NG*(vos + drift*(T-25) + aging) - (NG*R+ - Rf)*IB(T) - (NG*R+ + Rf)*IOS(T)/2 +/- VFS*S*ratio
 * </pre>
 * at Tmin and Tmax, keep the larger magnitude, and add the terms that stay at their limits
 * (4, 5, 6, 7, the tempco part of 8, the 3.3 x rms noise allowance). A unit passes when that
 * sum is at or under the limit. The gain error VFS*S*ratio takes the sign of the signal while
 * the offset keeps its own, so over a +/-VFS swing one end sees |offset| + |gain error|: a
 * unit's offset never cancels its gain error.
 *
 * <p>Distributions (k = the stage's max-to-sigma ratio): offset and drift N(0, s) truncated
 * at their maxima, s = max(typ, max/k) (max/k without a typical); typical-only values as one
 * sigma, untruncated. IB ~ N(typ, (max - typ)/k) truncated at typ +/- (max - typ), or fixed
 * at its maximum without a typical; IOS ~ N(0, max/k) truncated at +/- max; both scaled
 * with temperature like their limits. Ratio uniform in +/- tolR; aging N(0, figure).
 * Where the catalog bounds the offset over temperature, each unit's offset plus drift is
 * held inside that bound (every unit meets the datasheet guarantee).
 *
 * <p>Units are simulated 1000 at a time into primitive arrays; sampling is skipped when the
 * bounds decide the answer (see {@link #maxError()} and {@link #minError()}).
 */
final class YieldModel {

    private final Stage s;
    private final double limit;
    private final double fixed;
    private final boolean trimmed;
    private final double ng;
    private final double a;
    private final double b;
    private final double gainCoef;
    private final double clamp;
    private final double[] dt = new double[2];
    private final double[] fib = new double[2];
    private final double[] fios = new double[2];
    private final TruncatedNormal vosD;
    private final TruncatedNormal driftD;
    private final TruncatedNormal ibD;
    private final TruncatedNormal iosD;
    private final TruncatedNormal agingD;
    private final double tol;
    private final double resolution;
    /** What a trim at 25 °C removes of each unit's IB and IOS: 1, or 0 when only an over-temperature maximum is known. */
    private final double ibTrimmed;
    private final double iosTrimmed;

    /**
     * @param fixed     output volts of the terms held at their limits
     * @param trimmed   simulate units after a one- or two-point trim at 25 °C
     * @param twoPoint  the trim also removes the resistor-ratio tolerance
     */
    YieldModel(Stage s, PartValues v, double fixed, boolean trimmed, boolean twoPoint) {
        this.s = s;
        this.limit = s.limitVolts();
        this.fixed = fixed;
        this.trimmed = trimmed;
        this.ng = s.noiseGain();
        this.a = ng * s.rPlus() - s.rf();
        this.b = ng * s.rPlus() + s.rf();
        double vfs = s.fullScaleOutput() == null ? 0.0 : s.fullScaleOutput();
        this.gainCoef = vfs * ResistorTerm.sensitivity(s);
        this.tol = trimmed && twoPoint ? 0.0 : s.ratioTolerance();
        this.resolution = trimmed ? BudgetCalculator.trimOf(s).resolution() : 0.0;
        this.ibTrimmed = trimmed && v.ibKnownAt25() ? 1.0 : 0.0;
        this.iosTrimmed = trimmed && v.iosKnownAt25() ? 1.0 : 0.0;
        double k = s.maxToSigma();
        double[] temps = {s.tMin(), s.tMax()};
        for (int j = 0; j < 2; j++) {
            dt[j] = temps[j] - Stage.T_REF;
            fib[j] = v.ibFactor(temps[j]);
            fios[j] = v.iosFactor(temps[j]);
        }
        boolean dc = !s.acCoupled();
        this.clamp = dc && !trimmed && !Double.isNaN(v.vosMaxOverTemp()) ? v.vosMaxOverTemp() : Double.POSITIVE_INFINITY;
        this.vosD = dc && !trimmed ? symmetric(v.vos(), v.vos().bound(), k) : null;
        this.driftD = dc ? symmetric(v.drift(), v.driftBound(s.deltaT()), k) : null;
        this.ibD = dc ? bias(v.ib(), k) : null;
        this.iosD = dc ? symmetric(v.ios(), v.ios().bound(), k) : null;
        double aging = AgingTerm.inputAging(v.part().longTermDrift(), s.serviceLife());
        this.agingD = dc && aging > 0 ? TruncatedNormal.untruncated(0.0, aging) : null;
    }

    /** Zero-centred spread: s = max(typ, bound/k) truncated at +/- bound; typical-only untruncated. */
    private static TruncatedNormal symmetric(Figure f, double bound, double k) {
        if (f.basis() == Basis.MISSING || bound == 0) {
            return null;
        }
        if (f.basis() == Basis.TYPICAL_ONLY) {
            return TruncatedNormal.untruncated(0.0, bound);
        }
        double sigma = f.hasTyp() ? Math.max(f.typ(), bound / k) : bound / k;
        return new TruncatedNormal(0.0, sigma, -bound, bound);
    }

    /** IB ~ N(typ, (max - typ)/k) truncated symmetric at max; fixed at its bound without a typical. */
    private static TruncatedNormal bias(Figure f, double k) {
        if (f.basis() == Basis.MISSING || f.bound() == 0) {
            return null;
        }
        if (!f.hasTyp() || f.typ() >= f.bound()) {
            return new TruncatedNormal(f.bound(), 0.0, f.bound(), f.bound());
        }
        double half = f.bound() - f.typ();
        return new TruncatedNormal(f.typ(), half / k, f.typ() - half, f.bound());
    }

    /** Runs the estimate; {@code target} NaN means no early stop. */
    YieldResult run(double target) {
        if (Double.isNaN(limit)) {
            return new YieldResult(0, 0, 0, 0, "none-pass");
        }
        if (maxError() <= limit) {
            return new YieldResult(1.0, 1.0, 1.0, 0, "all-pass");
        }
        if (minError() > limit) {
            return new YieldResult(0.0, 0.0, 0.0, 0, "none-pass");
        }
        RandomGenerator rng = new Well19937c(s.seed());
        int n = SequentialYield.BLOCK;
        double[] vos = new double[n];
        double[] drift = new double[n];
        double[] ib = new double[n];
        double[] ios = new double[n];
        double[] ratio = new double[n];
        double[] aging = new double[n];
        double[] res = new double[n];
        SequentialYield.Estimate e = SequentialYield.run(Math.max(1, s.trials()), target, size -> {
            fill(vosD, rng, vos, size);
            fill(driftD, rng, drift, size);
            fill(ibD, rng, ib, size);
            fill(iosD, rng, ios, size);
            fill(agingD, rng, aging, size);
            uniform(tol, rng, ratio, size);
            uniform(resolution, rng, res, size);
            return count(size, vos, drift, ib, ios, ratio, aging, res);
        });
        return new YieldResult(e.value(), e.low(), e.high(), (int) e.trials(), "sampled");
    }

    private int count(int size, double[] vos, double[] drift, double[] ib, double[] ios, double[] ratio,
            double[] aging, double[] res) {
        int passes = 0;
        double room = limit - fixed;
        for (int i = 0; i < size; i++) {
            double worst = 0;
            for (int j = 0; j < 2; j++) {
                double off = vos[i] + drift[i] * dt[j];
                if (off > clamp) {
                    off = clamp;
                } else if (off < -clamp) {
                    off = -clamp;
                }
                // after a trim at 25 °C only the change of the bias currents from 25 °C remains
                double gi = fib[j] - ibTrimmed;
                double go = fios[j] - iosTrimmed;
                double e = ng * (off + aging[i]) - a * ib[i] * gi - b * ios[i] * go / 2.0 + res[i];
                worst = Math.max(worst, Math.abs(e));
            }
            worst += Math.abs(gainCoef * ratio[i]); // at the end of the swing where it adds to the offset
            if (worst <= room) {
                passes++;
            }
        }
        return passes;
    }

    private static void fill(TruncatedNormal d, RandomGenerator rng, double[] out, int n) {
        if (d == null) {
            java.util.Arrays.fill(out, 0, n, 0.0);
        } else {
            d.fill(rng, out, n);
        }
    }

    private static void uniform(double half, RandomGenerator rng, double[] out, int n) {
        if (half == 0) {
            java.util.Arrays.fill(out, 0, n, 0.0);
            return;
        }
        for (int i = 0; i < n; i++) {
            out[i] = half * (2.0 * rng.nextDouble() - 1.0);
        }
    }

    /** Interval of a variable's values: [lo, hi], infinite when untruncated, {0, 0} when absent. */
    private static double[] span(TruncatedNormal d) {
        return d == null ? new double[] {0, 0} : new double[] {d.lo(), d.hi()};
    }

    /** [min, max] of c * x for x in span; a zero coefficient gives 0 even for an unbounded span. */
    private static double[] scaled(double[] span, double c) {
        if (c == 0) {
            return new double[] {0, 0};
        }
        double p = c * span[0];
        double q = c * span[1];
        return new double[] {Math.min(p, q), Math.max(p, q)};
    }

    /**
     * Range [lo, hi] of the offset part of E(T) (without the gain error) at temperature index j
     * over every value the variables can take (interval arithmetic on a sum of independent
     * terms: exact for the range of the sum).
     */
    private double[] range(int j) {
        double[] d = scaled(span(driftD), dt[j]);
        double[] v = span(vosD);
        double offLo = Math.max(-clamp, Math.min(clamp, v[0] + d[0]));
        double offHi = Math.max(-clamp, Math.min(clamp, v[1] + d[1]));
        double[] off = scaled(new double[] {offLo, offHi}, ng);
        double[] g = scaled(span(agingD), ng);
        double gi = fib[j] - ibTrimmed;
        double go = fios[j] - iosTrimmed;
        double[] ib = scaled(span(ibD), -a * gi);
        double[] io = scaled(span(iosD), -b * go / 2.0);
        return new double[] {off[0] + g[0] + ib[0] + io[0] - resolution, off[1] + g[1] + ib[1] + io[1] + resolution};
    }

    /** Largest error any unit can have: every unit passes when it is within the limit. */
    double maxError() {
        double m = 0;
        for (int j = 0; j < 2; j++) {
            double[] r = range(j);
            m = Math.max(m, Math.max(Math.abs(r[0]), Math.abs(r[1])));
        }
        return fixed + m + Math.abs(gainCoef * tol);
    }

    /**
     * Smallest error any unit can have (a lower bound: the largest over both temperatures of the
     * smallest offset part, the gain error taken as 0): no unit passes when it exceeds the limit.
     */
    double minError() {
        double m = 0;
        for (int j = 0; j < 2; j++) {
            double[] r = range(j);
            double minAbs = r[0] > 0 ? r[0] : r[1] < 0 ? -r[1] : 0.0;
            m = Math.max(m, minAbs);
        }
        return fixed + m;
    }
}
