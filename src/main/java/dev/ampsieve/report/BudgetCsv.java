package dev.ampsieve.report;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.NoiseModel;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.Trimmed;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.text.Visible;
import dev.ampsieve.units.Dimension;
import java.util.List;

/**
 * {@code budget --csv}: one part's budget as a sheet in long form, the same figures as the text
 * and JSON ({@link BudgetText}, {@link BudgetJson}). Leading {@code #} comment lines (part, stage,
 * limit, caution), then a header row and one row per term, per total, per trimmed total, per
 * yield and the verdict, each row's {@code section} saying which.
 */
public final class BudgetCsv {
    private BudgetCsv() {}

    /** The header row: column names of our own, described in README ("budget --csv"). */
    static final List<String> COLUMNS = List.of(
            "section",
            "key",
            "label",
            "kind",
            "output_v",
            "input",
            "input_unit",
            "share_of_limit",
            "worst_at_c",
            "estimated",
            "counted",
            "yield",
            "yield_low",
            "yield_high",
            "units");

    public static String render(Budget b, String stageLabel) {
        StringBuilder o = new StringBuilder();
        o.append("# part: ").append(Visible.of(b.part().id())).append('\n');
        o.append("# stage: ").append(StageLine.head(b.stage(), stageLabel)).append('\n');
        o.append("# limit: ").append(StageLine.limit(b.stage())).append('\n');
        o.append("# ").append(Caution.TEXT).append('\n');
        o.append(String.join(",", COLUMNS)).append('\n');
        double limit = b.limitV();
        String inputUnit = Figures.inputDimension(b.stage()) == Dimension.CURRENT ? "A" : "V";
        double g = b.stage().sourceGain(); // input-referred = at the signal source, as the text
        for (TermResult t : b.terms()) {
            row(
                    o,
                    "term",
                    t.key(),
                    RankReport.csv(t.label()),
                    t.kind().key(),
                    RankReport.num(t.outputV()),
                    RankReport.num(t.inputV()),
                    inputUnit,
                    RankReport.num(share(t.outputV(), limit)),
                    RankReport.num(t.worstAtC()),
                    Boolean.toString(t.estimated()),
                    Boolean.toString(BudgetCalculator.counts(b.stage(), t.key())),
                    "",
                    "",
                    "",
                    "");
        }
        total(o, "total", "worst-case", "worst-case sum", b.worstCaseV(), g, inputUnit, limit);
        total(o, "total", "rss", "root-sum-square", b.rssV(), g, inputUnit, limit);
        total(o, "total", "noise-rms", "noise rms", b.noiseRmsV(), g, inputUnit, Double.NaN);
        total(
                o,
                "total",
                "noise-peak-to-peak",
                "noise peak-to-peak",
                NoiseModel.PEAK_TO_PEAK * b.noiseRmsV(),
                g,
                inputUnit,
                Double.NaN);
        // after each trim method, as the text's "Trimmed" lines: keys "<method>.worst-case", "<method>.rss"
        Stage s = b.stage();
        Trim trim = BudgetCalculator.trimOf(s);
        for (Trim.Method m : Trim.Method.values()) {
            if (m == Trim.Method.TWO_TEMPERATURE && !(trim.coldIn(s) < trim.hotIn(s))) {
                continue; // a range of one temperature gives no second calibration point
            }
            Trimmed t = m == trim.method() ? b.trimmed() : BudgetCalculator.trimmed(s, b.part(), m);
            String after = "after the " + BudgetText.methodName(m) + " trim"
                    + (m == trim.method() ? " (the stage's method)" : "");
            total(o, "trimmed", m.key() + ".worst-case", "worst-case " + after, t.worstCaseV(), g, inputUnit, limit);
            total(o, "trimmed", m.key() + ".rss", "root-sum-square " + after, t.rssV(), g, inputUnit, limit);
        }
        String method = BudgetText.methodName(trim.method());
        yieldRow(o, "as-is", "yield as it is", b.yield());
        if (b.trimmed() != null && b.trimmed().yield() != null) {
            yieldRow(
                    o,
                    "after-trim",
                    "yield after the " + method + " trim",
                    b.trimmed().yield());
        }
        TermResult lim = b.limitingTerm() == null ? null : b.term(b.limitingTerm());
        row(
                o,
                "verdict",
                b.constraintsMet() ? b.verdict().key() : "rejected",
                lim == null ? "" : RankReport.csv(lim.label()),
                lim == null ? "" : lim.kind().key(),
                lim == null ? "" : RankReport.num(lim.outputV()),
                "",
                "",
                lim == null ? "" : RankReport.num(share(lim.outputV(), limit)),
                "",
                "",
                "",
                "",
                "",
                "",
                "");
        return o.toString();
    }

    private static double share(double v, double limit) {
        return limit > 0 ? v / limit : Double.NaN;
    }

    private static void total(
            StringBuilder o,
            String section,
            String key,
            String label,
            double v,
            double gain,
            String inputUnit,
            double limit) {
        row(
                o,
                section,
                key,
                label,
                "",
                RankReport.num(v),
                RankReport.num(v / gain),
                inputUnit,
                RankReport.num(share(v, limit)),
                "",
                "",
                "",
                "",
                "",
                "",
                "");
    }

    private static void yieldRow(StringBuilder o, String key, String label, YieldResult y) {
        if (y == null) {
            return;
        }
        row(
                o,
                "yield",
                key,
                label,
                "",
                "",
                "",
                "",
                "",
                "",
                "",
                "",
                RankReport.num(y.value()),
                RankReport.num(y.low()),
                RankReport.num(y.high()),
                Integer.toString(y.trials()));
    }

    private static void row(StringBuilder o, String... cells) {
        if (cells.length != COLUMNS.size()) {
            throw new IllegalStateException(cells.length + " cells for " + COLUMNS.size() + " columns");
        }
        o.append(String.join(",", cells)).append('\n');
    }
}
