package dev.ampsieve.report;

import static dev.ampsieve.report.Phrases.money;
import static dev.ampsieve.report.Phrases.standing;
import static dev.ampsieve.report.Phrases.volts;

import dev.ampsieve.advice.Advice;
import dev.ampsieve.advice.BoardLimited;
import dev.ampsieve.advice.Candidate;
import dev.ampsieve.advice.Caveat;
import dev.ampsieve.advice.Change;
import dev.ampsieve.advice.Comparison;
import dev.ampsieve.advice.NoFitAdvice;
import dev.ampsieve.advice.Rejected;
import dev.ampsieve.advice.Sufficiency;
import dev.ampsieve.advice.TrimAdvice;
import dev.ampsieve.advice.Unsettled;
import dev.ampsieve.advice.ZeroDriftAdvice;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.ConstraintResult;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.ThermalEmfTerm;
import dev.ampsieve.stage.Board;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Difference;
import dev.ampsieve.stage.Inverting;
import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.Network;
import dev.ampsieve.stage.NonInverting;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Topology;
import dev.ampsieve.stage.Transimpedance;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * The advice in words: the one place where the facts of {@code advice} (the pick, the trim and
 * zero-drift findings, the changes that would make a part fit, the caveats, a comparison's
 * preferred part, the answer to "does it suffice") become sentences. Every format (text, JSON's
 * {@code lines} and {@code text} fields, the decision records) takes its words from here.
 */
public final class AdviceText {
    private AdviceText() {}

    // ------------------------------------------------------------------ the advice lines

    /** The advice, one sentence (or an indented list item) a line. */
    public static List<String> lines(Advice a) {
        Stage stage = a.stage();
        List<String> lines = new ArrayList<>();
        if (a.nothingToRank()) {
            lines.add("No part to rank: the catalog (or the query) gave none.");
        }
        Candidate pick = a.pick();
        Candidate asIs = a.cheapestAsIs();
        if (pick != null) {
            lines.add("Pick " + pick.id() + ": " + money(pick.effectiveCost(), pick.currency()) + " per unit"
                    + (pick.trimmed() ? " including the trim" : "") + ", fits "
                    + (pick.trimmed() ? "after the trim" : "as it is")
                    + "; " + standing(pick) + ".");
            if (a.boardLimited() != null) {
                lines.add(board(a.boardLimited()));
            }
            if (asIs == null) {
                lines.add("No part fits as it is.");
            } else if (asIs != pick) {
                lines.add("Cheapest part that fits as it is: " + asIs.id() + " at "
                        + money(asIs.effectiveCost(), asIs.currency()) + "; " + standing(asIs) + ".");
            }
        }
        if (a.anyRanked()) { // with no part at all, no trim can help or fail to
            String t = trim(stage, a.trim());
            if (t != null) {
                lines.add(t);
            }
            if (a.trimCircuits() != null) {
                TrimCircuitText.render(a.trimCircuits(), stage).lines().forEach(lines::add);
            }
        }
        zeroDrift(stage, a.zeroDrift(), lines);
        if (a.undecided() != null) {
            lines.add(undecided(a.undecided()));
        }
        if (a.noFit() != null) {
            noFit(a.noFit(), a.rejected(), lines);
        }
        if (!a.rejected().isEmpty()) {
            lines.add(a.rejected().size()
                    + " part(s) fail a hard constraint and are not ranked (see the rejected list).");
        }
        if (!a.currencies().isEmpty()) {
            lines.add("Prices are in different currencies (" + String.join(", ", a.currencies())
                    + ") and are compared as plain numbers.");
        }
        if (!a.quotedQuantities().isEmpty()) {
            lines.add("Prices are the catalog's, each for its stated order quantity ("
                    + String.join(
                            ", ",
                            a.quotedQuantities().stream().map(String::valueOf).toList())
                    + " units), not for this build of "
                    + stage.quantity() + ": smaller orders usually cost more per unit.");
        }
        return lines;
    }

    /** The pick's largest term is the board's: say so and name the lever. */
    static String board(BoardLimited b) {
        TermResult t = b.term();
        Board board = b.board();
        String lever = t.key().equals(ThermalEmfTerm.KEY)
                ? "pair the " + board.junctions() + " junction(s) so their EMFs cancel, or keep heat away from them"
                : "a guard ring at the node's potential, a lower voltage beside the node, or a cleaner, drier board";
        return "Its largest term comes from the board, not the part: " + t.label() + ", " + volts(t.outputV())
                + " at the output (" + Phrases.percent(t.outputV() / b.limitV())
                + " of the limit); a better part would not remove it: " + lever + ".";
    }

