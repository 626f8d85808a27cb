package dev.ampsieve.advice;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Topology;
import dev.ampsieve.stage.Trim;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.function.Predicate;

/**
 * The stage advice (error-model.md, "Per-part verdict and stage advice"): the cheapest part
 * that fits as it is; whether a trim or a zero-drift part is warranted, by how much; and when
 * nothing fits, what single change would make the closest part fit, found by re-running the
 * budget on modified stages.
 */
public final class Advisor {
    private Advisor() {}

    /**
     * Band-edge ratio below which chopping ripple and intermodulation are called "near the
     * band": common practice is to keep the chopping frequency at least ten times above it.
     */
    static final double CHOP_CLEARANCE = 10.0;

    static Advice advise(Stage stage, List<Candidate> ranked, List<Rejected> rejected, BudgetFunction budgets) {
        List<Candidate> fitting = ranked.stream().filter(Candidate::fits).toList();
        Candidate pick = fitting.isEmpty() ? null : fitting.get(0);
        Candidate asIs = fitting.stream().filter(c -> !c.trimmed()).findFirst().orElse(null);
        TrimAdvice trim = trim(stage, ranked, fitting, asIs);
        ZeroDriftAdvice zeroDrift = zeroDrift(stage, fitting);
        if (zeroDrift.warranted()) {
            zeroDrift =
                    zeroDrift.withResistorOption(resistorOption(stage, ranked, zeroDrift.selfCorrecting(), budgets));
        }
        NoFitAdvice noFit = fitting.isEmpty() ? noFit(stage, ranked, budgets) : null;

        Unsettled undecided = undecided(stage, ranked);
        TreeSet<String> currencies = new TreeSet<>();
        ranked.forEach(c -> currencies.add(c.currency()));
        currencies.remove("");
        // one price per part, at the quantity it was quoted for: nothing to pick a price break from
        TreeSet<Integer> larger = new TreeSet<>();
        ranked.stream()
                .map(c -> c.part().price())
                .filter(p -> p != null && p.quantity() > stage.quantity())
                .forEach(p -> larger.add(p.quantity()));
        return new Advice(
                pick,
                asIs,
                trim,
                zeroDrift,
                noFit,
                undecided,
                stage,
                !ranked.isEmpty(),
                pick == null ? null : boardLimited(stage, pick),
                rejected,
                currencies.size() > 1 ? List.copyOf(currencies) : List.of(),
                List.copyOf(larger),
                trimCircuits(stage, trim, noFit));
    }

    /**
     * When the stage allows a trim and names more than one circuit ({@code trim.circuits}): the
     * circuits compared for the part the trim advice is about (the cheapest part that fits with the
     * trim, else the closest part when nothing fits). Null otherwise.
     */
    static TrimCircuitChoice trimCircuits(Stage stage, TrimAdvice trim, NoFitAdvice noFit) {
        Trim t = StageEdit.trim(stage);
        if (!t.allowed() || t.circuits().size() < 2) {
            return null;
        }
        Candidate subject = trim.withTrim() != null ? trim.withTrim() : noFit != null ? noFit.closest() : null;
        return subject == null ? null : TrimCircuitChoice.of(stage, subject.part());
    }

    /**
     * When the pick's largest term comes from the board rather than the part: a better part would
     * not help, the layout would. Null otherwise.
     */
    static BoardLimited boardLimited(Stage stage, Candidate pick) {
        String key = pick.budget().limitingTerm();
        if (key == null || dev.ampsieve.budget.BudgetCalculator.kindOf(key) != dev.ampsieve.budget.TermKind.BOARD) {
            return null;
        }
        return new BoardLimited(pick.budget().term(key), pick.limitV(), stage.board());
    }

    // ------------------------------------------------------------------ trim

    static TrimAdvice trim(Stage stage, List<Candidate> ranked, List<Candidate> fitting, Candidate asIs) {
        int q = stage.quantity();
        if (!StageEdit.trim(stage).allowed()) {
            // judged on the after-trim totals the engine computed for every part
            Candidate would = ranked.stream()
                    .filter(c -> !c.verdict().fits() && fitsAfterTrim(c.budget()))
                    .map(c -> Candidate.withTrim(c.budget()))
                    .min(Comparator.comparingDouble(Candidate::effectiveCost).thenComparing(Candidate::id))
                    .orElse(null);
            if (would != null && (asIs == null || would.effectiveCost() < asIs.effectiveCost())) {
                double saving = asIs == null ? Double.NaN : asIs.effectiveCost() - would.effectiveCost();
                return new TrimAdvice(TrimAdvice.Status.WOULD_PAY_IF_ALLOWED, would, asIs, saving, saving * q);
            }
            return new TrimAdvice(
                    asIs != null ? TrimAdvice.Status.NOT_NEEDED : TrimAdvice.Status.NO_HELP,
                    null,
                    asIs,
                    Double.NaN,
                    Double.NaN);
        }
        Candidate withTrim =
                fitting.stream().filter(Candidate::trimmed).findFirst().orElse(null);
        if (withTrim == null) {
            return new TrimAdvice(
                    asIs != null ? TrimAdvice.Status.NOT_NEEDED : TrimAdvice.Status.NO_HELP,
                    null,
                    asIs,
                    Double.NaN,
                    Double.NaN);
        }
        if (asIs == null) {
            return new TrimAdvice(TrimAdvice.Status.REQUIRED, withTrim, null, Double.NaN, Double.NaN);
        }
        double saving = asIs.effectiveCost() - withTrim.effectiveCost();
        TrimAdvice.Status s = saving > 0 ? TrimAdvice.Status.WARRANTED : TrimAdvice.Status.NOT_WARRANTED;
        return new TrimAdvice(s, withTrim, asIs, saving, saving * q);
    }

