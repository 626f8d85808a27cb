package dev.ampsieve.advice;

import static dev.ampsieve.advice.Phrases.money;
import static dev.ampsieve.advice.Phrases.standing;
import static dev.ampsieve.advice.Phrases.volts;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Topology;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.function.Predicate;

/**
 * The stage advice (error-model.md, "Per-part verdict and stage advice"): the cheapest part
 * that fits as it is; whether a trim or a zero-drift part is warranted, by how much; and when
 * nothing fits, what single change would make the closest part fit, found by re-running the
 * budget on modified stages.
 */
public final class Advisor {
    private Advisor() {
    }

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
        NoFitAdvice noFit = fitting.isEmpty() ? noFit(stage, ranked, budgets) : null;

        List<String> lines = new ArrayList<>();
        if (ranked.isEmpty() && rejected.isEmpty()) {
            lines.add("No part to rank: the catalog (or the query) gave none.");
        }
        if (pick != null) {
            lines.add("Pick " + pick.id() + ": " + money(pick.effectiveCost(), pick.currency()) + " per unit"
                    + (pick.trimmed() ? " including the trim" : "") + ", fits " + (pick.trimmed() ? "after the trim" : "as it is")
                    + "; " + standing(pick) + ".");
            if (asIs == null) {
                lines.add("No part fits as it is.");
            } else if (asIs != pick) {
                lines.add("Cheapest part that fits as it is: " + asIs.id() + " at " + money(asIs.effectiveCost(), asIs.currency())
                        + "; " + standing(asIs) + ".");
            }
        }
        if (!ranked.isEmpty()) { // with no part at all, no trim can help or fail to
            trimLine(stage, trim).ifPresent(lines::add);
        }
        zeroDriftLines(stage, zeroDrift, fitting, lines);
        Unsettled undecided = undecided(stage, ranked);
        if (undecided != null) {
            lines.add(undecidedLine(undecided));
        }
        if (noFit != null) {
            noFitLines(noFit, rejected, lines);
        }
        if (!rejected.isEmpty()) {
            lines.add(rejected.size() + " part(s) fail a hard constraint and are not ranked (see the rejected list).");
        }
        TreeSet<String> currencies = new TreeSet<>();
        ranked.forEach(c -> currencies.add(c.currency()));
        currencies.remove("");
        if (currencies.size() > 1) {
            lines.add("Prices are in different currencies (" + String.join(", ", currencies)
                    + ") and are compared as plain numbers.");
        }
        // one price per part, at the quantity it was quoted for: nothing to pick a price break from
        TreeSet<Integer> larger = new TreeSet<>();
        ranked.stream().map(c -> c.part().price()).filter(p -> p != null && p.quantity() > stage.quantity())
                .forEach(p -> larger.add(p.quantity()));
        if (!larger.isEmpty()) {
            lines.add("Prices are the catalog's, each for its stated order quantity ("
                    + String.join(", ", larger.stream().map(String::valueOf).toList()) + " units), not for this build of "
                    + stage.quantity() + ": smaller orders usually cost more per unit.");
        }
        return new Advice(pick, asIs, trim, zeroDrift, noFit, undecided, lines);
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
            return new TrimAdvice(asIs != null ? TrimAdvice.Status.NOT_NEEDED : TrimAdvice.Status.NO_HELP,
                    null, asIs, Double.NaN, Double.NaN);
        }
        Candidate withTrim = fitting.stream().filter(Candidate::trimmed).findFirst().orElse(null);
        if (withTrim == null) {
            return new TrimAdvice(asIs != null ? TrimAdvice.Status.NOT_NEEDED : TrimAdvice.Status.NO_HELP,
                    null, asIs, Double.NaN, Double.NaN);
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
        double total = b.stage().criterion().kind() == Criterion.Kind.RSS ? b.trimmed().rssV() : b.trimmed().worstCaseV();
        return total <= b.limitV();
    }

    private static java.util.Optional<String> trimLine(Stage stage, TrimAdvice t) {
        int q = stage.quantity();
        String trimName = StageEdit.trim(stage).method() == Trim.Method.TWO_POINT ? "two-point calibration" : "one-point trim";
        String cost = StageEdit.trim(stage).cost() > 0
                ? money(StageEdit.trim(stage).cost(), t.withTrim() == null ? "" : t.withTrim().currency())
                : "no stated cost (stage trim.cost; counted as 0)";
        Candidate w = t.withTrim();
        Candidate a = t.asIs();
        return java.util.Optional.ofNullable(switch (t.status()) {
            case WARRANTED -> "A " + trimName + " is warranted: " + w.id() + " at " + money(Candidate.price(w.part()), w.currency())
                    + " plus the trim at " + cost + " costs " + money(w.effectiveCost(), w.currency()) + " per unit, "
                    + money(t.savingPerUnit(), w.currency()) + " less than " + a.id() + " as it is ("
                    + money(t.savingTotal(), w.currency()) + " over " + q + " units); " + standing(w) + ".";
            case REQUIRED -> "A " + trimName + " is required: no part fits as it is; " + w.id() + " fits after it at "
                    + money(w.effectiveCost(), w.currency()) + " per unit including " + cost + " for the trim; "
                    + standing(w) + ".";
            case NOT_WARRANTED -> "A " + trimName + " does not pay: " + w.id() + " fits after it at "
                    + money(w.effectiveCost(), w.currency()) + " per unit including the trim, "
                    + money(-t.savingPerUnit(), w.currency()) + " more than " + a.id() + " as it is.";
            case NOT_NEEDED -> StageEdit.trim(stage).allowed() ? "No part needs the " + trimName + " to fit; leave it out." : null;
            case WOULD_PAY_IF_ALLOWED -> "The stage allows no trim; a " + trimName + " would let " + w.id() + " fit at "
                    + money(w.effectiveCost(), w.currency()) + " per unit (price "
                    + money(Candidate.price(w.part()), w.currency()) + " plus the trim: " + cost + ")"
                    + (a == null ? ", and nothing fits without one"
                    : ", " + money(t.savingPerUnit(), w.currency()) + " less than " + a.id() + " as it is ("
                    + money(t.savingTotal(), w.currency()) + " over " + q + " units)")
                    + "; " + standing(w) + ".";
            case NO_HELP -> StageEdit.trim(stage).allowed() ? "Not even a trimmed part fits." : null;
        });
    }

    // ------------------------------------------------------------------ zero-drift

    static ZeroDriftAdvice zeroDrift(Stage stage, List<Candidate> fitting) {
        Candidate self = fitting.stream().filter(c -> c.part().selfCorrecting()).findFirst().orElse(null);
        Candidate std = fitting.stream().filter(c -> !c.part().selfCorrecting()).findFirst().orElse(null);
        List<String> caveats = self == null ? List.of() : caveats(stage, self);
        int q = stage.quantity();
        if (self == null) {
            return new ZeroDriftAdvice(ZeroDriftAdvice.Status.NONE_FITS, null, std, Double.NaN, Double.NaN, caveats);
        }
        if (std == null) {
            return new ZeroDriftAdvice(ZeroDriftAdvice.Status.ONLY_OPTION, self, null, Double.NaN, Double.NaN, caveats);
        }
        double saving = std.effectiveCost() - self.effectiveCost();
        ZeroDriftAdvice.Status s = saving > 0 ? ZeroDriftAdvice.Status.CHEAPER : ZeroDriftAdvice.Status.NOT_WARRANTED;
        return new ZeroDriftAdvice(s, self, std, saving, saving * q, caveats);
    }

    /**
     * What to check with a chopper or auto-zero part (error-model.md, "Self-correcting parts";
     * practitioner-notes.md item 10): charge-injection bias current and current noise, and
     * ripple at the chopping frequency against the band.
     */
    static List<String> caveats(Stage stage, Candidate c) {
        Part p = c.part();
        List<String> out = new ArrayList<>();
        Double ib = p.ib().max() != null ? p.ib().max() : p.ib().typ();
        TermResult bias = c.budget().term("bias");
        if (ib != null) {
            String hot = "";
            if (bias != null && Double.isFinite(bias.worstAtC()) && bias.worstAtC() != Stage.T_REF) {
                // the budget scales it with temperature: quote the current that gives the output error below
                double ibT = dev.ampsieve.budget.PartValues.of(p, stage).ibAt(bias.worstAtC());
                hot = " at 25 °C, " + Units.format(ibT, Dimension.CURRENT) + " at " + Phrases.celsius(bias.worstAtC())
                        + " in this budget";
            }
            out.add("bias current up to " + Units.format(Math.abs(ib), Dimension.CURRENT) + hot
                    + " (charge injection at the input switches, more than a plain CMOS input draws)"
                    + (bias != null ? ": " + volts(bias.outputV()) + " at the output here, "
                    + Phrases.percent(bias.outputV() / c.limitV()) + " of the limit" : "") + ".");
        } else {
            out.add("bias current is not in the catalog: chopper and auto-zero inputs draw charge-injection current;"
                    + " take it from the datasheet.");
        }
        Double in = p.noise().in();
        double r = Math.max(stage.rPlus(), stage.rMinus());
        if (in != null) {
            String s = "current noise " + Units.format(in, Dimension.CURRENT_DENSITY) + " (raised by charge injection)";
            if (r > 0) {
                s += " through up to " + Phrases.ohms(r) + " gives " + Units.format(in * r, Dimension.VOLTAGE_DENSITY);
                Double en = p.noise().en();
                if (en != null) {
                    s += " against its voltage noise of " + Units.format(en, Dimension.VOLTAGE_DENSITY);
                }
            }
            out.add(s + ".");
        } else {
            out.add("current noise is not in the catalog: charge injection raises it above a plain CMOS input;"
                    + " check it against the " + Phrases.ohms(r) + " at the inputs.");
        }
        Double fchop = p.choppingFrequency();
        String band = Units.format(stage.bandHigh(), Dimension.FREQUENCY);
        if (fchop == null) {
            out.add("chopping frequency is not in the catalog: compare the datasheet's ripple frequency with the "
                    + band + " band edge and with any ADC sample rate.");
        } else {
            double ratio = fchop / stage.bandHigh();
            String times = Phrases.number(ratio) + " times";
            if (ratio <= 1.0) {
                out.add("chopping at " + Units.format(fchop, Dimension.FREQUENCY) + " is inside the " + band
                        + " band: its ripple and intermodulation land in the signal; a part clocked well above the band"
                        + " is needed (common practice: 10 times above it).");
            } else if (ratio < CHOP_CLEARANCE) {
                out.add("chopping at " + Units.format(fchop, Dimension.FREQUENCY) + " is only " + times + " the "
                        + band + " band edge: ripple and intermodulation land near the band; check the datasheet's"
                        + " ripple and filter (common practice: keep it 10 times above the band).");
            } else {
                out.add("chopping at " + Units.format(fchop, Dimension.FREQUENCY) + " is " + times + " the " + band
                        + " band edge: the ripple lies well above the band; filter it before any ADC so it cannot alias.");
            }
        }
        return out;
    }

    /** "; resting on estimated or typical-only figures for ..." inside the parenthesis after a recommended part; empty otherwise. */
    private static String flagged(Candidate c) {
        return Phrases.estimateNote(c);
    }

    private static String withTrim(Candidate c) {
        return c.trimmed() ? " with the trim" : "";
    }

    private static void zeroDriftLines(Stage stage, ZeroDriftAdvice z, List<Candidate> fitting, List<String> lines) {
        int q = stage.quantity();
        Candidate s = z.selfCorrecting();
        Candidate std = z.standard();
        switch (z.status()) {
            case ONLY_OPTION -> {
                // "only X fits" would be false when several zero-drift parts fit: name the cheapest then
                long n = fitting.stream().filter(c -> c.part().selfCorrecting()).count();
                lines.add("A zero-drift part is warranted: "
                        + (n > 1 ? "only zero-drift parts fit (" + n + "); the cheapest, " + s.id() + " ("
                                + s.part().architecture().key() + "), costs "
                                : "only " + s.id() + " (" + s.part().architecture().key() + ") fits, at ")
                        + money(s.effectiveCost(), s.currency()) + " per unit" + withTrim(s) + "; " + standing(s) + ".");
            }
            case CHEAPER -> lines.add("A zero-drift part is warranted: " + s.id() + " (" + s.part().architecture().key()
                    + flagged(s) + ") fits at " + money(s.effectiveCost(), s.currency()) + withTrim(s) + ", " + money(z.savingPerUnit(), s.currency())
                    + " less per unit than the cheapest standard part " + std.id() + " at "
                    + money(std.effectiveCost(), std.currency()) + withTrim(std) + " (" + money(z.savingTotal(), s.currency())
                    + " over " + q + " units).");
            case NOT_WARRANTED -> lines.add("A zero-drift part is not needed: " + std.id() + " (standard" + flagged(std) + ") fits at "
                    + money(std.effectiveCost(), std.currency()) + withTrim(std) + ", " + money(-z.savingPerUnit(), std.currency())
                    + " less than the cheapest zero-drift part that fits, " + s.id() + ".");
            case NONE_FITS -> {
            }
        }
        if (z.warranted()) {
            lines.add("With " + s.id() + ", check:");
            z.caveats().forEach(c -> lines.add("  - " + c));
        }
    }

    // ------------------------------------------------------------------ undecided yield

    /** The best-ranked part whose yield interval still holds the target, with what would settle it; null when none. */
    static Unsettled undecided(Stage stage, List<Candidate> ranked) {
        Candidate c = ranked.stream().filter(x -> x.constraintsMet() && x.verdict() == Verdict.UNDECIDED).findFirst().orElse(null);
        if (c == null) {
            return null;
        }
        double target = stage.criterion().yieldTarget();
        var asIs = c.budget().yield();
        var after = c.budget().trimmed() == null ? null : c.budget().trimmed().yield();
        boolean trimmed = asIs.high() < target && after != null; // only the trim's run holds the target
        var y = trimmed ? after : asIs;
        return new Unsettled(c, y, trimmed, target, Math.max(stage.trials(), stage.maxTrials()),
                Unsettled.unitsToSettle(y.value(), target), StageEdit.trim(stage).allowed());
    }

    private static String undecidedLine(Unsettled u) {
        var y = u.yield();
        // the target as the stage gives it (99.02 %, not 99.0 %); the interval's upper end rounded up, its lower end down
        String pc = Units.format(u.target(), Dimension.RATIO, 4);
        String more = u.unitsToSettle() == Long.MAX_VALUE
                ? "no number of units can settle it, as the yield seen is the target itself"
                : "more units cannot settle it below about " + u.unitsToSettle() + " units at the yield seen"
                        + (u.unitsToSettle() > u.cap() ? " (max-trials is " + u.cap() + ")" : "");
        return u.candidate().id() + " is undecided" + (u.trimmed() ? " after the trim" : "") + ": after " + y.trials()
                + " simulated units the true yield is within " + Phrases.yieldPercent(y.low()) + " to "
                + (y.high() >= 1 ? "100 %" : String.format(Locale.ROOT, "%.2f %%", Math.ceil(y.high() * 1e4) / 100))
                + ", which holds the " + pc + " target; " + more
                + ". What settles it: a looser target (" + Phrases.yieldPercent(y.low()) + " or less is shown met), a part with "
                + "a smaller error" + (u.trimAllowed() ? "" : ", or allowing a trim") + ".";
    }

    // ------------------------------------------------------------------ nothing fits

    static NoFitAdvice noFit(Stage stage, List<Candidate> ranked, BudgetFunction budgets) {
        Candidate closest = ranked.stream()
                .max(Comparator.comparingDouble(Candidate::margin).thenComparing(Candidate::id, Comparator.reverseOrder()))
                .orElse(null);
        if (closest == null) {
            return new NoFitAdvice(null, null, Double.NaN, List.of());
        }
        String limiting = closest.budget().limitingTerm();
        TermResult t = limiting == null ? null : closest.budget().term(limiting);
        List<Change> changes = changes(stage, closest, budgets);
        return new NoFitAdvice(closest, limiting, t == null ? Double.NaN : t.outputV(), changes);
    }

    static List<Change> changes(Stage stage, Candidate closest, BudgetFunction budgets) {
        Part p = closest.part();
        Predicate<Stage> fits = s -> {
            Budget b = budgets.compute(StageEdit.capSampling(s), p); // fast near the target; undecided is no fit
            return b.constraintsMet() && b.verdict().fits();
        };
        List<Change> out = new ArrayList<>();
        lowerGain(stage, fits).ifPresent(out::add);
        lowerSource(stage, fits).ifPresent(out::add);
        narrowerTemperature(stage, fits).ifPresent(out::add);
        betterResistors(stage, fits).ifPresent(out::add);
        trimChange(stage, p, budgets).ifPresent(out::add);
        looserLimit(stage, closest, fits).ifPresent(out::add);
        lowerYieldTarget(stage, closest, fits).ifPresent(out::add);
        return out;
    }

    /**
     * x fits and is (within the bisection tolerance) the largest value that does: report it to
     * 3 digits, one step lower when the rounded value no longer fits.
     */
    static double reportLargest(double x, java.util.function.DoublePredicate fits) {
        double r = Phrases.round3(x);
        return r <= x || fits.test(r) ? r : r - Phrases.unit3(r);
    }

    /** As {@link #reportLargest}, for the smallest value that fits. */
    static double reportSmallest(double x, java.util.function.DoublePredicate fits) {
        double r = Phrases.round3(x);
        return r >= x || fits.test(r) ? r : r + Phrases.unit3(r);
    }

    private static java.util.Optional<Change> lowerGain(Stage stage, Predicate<Stage> fits) {
        if (stage.topology() == Topology.FOLLOWER || stage.rf() <= 0) {
            return java.util.Optional.empty();
        }
        double rf = stage.rf();
        double rgEff = stage.rgEffective();
        // scale Rf down: to a noise gain of 1 (non-inverting) or a signal gain of -1 (inverting)
        double low = stage.topology() == Topology.NON_INVERTING ? 0.0 : Math.min(1.0, rgEff / rf);
        if (low >= 1.0 || !fits.test(StageEdit.withRf(stage, rf * low))) {
            return java.util.Optional.empty();
        }
        double k = Bisection.largest(x -> fits.test(StageEdit.withRf(stage, rf * x)), low, 1.0);
        double ng = Math.max(1.0, reportLargest(StageEdit.withRf(stage, rf * k).noiseGain(),
                g -> fits.test(StageEdit.withRf(stage, (g - 1.0) * rgEff))));
        double rfNeeded = (ng - 1.0) * rgEff;
        Stage at = StageEdit.withRf(stage, rfNeeded);
        // the resistor as printed (3 digits), rounded toward the lower gain so that building it fits
        double rfShown = Phrases.round3Down(rfNeeded);
        if (!fits.test(StageEdit.withRf(stage, rfShown))) {
            rfShown -= Phrases.unit3(rfShown);
        }
        Map<String, Double> v = new LinkedHashMap<>();
        v.put("noiseGain", at.noiseGain());
        v.put("signalGain", at.signalGain());
        v.put("rf", rfShown);
        String resistors = "Rf " + Phrases.ohms(rfShown) + " with Rg " + Phrases.ohms(stage.rg());
        String text = stage.topology() == Topology.INVERTING
                ? "a gain of " + Phrases.number(at.signalGain()) + " or less in magnitude (now "
                + Phrases.number(stage.signalGain()) + "; noise gain " + Phrases.number(at.noiseGain()) + "): " + resistors
                : "a gain of " + Phrases.number(at.noiseGain()) + " or lower (now " + Phrases.number(stage.noiseGain())
                + "): " + resistors;
        return java.util.Optional.of(new Change(Change.Kind.LOWER_GAIN, text, v));
    }

    private static java.util.Optional<Change> lowerSource(Stage stage, Predicate<Stage> fits) {
        double rs = stage.sourceResistance();
        if (rs <= 0 || !fits.test(StageEdit.withSourceResistance(stage, 0))) {
            return java.util.Optional.empty();
        }
        java.util.function.DoublePredicate ok = r -> fits.test(StageEdit.withSourceResistance(stage, r));
        double x = reportLargest(Bisection.largest(ok, 0, rs), ok);
        String text = "a source resistance of " + Phrases.ohms(x) + " or lower (now " + Phrases.ohms(rs) + ")";
        return java.util.Optional.of(new Change(Change.Kind.LOWER_SOURCE_RESISTANCE, text, Map.of("sourceResistance", x)));
    }

    private static java.util.Optional<Change> narrowerTemperature(Stage stage, Predicate<Stage> fits) {
        // shrink toward the trim / datasheet reference temperature, or the nearest end of the range
        double c = Math.max(stage.tMin(), Math.min(stage.tMax(), Stage.T_REF));
        double dMax = Math.max(c - stage.tMin(), stage.tMax() - c);
        java.util.function.DoubleFunction<Stage> at = d ->
                StageEdit.withTemperature(stage, Math.max(stage.tMin(), c - d), Math.min(stage.tMax(), c + d));
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
        String text = "an ambient range of " + Phrases.celsius(s.tMin()) + " to " + Phrases.celsius(s.tMax()) + " (now "
                + Phrases.celsius(stage.tMin()) + " to " + Phrases.celsius(stage.tMax()) + ")";
        return java.util.Optional.of(new Change(Change.Kind.NARROWER_TEMPERATURE, text, v));
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
        double tol = Phrases.round3(stage.ratioTolerance() * k);
        double tc = Phrases.round3(stage.ratioTempco() * k);
        if (tol > stage.ratioTolerance() * k || tc > stage.ratioTempco() * k) {
            // rounded up past the boundary: one step better on both
            tol = tol > 0 ? tol - Phrases.unit3(tol) : 0;
            tc = tc > 0 ? tc - Phrases.unit3(tc) : 0;
        }
        Map<String, Double> v = new LinkedHashMap<>();
        v.put("ratioTolerance", tol);
        v.put("ratioTempco", tc);
        String text = "resistors matched to " + Units.format(tol, Dimension.RATIO) + " with "
                + Units.format(tc, Dimension.RATIO_DRIFT) + " tracking or better (now "
                + Units.format(stage.ratioTolerance(), Dimension.RATIO) + ", "
                + Units.format(stage.ratioTempco(), Dimension.RATIO_DRIFT) + ")";
        return java.util.Optional.of(new Change(Change.Kind.BETTER_RESISTORS, text, v));
    }

    private static java.util.Optional<Change> trimChange(Stage stage, Part p, BudgetFunction budgets) {
        Trim t = StageEdit.trim(stage);
        Trim tried;
        Change.Kind kind;
        if (!t.allowed()) {
            tried = new Trim(true, t.method(), t.resolution(), t.cost());
            kind = Change.Kind.ALLOW_TRIM;
        } else if (t.method() == Trim.Method.ONE_POINT) {
            tried = new Trim(true, Trim.Method.TWO_POINT, t.resolution(), t.cost());
            kind = Change.Kind.TWO_POINT_TRIM;
        } else {
            return java.util.Optional.empty();
        }
        Budget b = budgets.compute(StageEdit.withTrim(stage, tried), p);
        if (!b.constraintsMet() || !b.verdict().fits()) {
            return java.util.Optional.empty();
        }
        Candidate c = Candidate.of(b);
        String cost = t.cost() > 0 ? money(t.cost(), c.currency()) + " per unit" : "the trim's cost per unit (not given)";
        String what = kind == Change.Kind.ALLOW_TRIM
                ? "allow a " + (tried.method() == Trim.Method.TWO_POINT ? "two-point calibration" : "one-point trim at 25 °C")
                : "a two-point calibration instead of the one-point trim";
        Map<String, Double> v = new LinkedHashMap<>();
        v.put("errorAfterTrimV", c.errorV());
        v.put("trimCost", t.cost());
        return java.util.Optional.of(new Change(kind, what + ": " + standing(c) + ", at " + cost, v));
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
        StringBuilder text = new StringBuilder("a limit of ");
        // said the way the user wrote the limit, with the output figure beside it
        switch (l.kind()) {
            // each figure in the user's form rounded toward the looser side, so that the limit as printed fits
            case INPUT -> text.append(volts(Phrases.round3Up(needed / g))).append(" at the input (").append(volts(needed))
                    .append(" at the output) or looser (now ").append(volts(l.value())).append(" at the input)");
            case LSB -> {
                double lsb = l.reference() / Math.pow(2, l.bits());
                v.put("limitLsb", needed / lsb);
                text.append(String.format(Locale.ROOT, "%.2f", Math.ceil(needed / lsb * 100 - 1e-9) / 100)).append(" LSB (").append(volts(needed))
                        .append(" at the output) or looser (now ").append(Phrases.number(l.value())).append(" LSB)");
            }
            case PERCENT_OF_FULL_SCALE -> {
                double fs = stage.fullScaleOutput() == null ? Double.NaN : stage.fullScaleOutput();
                v.put("limitFraction", needed / fs);
                text.append(Units.format(Phrases.round3Up(needed / fs), Dimension.RATIO)).append(" of full scale (").append(volts(needed))
                        .append(" at the output) or looser (now ").append(Units.format(l.value(), Dimension.RATIO)).append(")");
            }
            case OUTPUT -> text.append(volts(needed)).append(" at the output (").append(volts(needed / g))
                    .append(" at the input) or looser (now ").append(volts(e)).append(")");
        }
        return java.util.Optional.of(new Change(Change.Kind.LOOSER_LIMIT, text.toString(), v));
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
        String text = "a yield target of " + Phrases.percentFine(target) + " or lower (now "
                + Phrases.percentFine(stage.criterion().yieldTarget()) + ")";
        return java.util.Optional.of(new Change(Change.Kind.LOWER_YIELD_TARGET, text, Map.of("yieldTarget", target)));
    }

    private static void noFitLines(NoFitAdvice n, List<Rejected> rejected, List<String> lines) {
        Candidate c = n.closest();
        if (c == null) {
            if (!rejected.isEmpty()) {
                Map<String, Integer> counts = new TreeMap<>();
                rejected.forEach(r -> r.failed().forEach(f -> counts.merge(f, 1, Integer::sum)));
                List<String> parts = new ArrayList<>();
                counts.forEach((k, v) -> parts.add(k + " (" + v + ")"));
                lines.add("Nothing fits: every part fails a hard constraint: " + String.join(", ", parts) + ".");
            }
            return;
        }
        String limit = Phrases.limitedBy(c);
        lines.add("Nothing fits. Closest: " + c.id() + ", " + standing(c) + limit + ".");
        if (n.changes().isEmpty()) {
            lines.add("No single change of gain, source resistance, temperature range, trim or limit makes it fit.");
        } else {
            lines.add("It would fit with any one of these changes:");
            n.changes().forEach(ch -> lines.add("  - " + ch.text()));
        }
    }
}
