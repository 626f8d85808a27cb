package dev.ampsieve.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.ampsieve.advice.Candidate;
import dev.ampsieve.advice.Comparison;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.text.Visible;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;

/** What {@code ampsieve compare} prints: two budgets side by side and the conclusion. */
public final class CompareReport {
    private CompareReport() {}

    private static String better(Comparison c, Comparison.Side side) {
        return switch (side) {
            case A -> c.a().id();
            case B -> c.b().id();
            case EQUAL -> "=";
        };
    }

    private static String by(double diff, double ratio) {
        if (diff == 0) {
            return "";
        }
        String r = Double.isInfinite(ratio) ? "" : " (" + Units.format(ratio, Dimension.NUMBER) + " times)";
        return Figures.volts(diff) + r;
    }

    public static String text(Comparison c, String stageLabel) {
        return text(c, stageLabel, TextTable.WIDTH);
    }

    /** @param width columns the tables fit in (the terminal's, in the shell) */
    public static String text(Comparison c, String stageLabel, int width) {
        StringBuilder o = new StringBuilder();
        o.append(StageLine.of(c.a().budget().stage(), stageLabel)).append('\n').append('\n');
        String a = c.a().id();
        String b = c.b().id();
        TextTable t = new TextTable()
                .left("output error")
                .right(a)
                .right(b)
                .left("better")
                .flex("by");
        Budget ba = c.a().budget();
        Budget bb = c.b().budget();
        boolean anyMarked = false;
        boolean anyUnknown = false;
        java.util.Set<dev.ampsieve.budget.TermKind> kinds =
                java.util.EnumSet.noneOf(dev.ampsieve.budget.TermKind.class);
        for (Comparison.TermDelta d : c.terms()) {
            kinds.add(Figures.kindOf(d.key()));
            boolean ea = d.aEstimated();
            boolean eb = d.bEstimated();
            anyMarked |= ea || eb;
            // a figure the catalog lacks counts as 0 V: it must not win the row on that alone
            boolean winnerUnknown = d.betterUnknown();
            anyUnknown |= winnerUnknown;
            t.row(
                    d.label() + Figures.kindTag(Figures.kindOf(d.key())),
                    Figures.volts(d.aV()) + (ea ? "*" : ""),
                    Figures.volts(d.bV()) + (eb ? "*" : ""),
                    winnerUnknown ? "unknown" : better(c, d.better()),
                    winnerUnknown ? "" : by(d.differenceV(), d.ratio()));
        }
        total(t, c, "worst-case sum", ba.worstCaseV(), bb.worstCaseV());
        total(t, c, "root-sum-square", ba.rssV(), bb.rssV());
        if (ba.trimmed() != null && bb.trimmed() != null) {
            total(
                    t,
                    c,
                    "worst-case after trim",
                    ba.trimmed().worstCaseV(),
                    bb.trimmed().worstCaseV());
        }
        t.lines(width).forEach(l -> o.append(l).append('\n'));
        if (anyMarked) {
            o.append("* estimated, typical-only or missing in the catalog ('budget PART' lists the warnings)")
                    .append(
                            anyUnknown
                                    ? "; unknown: the smaller figure is 0 V only because the catalog lacks the value"
                                    : "")
                    .append('\n');
        }
        String legend = Figures.kindLegend(kinds);
        if (!legend.isEmpty()) {
            o.append(legend).append('\n');
        }
        o.append('\n');
        TextTable s = new TextTable().left("").right(a).right(b);
        s.row("limit", Figures.volts(ba.limitV()), Figures.volts(bb.limitV()));
        s.row(
                "yield as it is",
                ba.yield() == null ? Figures.NONE : Figures.yield(ba.yield().value()),
                bb.yield() == null ? Figures.NONE : Figures.yield(bb.yield().value()));
        s.row("verdict", verdict(c.a()), verdict(c.b()));
        s.row("unit cost", cost(c.a()), cost(c.b()));
        // the margin of the criterion in force: points of yield under a yield criterion
        boolean byYield = ba.stage().criterion().kind() == dev.ampsieve.stage.Criterion.Kind.YIELD;
        s.row(
                "margin",
                byYield ? Figures.yieldMargin(c.a().margin()) : Figures.percent(c.a().margin()),
                byYield ? Figures.yieldMargin(c.b().margin()) : Figures.percent(c.b().margin()));
        s.row("largest term", largest(ba), largest(bb));
        s.lines(width).forEach(l -> o.append(l).append('\n'));
        String both = Uncounted.words(Uncounted.ofStage(ba.notCounted()));
        if (!both.isEmpty()) {
            o.append("Both verdicts: ").append(both).append('\n');
        }
        for (Candidate x : java.util.List.of(c.a(), c.b())) {
            String own = Uncounted.words(Uncounted.ofPart(x.budget().notCounted()));
            if (!own.isEmpty()) {
                o.append("Verdict of ").append(x.id()).append(": ").append(own).append('\n');
            }
        }
        o.append('\n').append(AdviceText.conclusion(c)).append('\n');
        o.append('\n').append(Caution.TEXT).append('\n');
        // the conclusion quotes part ids and currencies: no control character gets through
        return Wrap.prose(Visible.lines(o.toString()), width);
    }