    /**
     * Would the part meet the limit after the stage's trim? The yield criterion is judged on the
     * after-trim worst case (which, when within the limit, guarantees every unit passes).
     */
    static boolean fitsAfterTrim(Budget b) {
        if (b.trimmed() == null) {
            return false;
        }
        double total = b.stage().criterion().kind() == Criterion.Kind.RSS
                ? b.trimmed().rssV()
                : b.trimmed().worstCaseV();
        return total <= b.limitV();
    }

    // ------------------------------------------------------------------ zero-drift

    static ZeroDriftAdvice zeroDrift(Stage stage, List<Candidate> fitting) {
        Candidate self = fitting.stream()
                .filter(c -> c.part().selfCorrecting())
                .findFirst()
                .orElse(null);
        Candidate std = fitting.stream()
                .filter(c -> !c.part().selfCorrecting())
                .findFirst()
                .orElse(null);
        List<Caveat> caveats = self == null ? List.of() : caveats(stage, self);
        int n = (int) fitting.stream().filter(c -> c.part().selfCorrecting()).count();
        int q = stage.quantity();
        if (self == null) {
            return new ZeroDriftAdvice(ZeroDriftAdvice.Status.NONE_FITS, null, std, Double.NaN, Double.NaN, caveats, n);
        }
        if (std == null) {
            return new ZeroDriftAdvice(
                    ZeroDriftAdvice.Status.ONLY_OPTION, self, null, Double.NaN, Double.NaN, caveats, n);
        }
        double saving = std.effectiveCost() - self.effectiveCost();
        ZeroDriftAdvice.Status s = saving > 0 ? ZeroDriftAdvice.Status.CHEAPER : ZeroDriftAdvice.Status.NOT_WARRANTED;
        return new ZeroDriftAdvice(s, self, std, saving, saving * q, caveats, n);
    }

    /**
     * What to check with a chopper or auto-zero part (error-model.md, "Self-correcting parts";
     * practitioner-notes.md item 10): charge-injection bias current and current noise, and
     * ripple at the chopping frequency against the band.
     */
    static List<Caveat> caveats(Stage stage, Candidate c) {
        Part p = c.part();
        List<Caveat> out = new ArrayList<>();
        Double ib = p.ib().max() != null ? p.ib().max() : p.ib().typ();
        TermResult bias = c.budget().term("bias");
        double atC = Double.NaN;
        double ibT = Double.NaN;
        if (ib != null && bias != null && Double.isFinite(bias.worstAtC()) && bias.worstAtC() != Stage.T_REF) {
            // the budget scales it with temperature: the current that gives the output error
            atC = bias.worstAtC();
            ibT = dev.ampsieve.budget.PartValues.of(p, stage).ibAt(atC);
        }
        out.add(new Caveat.Bias(
                ib == null ? null : Math.abs(ib), atC, ibT, bias == null ? Double.NaN : bias.outputV(), c.limitV()));
        out.add(new Caveat.CurrentNoise(
                p.noise().in(),
                Math.max(stage.rPlus(), stage.rMinus()),
                p.noise().en()));
        Double fchop = p.choppingFrequency();
        if (fchop == null) {
            out.add(new Caveat.Chopping(null, stage.bandHigh(), Double.NaN, Caveat.Position.UNKNOWN));
        } else {
            double ratio = fchop / stage.bandHigh();
            Caveat.Position where = ratio <= 1.0
                    ? Caveat.Position.INSIDE
                    : ratio < CHOP_CLEARANCE ? Caveat.Position.NEAR : Caveat.Position.CLEAR;
            out.add(new Caveat.Chopping(fchop, stage.bandHigh(), ratio, where));
        }
        return out;
    }

