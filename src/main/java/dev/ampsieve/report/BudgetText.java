package dev.ampsieve.report;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.ConstraintResult;
import dev.ampsieve.budget.NoiseModel;
import dev.ampsieve.budget.SigmaYield;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.Trimmed;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.stage.TrimCircuit;
import dev.ampsieve.text.Visible;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.util.List;
import java.util.Locale;

/** The budget of one part in one stage as a plain-text table for a terminal. */
public final class BudgetText {
    private BudgetText() {}

    /**
     * @param stageLabel how to name the stage in the header (its file), or null
     */
    public static String render(Budget b, String stageLabel) {
        return render(b, stageLabel, TextTable.WIDTH);
    }

    /** @param width columns prose lines are folded at (the terminal's, in the shell) */
    public static String render(Budget b, String stageLabel, int width) {
        return render(b, List.of(), stageLabel, width);
    }

    /** @param bySigma the yield at other max-to-sigma readings ({@code BudgetCalculator.yieldBySigma}); empty to leave the line out */
    public static String render(Budget b, List<SigmaYield> bySigma, String stageLabel, int width) {
        return render(b, bySigma, stageLabel, width, null);
    }

    /** @param datasheetYield the part's yield without its measured lot (shown beside the lot's); null to leave out */
    public static String render(
            Budget b, List<SigmaYield> bySigma, String stageLabel, int width, YieldResult datasheetYield) {
        // warnings and constraint details quote catalog text: no control character gets through
        return Wrap.prose(Visible.lines(table(b, bySigma, stageLabel, width, datasheetYield)), width);
    }

    /**
     * "2: 93.10 % (91.35..94.52), 3 (stage): 99.02 % (99.00..99.05), 4: ..." on one line: the yield
     * (rounded down) and its 95 % interval (ends rounded outward) at each max-to-sigma reading.
     */
    static String sigmaLine(List<SigmaYield> bySigma, Stage s) {
        List<String> parts = new java.util.ArrayList<>();
        for (SigmaYield y : bySigma) {
            parts.add(num(y.maxToSigma()) + (y.maxToSigma() == s.maxToSigma() ? " (stage)" : "") + ": "
                    + points(Math.floor(y.yield() * 1e4) / 1e4) + " % (" + points(Math.floor(y.low() * 1e4) / 1e4)
                    + ".."
                    + points(Math.ceil(y.high() * 1e4) / 1e4) + ")");
        }
        return String.join(", ", parts);
    }

    private static String points(double ratio) {
        return String.format(Locale.ROOT, "%.2f", 100 * ratio);
    }

