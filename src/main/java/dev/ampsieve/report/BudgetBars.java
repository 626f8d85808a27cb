package dev.ampsieve.report;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.text.Visible;
import java.util.ArrayList;
import java.util.List;

/** One part's budget as a bar chart: each counted term, the totals, and the limit marked. */
public final class BudgetBars {
    private BudgetBars() {}

    /** @param stageLabel how to name the stage (its file), or null */
    public static String render(Budget b, String stageLabel, OutputStyle style) {
        List<BarChart.Bar> terms = new ArrayList<>();
        List<String> skipped = new ArrayList<>();
        for (TermResult t : b.terms()) {
            if (BudgetCalculator.counts(b.stage(), t.key())) {
                terms.add(new BarChart.Bar(t.label() + (t.estimated() ? "*" : ""), t.outputV()));
            } else {
                skipped.add(t.label());
            }
        }
        List<BarChart.Bar> totals = new ArrayList<>();
        totals.add(new BarChart.Bar("worst-case sum", b.worstCaseV()));
        totals.add(new BarChart.Bar("root-sum-square", b.rssV()));
        Trim trim = BudgetCalculator.trimOf(b.stage());
        if (trim.allowed() && b.trimmed() != null) {
            totals.add(new BarChart.Bar("after the trim", b.trimmed().worstCaseV()));
        }
        StringBuilder o = new StringBuilder();
        o.append(Visible.of(b.part().id()))
                .append(stageLabel == null ? "" : " in " + Visible.of(stageLabel))
                .append(": error at the output, term by term, against the limit (")
                .append(CriterionText.of(b.stage().criterion()))
                .append(")\n\n");
        for (String line : BarChart.render(terms, totals, b.limitV(), style)) {
            o.append(line).append('\n');
        }
        o.append('\n');
        if (terms.stream().anyMatch(t -> t.label().endsWith("*"))) {
            o.append("* estimated, typical-only or assumed value ('budget' lists the warnings)\n");
        }
        if (!skipped.isEmpty()) {
            o.append("Not counted (AC-coupled, headroom only): ")
                    .append(String.join(", ", skipped))
                    .append('\n');
        }
        o.append("Verdict ")
                .append(b.verdict().key())
                .append(b.limitingTerm() == null ? "" : "; largest term: " + BudgetText.termLabel(b, b.limitingTerm()))
                .append("; input-referred limit ")
                .append(Figures.atInput(b.stage(), b.limitV() / b.stage().sourceGain()))
                .append('\n');
        o.append('\n').append(Caution.TEXT).append('\n');
        return style.glyphs().text(Wrap.prose(o.toString(), style.width()));
    }
}