    /**
     * Under a worst-case or RSS criterion, when a zero-drift part is warranted: the closest
     * standard part cheaper than it that does not fit, and the resistors that would let it fit
     * ({@link #betterResistors}), so that a designer sees both ways out. Not under the yield
     * criterion, where each try is a Monte Carlo run. Null when there is none.
     */
    static ZeroDriftAdvice.ResistorOption resistorOption(
            Stage stage, List<Candidate> ranked, Candidate zeroDrift, BudgetFunction budgets) {
        if (stage.criterion().kind() == Criterion.Kind.YIELD || zeroDrift == null) {
            return null;
        }
        Candidate std = ranked.stream()
                .filter(c -> !c.part().selfCorrecting() && !c.fits() && c.constraintsMet())
                .filter(c -> !(c.effectiveCost() >= zeroDrift.effectiveCost()))
                .max(Comparator.comparingDouble(Candidate::margin)
                        .thenComparing(Candidate::id, Comparator.reverseOrder()))
                .orElse(null);
        if (std == null) {
            return null;
        }
        Part p = std.part();
        Predicate<Stage> fits = s -> {
            Budget b = budgets.compute(s, p);
            return fitsBy(b);
        };
        return betterResistors(stage, fits)
                .map(ch -> new ZeroDriftAdvice.ResistorOption(std, ch))
                .orElse(null);
    }

    // ------------------------------------------------------------------ undecided yield

    /** The best-ranked part whose yield interval still holds the target, with what would settle it; null when none. */
    static Unsettled undecided(Stage stage, List<Candidate> ranked) {
        Candidate c = ranked.stream()
                .filter(x -> x.constraintsMet() && x.verdict() == Verdict.UNDECIDED)
                .findFirst()
                .orElse(null);
        if (c == null) {
            return null;
        }
        double target = stage.criterion().yieldTarget();
        var asIs = c.budget().yield();
        var after = c.budget().trimmed() == null ? null : c.budget().trimmed().yield();
        boolean trimmed = asIs.high() < target && after != null; // only the trim's run holds the target
        var y = trimmed ? after : asIs;
        return new Unsettled(
                c,
                y,
                trimmed,
                target,
                Math.max(stage.trials(), stage.maxTrials()),
                Unsettled.unitsToSettle(y.value(), target),
                StageEdit.trim(stage).allowed());
    }

    // ------------------------------------------------------------------ nothing fits

    static NoFitAdvice noFit(Stage stage, List<Candidate> ranked, BudgetFunction budgets) {
        Candidate closest = ranked.stream()
                .max(Comparator.comparingDouble(Candidate::margin)
                        .thenComparing(Candidate::id, Comparator.reverseOrder()))
                .orElse(null);
        if (closest == null) {
            return new NoFitAdvice(null, null, Double.NaN, List.of(), List.of());
        }
        String limiting = closest.budget().limitingTerm();
        TermResult t = limiting == null ? null : closest.budget().term(limiting);
        List<Change> changes = changes(stage, closest, budgets);
        return new NoFitAdvice(
                closest, limiting, t == null ? Double.NaN : t.outputV(), changes, partTargets(stage, closest, budgets));
    }

    /**
     * A re-run budget counts as a fit only on a positive verdict with every constraint met: any
     * verdict other than the two that say "fits" is not one, so an offered change never rests on it.
     */
    static boolean fitsBy(Budget b) {
        return b.constraintsMet() && (b.verdict() == Verdict.FITS || b.verdict() == Verdict.FITS_AFTER_TRIM);
    }

    static List<Change> changes(Stage stage, Candidate closest, BudgetFunction budgets) {
        Part p = closest.part();
        Predicate<Stage> fits = s -> {
            Budget b = budgets.compute(StageEdit.capSampling(s), p); // fast near the target; undecided is no fit
            return fitsBy(b);
        };
        List<Change> out = new ArrayList<>();
        lowerGain(stage, fits).ifPresent(out::add);
        lowerSource(stage, fits).ifPresent(out::add);
        narrowerTemperature(stage, fits).ifPresent(out::add);
        betterResistors(stage, fits).ifPresent(out::add);
        lessThermalEmf(stage, fits).ifPresent(out::add);
        lessLeakage(stage, fits).ifPresent(out::add);
        trimChange(stage, p, budgets).ifPresent(out::add);
        looserLimit(stage, closest, fits).ifPresent(out::add);
        lowerYieldTarget(stage, closest, fits).ifPresent(out::add);
        // operating point
        higherLoad(stage, fits).ifPresent(out::add);
        steeperFilter(stage, closest, fits).ifPresent(out::add);
        return out;
    }

    /**
     * x fits and is (within the bisection tolerance) the largest value that does: report it to
     * 3 digits, one step lower when the rounded value no longer fits.
     */
    static double reportLargest(double x, java.util.function.DoublePredicate fits) {
        double r = Rounding.round3(x);
        return r <= x || fits.test(r) ? r : r - Rounding.unit3(r);
    }