    private static String table(
            Budget b, List<SigmaYield> bySigma, String stageLabel, int width, YieldResult datasheetYield) {
        Stage s = b.stage();
        StringBuilder o = new StringBuilder();
        double limit = b.limitV();
        double g = s.sourceGain(); // input-referred = at the signal source
        line(
                o,
                "Part       %s%s",
                Visible.of(b.part().id()),
                b.part().title().isBlank() ? "" : "  (" + Visible.of(b.part().title()) + ")");
        boolean currentIn = Figures.inputDimension(s) == Dimension.CURRENT;
        line(
                o,
                "Stage      %s%s, noise gain %s, signal gain %s",
                stageLabel == null ? "" : Visible.of(stageLabel) + ": ",
                s.topology().key(),
                num(b.noiseGain()),
                currentIn ? Units.format(s.signalGain(), Dimension.RESISTANCE, 4) + " (V/A)" : num(s.signalGain()));
        java.util.function.DoubleFunction<String> in = x -> Figures.atInput(s, x);
        line(
                o,
                "Limit      %s at the output (%s at the input), criterion %s",
                v(limit),
                in.apply(limit / g),
                CriterionText.of(s.criterion()));
        o.append('\n');
        // the input column's convention, stated where it is read
        line(
                o,
                "input = output / |signal gain| %s: referred to the signal source",
                currentIn ? Units.format(g, Dimension.RESISTANCE, 4) + ", a current" : num(g));
        line(o, "%-24s %11s %11s %9s %10s", "term", "output", "input", "of limit", "worst at");
        boolean anyEstimated = false;
        boolean anyUncounted = false;
        java.util.Set<dev.ampsieve.budget.TermKind> kinds =
                java.util.EnumSet.noneOf(dev.ampsieve.budget.TermKind.class);
        for (TermResult t : b.terms()) {
            kinds.add(t.kind());
            boolean counted = BudgetCalculator.counts(s, t.key());
            String mark = t.estimated() ? "*" : "";
            anyEstimated |= t.estimated();
            anyUncounted |= !counted;
            line(
                    o,
                    "%-24s %11s %11s %9s %10s%s",
                    t.label() + Figures.kindTag(t.kind()) + mark,
                    v(t.outputV()),
                    in.apply(t.inputV()),
                    share(t.outputV(), limit),
                    Double.isNaN(t.worstAtC()) ? "-" : Units.format(t.worstAtC(), Dimension.TEMPERATURE),
                    BudgetCalculator.afterTrimOnly(t.key()) ? "  after trim only" : counted ? "" : "  headroom only");
        }
        if (anyEstimated) {
            line(o, "* estimated, typical-only or assumed value: see the warnings");
        }
        String legend = Figures.kindLegend(kinds);
        if (!legend.isEmpty()) {
            line(o, "%s", legend);
        }
        if (b.terms().stream().anyMatch(t -> BudgetCalculator.afterTrimOnly(t.key()))) {
            line(o, "after trim only: the trim circuit's own error, counted in the trimmed totals only");
        }
        if (anyUncounted) {
            line(o, "headroom only: AC-coupled stage, the DC term does not count toward the error");
        }
        o.append('\n');
        line(o, "%-24s %11s %11s %9s", "total", "output", "input", "of limit");
        line(
                o,
                "%-24s %11s %11s %9s",
                "worst-case sum",
                v(b.worstCaseV()),
                in.apply(b.worstCaseV() / g),
                share(b.worstCaseV(), limit));
        line(o, "%-24s %11s %11s %9s", "root-sum-square", v(b.rssV()), in.apply(b.rssV() / g), share(b.rssV(), limit));
        line(o, "%-24s %11s %11s", "noise rms", v(b.noiseRmsV()), in.apply(b.noiseRmsV() / g));
        line(
                o,
                "%-24s %11s %11s",
                "noise peak-to-peak",
                v(NoiseModel.PEAK_TO_PEAK * b.noiseRmsV()),
                in.apply(NoiseModel.PEAK_TO_PEAK * b.noiseRmsV() / g));
        o.append('\n');
        line(o, "Yield      %s", yieldLine(b.yield(), s));
        if (!bySigma.isEmpty()) {
            // the reading of datasheet maxima moves the yield more than the sampling does
            line(o, "%-10s %s", "Max-to-σ", sigmaLine(bySigma, s));
        }
        for (String m : MeasuredText.lines(b, datasheetYield)) {
            o.append(m).append('\n');
        }
        Trim trim = BudgetCalculator.trimOf(s);
        for (Trim.Method m : Trim.Method.values()) {
            boolean twoTemp = m == Trim.Method.TWO_TEMPERATURE;
            if (twoTemp && !(trim.coldIn(s) < trim.hotIn(s))) {
                continue; // a range of one temperature gives no second calibration point
            }
            if (twoTemp
                    && (trim.circuit().kind() == TrimCircuit.Kind.NULL_PINS
                            || trim.circuit().kind() == TrimCircuit.Kind.INJECTION)) {
                continue; // a trimmer is set once: it cannot follow a calibration line (the loader refuses the pair)
            }
            Trimmed t = m == trim.method() ? b.trimmed() : BudgetCalculator.trimmed(s, b.part(), m);
            String where = twoTemp
                    ? "at " + Units.format(trim.coldIn(s), Dimension.TEMPERATURE) + " and "
                            + Units.format(trim.hotIn(s), Dimension.TEMPERATURE)
                    : "at 25 °C";
            line(
                    o,
                    "%-10s %s %s%s: worst-case %s (%s), RSS %s (%s)%s",
                    m == Trim.Method.ONE_POINT ? "Trimmed" : "",
                    methodName(m),
                    where,
                    resolution(b, trim) > 0 ? ", resolution " + v(resolution(b, trim)) : "",
                    v(t.worstCaseV()),
                    share(t.worstCaseV(), limit).strip(),
                    v(t.rssV()),
                    share(t.rssV(), limit).strip(),
                    // one space before the note: two would mark a table row, which Wrap never folds
                    m == trim.method()
                            ? (trim.allowed() ? "; the stage's trim" : "; the stage's method, trim not allowed")
                            : "");
        }
        if (b.trimmed().yield() != null) {
            line(
                    o,
                    "%-10s %s",
                    "",
                    "yield after the " + methodName(trim.method()) + " trim: "
                            + yieldLine(b.trimmed().yield(), s));
        }
        if (trim.allowed() && b.trimmed().circuit() != null && trim.circuit().kind() != TrimCircuit.Kind.STORED) {
            line(o, "%-10s %s", "Circuit", TrimCircuitText.describe(b.trimmed().circuit(), s));
        }
        o.append('\n');
        line(o, "Constraints");
        // the detail column continues under itself rather than running past the width
        TextTable ct = new TextTable().left("").left("").flex("").wrapFlex();
        for (ConstraintResult c : b.constraints()) {
            // a constraint that could not be checked is not reported as met
            ct.row(!c.ok() ? "FAIL" : !c.checked() ? "--" : "ok", c.name(), ConstraintText.detail(c));
        }
        List<String> rows = ct.lines(width - 2);
        for (String row : rows.subList(1, rows.size())) { // the first line is the (empty) heading
            o.append("  ").append(row).append('\n');
        }
        o.append('\n');
        line(
                o,
                "Verdict    %s%s",
                b.verdict().key(),
                b.limitingTerm() == null ? "" : "   (largest term: " + termLabel(b, b.limitingTerm()) + ")");
        String left = Uncounted.words(b.notCounted());
        if (!left.isEmpty()) {
            // "but" where a fit may rest on it; a miss would only grow
            line(o, "%-10s %s", "", (b.verdict() == dev.ampsieve.budget.Verdict.NO_FIT ? "and " : "but ") + left);
        }
        String why = yieldMiss(b);
        if (why != null) {
            line(o, "%-10s %s", "", why);
        }
        if (!b.assumptions().isEmpty()) {
            o.append('\n');
            line(o, "Warnings");
            for (String w : AssumptionText.of(b)) {
                line(o, "  - %s", w);
            }
        }
        o.append('\n').append(Caution.TEXT).append('\n');
        return o.toString();
    }