    /** "one-point trim", "two-point calibration", "two-temperature calibration". */
    private static String trimName(Trim.Method m) {
        return switch (m) {
            case TWO_POINT -> "two-point calibration";
            case TWO_TEMPERATURE -> "two-temperature calibration";
            case ONE_POINT -> "one-point trim";
        };
    }

    private static Trim trimOf(Stage s) {
        return s.trim() == null ? Trim.NONE : s.trim();
    }

    /** The trim finding in words; null when there is nothing to say. */
    static String trim(Stage stage, TrimAdvice t) {
        int q = stage.quantity();
        Trim trim = trimOf(stage);
        String trimName = trimName(trim.method());
        String cost = trim.totalCost() > 0
                ? money(
                        trim.totalCost(),
                        t.withTrim() == null ? "" : t.withTrim().currency())
                : "no stated cost (stage trim.cost; counted as 0)";
        Candidate w = t.withTrim();
        Candidate a = t.asIs();
        return switch (t.status()) {
            case WARRANTED ->
                "A " + trimName + " is warranted: " + w.id() + " at "
                        + money(Candidate.price(w.part(), q), w.currency())
                        + " plus the trim at " + cost + " costs " + money(w.effectiveCost(), w.currency())
                        + " per unit, "
                        + money(t.savingPerUnit(), w.currency()) + " less than " + a.id() + " as it is ("
                        + money(t.savingTotal(), w.currency()) + " over " + q + " units); " + standing(w) + ".";
            case REQUIRED ->
                "A " + trimName + " is required: no part fits as it is; " + w.id() + " fits after it at "
                        + money(w.effectiveCost(), w.currency()) + " per unit including " + cost
                        + " for the trim; "
                        + standing(w) + ".";
            case NOT_WARRANTED ->
                "A " + trimName + " does not pay: " + w.id() + " fits after it at "
                        + money(w.effectiveCost(), w.currency()) + " per unit including the trim, "
                        + money(-t.savingPerUnit(), w.currency()) + " more than " + a.id() + " as it is.";
            case NOT_NEEDED -> trim.allowed() ? "No part needs the " + trimName + " to fit; leave it out." : null;
            case WOULD_PAY_IF_ALLOWED ->
                "The stage allows no trim; a " + trimName + " would let " + w.id() + " fit at "
                        + money(w.effectiveCost(), w.currency()) + " per unit (price "
                        + money(Candidate.price(w.part(), q), w.currency()) + " plus the trim: " + cost + ")"
                        + (a == null
                                ? ", and nothing fits without one"
                                : ", " + money(t.savingPerUnit(), w.currency()) + " less than " + a.id()
                                        + " as it is (" + money(t.savingTotal(), w.currency()) + " over " + q
                                        + " units)")
                        + "; " + standing(w) + ".";
            case NO_HELP -> trim.allowed() ? "Not even a trimmed part fits." : null;
        };
    }

    private static String withTrim(Candidate c) {
        return c.trimmed() ? " with the trim" : "";
    }

