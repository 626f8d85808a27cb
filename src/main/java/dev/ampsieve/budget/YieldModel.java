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
        return simulate(new YieldModel[] {this}, new double[] {target}, new double[] {bound})[0];
    }

    /**
     * The yields of one part in one stage before and after the stage's one- or two-point trim,
     * estimated on the same simulated units: each result is exactly what {@link #run(double,
     * double)} gives for that model alone (same units, same looks, same stopping point), while the
     * random draws the two share are made once. The same units on both sides also make the
     * difference between the two yields the trim's, not the sampling's (common random numbers).
     */
    static YieldResult[] beforeAndAfterTrim(
            YieldModel before,
            double targetBefore,
            double boundBefore,
            YieldModel after,
            double targetAfter,
            double boundAfter) {
        if (before.trimmed || !after.trimmed || before.s != after.s || !before.partId.equals(after.partId)) {
            throw new IllegalArgumentException("one part and stage, untrimmed then trimmed");
        }
        return simulate(new YieldModel[] {before, after}, new double[] {targetBefore, targetAfter}, new double[] {
            boundBefore, boundAfter
        });
    }

    /** Without sampling: every unit passes, none does, or null (sample). */
    private YieldResult decided(double bound) {
        if (Double.isNaN(limit)) {
            return new YieldResult(0, 0, 0, 0, "none-pass");
        }
        if (bound <= limit && !lotBeyondWorstCase || maxError() <= limit) {
            return new YieldResult(1.0, 1.0, 1.0, 0, "all-pass");
        }
        if (minError() > limit) {
            return new YieldResult(0.0, 0.0, 0.0, 0, "none-pass");
        }
        return null;
    }

    /**
     * Runs models of one part and stage on one set of simulated units. Every model draws the same
     * variables from the same distributions (they depend on the part and the stage, not on the trim),
     * in a fixed order from the part's stream ({@link UnitStream#of}); what only a trimmed unit needs
     * (its 25 °C currents where no range end is at 25 °C, the trim resolution) comes from a second
     * stream of its own, so an untrimmed model's units are the same whether or not a trimmed one runs
     * beside it. Blocks go on while any model is undecided; each model takes the blocks up to its
     * own stopping point.
     */
    private static YieldResult[] simulate(YieldModel[] ms, double[] targets, double[] bounds) {
        YieldResult[] out = new YieldResult[ms.length];
        SequentialYield.Run[] runs = new SequentialYield.Run[ms.length];
        YieldModel any = null;
        YieldModel trimmedOne = null;
        for (int m = 0; m < ms.length; m++) {
            out[m] = ms[m].decided(bounds[m]);
            if (out[m] == null) {
                int units =
                        Double.isNaN(targets[m]) ? ms[m].s.trials() : Math.max(ms[m].s.trials(), ms[m].s.maxTrials());
                runs[m] = new SequentialYield.Run(Math.max(1, units), targets[m]);
                any = ms[m];
                trimmedOne = ms[m].trimmed ? ms[m] : trimmedOne;
            }
        }
        if (any == null) {
            return out;
        }
        Units u = new Units(any, trimmedOne);
        while (true) {
            int size = 0;
            boolean trimmedRunning = false;
            for (int m = 0; m < ms.length; m++) {
                if (runs[m] == null || runs[m].done()) {
                    continue;
                }
                int n = runs[m].nextSize();
                if (size != 0 && n != size) {
                    throw new IllegalStateException("models out of step: " + n + " and " + size + " units");
                }
                size = n;
                trimmedRunning |= ms[m].trimmed;
            }
            if (size == 0) {
                break;
            }
            u.drawShared(size);
            if (trimmedRunning) {
                u.drawTrimOnly(size);
            }
            for (int m = 0; m < ms.length; m++) {
                if (runs[m] != null && !runs[m].done()) {
                    runs[m].add(ms[m].count(size, u));
                }
            }
        }
        for (int m = 0; m < ms.length; m++) {
            if (runs[m] != null) {
                SequentialYield.Estimate e = runs[m].estimate();
                out[m] = new YieldResult(e.value(), e.low(), e.high(), (int) e.trials(), "sampled");
            }
        }
        return out;
    }

    /**
     * One block of simulated units: the variables of {@link YieldModel}'s formula, drawn once for
     * every model of the run. The uniform ones are kept as raw draws in [-1, 1) that each model
     * scales by its own half-width (a two-point trim removes the resistor ratio: half-width 0).
     */
    private static final class Units {
        private final YieldModel m;
        private final UnitStream rng;
        private final UnitStream trimRng;
        private final boolean anyAtRef;
        private final boolean ratioDrawn;
        private final double resolution;
        final double[] vos = new double[SequentialYield.BLOCK];
        final double[] drift = new double[SequentialYield.BLOCK];
        final double[] ib25 = new double[SequentialYield.BLOCK];
        final double[] ib0 = new double[SequentialYield.BLOCK];
        final double[] ib1 = new double[SequentialYield.BLOCK];
        final double[] ios25 = new double[SequentialYield.BLOCK];
        final double[] ios0 = new double[SequentialYield.BLOCK];
        final double[] ios1 = new double[SequentialYield.BLOCK];
        final double[] aging = new double[SequentialYield.BLOCK];
        final double[] ratio = new double[SequentialYield.BLOCK];
        final double[] res = new double[SequentialYield.BLOCK];

        /** {@code m}: any model of the run (they share distributions); {@code trimmed}: the trimmed one, or null. */
        Units(YieldModel m, YieldModel trimmed) {
            this.m = m;
            this.rng = UnitStream.of(m.s.seed(), m.partId);
            this.trimRng = trimmed != null ? UnitStream.of(m.s.seed(), m.partId, UnitStream.TRIM) : null;
            this.anyAtRef = m.atRef[0] || m.atRef[1];
            this.ratioDrawn = m.s.ratioTolerance() != 0;
            this.resolution = trimmed != null ? trimmed.resolution : 0.0;
        }

        /** What every model reads, in the order of the part's stream. */
        void drawShared(int size) {
            fill(m.vosD, rng, vos, size);
            fill(m.driftD, rng, drift, size);
            // a unit's 25 °C currents: here when a range end is at 25 °C (every model reads them), else trimmed only
            if (anyAtRef) {
                fill(m.ibD, rng, ib25, size);
            }
            fill(m.atRef[0] ? null : m.ibD, rng, ib0, size);
            fill(m.atRef[1] ? null : m.ibD, rng, ib1, size);
            if (anyAtRef) {
                fill(m.iosD, rng, ios25, size);
            }
            fill(m.atRef[0] ? null : m.iosD, rng, ios0, size);
            fill(m.atRef[1] ? null : m.iosD, rng, ios1, size);
            fill(m.agingD, rng, aging, size);
            if (ratioDrawn) {
                raw(rng, ratio, size);
            }
        }

        /** What only a trimmed unit reads, from the trim's own stream. */
        void drawTrimOnly(int size) {
            if (!anyAtRef) {
                fill(m.ibD, trimRng, ib25, size);
                fill(m.iosD, trimRng, ios25, size);
            }
            if (resolution != 0) {
                raw(trimRng, res, size);
            }
        }

        private static void fill(TruncatedNormal d, UnitStream rng, double[] out, int n) {
            if (d != null) { // an absent variable stays 0 in every block
                d.fill(rng, out, n);
            }
        }

        private static void raw(UnitStream rng, double[] out, int n) {
            for (int i = 0; i < n; i++) {
                out[i] = 2.0 * rng.uniform() - 1.0;
            }
        }
    }

    /** How many of the block's first {@code size} units pass, by this model. */
    private int count(int size, Units u) {
        int passes = 0;
        double room = limit - fixed;
        double vosRemoved = trimmed ? 1.0 : 0.0;
        double perDrift = driftFromVos ? 1.0 / PhysicalConstants.ROOM_KELVIN : 0.0;
        double[] vos = u.vos;
        double[] drift = u.drift;
        double[] ib25 = u.ib25;
        double[] ios25 = u.ios25;
        double[] aging = u.aging;
        double[] ratio = u.ratio;
        double[] res = u.res;
        // each end's currents: the unit's 25 °C draw at an end at 25 °C, else its own draw scaled to the limit there
        double[] ibA = atRef[0] ? ib25 : u.ib0;
        double[] ibB = atRef[1] ? ib25 : u.ib1;
        double[] iosA = atRef[0] ? ios25 : u.ios0;
        double[] iosB = atRef[1] ? ios25 : u.ios1;
        double fibA = atRef[0] ? 1.0 : fib[0];
        double fibB = atRef[1] ? 1.0 : fib[1];
        double fiosA = atRef[0] ? 1.0 : fios[0];
        double fiosB = atRef[1] ? 1.0 : fios[1];
        double dtA = dt[0];
        double dtB = dt[1];
        double half = tol;
        double resHalf = resolution;
        // the two range ends written out: the compiler of short commands (C1) does not unroll loops
        for (int i = 0; i < size; i++) {
            double v25 = vos[i];
            double dr = driftFromVos ? v25 * perDrift : drift[i];
            double ibRef = ibTrimmed * ib25[i];
            double iosRef = iosTrimmed * ios25[i];
            double r = resHalf * res[i];
            double vA = clamped(v25 + dr * dtA);
            double eA = ng * (vA - vosRemoved * v25 + aging[i])
                    + perIb * (atEnd(fibA, ibA[i], atRef[0]) - ibRef)
                    + perIos * (atEnd(fiosA, iosA[i], atRef[0]) - iosRef)
                    + r;
            double vB = clamped(v25 + dr * dtB);
            double eB = ng * (vB - vosRemoved * v25 + aging[i])
                    + perIb * (atEnd(fibB, ibB[i], atRef[1]) - ibRef)
                    + perIos * (atEnd(fiosB, iosB[i], atRef[1]) - iosRef)
                    + r;
            double worst = Math.max(Math.max(0, Math.abs(eA)), Math.abs(eB));
            worst += Math.abs(gainCoef * (half * ratio[i])); // at the end of the swing where it adds to the offset
            if (worst <= room) {
                passes++;
            }
        }
        return passes;
    }

    /** A unit's current at a range end: its 25 °C draw as it is, else its draw scaled to the limit there. */
    private static double atEnd(double factor, double draw, boolean atRef) {
        return atRef ? draw : factor * draw;
    }

    private double clamped(double vT) {
        if (vT > clamp) {
            return clamp;
        }
        if (vT < -clamp) {
            return -clamp;
        }
        return vT;
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
