package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stats.SequentialYield;
import dev.ampsieve.stats.TruncatedNormal;
import dev.ampsieve.stats.UnitStream;
import dev.ampsieve.units.PhysicalConstants;

/**
 * Monte Carlo yield of error-model.md "Yield": per simulated unit, draw the offset, drift,
 * bias and offset currents, resistor ratio and aging; evaluate the signed DC output error with
 * {@link DcModel} (the one DC model of the engine)
 * <pre>
 *   E(T) = NG*(vos(T) - t*vos + aging) + perIb*(IB(T) - t*IB25) + perIos*(IOS(T) - t*IOS25) + res
 *   vos(T) = vos + drift*(T-25), held inside +/- vos.maxOverTemp where the catalog bounds it
 * </pre>
 * (t = 1 after a trim at 25 °C, 0 before) at Tmin and Tmax, keep the larger magnitude, add the
 * gain error |VFS*S*ratio| and the terms that stay at their limits (4, 5, 6, 7, the tempco part
 * of 8, the 3.3 x rms noise allowance). A unit passes when that sum is at or under the limit.
 * The gain error takes the sign of the signal while the offset keeps its own, so over a +/-VFS
 * swing one end sees |offset| + |gain error|: a unit's offset never cancels its gain error.
 *
 * <p>Each unit has its own values at 25 °C and at each end of the range, each inside the
 * bound the worst case uses there, so every simulated unit meets the datasheet and no unit's
 * error exceeds the worst-case total (a part that fits by the worst case has a yield of 100 %):
 * <ul>
 * <li>offset and drift N(0, s) truncated at their bounds, s = max(typ, bound/k) (bound/k
 * without a typical; a typical-only figure has bound k x typ and s = typ). A part with a measured
 * lot draws its offset from the lot instead ({@link Measurements#offsetSpread}). A drift estimated as
 * vos / T is each unit's own vos / T (same sign), not an independent draw.</li>
 * <li>IB and IOS are drawn independently at 25 °C and at each range end, scaled to the limit
 * there ({@link PartValues#ibAt}): an IOS may change sign with temperature, so what a trim
 * leaves can reach IOS(T) + IOS(25 °C), as {@link BiasTerm#afterTrim} bounds it. IB ~
 * N(typ, (max - typ)/k) truncated at typ +/- (max - typ) (typical-only: N(typ, typ) truncated at
 * k x typ), never below zero for a plain bipolar input, or fixed at its bound without a
 * typical; IOS ~ N(0, s) truncated at +/- its bound.</li>
 * <li>Ratio uniform in +/- tolR; aging N(0, s) truncated at its bound (the catalog's typical
 * figure as s, k times it as the bound); trim resolution uniform in +/- its value.</li>
 * </ul>
 *
 * <p>Units are simulated 1000 at a time into primitive arrays; sampling is skipped when the
 * bounds decide the answer (see {@link #maxError()} and {@link #minError()}).
 */
final class YieldModel {

    private final Stage s;
    /** Names the run's random stream with the stage's seed ({@link UnitStream#of}). */
    private final String partId;

    private final double limit;
    private final double fixed;
    private final boolean trimmed;
    private final double ng;
    private final double perIb;
    private final double perIos;
    private final double gainCoef;
    private final double clamp;
    private final double[] dt = new double[2];
    private final double[] fib = new double[2];
    private final double[] fios = new double[2];
    /** A range end at exactly 25 °C uses the unit's 25 °C currents instead of a fresh draw. */
    private final boolean[] atRef = new boolean[2];

    private final TruncatedNormal vosD;
    /** A measured lot beyond the datasheet: the worst-case total no longer bounds every unit. */
    private final boolean lotBeyondWorstCase;

