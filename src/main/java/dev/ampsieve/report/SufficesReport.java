package dev.ampsieve.report;

import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.ampsieve.advice.Sufficiency;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.text.Visible;
import java.util.Locale;

/** What {@code ampsieve suffices} prints: the yes/no answer first, then the figures behind it. */
public final class SufficesReport {
    private SufficesReport() {}

    public static String text(Sufficiency s, String stageLabel) {
        return text(s, stageLabel, TextTable.WIDTH);
    }

    /** @param width columns the table fits in (the terminal's, in the shell) */
    public static String text(Sufficiency s, String stageLabel, int width) {
        Budget b = s.budget();
        StringBuilder o = new StringBuilder();
        o.append(AdviceText.answer(s)).append('\n');
        // the answer names the failed constraints; each one's numbers follow
        for (var c : b.constraints()) {
            if (!c.ok()) {
                o.append("  ")
                        .append(c.name())
                        .append(": ")
                        .append(ConstraintText.detail(c))
                        .append('\n');
            }
        }
        String left = Uncounted.words(b.notCounted());
        if (!left.isEmpty()) {
            o.append(s.yes() ? "But " : "And ").append(left).append('\n');
        }
        o.append('\n');
        o.append(StageLine.of(b.stage(), stageLabel)).append('\n');
        TextTable t = new TextTable().left("").flex("");
        t.row(
                "worst-case",
                Figures.volts(b.worstCaseV()) + " of " + Figures.volts(b.limitV()) + share(b.worstCaseV(), b.limitV()));
        t.row("RSS", Figures.volts(b.rssV()) + share(b.rssV(), b.limitV()));
        YieldResult y = b.yield();
        if (y != null) {
            t.row(
                    "yield",
                    Figures.yield(y.value()) + " (95 % interval " + Figures.yield(y.low()) + " to "
                            + Figures.yieldHigh(y.high())
                            + (y.trials() > 0 ? ", " + y.trials() + " units" : ", " + y.decided()) + ")");
        }
        TermResult lim = b.limitingTerm() == null ? null : b.term(b.limitingTerm());
        t.row(
                "largest term",
                lim == null
                        ? Figures.NONE
                        : lim.label() + ", " + Figures.volts(lim.outputV()) + share(lim.outputV(), b.limitV()));
        t.row(
                "verdict",
                (b.constraintsMet() ? b.verdict().key() : "rejected (hard constraint)")
                        + (left.isEmpty()
                                ? ""
                                : "; " + b.notCounted().size() + " term"
                                        + (b.notCounted().size() == 1 ? "" : "s") + " not counted (named above)"));
        t.lines(width).stream().skip(1).forEach(l -> o.append(l).append('\n'));
        o.append('\n').append(Caution.TEXT).append('\n');
        // the answer quotes the part id: no control character gets through
        return Wrap.prose(Visible.lines(o.toString()), width);
    }

    private static String share(double v, double limit) {
        return limit > 0 ? String.format(Locale.ROOT, " (%.0f %% of the limit)", 100 * v / limit) : "";
    }

    public static String json(Sufficiency s, String stageLabel) {
        Budget b = s.budget();
        ObjectNode o = JsonSupport.object();
        o.put("answer", s.yes() ? "yes" : "no");
        o.put("text", AdviceText.answer(s));
        JsonSupport.put(o, "stage", stageLabel);
        o.put("part", b.part().id());
        o.put("verdict", b.verdict().key());
        o.put("constraintsMet", b.constraintsMet());
        JsonSupport.put(o, "worstCaseV", b.worstCaseV());
        JsonSupport.put(o, "rssV", b.rssV());
        JsonSupport.put(o, "limitV", b.limitV());
        JsonSupport.put(o, "margin", s.margin());
        YieldResult y = b.yield();
        if (y == null) {
            o.putNull("yield");
        } else {
            ObjectNode yn = o.putObject("yield");
            JsonSupport.put(yn, "value", y.value());
            JsonSupport.put(yn, "low", y.low());
            JsonSupport.put(yn, "high", y.high());
        }
        JsonSupport.put(o, "limitingTerm", b.limitingTerm());
        Uncounted.put(o, b.notCounted());
        return JsonSupport.render(o);
    }
}
