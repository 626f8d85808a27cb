package dev.ampsieve.report;

import dev.ampsieve.advice.Candidate;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.text.Visible;
import java.util.ArrayList;
import java.util.List;

/** The candidates of a ranking on an error-against-cost plane, the limit drawn across. */
public final class RankScatter {
    private RankScatter() {}

    /**
     * @param stageLabel how to name the stage (its file), or null
     * @param top        how many candidates, in ranking order
     * @param height     rows of the plot
     */
    public static String render(Ranking r, String stageLabel, int top, int height, OutputStyle style) {
        List<ScatterChart.Point> points = new ArrayList<>();
        String currency = "";
        for (Candidate c :
                r.candidates().subList(0, Math.min(top, r.candidates().size()))) {
            String verdict = c.fits() ? (c.trimmed() ? "fits-after-trim" : "fits") : "no-fit";
            points.add(new ScatterChart.Point(c.id(), c.errorV(), c.effectiveCost(), verdict));
            if (currency.isEmpty()) {
                currency = c.currency();
            }
        }
        StringBuilder o = new StringBuilder();
        o.append(stageLabel == null ? "" : Visible.of(stageLabel) + ": ")
                .append(r.stage().criterion().kind() == Criterion.Kind.WORST_CASE ? "worst-case" : "RSS")
                .append(" error at the output (log scale) against effective unit cost\n");
        if (points.isEmpty()) {
            o.append("No candidate meets the hard constraints (")
                    .append(r.rejected().size())
                    .append(" rejected; 'rank' gives the reasons).\n");
        } else {
            o.append('\n');
            for (String line : ScatterChart.render(points, r.stage().limitVolts(), currency, height, style)) {
                o.append(line).append('\n');
            }
            o.append('\n')
                    .append(
                            r.stage().criterion().kind() == Criterion.Kind.YIELD
                                    ? "The verdict column decides: judged by yield, a part under the RSS line can still miss its target."
                                    : "Under the limit line the parts fit; the leftmost of them is the cheapest.");
            int more = r.candidates().size() - points.size();
            if (more > 0) {
                o.append(" ").append(more).append(" more candidate(s) not shown (--top).");
            }
            if (!r.rejected().isEmpty()) {
                o.append(" ")
                        .append(r.rejected().size())
                        .append(" part(s) fail a hard constraint ('rank' lists them).");
            }
            o.append('\n');
        }
        o.append('\n').append(Caution.TEXT).append('\n');
        return style.glyphs().text(Wrap.prose(o.toString(), style.width()));
    }
}
