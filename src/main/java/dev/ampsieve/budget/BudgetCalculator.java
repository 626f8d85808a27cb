package dev.ampsieve.budget;

import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * The full output error budget of one part in one stage (error-model.md): the ten terms,
 * worst-case and RSS totals, Monte Carlo yield, trimmed totals, hard constraints, verdict.
 * Pure and deterministic: the same stage (with its seed) and part give the same budget.
 */
public final class BudgetCalculator {
    private BudgetCalculator() {}

    /** Every error term, in the order of error-model.md. Add a new term here. */
    public static final List<ErrorTerm> TERMS = List.of(
            new OffsetTerm(),
            new DriftTerm(),
            new BiasTerm(),
            new CmrrTerm(),
            new PsrrTerm(),
            new OpenLoopGainTerm(),
            new BandwidthTerm(),
            new ResistorTerm(),
            new AgingTerm(),
            new NoiseTerm(),
            // operating point (TermKind.OPERATING_POINT)
            new OperatingPointTerm(),
            new InputCrossoverTerm(),
            new SelfHeatingTerm(),
            new ChoppingRippleTerm(),
            // board-level: 0 V unless the stage names them
            new ThermalEmfTerm(),
            new LeakageTerm(),
            // the trim circuit's own errors: counted only after the trim (ErrorTerm.afterTrimOnly)
            new NullPinDriftTerm(),
            new InjectionDriftTerm(),
            new DacDriftTerm(),
            new InjectionGainTerm());

    /** Keys of the terms that stay at their limits in the Monte Carlo (not drawn per unit). */
    private static final Set<String> FIXED_IN_YIELD = Set.of(
            CmrrTerm.KEY,
            PsrrTerm.KEY,
            OpenLoopGainTerm.KEY,
            BandwidthTerm.KEY,
            NoiseTerm.KEY,
            // operating point: bounds of unknown sign, held at their limits (conservative)
            OperatingPointTerm.KEY,
            InputCrossoverTerm.KEY,
            SelfHeatingTerm.KEY,
            ChoppingRippleTerm.KEY,
            ThermalEmfTerm.KEY,
            LeakageTerm.KEY,
            // trim circuit: bounds held at their limits, after the trim only
            NullPinDriftTerm.KEY,
            InjectionDriftTerm.KEY,
            DacDriftTerm.KEY,
            InjectionGainTerm.KEY);

    /** Chopping frequency should be at least this many times the band edge (common practice). */
    static final double CHOP_MARGIN = 10.0;

    public static Budget compute(Stage stage, Part part) {
        return compute(stage, part, true);
    }

    /**
     * As {@link #compute}, but a part that fails a hard constraint gets no Monte Carlo: its yield is
     * "none-pass" with no units simulated (no unit can be used where the part fails a supply,
     * temperature, swing, slew or price constraint), as for a part whose budget overflows. For
     * {@code rank}, which shows a rejected part only by its failed constraints: in a large catalog
     * about half the parts fail one, and simulating them was half the ranking's work. The verdict
     * (no-fit) is the same either way; {@code budget PART} and decision records use {@link #compute}.
     */
    public static Budget screen(Stage stage, Part part) {
        return compute(stage, part, false);
    }