    private static void total(TextTable t, Comparison c, String label, double x, double y) {
        Comparison.TermDelta d = Comparison.delta(label, label, x, y);
        t.row(label, Figures.volts(x), Figures.volts(y), better(c, d.better()), by(d.differenceV(), d.ratio()));
    }

    private static String verdict(Candidate c) {
        if (!c.constraintsMet()) {
            return "rejected";
        }
        return c.verdict().key();
    }

    private static String cost(Candidate c) {
        return Figures.money(c.effectiveCost())
                + (c.currency().isEmpty() ? "" : " " + c.currency())
                + (c.trimmed() ? " incl. trim" : "");
    }

    private static String largest(Budget b) {
        if (b.limitingTerm() == null) {
            return Figures.NONE;
        }
        TermResult t = b.term(b.limitingTerm());
        return t == null ? b.limitingTerm() : t.label() + Figures.kindTag(t.kind());
    }

    public static String json(Comparison c, String stageLabel) {
        ObjectNode o = JsonSupport.object();
        JsonSupport.put(o, "stage", stageLabel);
        o.set("a", RankReport.candidate(c.a()));
        o.set("b", RankReport.candidate(c.b()));
        ArrayNode terms = o.putArray("terms");
        for (Comparison.TermDelta d : c.terms()) {
            ObjectNode n = terms.addObject();
            n.put("key", d.key());
            n.put("label", d.label());
            n.put("kind", Figures.kindOf(d.key()).key());
            JsonSupport.put(n, "aV", d.aV());
            JsonSupport.put(n, "bV", d.bV());
            // as the text: "unknown" when the smaller figure is 0 V only for want of a catalog value
            n.put("better", d.betterUnknown() ? "unknown" : better(c, d.better()));
            n.put("aEstimated", d.aEstimated());
            n.put("bEstimated", d.bEstimated());
            JsonSupport.put(n, "differenceV", d.differenceV());
            JsonSupport.put(n, "ratio", d.ratio());
        }
        JsonSupport.put(o, "preferred", c.preferred());
        o.put("conclusion", AdviceText.conclusion(c));
        return JsonSupport.render(o);
    }

    /** The header row of {@code compare --csv}: column names of our own, described in README. */
    static final java.util.List<String> CSV_COLUMNS = java.util.List.of(
            "section",
            "key",
            "label",
            "kind",
            "a",
            "b",
            "unit",
            "a_estimated",
            "b_estimated",
            "better",
            "difference",
            "ratio");