    /** As {@link #reportLargest}, for the smallest value that fits. */
    static double reportSmallest(double x, java.util.function.DoublePredicate fits) {
        double r = Rounding.round3(x);
        return r >= x || fits.test(r) ? r : r + Rounding.unit3(r);
    }

    /**
     * A change of gain never takes the stage below this share of its gain: a stage cut further
     * is no longer the stage designed, and the advice is to split the gain with a later stage.
     */
    static final double MIN_GAIN_SHARE = 0.5;

    /** The least gain a split leaves in this stage (non-inverting: Rf = Rg). */
    static final double SPLIT_MIN_HERE = 2.0;

    /**
     * No change offers a resistor below this, ohms: common practice, wiring, contacts and board
     * tracks are of this order, so a smaller value cannot be built as stated.
     */
    static final double RESISTOR_FLOOR = 10.0;

    /** Rf that gives |signal gain| {@code g} with the stage's Rg (and Rs, inverting). */
    static double rfFor(Stage stage, double g) {
        return stage.network().feedbackFor(g);
    }

    /** |signal gain| with feedback resistor {@code rf}. */
    static double gainWith(Stage stage, double rf) {
        return StageEdit.withRf(stage, rf).sourceGain();
    }

    private static java.util.Optional<Change> lowerGain(Stage stage, Predicate<Stage> fits) {
        if (!stage.network().gainAdjustable()) {
            return java.util.Optional.empty();
        }
        double rf = stage.rf();
        // the resistance the noise gain divides Rf by: NG = 1 + Rf/rgEff in every adjustable network
        double rgEff = rf / (stage.noiseGain() - 1.0);
        // the lowest Rf offered: half the gain (inverting: at least a gain of -1), never below the resistor floor
        double floorGain = switch (stage.topology()) {
            case INVERTING -> 1.0; // a gain of -1: below it the stage attenuates
            case NON_INVERTING, FOLLOWER, DIFFERENCE, TRANSIMPEDANCE -> 0.0;
        };
        double least = Math.max(MIN_GAIN_SHARE * stage.sourceGain(), floorGain);
        double rfMin = Math.max(rfFor(stage, least), RESISTOR_FLOOR);
        if (rfMin >= rf) {
            return java.util.Optional.empty();
        }
        if (!fits.test(StageEdit.withGain(stage, rfMin))) {
            return splitGain(stage, fits);
        }
        double found = Bisection.largest(x -> fits.test(StageEdit.withGain(stage, x)), rfMin, rf);
        double rfNeeded = switch (stage.topology()) {
            // the gain is Rf itself: rounded below, as printed
            case TRANSIMPEDANCE, FOLLOWER -> found;
            case NON_INVERTING, INVERTING, DIFFERENCE ->
                (Math.max(
                                        1.0,
                                        reportLargest(
                                                StageEdit.withRf(stage, found).noiseGain(),
                                                g -> fits.test(StageEdit.withGain(stage, (g - 1.0) * rgEff))))
                                - 1.0)
                        * rgEff;
        };
        Stage at = StageEdit.withRf(stage, rfNeeded);
        // the resistor as printed (3 digits), rounded toward the lower gain so that building it fits
        double rfShown = Rounding.round3Down(rfNeeded);
        if (!fits.test(StageEdit.withGain(stage, rfShown))) {
            rfShown -= Rounding.unit3(rfShown);
        }
        if (rfShown < rfMin * (1 - 1e-12) || !fits.test(StageEdit.withGain(stage, rfShown))) {
            return splitGain(stage, fits); // the printed resistor would cross the half-gain line
        }
        Map<String, Double> v = new LinkedHashMap<>();
        v.put("noiseGain", at.noiseGain());
        v.put("signalGain", at.signalGain());
        v.put("rf", rfShown);
        Double vfs = StageEdit.withGain(stage, rfShown).fullScaleOutput();
        if (vfs != null) {
            v.put("fullScaleOutput", vfs);
        }
        return java.util.Optional.of(
                new Change(Change.Kind.LOWER_GAIN, v, stage.network().withFeedback(rfShown), null));
    }

    /**
     * The stage with {@code here} of its gain (|signal gain|) and the rest, G / here, in a later
     * stage: its full-scale output scaled with the gain, and its share of the limit the limit
     * divided by the later gain (the later stage multiplies this stage's error by it).
     */
    static Stage splitAt(Stage stage, double rf) {
        double after = stage.sourceGain() / gainWith(stage, rf);
        return StageEdit.withLimit(StageEdit.withGain(stage, rf), Limit.output(stage.limitVolts() / after));
    }