    static String yieldLine(YieldResult y, Stage s) {
        String target = s.criterion().kind() == Criterion.Kind.YIELD
                ? ", target " + pct(s.criterion().yieldTarget())
                : "";
        return switch (y.decided()) {
            case "all-pass" ->
                "100 % (decided without sampling: even the largest error the catalog's limits allow is"
                        + " within the limit" + target + ")";
            case "none-pass" ->
                "0 % (decided without sampling: even the smallest error the catalog's limits allow"
                        + " exceeds the limit" + target + ")";
            default ->
                pct(y.value()) + " (95 % interval " + pct(y.low()) + " to " + pct(y.high()) + ", " + units(y, s)
                        + ", seed " + s.seed() + target + ")";
        };
    }

    /** How many units were simulated and why the run stopped there. */
    private static String units(YieldResult y, Stage s) {
        if (s.criterion().kind() != Criterion.Kind.YIELD) {
            return y.trials() + " units";
        }
        double target = s.criterion().yieldTarget();
        int cap = Math.max(s.trials(), s.maxTrials());
        if (y.low() >= target || y.high() < target) {
            String side = y.low() >= target ? "above" : "below";
            return y.trials() >= cap
                    ? y.trials() + " units (max-trials), the interval wholly " + side + " the target"
                    : y.trials() + " units, stopped once the interval lay wholly " + side + " the target";
        }
        return y.trials() + " units" + (y.trials() >= cap ? ", the max-trials cap" : "")
                + ", undecided: the interval holds the target";
    }