    private static void zeroDrift(Stage stage, ZeroDriftAdvice z, List<String> lines) {
        int q = stage.quantity();
        Candidate s = z.selfCorrecting();
        Candidate std = z.standard();
        switch (z.status()) {
            case ONLY_OPTION -> {
                // "only X fits" would be false when several zero-drift parts fit: name the cheapest then
                int n = z.fittingCount();
                lines.add("A zero-drift part is warranted: "
                        + (n > 1
                                ? "only zero-drift parts fit (" + n + "); the cheapest, " + s.id() + " ("
                                        + s.part().architecture().key() + "), costs "
                                : "only " + s.id() + " ("
                                        + s.part().architecture().key() + ") fits, at ")
                        + money(s.effectiveCost(), s.currency()) + " per unit" + withTrim(s) + "; " + standing(s)
                        + ".");
            }
            case CHEAPER ->
                lines.add("A zero-drift part is warranted: " + s.id() + " ("
                        + s.part().architecture().key()
                        + Phrases.estimateNote(s) + ") fits at " + money(s.effectiveCost(), s.currency())
                        + withTrim(s) + ", "
                        + money(z.savingPerUnit(), s.currency())
                        + " less per unit than the cheapest standard part " + std.id() + " at "
                        + money(std.effectiveCost(), std.currency()) + withTrim(std) + " ("
                        + money(z.savingTotal(), s.currency())
                        + " over " + q + " units).");
            case NOT_WARRANTED ->
                lines.add("A zero-drift part is not needed: " + std.id() + " (standard" + Phrases.estimateNote(std)
                        + ") fits at "
                        + money(std.effectiveCost(), std.currency()) + withTrim(std) + ", "
                        + money(-z.savingPerUnit(), std.currency())
                        + " less than the cheapest zero-drift part that fits, " + s.id() + ".");
            case NONE_FITS -> {}
        }
        if (z.warranted()) {
            lines.add("With " + s.id() + ", check:");
            z.caveats().forEach(c -> lines.add("  - " + caveat(c)));
        }
        if (z.resistorOption() != null) {
            Candidate o = z.resistorOption().part();
            lines.add("Or a standard part with better resistors: " + o.id() + " at "
                    + money(o.effectiveCost(), o.currency())
                    + withTrim(o) + " would fit with "
                    + change(z.resistorOption().change(), stage)
                    + " (the resistors' cost is not in the figures); now " + standing(o) + ".");
        }
    }

    /** One thing to check with a chopper or auto-zero part, in words. */
    public static String caveat(Caveat c) {
        if (c instanceof Caveat.Bias b) {
            if (b.ib() == null) {
                return "bias current is not in the catalog: chopper and auto-zero inputs draw charge-injection"
                        + " current; take it from the datasheet.";
            }
            String hot = Double.isNaN(b.worstAtC())
                    ? ""
                    : " at 25 °C, " + Units.format(b.ibAtWorst(), Dimension.CURRENT) + " at "
                            + Phrases.celsius(b.worstAtC()) + " in this budget";
            return "bias current up to " + Units.format(b.ib(), Dimension.CURRENT) + hot
                    + " (charge injection at the input switches, more than a plain CMOS input draws)"
                    + (Double.isNaN(b.outputV())
                            ? ""
                            : ": " + volts(b.outputV()) + " at the output here, "
                                    + Phrases.percent(b.outputV() / b.limitV()) + " of the limit")
                    + ".";
        }
        if (c instanceof Caveat.CurrentNoise n) {
            if (n.in() == null) {
                return "current noise is not in the catalog: charge injection raises it above a plain CMOS input;"
                        + " check it against the " + Phrases.ohms(n.r()) + " at the inputs.";
            }
            String s = "current noise " + Units.format(n.in(), Dimension.CURRENT_DENSITY)
                    + " (raised by charge injection)";
            if (n.r() > 0) {
                s += " through up to " + Phrases.ohms(n.r()) + " gives "
                        + Units.format(n.in() * n.r(), Dimension.VOLTAGE_DENSITY);
                if (n.en() != null) {
                    s += " against its voltage noise of " + Units.format(n.en(), Dimension.VOLTAGE_DENSITY);
                }
            }
            return s + ".";
        }
        Caveat.Chopping ch = (Caveat.Chopping) c;
        String band = Units.format(ch.bandHigh(), Dimension.FREQUENCY);
        String at = ch.frequency() == null ? "" : "chopping at " + Units.format(ch.frequency(), Dimension.FREQUENCY);
        String times = Phrases.number(ch.ratio()) + " times";
        return switch (ch.position()) {
            case UNKNOWN ->
                "chopping frequency is not in the catalog: compare the datasheet's ripple frequency with the " + band
                        + " band edge and with any ADC sample rate.";
            case INSIDE ->
                at + " is inside the " + band
                        + " band: its ripple and intermodulation land in the signal; a part clocked well above the band"
                        + " is needed (common practice: 10 times above it).";
            case NEAR ->
                at + " is only " + times + " the " + band
                        + " band edge: ripple and intermodulation land near the band; check the datasheet's"
                        + " ripple and filter (common practice: keep it 10 times above the band).";
            case CLEAR ->
                at + " is " + times + " the " + band
                        + " band edge: the ripple lies well above the band; filter it before any ADC so it cannot alias.";
        };
    }