    private static Budget compute(Stage stage, Part part, boolean sampleRejected) {
        PartValues v = PartValues.of(part, stage);
        Set<Assumption> warnings = new LinkedHashSet<>(v.assumptions());
        warnings.addAll(Measurements.warnings(part, stage));
        List<TermResult> terms = new ArrayList<>();
        double wc = 0;
        double sumSq = 0;
        double dcOnly = 0;
        for (ErrorTerm t : termsFor(stage)) {
            TermResult r = t.evaluate(stage, v);
            terms.add(r);
            if (t.afterTrimOnly()) {
                continue; // the trim circuit's own error: in the trimmed totals only
            }
            if (counts(stage, t)) {
                wc += r.outputV();
                sumSq += r.outputV() * r.outputV();
            } else {
                dcOnly += r.outputV();
            }
        }
        double rss = Math.sqrt(sumSq);
        double noiseRms = NoiseTerm.rms(stage, v);
        double limit = stage.limitVolts();
        stageWarnings(stage, part, warnings, limit);

        List<Assumption> cw = new ArrayList<>();
        List<ConstraintResult> constraints = new ArrayList<>(Constraints.check(stage, part, dcOnly, cw));
        constraints.addAll(SelfHeatingTerm.dieLimit(stage, v));
        warnings.addAll(cw);

        Trimmed trimmed = trimmed(stage, v, terms);
        ConstraintResult finite = Constraints.finite(terms, wc, rss, noiseRms, trimmed);
        if (!finite.ok()) {
            // no Monte Carlo on numbers past the largest double: the part is refused with the terms that overflowed
            constraints.add(finite);
            YieldResult none = new YieldResult(0, 0, 0, 0, "none-pass");
            return new Budget(
                    part,
                    stage,
                    stage.noiseGain(),
                    terms,
                    wc,
                    rss,
                    noiseRms,
                    limit,
                    none,
                    trimmed.withYield(none),
                    Verdict.NO_FIT,
                    null,
                    constraints,
                    List.copyOf(warnings));
        }

        boolean constraintsOk = constraints.stream().allMatch(ConstraintResult::ok);
        boolean sample = constraintsOk || sampleRejected;
        double fixed = fixedInYield(stage, terms, false, false);
        boolean withTrim = sample
                && stage.criterion().kind() == Criterion.Kind.YIELD
                && trimOf(stage).allowed();
        YieldModel before = sample ? new YieldModel(stage, v, fixed, false, false) : null;
        YieldResult yield;
        if (!sample) {
            yield = new YieldResult(0, 0, 0, 0, "none-pass");
            trimmed = trimmed.withYield(yield); // the verdict is no-fit without either yield
        } else if (withTrim && trimOf(stage).method() != Trim.Method.TWO_TEMPERATURE) {
            // both yields on the same simulated units, the draws they share made once; simulated here so reports
            // and ranking read the trimmed one instead of recomputing
            YieldResult[] both = YieldModel.beforeAndAfterTrim(
                    before,
                    yieldTarget(stage),
                    wcCounted(stage, terms),
                    trimmedModel(stage, v, terms),
                    yieldTarget(stage),
                    trimmedBound(stage, v, terms));
            yield = both[0];
            trimmed = trimmed.withYield(both[1]);
        } else {
            yield = before.run(yieldTarget(stage), wcCounted(stage, terms));
            if (withTrim) {
                trimmed = trimmed.withYield(trimmedYield(stage, v, terms));
            }
        }
        Trimmed afterTrim = trimmed;
        Verdict verdict = verdict(
                stage,
                wc,
                rss,
                yield,
                trimmed,
                constraintsOk,
                limit,
                () -> afterTrim.yield() != null ? afterTrim.yield() : trimmedYield(stage, v, terms));

        String limiting = null; // stays null when nothing contributes
        double largest = 0;
        for (ErrorTerm t : termsFor(stage)) {
            if (!counts(stage, t) || t.afterTrimOnly()) {
                continue;
            }
            double o = find(terms, t.key()).outputV();
            if (o > largest) {
                largest = o;
                limiting = t.key();
            }
        }
        List<TermResult> sorted = new ArrayList<>(terms);
        sorted.sort(Comparator.comparingDouble(TermResult::outputV).reversed());
        return new Budget(
                part,
                stage,
                stage.noiseGain(),
                sorted,
                wc,
                rss,
                noiseRms,
                limit,
                yield,
                trimmed,
                verdict,
                limiting,
                constraints,
                List.copyOf(warnings));
    }

    /** Whether {@code t} counts toward the error: DC terms of an AC-coupled stage count only toward headroom. */
    public static boolean counts(Stage stage, ErrorTerm t) {
        return !(stage.acCoupled() && t.dc());
    }