    /**
     * Why a part judged by yield misses when its seen yield reaches the target: the verdict rests
     * on the lower end of the 95 % interval, which a reader of "99.93 %" would not guess.
     */
    static String yieldMiss(Budget b) {
        Stage s = b.stage();
        if (s.criterion().kind() != Criterion.Kind.YIELD || !b.constraintsMet()) {
            return null;
        }
        boolean trimmed = b.trimmed() != null && b.trimmed().yield() != null;
        YieldResult y = trimmed ? b.trimmed().yield() : b.yield();
        double target = s.criterion().yieldTarget();
        if (b.verdict() == dev.ampsieve.budget.Verdict.UNDECIDED) {
            // the run whose interval still holds the target: as it is, or after the trim
            trimmed = trimmed && b.yield().high() < target;
            y = trimmed ? b.trimmed().yield() : b.yield();
            int cap = Math.max(s.trials(), s.maxTrials());
            return "undecided: " + y.trials() + " simulated units" + (y.trials() >= cap ? " (max-trials)" : "")
                    + " leave the true yield " + (trimmed ? "after the trim " : "") + "within " + pct(y.low()) + " to "
                    + pct(y.high()) + ", which holds the " + pct(target)
                    + " target: the sample neither shows it met nor missed";
        }
        if (b.verdict() != dev.ampsieve.budget.Verdict.NO_FIT) {
            return null;
        }
        if (y == null || y.value() < target) {
            return null;
        }
        return "the yield " + (trimmed ? "after the trim" : "as it is") + " is " + pct(y.value())
                + ", but the lower end of its 95 % interval, " + pct(y.low()) + ", is below the " + pct(target)
                + " target: the sample cannot show the target is met (more trials may settle it)";
    }

    /** A term's name as the table shows it ("initial offset"), not its JSON key ("offset"). */
    static String termLabel(Budget b, String key) {
        TermResult t = b.term(key);
        return t == null ? key : t.label();
    }

    static String methodName(Trim.Method m) {
        return m.key();
    }

    static String pct(double ratio) {
        String s = String.format(Locale.ROOT, "%.3f %%", 100 * ratio);
        // a target (or yield) of 99.9999 % must not read as 100.000 %
        return ratio < 1 && s.equals("100.000 %") ? Units.format(ratio, Dimension.RATIO, 7) : s;
    }

    private static String share(double v, double limit) {
        if (!(limit > 0)) {
            return "-";
        }
        return percentCell(100 * v / limit);
    }

    /**
     * A share of the limit that fits its 9-character column with room to spare, so that two spaces
     * always part it from the figure before it: "122.0 %", "16633 %" (no decimal from 1000 % up),
     * "1.2e6 %" (from 100,000 %).
     */
    static String percentCell(double pct) {
        double a = Math.abs(pct);
        if (a < 999.95) {
            return String.format(Locale.ROOT, "%.1f %%", pct);
        }
        if (a < 99999.5) {
            return String.format(Locale.ROOT, "%.0f %%", pct);
        }
        int e = (int) Math.floor(Math.log10(a));
        double m = pct / Math.pow(10, e);
        if (Math.abs(m) >= 9.95) {
            m /= 10;
            e++;
        }
        return String.format(Locale.ROOT, "%.1fe%d %%", m, e);
    }

    /** The step the trim leaves ({@link BudgetCalculator#trimResolution}). */
    private static double resolution(Budget b, Trim trim) {
        return b.trimmed().circuit() == null
                ? trim.resolution()
                : BudgetCalculator.trimResolution(b.stage(), b.trimmed().circuit());
    }

    private static String v(double volts) {
        return Units.format(volts, Dimension.VOLTAGE);
    }

    private static String num(double x) {
        return Units.format(x, Dimension.NUMBER, 4);
    }

    private static void line(StringBuilder o, String fmt, Object... args) {
        o.append(String.format(Locale.ROOT, fmt, args)).append('\n');
    }
}
