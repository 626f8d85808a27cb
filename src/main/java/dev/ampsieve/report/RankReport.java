package dev.ampsieve.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.ampsieve.advice.Advice;
import dev.ampsieve.advice.Candidate;
import dev.ampsieve.advice.Change;
import dev.ampsieve.advice.NoFitAdvice;
import dev.ampsieve.advice.PartTarget;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.advice.Rejected;
import dev.ampsieve.advice.TrimAdvice;
import dev.ampsieve.advice.ZeroDriftAdvice;
import dev.ampsieve.budget.ConstraintResult;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.text.Visible;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

/** What {@code ampsieve rank} prints: candidates, Pareto front, rejected parts, advice; text, CSV or JSON. */
public final class RankReport {
    private RankReport() {}

    /** Marks a row whose verdict rests on an estimated, assumed or typical-only figure (as '*' marks such a term in a budget). */
    static final String ESTIMATE_MARK = "*";

    private static String verdict(Candidate c) {
        return switch (c.verdict()) {
            case FITS -> "fits";
            case FITS_AFTER_TRIM -> "+trim";
            case UNDECIDED -> "undecided";
            case NO_FIT -> "no";
        };
    }

    private static String verdictWord(Candidate c) {
        return c.verdict() == Verdict.NO_FIT ? "no fit" : verdict(c);
    }

    private static String limiting(RankedFigures f) {
        String label = f.limitingLabel();
        // the engine names the largest term of the untrimmed budget
        return label == null ? Figures.NONE : label + (f.candidate().trimmed() ? " †" : "");
    }

    /** Yield of the part as ranked: after the stage's trim when it needs one. */
    private static String yieldCell(RankedFigures f) {
        return f.yield() == null ? Figures.NONE : Figures.yield(f.yield().value());
    }

    /** The margin of the criterion in force: points of yield under a yield criterion, else a share of the limit. */
    private static String marginCell(Ranking r, RankedFigures f) {
        return r.stage().criterion().kind() == Criterion.Kind.YIELD
                ? Figures.yieldMargin(f.margin())
                : Figures.percent(f.margin());
    }

    private static String errorName(Ranking r) {
        return r.stage().criterion().kind() == Criterion.Kind.WORST_CASE ? "worst-case" : "RSS";
    }

    public static String text(Ranking r, String stageLabel, String query, int top) {
        return text(r, stageLabel, query, top, TextTable.WIDTH);
    }

    /** @param width columns the tables fit in (the terminal's, in the shell) */
    public static String text(Ranking r, String stageLabel, String query, int top, int width) {
        return text(r, stageLabel, query, top, width, false);
    }