    /** The terms that apply to {@code stage}: every part term, and the board-level terms the stage names. */
    public static List<ErrorTerm> termsFor(Stage stage) {
        return TERMS.stream().filter(t -> t.appliesTo(stage)).toList();
    }

    /** The kind of the term with {@code key}; {@link TermKind#PART} for a key no term has. */
    public static TermKind kindOf(String key) {
        return TERMS.stream()
                .filter(t -> t.key().equals(key))
                .findFirst()
                .map(ErrorTerm::kind)
                .orElse(TermKind.PART);
    }

    /** Same, by key. */
    public static boolean counts(Stage stage, String key) {
        return TERMS.stream()
                .filter(t -> t.key().equals(key))
                .findFirst()
                .map(t -> counts(stage, t))
                .orElse(true);
    }

    /** The max-to-sigma values {@link #yieldBySigma} shows besides the stage's own. */
    public static final List<Double> SIGMA_READINGS = List.of(2.0, 4.0);

    /**
     * The untrimmed yield of the part with datasheet maxima read as each of {@link #SIGMA_READINGS}
     * and as the stage's own max-to-sigma, in increasing order of k: the other readings run the
     * stage's {@code trials} units with its seed and no early stop, so their intervals compare
     * (typical-only figures move their worst case with k).
     * For the single-part budget only: each is a Monte Carlo run of its own (the stage's own value
     * is the budget's yield, not run again).
     */
    public static List<SigmaYield> yieldBySigma(Budget b) {
        Stage stage = b.stage();
        Part part = b.part();
        java.util.TreeSet<Double> ks = new java.util.TreeSet<>(SIGMA_READINGS);
        ks.add(stage.maxToSigma());
        List<SigmaYield> out = new ArrayList<>();
        for (double k : ks) {
            if (k == stage.maxToSigma()) {
                YieldResult y = b.yield();
                out.add(new SigmaYield(k, y.value(), y.low(), y.high(), y.trials()));
                continue;
            }
            Stage sk = stage.withMaxToSigma(k);
            PartValues v = PartValues.of(part, sk);
            List<TermResult> terms =
                    termsFor(sk).stream().map(t -> t.evaluate(sk, v)).toList();
            YieldResult y = terms.stream().anyMatch(t -> !Double.isFinite(t.outputV()))
                    ? new YieldResult(0, 0, 0, 0, "none-pass") // as compute() decides for such a part
                    // the stage's trials without early stop: comparable intervals at each reading
                    : new YieldModel(sk, v, fixedInYield(sk, terms, false, false), false, false)
                            .run(Double.NaN, wcCounted(sk, terms));
            out.add(new SigmaYield(k, y.value(), y.low(), y.high(), y.trials()));
        }
        return List.copyOf(out);
    }

    /** Yield after the stage's trim (for the yield criterion), simulated with the same seed. */
    public static YieldResult trimmedYield(Stage stage, Part part) {
        PartValues v = PartValues.of(part, stage);
        List<TermResult> terms =
                termsFor(stage).stream().map(t -> t.evaluate(stage, v)).toList();
        if (terms.stream().anyMatch(t -> !Double.isFinite(t.outputV()))) {
            return new YieldResult(0, 0, 0, 0, "none-pass"); // as compute() decides for such a part
        }
        return trimmedYield(stage, v, terms);
    }

    private static YieldResult trimmedYield(Stage stage, PartValues v, List<TermResult> terms) {
        double bound = trimmedBound(stage, v, terms);
        if (trimOf(stage).method() == Trim.Method.TWO_TEMPERATURE) {
            return new TwoTemperatureYield(
                            stage, v, trimmedFixed(stage, v, terms), CalibrationLine.of(stage, trimOf(stage)))
                    .run(yieldTarget(stage), bound);
        }
        return trimmedModel(stage, v, terms).run(yieldTarget(stage), bound);
    }