    /**
     * When even half the gain does not fit: the largest gain here that fits when a later stage
     * supplies the rest, each judged by the same budget with the limit scaled; null when not even
     * a gain of {@link #SPLIT_MIN_HERE} here fits (then no split helps: the part's input errors
     * stay the same however the gain is shared).
     */
    private static java.util.Optional<Change> splitGain(Stage stage, Predicate<Stage> fits) {
        double g = stage.sourceGain();
        double e = stage.limitVolts();
        if (stage.topology() == Topology.TRANSIMPEDANCE) {
            return java.util.Optional.empty(); // a later voltage gain after a smaller Rf: not offered yet
        }
        if (!(e > 0) || !Double.isFinite(e) || MIN_GAIN_SHARE * g <= SPLIT_MIN_HERE) {
            return java.util.Optional.empty();
        }
        double rfLow = Math.max(rfFor(stage, SPLIT_MIN_HERE), RESISTOR_FLOOR);
        double rfHigh = rfFor(stage, MIN_GAIN_SHARE * g);
        java.util.function.DoublePredicate ok = rf -> fits.test(splitAt(stage, rf));
        if (!(rfLow < rfHigh) || !ok.test(rfLow)) {
            return java.util.Optional.empty();
        }
        double found = ok.test(rfHigh) ? rfHigh : Bisection.largest(ok, rfLow, rfHigh);
        // the resistor as printed, rounded toward less gain here, and re-checked
        double rfShown = Rounding.round3Down(found);
        if (!ok.test(rfShown)) {
            rfShown -= Rounding.unit3(rfShown);
        }
        if (rfShown < rfLow * (1 - 1e-12) || !ok.test(rfShown)) {
            return java.util.Optional.empty();
        }
        Stage here = splitAt(stage, rfShown);
        double gHere = here.sourceGain();
        double after = g / gHere;
        Map<String, Double> v = new LinkedHashMap<>();
        v.put("gainHere", here.signalGain());
        v.put("gainAfter", after);
        v.put("noiseGain", here.noiseGain());
        v.put("rf", rfShown);
        v.put("limitHereV", here.limitVolts());
        v.put("sourceGainHere", gHere);
        return java.util.Optional.of(
                new Change(Change.Kind.SPLIT_GAIN, v, stage.network().withFeedback(rfShown), null));
    }

    private static java.util.Optional<Change> lowerSource(Stage stage, Predicate<Stage> fits) {
        boolean lever = switch (stage.topology()) {
            case NON_INVERTING, INVERTING, FOLLOWER, DIFFERENCE -> true;
            case TRANSIMPEDANCE -> false; // a lower shunt raises the noise gain: never a way out
        };
        if (!lever) {
            return java.util.Optional.empty();
        }
        double rs = stage.sourceResistance();
        // never "remove the source resistor": nothing below the resistor floor is offered
        if (rs <= RESISTOR_FLOOR || !fits.test(StageEdit.withSourceResistance(stage, RESISTOR_FLOOR))) {
            return java.util.Optional.empty();
        }
        java.util.function.DoublePredicate ok = r -> fits.test(StageEdit.withSourceResistance(stage, r));
        double x = Math.max(RESISTOR_FLOOR, reportLargest(Bisection.largest(ok, RESISTOR_FLOOR, rs), ok));
        if (!ok.test(x)) {
            return java.util.Optional.empty();
        }
        Map<String, Double> v = new LinkedHashMap<>();
        v.put("sourceResistance", x);
        if (stage.topology() == Topology.INVERTING) {
            // Rs is part of the gain resistor here: the gain (and the output's full scale) rises with it
            Stage at = StageEdit.withSourceResistance(stage, x);
            v.put("signalGain", at.signalGain());
            if (at.fullScaleOutput() != null) {
                v.put("fullScaleOutput", at.fullScaleOutput());
            }
        }
        return java.util.Optional.of(new Change(Change.Kind.LOWER_SOURCE_RESISTANCE, v));
    }

    /**
     * Board-level: the largest temperature difference across the stage's unpaired junctions that lets
     * the part fit, with the thermal EMF it allows at the input; the levers are pairing the junctions
     * (equal and opposite EMFs cancel) and keeping heat sources away from them (Keithley, Low Level
     * Measurements Handbook, 7th ed., §3.2 [from memory]).
     */
    private static java.util.Optional<Change> lessThermalEmf(Stage stage, Predicate<Stage> fits) {
        dev.ampsieve.stage.Board b = stage.board();
        if (!b.thermalEmf() || b.gradient() <= 0 || !fits.test(StageEdit.withGradient(stage, 0))) {
            return java.util.Optional.empty();
        }
        java.util.function.DoublePredicate ok = g -> fits.test(StageEdit.withGradient(stage, g));
        double g = reportLargest(Bisection.largest(ok, 0, b.gradient()), ok);
        if (!(g > 0) || !ok.test(g)) {
            return java.util.Optional.empty();
        }
        double emf = b.junctions() * b.seebeck() * g;
        Map<String, Double> v = new LinkedHashMap<>();
        v.put("thermalEmfV", emf);
        v.put("gradient", g);
        return java.util.Optional.of(new Change(Change.Kind.LESS_THERMAL_EMF, v));
    }