    /**
     * @param allOnFront true: the Pareto front of every candidate; false: of the parts that fit (as they are or
     *                   after the stage's trim), since a front led by parts far over the limit answers nothing
     */
    public static String text(Ranking r, String stageLabel, String query, int top, int width, boolean allOnFront) {
        StringBuilder o = new StringBuilder();
        o.append(StageLine.of(r.stage(), stageLabel)).append('\n');
        if (query != null && !query.isBlank()) {
            o.append("Parts matching '").append(Visible.of(query)).append("'\n");
        }
        List<Candidate> shown = r.candidates().stream().limit(Math.max(0, top)).toList();
        List<Candidate> frontList = front(r, allOnFront);
        Set<String> front = frontList.stream().map(Candidate::id).collect(java.util.stream.Collectors.toSet());
        o.append('\n').append("Candidates (").append(r.candidates().size()).append(" budgeted");
        if (shown.size() < r.candidates().size()) {
            o.append(", first ").append(shown.size()).append(" shown; --top N for more");
        }
        o.append("; ").append(r.rejected().size()).append(" rejected)\n");
        if (!shown.isEmpty()) {
            String cur = Figures.currency(
                    r.candidates().stream().map(Candidate::part).toList());
            TextTable t = new TextTable()
                    .right("#")
                    .left("part")
                    .left("verdict")
                    .right(cur.isEmpty() ? "cost" : "cost " + cur)
                    .right("worst-case")
                    .right("RSS")
                    .right("yield")
                    .right("margin")
                    .flex("largest term")
                    .left("P");
            int i = 0;
            for (Candidate c : shown) {
                RankedFigures f = RankedFigures.of(c);
                t.row(
                        Integer.toString(++i),
                        c.id(),
                        verdict(c) + (c.restsOnEstimate() ? ESTIMATE_MARK : ""),
                        Figures.money(f.effectiveCost())
                                + (cur.isEmpty() && c.part().price() != null ? " " + c.currency() : ""),
                        Figures.volts(f.worstCaseV()),
                        Figures.volts(f.rssV()),
                        yieldCell(f),
                        marginCell(r, f),
                        limiting(f),
                        front.contains(c.id()) ? "*" : "");
            }
            t.lines(width).forEach(l -> o.append(l).append('\n'));
            o.append("verdict: fits as it is, +trim after the stage's trim (its cost and figures include it)"
                    + (shown.stream().anyMatch(c -> c.verdict() == Verdict.UNDECIDED)
                            ? ", undecided (the yield's 95 % interval still holds the target after max-trials units)"
                            : "")
                    + ", no.\n");
            if (shown.stream().anyMatch(Candidate::restsOnEstimate)) {
                o.append(ESTIMATE_MARK)
                        .append(" after the verdict: it rests on an estimated or typical-only figure"
                                + " (ampsieve budget PART names it; enter the datasheet value to firm it up).\n");
            }
            o.append(
                            r.stage().criterion().kind() == Criterion.Kind.YIELD
                                    ? "margin: lower end of the yield's 95 % interval minus the target, in points of yield.\n"
                                    : "margin: (limit - " + errorName(r) + ") / limit.  ")
                    .append("†: largest before the trim.  P: on the Pareto front.\n");
            String legend = Figures.kindLegend(shown.stream()
                    .filter(c -> c.budget().limitingTerm() != null)
                    .map(c -> Figures.kindOf(c.budget().limitingTerm()))
                    .toList());
            if (!legend.isEmpty()) {
                o.append(legend).append(".\n");
            }
        }
        notCounted(o, r, shown);
        if (!frontList.isEmpty()) {
            // error against cost: each step up in cost buys a smaller error
            o.append('\n')
                    .append("Pareto front of error against cost (no other part is cheaper and better; ")
                    .append(allOnFront ? "every candidate" : "parts that fit; --all for every candidate")
                    .append(")\n");
            TextTable p = new TextTable()
                    .left("part")
                    .right("cost")
                    .right(errorName(r))
                    .left("verdict");
            for (Candidate c : frontList) {
                p.row(
                        c.id(),
                        Figures.money(c.effectiveCost()) + (c.currency().isEmpty() ? "" : " " + c.currency()),
                        Figures.volts(c.errorV()),
                        verdictWord(c) + (c.trimmed() ? " (trim included)" : ""));
            }
            p.lines(width).forEach(l -> o.append(l).append('\n'));
        }
        if (frontList.isEmpty() && !allOnFront && !r.candidates().isEmpty()) {
            o.append('\n').append("Pareto front: no part fits (--all shows the front of every candidate)\n");
        }
        if (!r.rejected().isEmpty()) {
            rejected(o, r.rejected(), top, width);
        }
        o.append('\n').append("Advice\n");
        for (String l : AdviceText.lines(r.advice())) {
            o.append("  ").append(l).append('\n');
        }
        Candidate pick = r.advice().pick();
        if (pick != null && !pick.budget().assumptions().isEmpty()) {
            o.append('\n')
                    .append("Notes from the budget of ")
                    .append(pick.id())
                    .append(" (ampsieve budget ")
                    .append(pick.id())
                    .append(" shows it in full)\n");
            AssumptionText.of(pick.budget())
                    .forEach(w -> o.append("  - ").append(w).append('\n'));
        }
        o.append('\n').append(Caution.TEXT).append('\n');
        // advice, notes and reasons quote part ids and catalog text: no control character gets through
        return Wrap.prose(Visible.lines(o.toString()), width);
    }