    /** The undecided part and what would settle it. */
    static String undecided(Unsettled u) {
        var y = u.yield();
        // the target as the stage gives it (99.02 %, not 99.0 %); the interval's upper end rounded up, its lower end
        // down
        String pc = Units.format(u.target(), Dimension.RATIO, 4);
        String more = u.unitsToSettle() == Long.MAX_VALUE
                ? "no number of units can settle it, as the yield seen is the target itself"
                : "more units cannot settle it below about " + u.unitsToSettle() + " units at the yield seen"
                        + (u.unitsToSettle() > u.cap() ? " (max-trials is " + u.cap() + ")" : "");
        return u.candidate().id() + " is undecided" + (u.trimmed() ? " after the trim" : "") + ": after " + y.trials()
                + " simulated units the true yield is within " + Phrases.yieldPercent(y.low()) + " to "
                + (y.high() >= 1 ? "100 %" : String.format(Locale.ROOT, "%.2f %%", Math.ceil(y.high() * 1e4) / 100))
                + ", which holds the " + pc + " target; " + more
                + ". What settles it: a looser target (" + Phrases.yieldPercent(y.low())
                + " or less is shown met), a part with "
                + "a smaller error" + (u.trimAllowed() ? "" : ", or allowing a trim") + ".";
    }

    private static void noFit(NoFitAdvice n, List<Rejected> rejected, List<String> lines) {
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
        Stage stage = c.budget().stage();
        lines.add("Nothing fits. Closest: " + c.id() + ", " + standing(c) + Phrases.limitedBy(c) + ".");
        if (n.changes().isEmpty()) {
            lines.add("No single change of gain, source resistance, temperature range, trim or limit makes it fit.");
        } else {
            lines.add("It would fit with any one of these changes:");
            n.changes().forEach(ch -> lines.add("  - " + change(ch, stage)));
        }
        if (!n.targets().isEmpty()) {
            lines.add(
                    "A part would fit the stage as it is with any one of these figures, the rest as " + c.id() + "'s:");
            n.targets().forEach(t -> lines.add("  - " + Phrases.target(t, stage)));
        }
    }

    // ------------------------------------------------------------------ changes

    /** The gain-setting resistors of a network as built, for the wording of a gain change. */
    private static String resistors(Network n) {
        return switch (n.topology()) {
            case NON_INVERTING ->
                "Rf " + Phrases.ohms(n.feedback()) + " with Rg " + Phrases.ohms(((NonInverting) n).rg());
            case INVERTING -> "Rf " + Phrases.ohms(n.feedback()) + " with Rg " + Phrases.ohms(((Inverting) n).rg());
            case DIFFERENCE -> {
                Difference d = (Difference) n;
                yield "R2 " + Phrases.ohms(d.r2()) + " with R1 " + Phrases.ohms(d.r1()) + ", R4 " + Phrases.ohms(d.r4())
                        + " with R3 " + Phrases.ohms(d.r3());
            }
            case TRANSIMPEDANCE -> {
                Transimpedance t = (Transimpedance) n;
                yield "Rf " + Phrases.ohms(t.rf())
                        + (t.cf() > 0
                                ? " with Cf " + Units.format(t.cf(), Dimension.CAPACITANCE)
                                        + " (the same signal bandwidth)"
                                : "");
            }
            case FOLLOWER -> "Rf " + Phrases.ohms(n.feedback());
        };
    }