    /** The Monte Carlo model after the stage's one- or two-point trim. */
    private static YieldModel trimmedModel(Stage stage, PartValues v, List<TermResult> terms) {
        boolean two = trimOf(stage).method() == Trim.Method.TWO_POINT;
        return new YieldModel(stage, v, trimmedFixed(stage, v, terms), true, two);
    }

    /**
     * Output volts held at their limits after the trim: what the trim circuit cannot reach of the offset stays,
     * held at its bound (each unit's offset is removed in full).
     */
    private static double trimmedFixed(Stage stage, PartValues v, List<TermResult> terms) {
        boolean two = trimOf(stage).method() == Trim.Method.TWO_POINT;
        return fixedInYield(stage, terms, true, two) + TrimSizing.of(stage, v).uncoveredV();
    }

    /** The trimmed worst case, which bounds every trimmed unit's error. */
    private static double trimmedBound(Stage stage, PartValues v, List<TermResult> terms) {
        return trimmed(stage, v, terms, trimOf(stage).method()).worstCaseV();
    }

    /** The worst-case total of the terms that count. */
    private static double wcCounted(Stage stage, List<TermResult> terms) {
        double wc = 0;
        for (ErrorTerm t : termsFor(stage)) {
            if (counts(stage, t) && !t.afterTrimOnly()) {
                wc += find(terms, t.key()).outputV();
            }
        }
        return wc;
    }

    private static double yieldTarget(Stage stage) {
        return stage.criterion().kind() == Criterion.Kind.YIELD
                ? stage.criterion().yieldTarget()
                : Double.NaN;
    }

    /**
     * Terms 4, 5, 6, 7, the tempco part of 8 and the noise allowance (a two-point trim drops 6).
     * Package-private so the benchmark harness can run the Monte Carlo on its own.
     */
    static double fixedInYield(Stage stage, List<TermResult> terms, boolean trimmed, boolean twoPoint) {
        double f = 0;
        for (TermResult r : terms) {
            if (FIXED_IN_YIELD.contains(r.key())) {
                if (trimmed && twoPoint && r.key().equals(OpenLoopGainTerm.KEY)) {
                    continue;
                }
                if (trimmed && r.key().equals(OperatingPointTerm.KEY)) {
                    continue; // a static offset at the operating point: every trim removes it
                }
                if (!trimmed && afterTrimOnly(r.key())) {
                    continue; // the trim circuit's error exists only once it trims
                }
                f += r.outputV();
            }
        }
        return f + ResistorTerm.tempcoPart(stage);
    }

    /** Whether the term with {@code key} counts only after the trim (a trim circuit's own error). */
    public static boolean afterTrimOnly(String key) {
        return TERMS.stream().anyMatch(t -> t.key().equals(key) && t.afterTrimOnly());
    }

    /**
     * The step the trim leaves, output volts: the stage's {@code trim.resolution}, or the sized
     * circuit's own step when that is coarser (a trimmer's settability, a DAC's LSB).
     */
    public static double trimResolution(Stage stage, SizedTrim sized) {
        double own = trimOf(stage).resolution();
        double circuit = sized.resolutionV();
        return Double.isNaN(circuit) ? own : Math.max(own, circuit);
    }

    /** The stage's trim circuit sized for the part (a stored correction when the stage names none). */
    public static SizedTrim sizedTrim(Stage stage, Part part) {
        return TrimSizing.of(stage, PartValues.of(part, stage));
    }

    /** The stage's trim, {@link Trim#NONE} when it has none. */
    public static Trim trimOf(Stage stage) {
        return stage.trim() == null ? Trim.NONE : stage.trim();
    }

    static Trimmed trimmed(Stage stage, PartValues v, List<TermResult> terms) {
        return trimmed(stage, v, terms, trimOf(stage).method());
    }