    /**
     * The rejected parts: every one while they are no more than {@code top}; beyond that (a large catalog
     * rejects thousands) how many fail each constraint, then the first {@code top}, as --top sets for the
     * candidates. JSON and CSV always list every one.
     */
    private static void rejected(StringBuilder o, List<Rejected> rejected, int top, int width) {
        o.append('\n').append("Rejected (a hard constraint fails; --json or --csv lists every failure)\n");
        List<Rejected> shown = rejected;
        if (rejected.size() > top) {
            Map<String, Integer> byConstraint = new LinkedHashMap<>();
            for (Rejected x : rejected) {
                for (ConstraintResult c : x.failedConstraints()) {
                    byConstraint.merge(c.name(), 1, Integer::sum);
                }
            }
            o.append(rejected.size())
                    .append(" parts, first ")
                    .append(top)
                    .append(" shown (--top N for more); failing ")
                    .append(byConstraint.entrySet().stream()
                            .sorted(Map.Entry.<String, Integer>comparingByValue()
                                    .reversed())
                            .map(e -> e.getKey() + " " + e.getValue())
                            .collect(Collectors.joining(", ")))
                    .append(
                            rejected.stream()
                                            .anyMatch(x -> x.failedConstraints().size() > 1)
                                    ? " (a part may fail several)"
                                    : "")
                    .append('\n');
            shown = rejected.subList(0, top);
        }
        TextTable t = new TextTable().left("part").flex("reason").wrapFlex();
        for (Rejected x : shown) {
            t.row(x.id(), ConstraintText.shortReason(x.failedConstraints()));
        }
        t.lines(width).forEach(l -> o.append(l).append('\n'));
    }

    /** The front shown: of every candidate, or of those that fit (as they are or after the trim). */
    static List<Candidate> front(Ranking r, boolean all) {
        return all
                ? r.pareto()
                : dev.ampsieve.advice.Pareto.front(r.candidates().stream()
                        .filter(c -> c.verdict() != Verdict.NO_FIT)
                        .toList());
    }

    /** Under the candidates: what no verdict counts (the stage's doing), then what a listed part's catalog lacks. */
    private static void notCounted(StringBuilder o, Ranking r, List<Candidate> shown) {
        if (r.candidates().isEmpty()) {
            return;
        }
        String every =
                Uncounted.words(Uncounted.ofStage(r.candidates().get(0).budget().notCounted()));
        if (!every.isEmpty()) {
            o.append("Every verdict: ").append(every).append('\n');
        }
        for (Candidate c : shown) {
            String own = Uncounted.words(Uncounted.ofPart(c.budget().notCounted()));
            if (!own.isEmpty()) {
                o.append("Verdict of ").append(c.id()).append(": ").append(own).append('\n');
            }
        }
    }

    /** CSV of {@link #csv(Ranking, String, String, int, boolean)} without a stage label or query. */
    public static String csv(Ranking r, int top) {
        return csv(r, null, null, top, false);
    }

    /** The CSV header row: column names of our own, described in README ("rank --csv"). */
    static final List<String> CSV_COLUMNS = List.of(
            "rank",
            "part",
            "verdict",
            "rests_on_estimate",
            "effective_cost",
            "currency",
            "trimmed",
            "error_v",
            "margin",
            "ranked_worst_case_v",
            "ranked_rss_v",
            "ranked_yield",
            "ranked_yield_low",
            "ranked_yield_high",
            "untrimmed_worst_case_v",
            "untrimmed_rss_v",
            "untrimmed_yield",
            "trimmed_worst_case_v",
            "trimmed_rss_v",
            "trimmed_yield",
            "limiting_term",
            "limiting_kind",
            "pareto",
            "estimated_terms",
            "not_counted",
            "reason");