    /** One change that makes a part fit, in words, against {@code stage} as it is now. */
    public static String change(Change c, Stage stage) {
        Map<String, Double> v = c.values();
        return switch (c.kind()) {
            case LOWER_GAIN -> lowerGain(c, stage);
            case SPLIT_GAIN ->
                "split the gain with a later stage: a gain of " + Phrases.number(stage.signalGain())
                        + " in one stage does not fit even at half of it; " + Phrases.number(v.get("gainHere"))
                        + " here (" + resistors(c.network()) + ") and " + Phrases.number(v.get("gainAfter"))
                        + " after it would, this stage held to " + volts(v.get("limitHereV"))
                        + " at its output (the limit divided by "
                        + Phrases.number(v.get("gainAfter")) + "): the later stage's errors are divided by "
                        + Phrases.number(v.get("sourceGainHere"))
                        + " when referred to the input";
            case LOWER_SOURCE_RESISTANCE -> {
                String text = "a source resistance of " + Phrases.ohms(v.get("sourceResistance")) + " or lower (now "
                        + Phrases.ohms(stage.sourceResistance()) + ")";
                if (v.containsKey("signalGain")) {
                    text += "; the signal gain then " + Phrases.number(v.get("signalGain"))
                            + (v.containsKey("fullScaleOutput")
                                    ? ", full-scale output " + volts(v.get("fullScaleOutput"))
                                    : "");
                }
                yield text;
            }
            case NARROWER_TEMPERATURE ->
                "an ambient range of " + Phrases.celsius(v.get("tMin")) + " to " + Phrases.celsius(v.get("tMax"))
                        + " (now " + Phrases.celsius(stage.tMin()) + " to " + Phrases.celsius(stage.tMax()) + ")";
            case BETTER_RESISTORS -> betterResistors(v.get("ratioTolerance"), v.get("ratioTempco"), stage);
            case LESS_THERMAL_EMF -> {
                Board b = stage.board();
                yield "less thermal EMF at the input: " + Units.format(v.get("thermalEmfV"), Dimension.VOLTAGE)
                        + " or less (now "
                        + Units.format(b.junctions() * b.seebeck() * b.gradient(), Dimension.VOLTAGE) + "): pair the "
                        + b.junctions() + " junction(s) so their EMFs cancel, or keep them within "
                        + Phrases.number(v.get("gradient")) + " °C of each other (now "
                        + Phrases.number(b.gradient()) + " °C)";
            }
            case LESS_LEAKAGE -> {
                Board b = stage.board();
                yield "less leakage into the " + (b.leakageInput() == Board.Input.PLUS ? "+" : "-") + " input: "
                        + Phrases.ohms(v.get("leakageResistance")) + " or more (now "
                        + Phrases.ohms(b.leakageResistance())
                        + "), or a guard ring driven at the node's potential so that no voltage drives it";
            }
            case ALLOW_TRIM, TWO_POINT_TRIM -> trimChange(c, stage);
            case LOOSER_LIMIT -> looserLimit(v, stage);
            case LOWER_YIELD_TARGET ->
                "a yield target of " + Phrases.percentFine(v.get("yieldTarget")) + " or lower (now "
                        + Phrases.percentFine(stage.criterion().yieldTarget()) + ")";
            case HIGHER_LOAD_RESISTANCE ->
                "a load resistance of " + Phrases.ohms(v.get("loadResistance")) + " or higher (now "
                        + Phrases.ohms(stage.loadResistance()) + "): less output current heats the die less";
            case STEEPER_FILTER ->
                "a Butterworth low-pass of order " + (int) Math.round(v.get("filterOrder")) + " at "
                        + Units.format(stage.bandHigh(), Dimension.FREQUENCY)
                        + " after the amplifier (now "
                        + (stage.noiseFilterOrder() == 0 ? "none" : "order " + stage.noiseFilterOrder())
                        + "): it removes the chopping ripple (and shortens the noise band)";
        };
    }

    private static String lowerGain(Change c, Stage stage) {
        Map<String, Double> v = c.values();
        String resistors = resistors(c.network());
        // the input signal stays: the output's full scale shrinks with the gain
        String swing = !v.containsKey("fullScaleOutput")
                ? ""
                : "; full-scale output then " + volts(v.get("fullScaleOutput")) + " (now "
                        + volts(stage.fullScaleOutput()) + ")";
        return switch (stage.topology()) {
            case INVERTING, DIFFERENCE ->
                "a gain of " + Phrases.number(v.get("signalGain")) + " or less in magnitude (now "
                        + Phrases.number(stage.signalGain()) + "; noise gain " + Phrases.number(v.get("noiseGain"))
                        + "): " + resistors + swing;
            case TRANSIMPEDANCE ->
                "a smaller feedback resistor: " + resistors + " or less (now " + Phrases.ohms(stage.rf())
                        + "); the output per ampere falls with it" + swing;
            case NON_INVERTING, FOLLOWER ->
                "a gain of " + Phrases.number(v.get("noiseGain")) + " or lower (now "
                        + Phrases.number(stage.noiseGain()) + "): " + resistors + swing;
        };
    }

