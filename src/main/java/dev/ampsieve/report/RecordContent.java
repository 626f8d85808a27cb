package dev.ampsieve.report;

import dev.ampsieve.advice.Candidate;
import dev.ampsieve.advice.Comparison;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.advice.Rejected;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.ConstraintResult;
import dev.ampsieve.budget.NotCounted;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.record.DecisionRecord;
import dev.ampsieve.record.RecordFacts;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageWriter;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.stage.TrimCircuit;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** The words of a decision record, once, as blocks both formats lay out. */
final class RecordContent {
    private RecordContent() {}

    static final String ENTRY_HASH_NOTE =
            "Entry SHA-256: over the canonical form of the part's catalog values (every key"
                    + " path with its value in SI units, in the catalog's key order), not over the file's bytes: an edited comment,"
                    + " key order or unit prefix does not change it; any changed value does.";

    static List<RecordDoc.Block> blocks(DecisionRecord d) {
        List<RecordDoc.Block> o = new ArrayList<>();
        RecordFacts f = d.facts();
        Stage s = d.stage();
        boolean change = f.kind() == RecordFacts.Kind.CHANGE;
        o.add(new RecordDoc.Heading(
                1,
                (change
                                ? "Part change record: " + f.parts().get(0).id() + " to "
                                        + f.parts().get(1).id()
                                : "Part selection record")
                        + " for " + fileName(f.stagePath()),
                null));
        o.add(table(
                List.of("", ""),
                List.of(
                        List.of("written", f.date()),
                        List.of("tool", "ampsieve " + f.toolVersion()),
                        List.of("stage file", f.stagePath()),
                        List.of("catalog folder", f.catalogPath()),
                        List.of(
                                change ? "change" : "shortlist",
                                f.parts().isEmpty()
                                        ? "none: every part fails a hard constraint (see the rejected parts)"
                                        : String.join(
                                                ", ",
                                                f.parts().stream()
                                                        .map(p -> p.id())
                                                        .toList())),
                        List.of(
                                "cheapest part that fits",
                                f.cheapestFit() == null
                                        ? "none fits"
                                        : f.cheapestFit().id() + " at "
                                                + Figures.money(f.cheapestFit().effectiveCost()) + " "
                                                + f.cheapestFit().currency()
                                                + (f.cheapestFit().trimmed() ? " (trim included)" : ""))),
                false));
        o.add(new RecordDoc.Para(Caution.TEXT, "caution"));
        o.add(new RecordDoc.Para(
                "Re-check this record against today's catalog with: ampsieve recheck FILE (exit 0: it holds).",
                "note"));

        assumptions(o, d);
        // a change record is about the change: it comes before the ranking that places it
        if (d.comparison() != null) {
            comparison(o, d.comparison());
        }
        ranking(o, d);
        for (Candidate c : d.shortlist()) {
            o.add(new RecordDoc.PageBreak());
            part(o, c);
        }
        o.add(new RecordDoc.Heading(2, "Stage file as re-read by recheck", "stage-file"));
        o.add(new RecordDoc.Pre(f.stageYaml()));
        o.add(new RecordDoc.Para(Caution.TEXT, "caution"));
        return o;
    }