    /** Board-level: the smallest surface leakage resistance into the input that lets the part fit; a guard ring removes the voltage across it. */
    private static java.util.Optional<Change> lessLeakage(Stage stage, Predicate<Stage> fits) {
        dev.ampsieve.stage.Board b = stage.board();
        double none = Double.POSITIVE_INFINITY;
        if (!b.leakage() || !fits.test(StageEdit.withLeakageResistance(stage, none))) {
            return java.util.Optional.empty();
        }
        // bisection on the logarithm: leakage resistances span decades
        java.util.function.DoublePredicate okLog =
                x -> fits.test(StageEdit.withLeakageResistance(stage, Math.pow(10, x)));
        double hi = Math.log10(b.leakageResistance());
        double top = hi;
        while (!okLog.test(top) && top < hi + 12) {
            top += 1;
        }
        if (!okLog.test(top)) {
            return java.util.Optional.empty();
        }
        java.util.function.DoublePredicate ok = r -> fits.test(StageEdit.withLeakageResistance(stage, r));
        double r = reportSmallest(Math.pow(10, Bisection.smallest(okLog, hi, top)), ok);
        if (!ok.test(r)) {
            return java.util.Optional.empty();
        }
        Map<String, Double> v = new LinkedHashMap<>();
        v.put("leakageResistance", r);
        return java.util.Optional.of(new Change(Change.Kind.LESS_LEAKAGE, v));
    }

    /** Highest load resistance tried: 1 Gohm, no load to speak of (a higher one is the same stage). */
    static final double LOAD_CEILING = 1e9;

    /**
     * The least load resistance that fits when the stage's load heats the die too much: bisection on
     * ln R between the stage's load and {@link #LOAD_CEILING}, printed rounded up to 3 digits.
     */
    private static java.util.Optional<Change> higherLoad(Stage stage, Predicate<Stage> fits) {
        Double rl = stage.loadResistance();
        if (rl == null || rl >= LOAD_CEILING || !fits.test(StageEdit.withLoadResistance(stage, LOAD_CEILING))) {
            return java.util.Optional.empty();
        }
        java.util.function.DoublePredicate ok = r -> fits.test(StageEdit.withLoadResistance(stage, r));
        double ln = Bisection.smallest(x -> ok.test(Math.exp(x)), Math.log(rl), Math.log(LOAD_CEILING));
        double x = reportSmallest(Math.exp(ln), ok);
        if (!ok.test(x)) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(new Change(Change.Kind.HIGHER_LOAD_RESISTANCE, Map.of("loadResistance", x)));
    }

    /** The lowest filter order at band.high, above the stage's, that makes a chopper or auto-zero part fit. */
    private static java.util.Optional<Change> steeperFilter(Stage stage, Candidate closest, Predicate<Stage> fits) {
        TermResult ripple = closest.budget().term(dev.ampsieve.budget.ChoppingRippleTerm.KEY);
        if (ripple == null || !(ripple.outputV() > 0)) {
            return java.util.Optional.empty();
        }
        for (int n = stage.noiseFilterOrder() + 1; n <= Stage.MAX_FILTER_ORDER; n++) {
            if (fits.test(StageEdit.withFilterOrder(stage, n))) {
                return java.util.Optional.of(new Change(Change.Kind.STEEPER_FILTER, Map.of("filterOrder", (double) n)));
            }
        }
        return java.util.Optional.empty();
    }

    private static java.util.Optional<Change> narrowerTemperature(Stage stage, Predicate<Stage> fits) {
        // shrink toward the trim / datasheet reference temperature, or the nearest end of the range
        double c = Math.max(stage.tMin(), Math.min(stage.tMax(), Stage.T_REF));
        double dMax = Math.max(c - stage.tMin(), stage.tMax() - c);
        java.util.function.DoubleFunction<Stage> at =
                d -> StageEdit.withTemperature(stage, Math.max(stage.tMin(), c - d), Math.min(stage.tMax(), c + d));
        if (dMax <= 0 || !fits.test(at.apply(0))) {
            return java.util.Optional.empty();
        }
        double found = Bisection.largest(x -> fits.test(at.apply(x)), 0, dMax);
        // 0.1 °C steps: the rounded value, or a step narrower when that no longer fits
        double d = Math.round(found * 10) / 10.0;
        if (d > found && !fits.test(at.apply(d))) {
            d -= 0.1;
        }
        Stage s = at.apply(d);
        Map<String, Double> v = new LinkedHashMap<>();
        v.put("tMin", s.tMin());
        v.put("tMax", s.tMax());
        return java.util.Optional.of(new Change(Change.Kind.NARROWER_TEMPERATURE, v));
    }