    private static String betterResistors(double tol, double tc, Stage stage) {
        String now = " (now " + Units.format(stage.ratioTolerance(), Dimension.RATIO) + ", "
                + Units.format(stage.ratioTempco(), Dimension.RATIO_DRIFT) + ")";
        return switch (stage.topology()) {
            case NON_INVERTING, INVERTING, FOLLOWER ->
                "resistors matched to " + Units.format(tol, Dimension.RATIO) + " with "
                        + Units.format(tc, Dimension.RATIO_DRIFT) + " tracking or better" + now;
            // the pairs' match sets both the gain and the rejection of the common mode
            case DIFFERENCE ->
                "better-matched resistor pairs: r2/r1 and r4/r3 each within " + Units.format(tol, Dimension.RATIO)
                        + " with " + Units.format(tc, Dimension.RATIO_DRIFT) + " tracking or better" + now
                        + "; a matched four-resistor network also raises the common-mode rejection";
            case TRANSIMPEDANCE ->
                "a feedback resistor of " + Units.format(tol, Dimension.RATIO) + " tolerance and "
                        + Units.format(tc, Dimension.RATIO_DRIFT) + " or better" + now;
        };
    }

    private static String trimChange(Change c, Stage stage) {
        Trim t = trimOf(stage);
        Candidate after = c.after();
        String cost = t.totalCost() > 0
                ? money(t.totalCost(), after.currency()) + " per unit"
                : "the trim's cost per unit (not given)";
        String what = c.kind() == Change.Kind.ALLOW_TRIM
                ? "allow a "
                        + switch (t.method()) {
                            case TWO_POINT -> "two-point calibration";
                            case TWO_TEMPERATURE -> "two-temperature calibration";
                            case ONE_POINT -> "one-point trim at 25 °C";
                        }
                : "a two-point calibration instead of the one-point trim";
        return what + ": " + standing(after) + ", at " + cost;
    }

    private static String looserLimit(Map<String, Double> v, Stage stage) {
        double needed = v.get("limitV");
        double atInput = v.get("limitInputV");
        Limit l = stage.limit();
        StringBuilder text = new StringBuilder("a limit of ");
        // said the way the user wrote the limit, with the output figure beside it; each figure in the user's form
        // rounded toward the looser side, so that the limit as printed fits
        switch (l.kind()) {
            case INPUT ->
                text.append(volts(v.get("limitAsWritten")))
                        .append(" at the input (")
                        .append(volts(needed))
                        .append(" at the output) or looser (now ")
                        .append(volts(l.value()))
                        .append(" at the input)");
            case LSB ->
                text.append(String.format(Locale.ROOT, "%.2f", v.get("limitAsWritten")))
                        .append(" LSB (")
                        .append(volts(needed))
                        .append(" at the output) or looser (now ")
                        .append(Phrases.number(l.value()))
                        .append(" LSB)");
            case PERCENT_OF_FULL_SCALE ->
                text.append(Units.format(v.get("limitAsWritten"), Dimension.RATIO))
                        .append(" of full scale (")
                        .append(volts(needed))
                        .append(" at the output) or looser (now ")
                        .append(Units.format(l.value(), Dimension.RATIO))
                        .append(")");
            case INPUT_CURRENT ->
                text.append(Units.format(v.get("limitAsWritten"), Dimension.CURRENT))
                        .append(" at the input (")
                        .append(volts(needed))
                        .append(" at the output) or looser (now ")
                        .append(Units.format(l.value(), Dimension.CURRENT))
                        .append(" at the input)");
            case OUTPUT ->
                text.append(volts(needed))
                        .append(" at the output (")
                        .append(
                                stage.topology() == Topology.TRANSIMPEDANCE
                                        ? Units.format(atInput, Dimension.CURRENT)
                                        : volts(atInput))
                        .append(" at the input) or looser (now ")
                        .append(volts(stage.limitVolts()))
                        .append(")");
        }
        return text.toString();
    }

    // ------------------------------------------------------------------ compare and suffices