    private static void assumptions(List<RecordDoc.Block> o, DecisionRecord d) {
        Stage s = d.stage();
        double e = s.limitVolts();
        o.add(new RecordDoc.Heading(2, "Stage and assumptions", "stage"));
        Trim trim = BudgetCalculator.trimOf(s);
        List<List<String>> rows = new ArrayList<>();
        rows.add(List.of("topology", s.topology().key()));
        rows.add(List.of("noise gain", num(s.noiseGain())));
        rows.add(List.of(
                "signal gain",
                Figures.inputDimension(s) == Dimension.CURRENT
                        ? Units.format(s.signalGain(), Dimension.RESISTANCE, 4) + " (V/A)"
                        : num(s.signalGain())));
        rows.add(List.of(
                "limit",
                Figures.volts(e) + " at the output (" + Figures.atInput(s, e / s.sourceGain()) + " at the input)"));
        rows.add(List.of("criterion", CriterionText.of(s.criterion())));
        rows.add(List.of(
                "max-to-sigma", num(s.maxToSigma()) + " (a datasheet maximum read as this many standard deviations)"));
        rows.add(List.of(
                "temperatures",
                Units.format(s.tMin(), Dimension.TEMPERATURE) + " to "
                        + Units.format(s.tMax(), Dimension.TEMPERATURE) + " (largest distance from 25 °C: "
                        + Units.format(s.deltaT(), Dimension.TEMPERATURE) + ")"));
        rows.add(List.of(
                "trim",
                (trim.allowed() ? "allowed" : "not allowed") + ", method "
                        + trim.method().key()
                        + (trim.circuit().kind() == TrimCircuit.Kind.STORED
                                ? ""
                                : ", circuit " + trim.circuit().kind().key())
                        + ", cost " + Figures.money(trim.totalCost()) + " per unit"
                        + (trim.resolution() > 0 ? ", resolution " + Figures.volts(trim.resolution()) : "")));
        rows.add(List.of(
                "yield sampling",
                s.trials() + " units"
                        + (s.criterion().kind() == Criterion.Kind.YIELD
                                ? " (up to " + Math.max(s.trials(), s.maxTrials()) + " while undecided)"
                                : "")
                        + ", seed " + s.seed()));
        rows.add(List.of("quantity", Integer.toString(s.quantity())));
        String left = Uncounted.words(Uncounted.ofStage(NotCounted.of(s, null)));
        rows.add(List.of("terms not counted", left.isEmpty() ? "none: every term counts" : left));
        o.add(table(List.of("derived", "value"), rows, false));
        o.add(new RecordDoc.Para("Every value of the stage, as the stage file gives it or as its default:"));
        // two pairs of columns: the stage has some thirty keys
        List<Map.Entry<String, String>> answers =
                new ArrayList<>(StageWriter.answers(s).entrySet());
        int half = (answers.size() + 1) / 2;
        List<List<String>> keys = new ArrayList<>();
        for (int i = 0; i < half; i++) {
            Map.Entry<String, String> a = answers.get(i);
            Map.Entry<String, String> b = i + half < answers.size() ? answers.get(i + half) : null;
            keys.add(List.of(a.getKey(), a.getValue(), b == null ? "" : b.getKey(), b == null ? "" : b.getValue()));
        }
        o.add(table(List.of("stage key", "value", "stage key", "value"), keys, false));
        List<List<String>> est = new ArrayList<>();
        for (Candidate c : d.shortlist()) {
            List<String> terms = c.budget().terms().stream()
                    .filter(TermResult::estimated)
                    .map(TermResult::label)
                    .toList();
            List<NotCounted> partLeft = Uncounted.ofPart(c.budget().notCounted());
            est.add(List.of(
                    c.id(),
                    terms.isEmpty() ? "none" : String.join(", ", terms),
                    partLeft.isEmpty() ? "none" : Uncounted.words(partLeft)));
        }
        if (!est.isEmpty()) {
            o.add(new RecordDoc.Para(
                    "What was estimated: terms resting on an estimated, assumed or typical-only catalog"
                            + " figure (each part's warnings below say which figure and which rule):"));
            o.add(table(List.of("part", "estimated terms", "not counted for this part"), est, false));
        }
    }

    private static void ranking(List<RecordDoc.Block> o, DecisionRecord d) {
        Ranking r = d.ranking();
        Stage s = r.stage();
        String errorName = s.criterion().kind() == Criterion.Kind.WORST_CASE ? "worst-case" : "RSS";
        o.add(new RecordDoc.Heading(2, "Ranking", "ranking"));
        o.add(new RecordDoc.Para(r.candidates().size() + " parts meet the hard constraints, "
                + r.rejected().size()
                + " fail one. Parts that fit come first, cheapest first (trim cost included where the part needs it);"
                + " then the others, closest first."));
        List<List<String>> rows = new ArrayList<>();
        int i = 1;
        for (Candidate c : r.candidates()) {
            rows.add(List.of(
                    Integer.toString(i++),
                    c.id(),
                    verdict(c),
                    Figures.money(c.effectiveCost()) + " " + c.currency(),
                    Figures.volts(c.errorV()),
                    margin(s, c),
                    limiting(c),
                    r.paretoIds().contains(c.id()) ? "yes" : ""));
        }
        o.add(table(
                List.of(
                        "#",
                        "part",
                        "verdict",
                        "effective cost",
                        errorName + " error",
                        "margin",
                        "largest term",
                        "Pareto"),
                rows,
                true));
        o.add(new RecordDoc.Chart(
                RecordCharts.scatter(r, errorName),
                "Chart (HTML record): " + errorName
                        + " error against effective unit cost for every candidate with a price, the Pareto front and the limit"
                        + " line; the table above has the same figures."));
        o.add(new RecordDoc.Para(
                "Chart: each dot a candidate (filled: fits), the line joins the Pareto front (no other part"
                        + " is both cheaper and better), the red line is the limit " + Figures.volts(s.limitVolts())
                        + ". Error on a log scale."));
        if (!r.rejected().isEmpty()) {
            List<List<String>> rej = new ArrayList<>();
            for (Rejected x : r.rejected()) {
                rej.add(List.of(x.id(), ConstraintText.shortReason(x.failedConstraints())));
            }
            o.add(new RecordDoc.Heading(3, "Rejected: a hard constraint fails", null));
            o.add(table(List.of("part", "reason"), rej, false));
        }
        o.add(new RecordDoc.Heading(3, "Advice", "advice"));
        List<String> adviceLines = AdviceText.lines(r.advice());
        if (adviceLines.isEmpty()) {
            o.add(new RecordDoc.Para("No advice for this stage."));
        }
        for (String line : adviceLines) {
            o.add(new RecordDoc.Para(line));
        }
    }

