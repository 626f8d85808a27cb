package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stats.SequentialYield;
import dev.ampsieve.stats.TruncatedNormal;
import dev.ampsieve.stats.UnitStream;
import java.util.ArrayList;
import java.util.List;

/**
 * Monte Carlo yield after a two-temperature calibration ({@link CalibrationLine}), sampled unit by
 * unit as the worst case bounds it ({@link BudgetCalculator} trimmed totals), so no unit's error
 * exceeds the trimmed worst case (TwoTemperatureTrimTest). Per unit, at each evaluation temperature T:
 * <pre>
 *   E(T) = NG*aging + e1*w1(T) + e2*w2(T) + perIb*(IB(T) - L_IB(T)) + perIos*(IOS(T) - L_IOS(T))
 * </pre>
 * the offset and its drift being linear in T per unit, the line through the two readings removes
 * them exactly; e1, e2 are the readings' resolution errors, uniform in +/- the resolution; L is
 * the line through the unit's own currents at the two calibration temperatures.
 * <ul>
 * <li>FET, CMOS, zero-drift inputs with a 25 °C figure: a unit's currents are its 25 °C draws (as {@link YieldModel}
 * draws them) times the engine's curve over the 25 °C limit, so IB(T) - L_IB(T) is the draw
 * times the curve's deviation from its chord ({@link BiasTerm#afterTwoTemperature}). Evaluated
 * at the temperatures where that deviation can peak ({@link CalibrationLine#candidates}).</li>
 * <li>Other inputs, and a current known only over temperature: the currents have no shape in the engine, only a bound at each temperature,
 * so each unit gets an independent draw at every temperature used (range ends, 25 °C inside the
 * range, both calibration points), each inside its bound there and never below zero where the
 * sign is known.</li>
 * </ul>
 * The gain error |VFS*S*ratio| and the terms held at their limits are added as in
 * {@link YieldModel} (a two-temperature offset calibration corrects no gain).
 */
final class TwoTemperatureYield {

    private final Stage s;
    /** Names the run's random stream with the stage's seed ({@link UnitStream#of}). */
    private final String partId;

    private final double limit;
    private final double fixed;
    private final double ng;
    private final double perIb;
    private final double perIos;
    private final double gainCoef;
    private final double tol;
    private final double resolution;
    /** A unit's IB (IOS) follows the engine's curve ({@link BiasTerm#ibShaped}); otherwise drawn anew at each temperature. */
    private final boolean ibShaped;

    private final boolean iosShaped;
    /** Evaluation temperatures, then the calibration points where they are not among them. */
    private final double[] temps;

    private final int evaluated;
    private final int coldIndex;
    private final int hotIndex;
    private final double[] w1;
    private final double[] w2;
    /** Shaped currents: the curve's deviation from its chord at each evaluation temperature, per ampere at 25 °C. */
    private final double[] ibDev;

    private final double[] iosDev;
    /** Shape-free currents: the limit at each temperature over the 25 °C limit. */
    private final double[] ibFac;

    private final double[] iosFac;
    private final TruncatedNormal ibD;
    private final TruncatedNormal iosD;
    private final TruncatedNormal agingD;

    TwoTemperatureYield(Stage s, PartValues v, double fixed, CalibrationLine line) {
        this.s = s;
        this.partId = v.part().id();
        this.limit = s.limitVolts();
        this.fixed = fixed;
        DcModel m = DcModel.of(s);
        this.ng = m.perVos();
        this.perIb = m.perIb();
        this.perIos = m.perIos();
        double vfs = s.fullScaleOutput() == null ? 0.0 : s.fullScaleOutput();
        this.gainCoef = vfs * ResistorTerm.sensitivity(s);
        this.tol = s.ratioTolerance();
        this.resolution = BudgetCalculator.trimResolution(s, TrimSizing.of(s, v));
        this.ibShaped = BiasTerm.ibShaped(v);
        this.iosShaped = BiasTerm.iosShaped(v);
        List<Double> at = new ArrayList<>(List.of(s.tMin(), s.tMax()));
        if (Stage.T_REF > s.tMin() && Stage.T_REF < s.tMax()) {
            addNew(at, List.of(Stage.T_REF));
        }
        if (ibShaped) {
            addNew(at, line.candidates(v::ibAt, BiasTerm.ibKnee(v), s.tMin(), s.tMax()));
        }
        if (iosShaped) {
            addNew(at, line.candidates(v::iosAt, BiasTerm.iosKnee(v), s.tMin(), s.tMax()));
        }
        this.evaluated = at.size();
        addNew(at, List.of(line.cold(), line.hot())); // shape-free currents are also read there
        this.temps = at.stream().mapToDouble(Double::doubleValue).toArray();
        this.coldIndex = at.indexOf(line.cold());
        this.hotIndex = at.indexOf(line.hot());
        int n = temps.length;
        w1 = new double[n];
        w2 = new double[n];
        ibDev = new double[n];
        iosDev = new double[n];
        ibFac = new double[n];
        iosFac = new double[n];
        for (int j = 0; j < n; j++) {
            w1[j] = line.w1(temps[j]);
            w2[j] = line.w2(temps[j]);
            ibDev[j] = line.residual(v::ibFactor, temps[j]);
            iosDev[j] = line.residual(v::iosFactor, temps[j]);
            ibFac[j] = v.ibFactor(temps[j]);
            iosFac[j] = v.iosFactor(temps[j]);
        }
        double k = s.maxToSigma();
        boolean dc = !s.acCoupled();
        this.ibD = dc ? YieldModel.bias(v.ib(), k, v.biasSignKnown()) : null;
        this.iosD = dc ? YieldModel.symmetric(v.ios(), v.ios().bound(), k) : null;
        this.agingD = dc ? YieldModel.symmetric(v.aging(), v.aging().bound(), k) : null;
    }