    /** The one-line conclusion of a comparison of two parts. */
    public static String conclusion(Comparison c) {
        Candidate a = c.a();
        Candidate b = c.b();
        String preferred = c.preferred();
        int q = a.budget().stage().quantity();
        if (a.fits() && b.fits()) {
            Candidate p = a.id().equals(preferred) ? a : b;
            Candidate o = p == a ? b : a;
            double d = o.effectiveCost() - p.effectiveCost();
            if (preferred == null) {
                return "Both fit at the same cost with the same margin (" + Phrases.marginValue(a)
                        + "): either will do.";
            }
            if (Math.abs(d) < Comparison.COST_EPS) {
                return "Both fit at the same cost; " + p.id() + " has the larger margin (" + Phrases.marginValue(p)
                        + " against " + Phrases.marginValue(o) + "): " + p.id() + ".";
            }
            return "Both fit; " + p.id() + " costs " + money(d, p.currency()) + " less per unit ("
                    + money(d * q, p.currency()) + " over " + q + " units), margin " + Phrases.marginValue(p)
                    + " against "
                    + Phrases.marginValue(o) + ": " + p.id() + ".";
        }
        if (a.fits() || b.fits()) {
            Candidate p = a.fits() ? a : b;
            Candidate o = p == a ? b : a;
            return p.id() + " fits" + (p.trimmed() ? " after the trim" : "") + " (margin " + Phrases.marginValue(p)
                    + ") and " + o.id() + " does not (" + whyNot(o) + "): " + p.id() + ".";
        }
        if (preferred == null) {
            return "Neither fits (" + a.id() + ": " + whyNot(a) + "; " + b.id() + ": " + whyNot(b) + ").";
        }
        Candidate p = a.id().equals(preferred) ? a : b;
        Candidate o = p == a ? b : a;
        return "Neither fits; " + p.id() + " comes closer (" + volts(p.errorV()) + " against " + volts(o.errorV())
                + " for a " + volts(p.limitV()) + " limit; " + whyNot(p) + ").";
    }

    private static List<String> failedNames(Budget b) {
        return b.constraints().stream()
                .filter(x -> !x.ok())
                .map(ConstraintResult::name)
                .toList();
    }

    private static String whyNot(Candidate c) {
        if (!c.constraintsMet()) {
            return "fails " + String.join(", ", failedNames(c.budget()));
        }
        if (c.budget().stage().criterion().kind() == Criterion.Kind.YIELD && Phrases.yieldOf(c) != null) {
            // judged by the yield: an error total inside the limit would not say why it misses
            return Phrases.yieldText(c) + Phrases.limitedBy(c);
        }
        return Phrases.totalName(c.budget().stage().criterion()) + (c.trimmed() ? " after the trim " : " ")
                + volts(c.errorV()) + " against " + volts(c.limitV()) + Phrases.limitedBy(c);
    }

    /** The answer to "does this part suffice untrimmed?": one line beginning "yes:" or "no:". */
    public static String answer(Sufficiency s) {
        Budget b = s.budget();
        Criterion crit = b.stage().criterion();
        String id = b.part().id();
        String figure = Phrases.totalName(crit) + " " + volts(s.untrimmedErrorV()) + " against " + volts(b.limitV());
        if (crit.kind() == Criterion.Kind.YIELD && b.yield() != null) {
            figure = "yield " + Phrases.yieldPercent(b.yield().value()) + " (95 % interval from "
                    + Phrases.yieldPercent(b.yield().low()) + ", target " + Phrases.percentFine(crit.yieldTarget())
                    + "), " + figure;
        }
        TermResult t = b.limitingTerm() == null ? null : b.term(b.limitingTerm());
        String limited = t == null ? "" : ", limited by " + t.label() + " (" + volts(t.outputV()) + ")";
        return switch (s.outcome()) {
            case FAILS_CONSTRAINT -> "no: " + id + " fails a hard constraint: " + String.join(", ", failedNames(b));
            case YES ->
                "yes: " + id + " meets the limit untrimmed; " + figure + " (" + Phrases.margin(crit, s.margin()) + ").";
            case NEEDS_TRIM ->
                "no: " + id + " needs the trim; untrimmed " + figure + limited + "; after the trim "
                        + volts(s.afterTrimV()) + ".";
            case UNDECIDED ->
                "no: " + id + " is undecided untrimmed: after " + b.yield().trials()
                        + " simulated units the 95 % interval of its yield still holds the target; " + figure
                        + limited + ".";
            case NO ->
                "no: " + id + " does not meet the limit untrimmed; " + figure
                        + (s.margin() < 0 ? " (" + Phrases.margin(crit, s.margin()) + ")" : "") + limited + ".";
        };
    }
}