    private static java.util.Optional<Change> betterResistors(Stage stage, Predicate<Stage> fits) {
        if (stage.ratioTolerance() <= 0 && stage.ratioTempco() <= 0) {
            return java.util.Optional.empty();
        }
        java.util.function.DoublePredicate ok = k -> fits.test(StageEdit.withResistors(stage, k));
        if (!ok.test(0)) {
            return java.util.Optional.empty();
        }
        // tolerance and tempco scaled together: better resistors improve both
        double k = Bisection.largest(ok, 0, 1);
        double tol = Rounding.round3(stage.ratioTolerance() * k);
        double tc = Rounding.round3(stage.ratioTempco() * k);
        if (tol > stage.ratioTolerance() * k || tc > stage.ratioTempco() * k) {
            // rounded up past the boundary: one step better on both
            tol = tol > 0 ? tol - Rounding.unit3(tol) : 0;
            tc = tc > 0 ? tc - Rounding.unit3(tc) : 0;
        }
        Map<String, Double> v = new LinkedHashMap<>();
        v.put("ratioTolerance", tol);
        v.put("ratioTempco", tc);
        return java.util.Optional.of(new Change(Change.Kind.BETTER_RESISTORS, v));
    }

    private static java.util.Optional<Change> trimChange(Stage stage, Part p, BudgetFunction budgets) {
        Trim t = StageEdit.trim(stage);
        Trim tried;
        Change.Kind kind;
        if (!t.allowed()) {
            tried = new Trim(true, t.method(), t.resolution(), t.cost(), t.cold(), t.hot(), t.circuit(), t.circuits());
            kind = Change.Kind.ALLOW_TRIM;
        } else if (t.method() == Trim.Method.ONE_POINT) {
            tried = new Trim(
                    true,
                    Trim.Method.TWO_POINT,
                    t.resolution(),
                    t.cost(),
                    Double.NaN,
                    Double.NaN,
                    t.circuit(),
                    t.circuits());
            kind = Change.Kind.TWO_POINT_TRIM;
        } else {
            return java.util.Optional.empty();
        }
        Budget b = budgets.compute(StageEdit.withTrim(stage, tried), p);
        if (!fitsBy(b)) {
            return java.util.Optional.empty();
        }
        Candidate c = Candidate.of(b);
        Map<String, Double> v = new LinkedHashMap<>();
        v.put("errorAfterTrimV", c.errorV());
        v.put("trimCost", t.totalCost());
        return java.util.Optional.of(new Change(kind, v, null, c));
    }

    private static java.util.Optional<Change> looserLimit(Stage stage, Candidate closest, Predicate<Stage> fits) {
        double e = closest.limitV();
        if (!(e > 0) || !Double.isFinite(e)) {
            return java.util.Optional.empty();
        }
        double hi = Math.max(e, closest.budget().worstCaseV()) * 1.01;
        int tries = 0;
        while (!fits.test(StageEdit.withLimit(stage, Limit.output(hi)))) {
            if (++tries > 6) {
                return java.util.Optional.empty(); // something other than the error limit stops it
            }
            hi *= 2;
        }
        final double upper = hi;
        java.util.function.DoublePredicate ok = x -> fits.test(StageEdit.withLimit(stage, Limit.output(x)));
        double needed = reportSmallest(Bisection.smallest(ok, e, upper), ok);
        double g = stage.sourceGain(); // input-referred means at the signal source
        Map<String, Double> v = new LinkedHashMap<>();
        v.put("limitV", needed);
        v.put("limitInputV", needed / g);
        Limit l = stage.limit();
        // the limit in the user's form, rounded toward the looser side so that the limit as printed fits
        switch (l.kind()) {
            case INPUT, INPUT_CURRENT -> v.put("limitAsWritten", Rounding.round3Up(needed / g));
            case LSB -> {
                double lsbs = needed / (l.reference() / Math.pow(2, l.bits()));
                v.put("limitLsb", lsbs);
                v.put("limitAsWritten", Math.ceil(lsbs * 100 - 1e-9) / 100);
            }
            case PERCENT_OF_FULL_SCALE -> {
                double fraction = needed / (stage.fullScaleOutput() == null ? Double.NaN : stage.fullScaleOutput());
                v.put("limitFraction", fraction);
                v.put("limitAsWritten", Rounding.round3Up(fraction));
            }
            case OUTPUT -> v.put("limitAsWritten", needed);
        }
        return java.util.Optional.of(new Change(Change.Kind.LOOSER_LIMIT, v));
    }

    /**
     * Floors of the part-side targets: below them no catalog part is to be had, so the target
     * would not be advice (common practice, orders of magnitude [from memory]: the best
     * electrometer inputs guarantee tens of fA, the best zero-drift parts about 1 µV and 5 nV/°C).
     */
    static final double IB_FLOOR = 1e-15;

    static final double VOS_FLOOR = 0.5e-6;
    static final double DRIFT_FLOOR = 2e-9;
    /** No package is cooler than a few °C/W without a heat sink (common practice). */
    static final double THETA_FLOOR = 5.0;