    private static void addNew(List<Double> out, List<Double> ts) {
        for (double t : ts) {
            if (!out.contains(t)) {
                out.add(t);
            }
        }
    }

    /**
     * Runs the estimate ({@code target} NaN: no early stop); all units pass without sampling when
     * {@code bound}, the trimmed worst case, is within the limit, none when the terms held at their
     * limits alone exceed it.
     */
    YieldResult run(double target, double bound) {
        if (Double.isNaN(limit)) {
            return new YieldResult(0, 0, 0, 0, "none-pass");
        }
        if (bound <= limit) {
            return new YieldResult(1.0, 1.0, 1.0, 0, "all-pass");
        }
        if (fixed > limit) {
            return new YieldResult(0.0, 0.0, 0.0, 0, "none-pass");
        }
        Sampler u = new Sampler(UnitStream.of(s.seed(), partId), SequentialYield.BLOCK);
        double[] err = new double[SequentialYield.BLOCK];
        // as YieldModel: without a target every one of the stage's units; with one, blocks until the answer is plain or
        // the cap
        int units = Double.isNaN(target) ? s.trials() : Math.max(s.trials(), s.maxTrials());
        SequentialYield.Estimate e = SequentialYield.run(Math.max(1, units), target, size -> {
            u.errors(size, err);
            int passes = 0;
            for (int i = 0; i < size; i++) {
                if (err[i] <= limit) {
                    passes++;
                }
            }
            return passes;
        });
        return new YieldResult(e.value(), e.low(), e.high(), (int) e.trials(), "sampled");
    }

    /** The largest error among {@code units} simulated units (the stage's seed), V: for checking the bound. */
    double largestError(int units) {
        Sampler u = new Sampler(UnitStream.of(s.seed(), partId), SequentialYield.BLOCK);
        double[] err = new double[SequentialYield.BLOCK];
        double worst = 0;
        for (int done = 0; done < units; done += SequentialYield.BLOCK) {
            int size = Math.min(SequentialYield.BLOCK, units - done);
            u.errors(size, err);
            for (int i = 0; i < size; i++) {
                worst = Math.max(worst, err[i]);
            }
        }
        return worst;
    }

    /** Draws blocks of units and computes each unit's error, V. */
    private final class Sampler {
        private final UnitStream rng;
        private final double[][] ib;
        private final double[][] ios;
        private final double[] aging;
        private final double[] ratio;
        private final double[] e1;
        private final double[] e2;

        Sampler(UnitStream rng, int n) {
            this.rng = rng;
            ib = new double[ibShaped ? 1 : temps.length][n];
            ios = new double[iosShaped ? 1 : temps.length][n];
            aging = new double[n];
            ratio = new double[n];
            e1 = new double[n];
            e2 = new double[n];
        }

        void errors(int size, double[] out) {
            for (double[] d : ib) {
                fill(ibD, d, size);
            }
            for (double[] d : ios) {
                fill(iosD, d, size);
            }
            fill(agingD, aging, size);
            uniform(tol, ratio, size);
            uniform(resolution, e1, size);
            uniform(resolution, e2, size);
            for (int i = 0; i < size; i++) {
                double worst = 0;
                for (int j = 0; j < evaluated; j++) {
                    double currents = perIb * (ibShaped ? ib[0][i] * ibDev[j] : line(ib, ibFac, i, j))
                            + perIos * (iosShaped ? ios[0][i] * iosDev[j] : line(ios, iosFac, i, j));
                    double e = ng * aging[i] + e1[i] * w1[j] + e2[i] * w2[j] + currents;
                    worst = Math.max(worst, Math.abs(e));
                }
                out[i] = fixed + worst + Math.abs(gainCoef * ratio[i]);
            }
        }

        /** Unit i's shape-free current at temperature j minus the line through its readings at the calibration points, A. */
        private double line(double[][] draws, double[] fac, int i, int j) {
            return fac[j] * draws[j][i]
                    - w1[j] * fac[coldIndex] * draws[coldIndex][i]
                    - w2[j] * fac[hotIndex] * draws[hotIndex][i];
        }

        private void fill(TruncatedNormal d, double[] a, int n) {
            if (d == null) {
                java.util.Arrays.fill(a, 0, n, 0.0);
            } else {
                d.fill(rng, a, n);
            }
        }

        private void uniform(double half, double[] a, int n) {
            if (half == 0) {
                java.util.Arrays.fill(a, 0, n, 0.0);
                return;
            }
            for (int i = 0; i < n; i++) {
                a[i] = half * (2.0 * rng.uniform() - 1.0);
            }
        }
    }
}