    /**
     * CSV: leading comment lines starting with '#' (the stage, its limit and criterion, the query,
     * the caution) that a spreadsheet told to treat '#' as the comment character skips; then the
     * header row, one row per candidate in ranking order, then one per rejected part. The figures
     * "as ranked" are those the text table shows ({@link RankedFigures}); the untrimmed and trimmed
     * ones have their own columns.
     *
     * @param allOnFront as for {@link #text(Ranking, String, String, int, int, boolean)}: the {@code pareto} column
     */
    public static String csv(Ranking r, String stageLabel, String query, int top, boolean allOnFront) {
        StringBuilder o = new StringBuilder();
        o.append("# stage: ").append(StageLine.head(r.stage(), stageLabel)).append('\n');
        o.append("# limit: ").append(StageLine.limit(r.stage())).append('\n');
        if (query != null && !query.isBlank()) {
            o.append("# query: ").append(Visible.of(query)).append('\n');
        }
        o.append("# ").append(Caution.TEXT).append('\n');
        o.append(String.join(",", CSV_COLUMNS)).append('\n');
        Set<String> front =
                front(r, allOnFront).stream().map(Candidate::id).collect(java.util.stream.Collectors.toSet());
        int i = 0;
        for (Candidate c : r.candidates().stream().limit(Math.max(0, top)).toList()) {
            RankedFigures f = RankedFigures.of(c);
            YieldResult y = f.yield();
            row(
                    o,
                    Integer.toString(++i),
                    csv(c.id()),
                    c.verdict().key(),
                    Boolean.toString(c.restsOnEstimate()),
                    num(f.effectiveCost()),
                    csv(c.currency()),
                    Boolean.toString(c.trimmed()),
                    num(f.errorV()),
                    num(f.margin()),
                    num(f.worstCaseV()),
                    num(f.rssV()),
                    y == null ? "" : num(y.value()),
                    y == null ? "" : num(y.low()),
                    y == null ? "" : num(y.high()),
                    num(c.budget().worstCaseV()),
                    num(c.budget().rssV()),
                    f.untrimmedYield() == null ? "" : num(f.untrimmedYield().value()),
                    num(f.trimmedWorstCaseV()),
                    num(f.trimmedRssV()),
                    f.trimmedYield() == null ? "" : num(f.trimmedYield().value()),
                    csv(f.limitingTerm()),
                    f.limitingTerm() == null
                            ? ""
                            : Figures.kindOf(f.limitingTerm()).key(),
                    Boolean.toString(front.contains(c.id())),
                    csv(String.join(
                            ";",
                            c.estimatedTerms().stream().map(TermResult::key).toList())),
                    csv(String.join(
                            ";",
                            c.budget().notCounted().stream()
                                    .map(n -> n.term() + ":" + n.reason().key())
                                    .toList())),
                    "");
        }
        for (Rejected x : r.rejected()) {
            String[] cells = new String[CSV_COLUMNS.size()];
            java.util.Arrays.fill(cells, "");
            cells[CSV_COLUMNS.indexOf("part")] = csv(x.id());
            cells[CSV_COLUMNS.indexOf("verdict")] = "rejected";
            cells[CSV_COLUMNS.indexOf("effective_cost")] = num(
                    x.part().price() == null
                            ? Double.NaN
                            : x.part().price().at(r.stage().quantity()));
            cells[CSV_COLUMNS.indexOf("currency")] =
                    csv(x.part().price() == null ? "" : x.part().price().currency());
            cells[CSV_COLUMNS.indexOf("pareto")] = "false";
            cells[CSV_COLUMNS.indexOf("reason")] = csv(ConstraintText.reason(x.failedConstraints()));
            row(o, cells);
        }
        return o.toString();
    }

    private static void row(StringBuilder o, String... cells) {
        if (cells.length != CSV_COLUMNS.size()) {
            throw new IllegalStateException(cells.length + " cells for " + CSV_COLUMNS.size() + " columns");
        }
        o.append(String.join(",", cells)).append('\n');
    }