    /**
     * The part-side figures that would make the stage fit as it is, each found by bisection on a
     * copy of the closest part with that one figure changed ({@link PartEdit}), judged by the same
     * budget function, printed rounded down to 3 digits and re-checked as printed.
     */
    static List<PartTarget> partTargets(Stage stage, Candidate closest, BudgetFunction budgets) {
        Part p = closest.part();
        Predicate<Part> fits = q -> {
            Budget b = budgets.compute(stage, q);
            return fitsBy(b);
        };
        dev.ampsieve.budget.PartValues v = dev.ampsieve.budget.PartValues.of(p, stage);
        List<PartTarget> out = new ArrayList<>();

        // IB at the temperature where the closest part's bias term is worst (over the range when it does not depend on
        // it)
        TermResult bias = closest.budget().term(dev.ampsieve.budget.BiasTerm.KEY);
        double atC = bias != null && Double.isFinite(bias.worstAtC()) ? bias.worstAtC() : Double.NaN;
        double ibNow = Double.isNaN(atC) ? Math.max(v.ibAt(stage.tMin()), v.ibAt(stage.tMax())) : v.ibAt(atC);
        target(fits, x -> PartEdit.withIb(p, x), ibNow, IB_FLOOR)
                .ifPresent(x -> out.add(new PartTarget(PartTarget.Quantity.IB, x, atC)));

        // vos.max, the drift held at the closest part's (its figure, or the bound the engine used for it)
        double dT = stage.deltaT();
        dev.ampsieve.catalog.Spread drift =
                p.vosDrift().max() != null || p.vosDrift().typ() != null
                        ? p.vosDrift()
                        : new dev.ampsieve.catalog.Spread(null, v.driftBound(dT), null);
        target(fits, x -> PartEdit.withVos(p, x, drift), v.vos().bound(), VOS_FLOOR)
                .ifPresent(x -> out.add(new PartTarget(PartTarget.Quantity.VOS, x, Double.NaN)));

        if (dT > 0) {
            target(fits, x -> PartEdit.withDrift(p, x), v.driftBound(dT), DRIFT_FLOOR)
                    .ifPresent(x -> out.add(new PartTarget(PartTarget.Quantity.DRIFT, x, Double.NaN)));
        }

        // operating point: a cooler package, when the stage's load heats the die
        if (stage.loadResistance() != null && stage.supplyVoltage() != null) {
            target(
                            fits,
                            x -> PartEdit.withThetaJa(p, x),
                            v.operating().thetaJa().bound(),
                            THETA_FLOOR)
                    .ifPresent(x -> out.add(new PartTarget(PartTarget.Quantity.THETA_JA, x, Double.NaN)));
        }
        return out;
    }

    /**
     * The largest value of one part figure that fits, 3 digits rounded down and re-checked; empty
     * when the part's own value already fits with the edit (the figure is not what stops it), or
     * when not even the floor does.
     */
    private static java.util.OptionalDouble target(
            Predicate<Part> fits, java.util.function.DoubleFunction<Part> edit, double now, double floor) {
        if (!(now > floor) || !Double.isFinite(now) || fits.test(edit.apply(now)) || !fits.test(edit.apply(floor))) {
            return java.util.OptionalDouble.empty();
        }
        double x = Bisection.largest(y -> fits.test(edit.apply(y)), floor, now);
        double r = Rounding.round3Down(x);
        if (!fits.test(edit.apply(r))) {
            r -= Rounding.unit3(r);
        }
        if (r < floor || !fits.test(edit.apply(r))) {
            return java.util.OptionalDouble.empty();
        }
        return java.util.OptionalDouble.of(r);
    }

    /** Steps of 0.1 % tried below the first guess before giving up (the re-runs are Monte Carlo runs). */
    static final int YIELD_STEPS = 10;

    private static java.util.Optional<Change> lowerYieldTarget(Stage stage, Candidate closest, Predicate<Stage> fits) {
        var y = closest.budget().yield();
        if (stage.criterion().kind() != Criterion.Kind.YIELD || y == null || !(y.low() > 0)) {
            return java.util.Optional.empty();
        }
        // first guess: the lower end reached at the present target, in 0.1 % steps toward the side that
        // passes; then re-run, since a run stopped early against another target can end lower
        double target = Math.floor(y.low() * 1000) / 1000;
        int step = 0;
        while (target > 0 && !fits.test(StageEdit.withCriterion(stage, Criterion.yield(target)))) {
            if (++step > YIELD_STEPS) {
                return java.util.Optional.empty();
            }
            target = Math.round(target * 1000 - 1) / 1000.0;
        }
        if (!(target > 0)) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(new Change(Change.Kind.LOWER_YIELD_TARGET, Map.of("yieldTarget", target)));
    }
}