    /** Totals after a calibration by {@code method} at 25 °C, whatever the stage says (for comparison tables). */
    public static Trimmed trimmed(Stage stage, Part part, Trim.Method method) {
        PartValues v = PartValues.of(part, stage);
        List<TermResult> terms =
                termsFor(stage).stream().map(t -> t.evaluate(stage, v)).toList();
        return trimmed(stage, v, terms, method);
    }

    /**
     * Totals after a calibration at 25 °C. One-point: removes term 1, leaves the change of
     * term 3 from 25 °C ({@link BiasTerm#afterTrim}), keeps term 2 without its over-temperature
     * cap ({@link DriftTerm#afterTrim}), adds
     * the trim resolution. Two-point: also removes the static gain errors (term 6
     * and the tolerance part of term 8). Two-temperature ({@link CalibrationLine}): removes terms
     * 1 and 2 (the engine's offset is linear in temperature per unit: vos + drift x (T - 25)),
     * leaves of term 3 its part not linear in temperature ({@link BiasTerm#afterTwoTemperature}),
     * keeps every gain term, and the resolution grows by {@link CalibrationLine#resolutionFactor}
     * where the range reaches beyond the calibration points. Of the operating-point terms every
     * method removes the offset's move to the operating point ({@link OperatingPointTerm}, a static
     * offset there) and none the crossover step, the self-heating or the chopping ripple.
     */
    private static Trimmed trimmed(Stage stage, PartValues v, List<TermResult> terms, Trim.Method method) {
        boolean two = method == Trim.Method.TWO_POINT;
        CalibrationLine line = method == Trim.Method.TWO_TEMPERATURE ? CalibrationLine.of(stage, trimOf(stage)) : null;
        SizedTrim sized = TrimSizing.of(stage, v);
        double wc = 0;
        double sq = 0;
        for (ErrorTerm t : termsFor(stage)) {
            if (!counts(stage, t)) {
                continue;
            }
            double o = find(terms, t.key()).outputV();
            switch (t.key()) {
                // what the circuit cannot reach of the 25 °C offset stays (0 when it covers it)
                case OffsetTerm.KEY -> o = sized.uncoveredV();
                case OperatingPointTerm.KEY -> o = 0;
                case DriftTerm.KEY -> o = line != null ? 0 : DriftTerm.afterTrim(stage, v);
                case BiasTerm.KEY ->
                    o = line != null ? BiasTerm.afterTwoTemperature(stage, v, line) : BiasTerm.afterTrim(stage, v);
                case OpenLoopGainTerm.KEY -> o = two ? 0 : o;
                case ResistorTerm.KEY -> o = two ? ResistorTerm.tempcoPart(stage) : o;
                default -> {}
            }
            wc += o;
            sq += o * o;
        }
        double res =
                trimResolution(stage, sized) * (line != null ? line.resolutionFactor(stage.tMin(), stage.tMax()) : 1.0);
        wc += res;
        sq += res * res;
        return new Trimmed(wc, Math.sqrt(sq), null, sized);
    }

    /**
     * The verdict: a failed constraint is no-fit; otherwise the criterion decides, first as
     * the part is, then (when the stage allows a trim) after it. A yield criterion is met
     * (demonstrated) when the lower end of the 95 % interval reaches the target, refuted when
     * its upper end is below the target, and otherwise {@link Verdict#UNDECIDED}.
     */
    static Verdict verdict(
            Stage stage,
            double wc,
            double rss,
            YieldResult yield,
            Trimmed trimmed,
            boolean constraintsOk,
            double limit,
            java.util.function.Supplier<YieldResult> trimmedYield) {
        if (!constraintsOk || Double.isNaN(limit)) {
            return Verdict.NO_FIT;
        }
        Criterion c = stage.criterion();
        boolean trimAllowed = trimOf(stage).allowed();
        switch (c.kind()) {
            case WORST_CASE -> {
                if (wc <= limit) {
                    return Verdict.FITS;
                }
                return trimAllowed && trimmed.worstCaseV() <= limit ? Verdict.FITS_AFTER_TRIM : Verdict.NO_FIT;
            }
            case RSS -> {
                if (rss <= limit) {
                    return Verdict.FITS;
                }
                return trimAllowed && trimmed.rssV() <= limit ? Verdict.FITS_AFTER_TRIM : Verdict.NO_FIT;
            }
            default -> {
                double target = c.yieldTarget();
                if (yield.low() >= target) {
                    return Verdict.FITS;
                }
                YieldResult after = trimAllowed ? trimmedYield.get() : null;
                if (after != null && after.low() >= target) {
                    return Verdict.FITS_AFTER_TRIM;
                }
                // the interval still holds the target (as it is, or after an allowed trim): neither shown nor refuted
                boolean open = yield.high() >= target || after != null && after.high() >= target;
                return open ? Verdict.UNDECIDED : Verdict.NO_FIT;
            }
        }
    }