    /** A CSV figure: 6 significant digits, empty when not applicable (NaN). */
    static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.6g", v) : "";
    }

    /**
     * One text field: control characters made {@link Visible}; a field a spreadsheet would run as a
     * formula (starting with =, +, -, @, tab or carriage return, and not a number) defused with a
     * leading ' and quoted, as the OWASP "CSV Injection" page advises [from memory]; RFC 4180
     * quoting for commas, quotes and line breaks.
     */
    static String csv(String s) {
        if (s == null) {
            return "";
        }
        boolean formula = dev.ampsieve.text.FormulaCells.runsAsFormula(s);
        String v = (formula ? "'" : "") + Visible.of(s);
        if (formula || v.contains(",") || v.contains("\"") || v.contains("\n") || v.contains("\r")) {
            return "\"" + v.replace("\"", "\"\"") + "\"";
        }
        return v;
    }

    /**
     * JSON: {stage, query, candidates[{part, verdict, effectiveCost, worstCaseV, rssV, yield,
     * limitingTerm, ...}], rejected[{part, reason}], pareto[ids], advice{...}, caution}.
     */
    public static String json(Ranking r, String stageLabel, String query, int top) {
        return json(r, stageLabel, query, top, false);
    }

    /** @param allOnFront as for {@link #text(Ranking, String, String, int, int, boolean)} */
    public static String json(Ranking r, String stageLabel, String query, int top, boolean allOnFront) {
        ObjectNode o = JsonSupport.object();
        JsonSupport.put(o, "stage", stageLabel);
        JsonSupport.put(o, "query", query);
        o.put("criterion", CriterionText.of(r.stage().criterion()));
        JsonSupport.put(o, "limitV", r.stage().limitVolts());
        o.put("quantity", r.stage().quantity());
        o.put("budgeted", r.candidates().size());
        ArrayNode cands = o.putArray("candidates");
        for (Candidate c : r.candidates().stream().limit(Math.max(0, top)).toList()) {
            cands.add(candidate(c));
        }
        ArrayNode rej = o.putArray("rejected");
        for (Rejected x : r.rejected()) {
            ObjectNode n = rej.addObject();
            n.put("part", x.id());
            n.put("reason", ConstraintText.reason(x.failedConstraints()));
        }
        ArrayNode pareto = o.putArray("pareto");
        front(r, allOnFront).forEach(c -> pareto.add(c.id()));
        o.set("advice", advice(r.advice()));
        return JsonSupport.render(o);
    }

    static ObjectNode candidate(Candidate c) {
        RankedFigures f = RankedFigures.of(c);
        ObjectNode n = JsonSupport.object();
        n.put("part", c.id());
        n.put("verdict", c.verdict().key());
        JsonSupport.put(n, "effectiveCost", f.effectiveCost());
        JsonSupport.put(n, "currency", c.currency().isEmpty() ? null : c.currency());
        JsonSupport.put(n, "worstCaseV", c.budget().worstCaseV());
        JsonSupport.put(n, "rssV", c.budget().rssV());
        putYield(n, "yield", f.untrimmedYield());
        if (f.trimmedYield() != null) {
            putYield(n, "trimmedYield", f.trimmedYield());
        }
        JsonSupport.put(n, "limitingTerm", c.budget().limitingTerm());
        JsonSupport.put(
                n,
                "limitingKind",
                c.budget().limitingTerm() == null
                        ? null
                        : Figures.kindOf(c.budget().limitingTerm()).key());
        n.put("trimmed", c.trimmed());
        if (c.budget().trimmed() != null) {
            JsonSupport.put(n, "trimmedWorstCaseV", f.trimmedWorstCaseV());
            JsonSupport.put(n, "trimmedRssV", f.trimmedRssV());
        }
        JsonSupport.put(n, "errorV", f.errorV());
        JsonSupport.put(n, "margin", f.margin());
        // the figures the text table shows: after the trim exactly when the part is ranked with it
        JsonSupport.put(n, "rankedWorstCaseV", f.worstCaseV());
        JsonSupport.put(n, "rankedRssV", f.rssV());
        putYield(n, "rankedYield", f.yield());
        n.put("restsOnEstimate", c.restsOnEstimate());
        ArrayNode est = n.putArray("estimatedTerms");
        c.estimatedTerms().forEach(t -> est.add(t.key()));
        n.put("selfCorrecting", c.part().selfCorrecting());
        Uncounted.put(n, c.budget().notCounted());
        AssumptionText.put(n, c.budget());
        return n;
    }

    private static ObjectNode ref(Candidate c) {
        if (c == null) {
            return null;
        }
        ObjectNode n = JsonSupport.object();
        n.put("part", c.id());
        JsonSupport.put(n, "effectiveCost", c.effectiveCost());
        JsonSupport.put(n, "errorV", c.errorV());
        JsonSupport.put(n, "margin", c.margin());
        n.put("restsOnEstimate", c.restsOnEstimate());
        ArrayNode est = n.putArray("estimatedTerms");
        c.estimatedTerms().forEach(t -> est.add(t.key()));
        n.put("trimmed", c.trimmed());
        return n;
    }

    static ObjectNode advice(Advice a) {
        ObjectNode n = JsonSupport.object();
        n.set("pick", ref(a.pick()));
        n.set("cheapestAsIs", ref(a.cheapestAsIs()));
        TrimAdvice t = a.trim();
        ObjectNode tn = n.putObject("trim");
        tn.put("status", t.status().key());
        tn.set("withTrim", ref(t.withTrim()));
        tn.set("asIs", ref(t.asIs()));
        JsonSupport.put(tn, "savingPerUnit", t.savingPerUnit());
        JsonSupport.put(tn, "savingTotal", t.savingTotal());
        ZeroDriftAdvice z = a.zeroDrift();
        ObjectNode zn = n.putObject("zeroDrift");
        zn.put("status", z.status().key());
        zn.put("warranted", z.warranted());
        zn.set("selfCorrecting", ref(z.selfCorrecting()));
        zn.set("standard", ref(z.standard()));
        JsonSupport.put(zn, "savingPerUnit", z.savingPerUnit());
        JsonSupport.put(zn, "savingTotal", z.savingTotal());
        ArrayNode cav = zn.putArray("caveats");
        z.caveats().forEach(c -> cav.add(AdviceText.caveat(c)));
        if (z.resistorOption() == null) {
            zn.putNull("resistorOption");
        } else {
            ObjectNode ro = zn.putObject("resistorOption");
            ro.set("part", ref(z.resistorOption().part()));
            ro.put("text", AdviceText.change(z.resistorOption().change(), a.stage()));
            ObjectNode rv = ro.putObject("values");
            z.resistorOption().change().values().forEach((k, v) -> JsonSupport.put(rv, k, v));
        }
        NoFitAdvice nf = a.noFit();
        if (nf == null) {
            n.putNull("noFit");
        } else {
            ObjectNode f = n.putObject("noFit");
            f.set("closest", ref(nf.closest()));
            JsonSupport.put(f, "limitingTerm", nf.limitingTerm());
            JsonSupport.put(f, "limitingV", nf.limitingV());
            ArrayNode ch = f.putArray("changes");
            for (Change c : nf.changes()) {
                ObjectNode cn = ch.addObject();
                cn.put("kind", c.kind().key());
                cn.put("text", AdviceText.change(c, a.stage()));
                ObjectNode vals = cn.putObject("values");
                c.values().forEach((k, v) -> JsonSupport.put(vals, k, v));
            }
            ArrayNode tg = f.putArray("targets");
            for (PartTarget pt : nf.targets()) {
                ObjectNode tn2 = tg.addObject();
                tn2.put("quantity", pt.quantity().key());
                JsonSupport.put(tn2, "value", pt.value());
                JsonSupport.put(tn2, "atC", pt.atC());
            }
        }
        dev.ampsieve.advice.Unsettled u = a.undecided();
        if (u == null) {
            n.putNull("undecided");
        } else {
            ObjectNode un = n.putObject("undecided");
            un.set("part", ref(u.candidate()));
            un.put("afterTrim", u.trimmed());
            putYield(un, "yield", u.yield());
            JsonSupport.put(un, "target", u.target());
            un.put("maxTrials", u.cap());
            if (u.unitsToSettle() == Long.MAX_VALUE) {
                un.putNull("unitsToSettle");
            } else {
                un.put("unitsToSettle", u.unitsToSettle());
            }
        }
        if (a.trimCircuits() == null) {
            n.putNull("trimCircuits");
        } else {
            TrimCircuitText.json(n, a.trimCircuits());
        }
        ArrayNode lines = n.putArray("lines");
        AdviceText.lines(a).forEach(lines::add);
        return n;
    }

    private static void putYield(ObjectNode n, String key, YieldResult y) {
        if (y == null) {
            n.putNull(key);
            return;
        }
        ObjectNode yn = n.putObject(key);
        JsonSupport.put(yn, "value", y.value());
        JsonSupport.put(yn, "low", y.low());
        JsonSupport.put(yn, "high", y.high());
        yn.put("trials", y.trials());
        JsonSupport.put(yn, "decided", y.decided());
    }
}