    private static void comparison(List<RecordDoc.Block> o, Comparison c) {
        o.add(new RecordDoc.Heading(2, "Change from " + c.a().id() + " to " + c.b().id(), "change"));
        List<List<String>> rows = new ArrayList<>();
        for (Comparison.TermDelta t : c.terms()) {
            String better = switch (t.better()) {
                case A -> c.a().id();
                case B -> c.b().id();
                case EQUAL -> "equal";
            };
            rows.add(List.of(
                    t.label(),
                    Figures.volts(t.aV()),
                    Figures.volts(t.bV()),
                    better,
                    t.better() == Comparison.Side.EQUAL ? Figures.NONE : Figures.volts(t.differenceV())));
        }
        rows.add(List.of("judged total", Figures.volts(c.a().errorV()), Figures.volts(c.b().errorV()), "", ""));
        rows.add(List.of(
                "effective cost",
                Figures.money(c.a().effectiveCost()) + " " + c.a().currency(),
                Figures.money(c.b().effectiveCost()) + " " + c.b().currency(),
                "",
                ""));
        rows.add(List.of("verdict", verdict(c.a()), verdict(c.b()), "", ""));
        o.add(table(
                List.of("term (output)", c.a().id() + " (from)", c.b().id() + " (to)", "better", "by"),
                rows,
                List.of(false, true, true, false, true)));
        o.add(new RecordDoc.Para("Conclusion: " + AdviceText.conclusion(c)));
    }

    private static void part(List<RecordDoc.Block> o, Candidate c) {
        Budget b = c.budget();
        Stage s = b.stage();
        double limit = b.limitV();
        o.add(new RecordDoc.Heading(
                2,
                "Part " + c.id()
                        + (b.part().title().isBlank() ? "" : ": " + b.part().title()),
                "part-" + c.id()));
        var where = b.part().where();
        String file = where == null || where.file() == null
                ? Figures.NONE
                : where.file() + (where.line() > 0 ? ":" + where.line() : "");
        o.add(table(
                List.of("", ""),
                List.of(
                        List.of("verdict", verdict(c) + (c.trimmed() ? " (figures after the stage's trim)" : "")),
                        List.of("largest term", limiting(c)),
                        List.of(
                                "effective cost",
                                Figures.money(c.effectiveCost()) + " " + c.currency() + " at quantity " + s.quantity()),
                        List.of(
                                "source",
                                b.part().source().isBlank()
                                        ? "(the catalog entry names no source)"
                                        : b.part().source()),
                        List.of("catalog file", file),
                        List.of(
                                "entry SHA-256",
                                dev.ampsieve.record.Entry.of(b.part()).sha256()),
                        List.of(
                                "notes",
                                b.part().notes().isBlank()
                                        ? Figures.NONE
                                        : b.part().notes())),
                false));
        o.add(new RecordDoc.Para(ENTRY_HASH_NOTE, "note"));
        o.add(new RecordDoc.Heading(3, "Error budget", null));
        List<List<String>> rows = new ArrayList<>();
        for (TermResult t : b.terms()) {
            boolean counted = BudgetCalculator.counts(s, t.key());
            rows.add(List.of(
                    t.label() + (t.estimated() ? " *" : ""),
                    Figures.volts(t.outputV()),
                    Figures.atInput(s, t.inputV()),
                    share(t.outputV(), limit),
                    Double.isNaN(t.worstAtC()) ? Figures.NONE : Units.format(t.worstAtC(), Dimension.TEMPERATURE),
                    (counted ? "" : "headroom only; ") + TermNotes.of(t)));
        }
        double g = s.sourceGain();
        rows.add(List.of(
                "worst-case sum",
                Figures.volts(b.worstCaseV()),
                Figures.atInput(s, b.worstCaseV() / g),
                share(b.worstCaseV(), limit),
                "",
                ""));
        rows.add(List.of(
                "root-sum-square",
                Figures.volts(b.rssV()),
                Figures.atInput(s, b.rssV() / g),
                share(b.rssV(), limit),
                "",
                ""));
        rows.add(List.of("noise rms", Figures.volts(b.noiseRmsV()), Figures.atInput(s, b.noiseRmsV() / g), "", "", ""));
        rows.add(List.of("limit", Figures.volts(limit), Figures.atInput(s, limit / g), "100.0 %", "", ""));
        o.add(table(
                List.of("term", "output", "input", "of limit", "worst at", "how (operands)"),
                rows,
                List.of(false, true, true, true, true, false)));
        o.add(new RecordDoc.Para("* rests on an estimated, assumed or typical-only figure (see the warnings)."
                + " Input: referred to the signal source (output / |signal gain|)."));
        o.add(new RecordDoc.Chart(
                RecordCharts.bars(b),
                "Chart (HTML record): each term's output error as a bar against"
                        + " the limit line; the table above has the same figures."));
        o.add(new RecordDoc.Heading(3, "Totals and outcome", null));
        List<List<String>> out = new ArrayList<>();
        out.add(List.of("yield", yieldText(b.yield(), s)));
        if (b.trimmed() != null) {
            Trim trim = BudgetCalculator.trimOf(s);
            out.add(List.of(
                    "after the " + trim.method().key() + " trim" + (trim.allowed() ? "" : " (not allowed)"),
                    "worst-case " + Figures.volts(b.trimmed().worstCaseV()) + " ("
                            + share(b.trimmed().worstCaseV(), limit)
                            + "), RSS " + Figures.volts(b.trimmed().rssV()) + " ("
                            + share(b.trimmed().rssV(), limit) + ")"
                            + (b.trimmed().yield() == null
                                    ? ""
                                    : ", yield " + yieldText(b.trimmed().yield(), s))));
        }
        out.add(List.of("margin", margin(s, c)));
        String left = Uncounted.words(b.notCounted());
        out.add(List.of("not counted", left.isEmpty() ? "none: every term counts" : left));
        o.add(table(List.of("", ""), out, false));
        List<List<String>> cons = new ArrayList<>();
        for (ConstraintResult k : b.constraints()) {
            cons.add(List.of(
                    k.name(), !k.ok() ? "FAIL" : !k.checked() ? "not checked" : "ok", ConstraintText.detail(k)));
        }
        o.add(new RecordDoc.Heading(3, "Hard constraints", null));
        o.add(table(List.of("constraint", "result", "detail"), cons, false));
        if (!b.assumptions().isEmpty()) {
            o.add(new RecordDoc.Heading(3, "Warnings: estimated, typical-only or missing values", null));
            for (String w : AssumptionText.of(b)) {
                o.add(new RecordDoc.Para(w, "warning"));
            }
        }
    }