    private final TruncatedNormal driftD;
    /** Drift is each unit's vos / T (estimated from the offset), not drawn. */
    private final boolean driftFromVos;

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
        this.partId = v.part().id();
        this.limit = s.limitVolts();
        this.fixed = fixed;
        this.trimmed = trimmed;
        DcModel m = DcModel.of(s);
        this.ng = m.perVos();
        this.perIb = m.perIb();
        this.perIos = m.perIos();
        double vfs = s.fullScaleOutput() == null ? 0.0 : s.fullScaleOutput();
        this.gainCoef = vfs * ResistorTerm.sensitivity(s);
        this.tol = trimmed && twoPoint ? 0.0 : s.ratioTolerance();
        this.resolution = trimmed ? BudgetCalculator.trimResolution(s, TrimSizing.of(s, v)) : 0.0;
        this.ibTrimmed = trimmed && v.ibKnownAt25() ? 1.0 : 0.0;
        this.iosTrimmed = trimmed && v.iosKnownAt25() ? 1.0 : 0.0;
        double k = s.maxToSigma();
        double[] temps = {s.tMin(), s.tMax()};
        for (int j = 0; j < 2; j++) {
            dt[j] = temps[j] - Stage.T_REF;
            fib[j] = v.ibFactor(temps[j]);
            fios[j] = v.iosFactor(temps[j]);
            atRef[j] = temps[j] == Stage.T_REF;
        }
        boolean dc = !s.acCoupled();
        this.clamp = dc && !Double.isNaN(v.vosMaxOverTemp()) ? v.vosMaxOverTemp() : Double.POSITIVE_INFINITY;
        this.vosD = dc ? Measurements.offsetSpread(v, k) : null; // a measured lot's, else the datasheet's
        this.lotBeyondWorstCase = dc && Measurements.beyondWorstCase(v);
        this.driftFromVos = dc && v.driftFromOffset();
        this.driftD = dc && !driftFromVos ? symmetric(v.drift(), v.driftBound(s.deltaT()), k) : null;
        this.ibD = dc ? bias(v.ib(), k, v.biasSignKnown()) : null;
        this.iosD = dc ? symmetric(v.ios(), v.ios().bound(), k) : null;
        this.agingD = dc ? symmetric(v.aging(), v.aging().bound(), k) : null;
    }

    /** Zero-centred spread: s = max(typ, bound/k) (bound/k without a typical) truncated at +/- bound. */
    static TruncatedNormal symmetric(Figure f, double bound, double k) {
        if (f.basis() == Basis.MISSING || bound == 0 || !Double.isFinite(bound)) {
            return null;
        }
        double sigma = f.hasTyp() ? Math.max(f.typ(), bound / k) : bound / k;
        return new TruncatedNormal(0.0, sigma, -bound, bound);
    }

    /**
     * IB ~ N(typ, (max - typ)/k) truncated at typ +/- (max - typ); a typical-only figure N(typ, typ)
     * truncated at +/- its bound k x typ; never below zero when the sign is known; fixed at its bound
     * without a typical.
     */
    static TruncatedNormal bias(Figure f, double k, boolean signKnown) {
        if (f.basis() == Basis.MISSING || f.bound() == 0) {
            return null;
        }
        if (!f.hasTyp() || f.typ() >= f.bound()) {
            return new TruncatedNormal(f.bound(), 0.0, f.bound(), f.bound());
        }
        double sigma;
        double lo;
        if (f.basis() == Basis.TYPICAL_ONLY) {
            sigma = f.typ();
            lo = -f.bound();
        } else {
            double half = f.bound() - f.typ();
            sigma = half / k;
            lo = f.typ() - half;
        }
        return new TruncatedNormal(f.typ(), sigma, signKnown ? Math.max(0.0, lo) : lo, f.bound());
    }

    /**
     * Runs the estimate; {@code target} NaN means the stage's {@code trials} units, no early stop.
     * With a target the run looks after every block and goes on up to {@code max-trials} units
     * while the answer is not plain ({@link SequentialYield}).
     */
    YieldResult run(double target) {
        return run(target, Double.POSITIVE_INFINITY);
    }

    /**
     * Runs the estimate, all units passing without sampling when {@code bound}, the worst-case total
     * (which bounds every unit's error, WorstCaseBoundsYieldTest), is within the limit: a part that fits
     * by the worst case then has a yield of exactly 100 % even where the two sums round apart.
     */
    YieldResult run(double target, double bound) {
        if (Double.isNaN(limit)) {
            return new YieldResult(0, 0, 0, 0, "none-pass");
        }
        if (bound <= limit && !lotBeyondWorstCase || maxError() <= limit) {
            return new YieldResult(1.0, 1.0, 1.0, 0, "all-pass");
        }
        if (minError() > limit) {
            return new YieldResult(0.0, 0.0, 0.0, 0, "none-pass");
        }
        UnitStream rng = UnitStream.of(s.seed(), partId);
        int n = SequentialYield.BLOCK;
        double[] vos = new double[n];
        double[] drift = new double[n];
        double[] ib25 = new double[n];
        double[] ib0 = new double[n];
        double[] ib1 = new double[n];
        double[] ios25 = new double[n];
        double[] ios0 = new double[n];
        double[] ios1 = new double[n];
        double[] ratio = new double[n];
        double[] aging = new double[n];
        double[] res = new double[n];
        boolean need25 = trimmed || atRef[0] || atRef[1];
        // without a target every one of the stage's units; with one, blocks until the answer is plain or the cap
        int units = Double.isNaN(target) ? s.trials() : Math.max(s.trials(), s.maxTrials());
        SequentialYield.Estimate e = SequentialYield.run(Math.max(1, units), target, size -> {
            fill(vosD, rng, vos, size);
            fill(driftD, rng, drift, size);
            // a unit's 25 °C currents matter only after a trim or at a range end at 25 °C; an end at 25 °C uses them
            fill(need25 ? ibD : null, rng, ib25, size);
            fill(atRef[0] ? null : ibD, rng, ib0, size);
            fill(atRef[1] ? null : ibD, rng, ib1, size);
            fill(need25 ? iosD : null, rng, ios25, size);
            fill(atRef[0] ? null : iosD, rng, ios0, size);
            fill(atRef[1] ? null : iosD, rng, ios1, size);
            fill(agingD, rng, aging, size);
            uniform(tol, rng, ratio, size);
            uniform(resolution, rng, res, size);
            return count(size, vos, drift, ib25, ib0, ib1, ios25, ios0, ios1, ratio, aging, res);
        });
        return new YieldResult(e.value(), e.low(), e.high(), (int) e.trials(), "sampled");
    }

    private int count(
            int size,
            double[] vos,
            double[] drift,
            double[] ib25,
            double[] ib0,
            double[] ib1,
            double[] ios25,
            double[] ios0,
            double[] ios1,
            double[] ratio,
            double[] aging,
            double[] res) {
        int passes = 0;
        double room = limit - fixed;
        double vosRemoved = trimmed ? 1.0 : 0.0;
        double perDrift = driftFromVos ? 1.0 / PhysicalConstants.ROOM_KELVIN : 0.0;
        for (int i = 0; i < size; i++) {
            double v25 = vos[i];
            double dr = driftFromVos ? v25 * perDrift : drift[i];
            double worst = 0;
            for (int j = 0; j < 2; j++) {
                double vT = v25 + dr * dt[j];
                if (vT > clamp) {
                    vT = clamp;
                } else if (vT < -clamp) {
                    vT = -clamp;
                }
                // each unit's currents at this end: its 25 °C draw at 25 °C, else its own draw scaled to the limit here
                double ibT = atRef[j] ? ib25[i] : fib[j] * (j == 0 ? ib0[i] : ib1[i]);
                double iosT = atRef[j] ? ios25[i] : fios[j] * (j == 0 ? ios0[i] : ios1[i]);
                double e = ng * (vT - vosRemoved * v25 + aging[i])
                        + perIb * (ibT - ibTrimmed * ib25[i])
                        + perIos * (iosT - iosTrimmed * ios25[i])
                        + res[i];
                worst = Math.max(worst, Math.abs(e));
            }
            worst += Math.abs(gainCoef * ratio[i]); // at the end of the swing where it adds to the offset
            if (worst <= room) {
                passes++;
            }
        }
        return passes;
    }

    private static void fill(TruncatedNormal d, UnitStream rng, double[] out, int n) {
        if (d == null) {
            java.util.Arrays.fill(out, 0, n, 0.0);
        } else {
            d.fill(rng, out, n);
        }
    }

    private static void uniform(double half, UnitStream rng, double[] out, int n) {
        if (half == 0) {
            java.util.Arrays.fill(out, 0, n, 0.0);
            return;
        }
        for (int i = 0; i < n; i++) {
            out[i] = half * (2.0 * rng.uniform() - 1.0);
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
     * over every value the variables can take (interval arithmetic on a sum of terms: an outer
     * bound, exact when the terms are independent, so both skip tests below stay safe).
     */
    private double[] range(int j) {
        double[] v = span(vosD);
        double[] d = driftFromVos ? scaled(v, 1.0 / PhysicalConstants.ROOM_KELVIN) : span(driftD);
        double[] vd = driftFromVos
                ? scaled(v, 1.0 + dt[j] / PhysicalConstants.ROOM_KELVIN)
                : new double[] {v[0] + scaled(d, dt[j])[0], v[1] + scaled(d, dt[j])[1]};
        double vtLo = Math.max(-clamp, Math.min(clamp, vd[0]));
        double vtHi = Math.max(-clamp, Math.min(clamp, vd[1]));
        double[] off;
        if (trimmed) {
            // vos(T) - vos: the change from 25 °C, bounded by the drift and by the clamp
            double[] change = driftFromVos ? scaled(v, dt[j] / PhysicalConstants.ROOM_KELVIN) : scaled(d, dt[j]);
            off = new double[] {Math.max(change[0], vtLo - v[1]), Math.min(change[1], vtHi - v[0])};
        } else {
            off = new double[] {vtLo, vtHi};
        }
        off = scaled(off, ng);
        double[] g = scaled(span(agingD), ng);
        double[] b25 = span(ibD);
        double[] o25 = span(iosD);
        double[] ib = atRef[j]
                ? scaled(b25, perIb * (1.0 - ibTrimmed))
                : sum(scaled(b25, perIb * fib[j]), scaled(b25, -perIb * ibTrimmed));
        double[] io = atRef[j]
                ? scaled(o25, perIos * (1.0 - iosTrimmed))
                : sum(scaled(o25, perIos * fios[j]), scaled(o25, -perIos * iosTrimmed));
        return new double[] {off[0] + g[0] + ib[0] + io[0] - resolution, off[1] + g[1] + ib[1] + io[1] + resolution};
    }

    private static double[] sum(double[] p, double[] q) {
        return new double[] {p[0] + q[0], p[1] + q[1]};
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