    /**
     * {@code compare --csv}: leading {@code #} comment lines (stage, limit, the two parts, the
     * conclusion, the caution), a header row, then one row per term, per total (after the trim
     * when both parts have one), the yields as they are, the unit costs, the margins and the
     * verdicts; the same figures as the text and JSON.
     */
    public static String csv(Comparison c, String stageLabel) {
        Budget ba = c.a().budget();
        Budget bb = c.b().budget();
        StringBuilder o = new StringBuilder();
        o.append("# stage: ").append(StageLine.head(ba.stage(), stageLabel)).append('\n');
        o.append("# limit: ").append(StageLine.limit(ba.stage())).append('\n');
        o.append("# a: ").append(Visible.of(c.a().id())).append('\n');
        o.append("# b: ").append(Visible.of(c.b().id())).append('\n');
        o.append("# conclusion: ").append(Visible.of(AdviceText.conclusion(c))).append('\n');
        o.append("# ").append(Caution.TEXT).append('\n');
        o.append(String.join(",", CSV_COLUMNS)).append('\n');
        for (Comparison.TermDelta d : c.terms()) {
            csvRow(
                    o,
                    "term",
                    d.key(),
                    RankReport.csv(d.label()),
                    Figures.kindOf(d.key()).key(),
                    RankReport.num(d.aV()),
                    RankReport.num(d.bV()),
                    "V",
                    Boolean.toString(d.aEstimated()),
                    Boolean.toString(d.bEstimated()),
                    d.betterUnknown() ? "unknown" : csvBetter(c, d.better()),
                    RankReport.num(d.differenceV()),
                    RankReport.num(d.ratio()));
        }
        csvTotal(o, c, "worst-case", "worst-case sum", ba.worstCaseV(), bb.worstCaseV());
        csvTotal(o, c, "rss", "root-sum-square", ba.rssV(), bb.rssV());
        if (ba.trimmed() != null && bb.trimmed() != null) {
            csvTotal(
                    o,
                    c,
                    "trimmed-worst-case",
                    "worst-case after trim",
                    ba.trimmed().worstCaseV(),
                    bb.trimmed().worstCaseV());
        }
        csvRow(
                o,
                "yield",
                "as-is",
                "yield as it is",
                "",
                ba.yield() == null ? "" : RankReport.num(ba.yield().value()),
                bb.yield() == null ? "" : RankReport.num(bb.yield().value()),
                "1",
                "",
                "",
                "",
                "",
                "");
        csvRow(
                o,
                "cost",
                "effective-cost",
                "unit cost" + (c.a().trimmed() || c.b().trimmed() ? " (incl. trim where trimmed)" : ""),
                "",
                RankReport.num(c.a().effectiveCost()),
                RankReport.num(c.b().effectiveCost()),
                RankReport.csv(c.a().currency().equals(c.b().currency()) ? c.a().currency() : ""),
                "",
                "",
                "",
                "",
                "");
        csvRow(
                o,
                "margin",
                "margin",
                "margin",
                "",
                RankReport.num(c.a().margin()),
                RankReport.num(c.b().margin()),
                "1",
                "",
                "",
                "",
                "",
                "");
        csvRow(o, "verdict", "verdict", "verdict", "", verdict(c.a()), verdict(c.b()), "", "", "", "", "", "");
        csvRow(
                o,
                "preferred",
                "preferred",
                "preferred",
                "",
                "",
                "",
                "",
                "",
                "",
                c.preferred() == null ? "equal" : RankReport.csv(c.preferred()),
                "",
                "");
        return o.toString();
    }

    private static void csvTotal(StringBuilder o, Comparison c, String key, String label, double x, double y) {
        Comparison.TermDelta d = Comparison.delta(key, label, x, y);
        csvRow(
                o,
                "total",
                key,
                label,
                "",
                RankReport.num(x),
                RankReport.num(y),
                "V",
                "",
                "",
                csvBetter(c, d.better()),
                RankReport.num(d.differenceV()),
                RankReport.num(d.ratio()));
    }

    /** Which part a figure favours, for a CSV cell: its id, or "equal" (a bare "=" would read as a formula). */
    private static String csvBetter(Comparison c, Comparison.Side side) {
        return side == Comparison.Side.EQUAL ? "equal" : RankReport.csv(better(c, side));
    }

    private static void csvRow(StringBuilder o, String... cells) {
        if (cells.length != CSV_COLUMNS.size()) {
            throw new IllegalStateException(cells.length + " cells for " + CSV_COLUMNS.size() + " columns");
        }
        o.append(String.join(",", cells)).append('\n');
    }
}