    static String yieldText(YieldResult y, Stage s) {
        String target = s.criterion().kind() == Criterion.Kind.YIELD
                ? ", target " + Figures.yield(s.criterion().yieldTarget())
                : "";
        return switch (y.decided()) {
            case "all-pass" ->
                "100 % (decided without sampling: the largest error the catalog's limits allow is within" + " the limit"
                        + target + ")";
            case "none-pass" -> "0 % (decided without sampling: the smallest error exceeds the limit" + target + ")";
            default ->
                Figures.yield(y.value()) + " (95 % interval " + Figures.yield(y.low()) + " to "
                        + Figures.yieldHigh(y.high()) + ", " + y.trials() + " units, seed " + s.seed() + target + ")";
        };
    }

    static String verdict(Candidate c) {
        if (!c.constraintsMet()) {
            return "rejected (hard constraint)";
        }
        return switch (c.verdict()) {
            case FITS -> "fits";
            case FITS_AFTER_TRIM -> "fits after trim";
            case UNDECIDED -> "undecided";
            case NO_FIT -> "no fit";
        };
    }

    static String limiting(Candidate c) {
        String key = c.budget().limitingTerm();
        if (key == null) {
            return Figures.NONE;
        }
        TermResult t = c.budget().term(key);
        return (t == null ? key : t.label()) + (c.trimmed() ? " (before the trim)" : "");
    }

    private static String margin(Stage s, Candidate c) {
        return s.criterion().kind() == Criterion.Kind.YIELD
                ? Figures.yieldMargin(c.margin()) + " (points of yield)"
                : Figures.percent(c.margin()) + " of the limit";
    }

    private static String share(double v, double limit) {
        return limit > 0 && Double.isFinite(v) ? String.format(Locale.ROOT, "%.1f %%", 100 * v / limit) : Figures.NONE;
    }

    private static String num(double x) {
        return Units.format(x, Dimension.NUMBER, 4);
    }

    private static String fileName(String path) {
        int i = Math.max(path.lastIndexOf('/'), path.lastIndexOf('\\'));
        return i < 0 ? path : path.substring(i + 1);
    }

    private static RecordDoc.Table table(List<String> head, List<List<String>> rows, boolean numericAfterFirstTwo) {
        List<Boolean> num = new ArrayList<>();
        for (int i = 0; i < head.size(); i++) {
            num.add(numericAfterFirstTwo && i >= 3 && i <= 5);
        }
        return new RecordDoc.Table(head, rows, num);
    }

    private static RecordDoc.Table table(List<String> head, List<List<String>> rows, List<Boolean> numeric) {
        return new RecordDoc.Table(head, rows, numeric);
    }
}