    private static void stageWarnings(Stage stage, Part part, Set<Assumption> w, double limit) {
        if (Double.isNaN(limit)) {
            w.add(new Assumption.Note("limit", Assumption.Rule.LIMIT_NEEDS_FULL_SCALE));
        }
        if (stage.fullScaleOutput() == null) {
            w.add(new Assumption.Note("full-scale-output", Assumption.Rule.GAIN_TERMS_NOT_COUNTED));
        }
        double loop = part.gbw() / stage.noiseGain();
        if (stage.filterOrder() == null && loop > stage.bandHigh()) {
            // the conservative default (NoiseModel.noiseBandEdge): say so, since a filter the user forgot to name costs
            // noise
            w.add(new Assumption.NoiseBand(
                    loop, NoiseModel.SINGLE_POLE_ENBW * loop, NoiseModel.SINGLE_POLE_ENBW * stage.bandHigh()));
        }
        Trim trim = trimOf(stage);
        if (trim.allowed()
                && trim.method() == Trim.Method.TWO_TEMPERATURE
                && (Double.isNaN(trim.cold()) || Double.isNaN(trim.hot()))) {
            w.add(new Assumption.CalibrationPoints(
                    trim.coldIn(stage), trim.hotIn(stage), !Double.isNaN(trim.cold()), !Double.isNaN(trim.hot())));
        }
        if (trim.allowed() && trim.method() == Trim.Method.TWO_TEMPERATURE) {
            // the engine's per-unit offset is a straight line in temperature; a datasheet's drift figure
            // (a box over the range) does not promise one, and no catalog holds the curvature
            w.add(new Assumption.Note("trim", Assumption.Rule.STRAIGHT_LINE_CALIBRATION));
        }
        if (stage.acCoupled()) {
            w.add(new Assumption.Note("ac-coupled", Assumption.Rule.AC_COUPLED));
        }
        if (part.selfCorrecting()) {
            w.add(new Assumption.Chopper("architecture", Assumption.Rule.CHOPPER_CAVEATS, part.architecture()));
            Double fc = part.choppingFrequency();
            if (fc == null) {
                w.add(new Assumption.Chopper(
                        "chopping-frequency", Assumption.Rule.CHOPPING_FREQUENCY_UNKNOWN, part.architecture()));
            } else if (stage.bandHigh() > fc / CHOP_MARGIN) {
                w.add(new Assumption.ChoppingNearBand(part.architecture(), stage.bandHigh(), fc));
            }
            if (fc != null && stage.sampleRate() != null) {
                for (ChoppingRippleTerm.Alias a :
                        ChoppingRippleTerm.aliases(fc, stage.sampleRate(), stage.bandHigh())) {
                    w.add(new Assumption.ChoppingAlias(
                            a.harmonic(), a.frequency(), stage.sampleRate(), a.alias(), stage.bandHigh()));
                }
            }
        }
    }

    private static TermResult find(List<TermResult> terms, String key) {
        for (TermResult t : terms) {
            if (t.key().equals(key)) {
                return t;
            }
        }
        throw new IllegalStateException("no term " + key);
    }
}
