package dev.ampsieve.report;

import dev.ampsieve.advice.Candidate;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.TermResult;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * The two SVG charts of an HTML record, drawn with fixed scales so that a reader (and a test) can
 * place every mark by hand.
 *
 * <p>Term bars: one row of {@link #ROW} px per term; a linear axis from {@link #BAR_X0} to
 * {@link #BAR_X0} + {@link #BAR_W} px spanning 0 to 1.25 times the larger of the limit and the
 * largest term, so the limit line of a part whose every term is inside the limit sits at
 * {@code BAR_X0 + BAR_W / 1.25}.
 *
 * <p>Error against cost: effective unit cost linear from 0 to 1.1 times the dearest candidate;
 * the judged error on a log axis from the decade below the smallest of errors and limit to the
 * decade above the largest; the Pareto front as a line through its parts, the limit as a
 * horizontal line.
 */
final class RecordCharts {
    private RecordCharts() {}

    static final double BAR_X0 = 200;
    static final double BAR_W = 520;
    static final double ROW = 22;
    static final double BAR_TOP = 28;
    static final double WIDTH = 760;

    static final double SC_X0 = 80;
    static final double SC_W = 640;
    static final double SC_Y0 = 20;
    static final double SC_H = 300;

    /** Each term of {@code b} as a bar against the stage limit. */
    static String bars(Budget b) {
        List<TermResult> terms = b.terms();
        double limit = b.limitV();
        double largest = terms.stream()
                .mapToDouble(TermResult::outputV)
                .filter(Double::isFinite)
                .max()
                .orElse(0);
        double top = 1.25 * Math.max(limit, largest);
        double h = BAR_TOP + ROW * terms.size() + 10;
        StringBuilder s = new StringBuilder();
        s.append(open(WIDTH, h, "Each error term of " + b.part().id() + " at the output against the limit"));
        // axis ticks at quarters of the scale
        for (int i = 0; i <= 4; i++) {
            double x = BAR_X0 + BAR_W * i / 4.0;
            s.append(line("grid", x, BAR_TOP - 4, x, h - 10));
            s.append(text("tick", x, BAR_TOP - 8, "middle", Figures.volts(top * i / 4.0)));
        }
        for (int i = 0; i < terms.size(); i++) {
            TermResult t = terms.get(i);
            double y = BAR_TOP + ROW * i;
            double w = Double.isFinite(t.outputV()) && top > 0 ? BAR_W * Math.min(t.outputV(), top) / top : 0;
            s.append(text("label", BAR_X0 - 8, y + ROW * 0.68, "end", t.label()));
            s.append(String.format(
                    Locale.ROOT,
                    "<rect class=\"term%s\" data-term=\"%s\" x=\"%s\" y=\"%s\" width=\"%s\" height=\"%s\">"
                            + "<title>%s</title></rect>\n",
                    t.outputV() > limit ? " over" : "",
                    RecordHtml.esc(t.key()),
                    n(BAR_X0),
                    n(y + 3),
                    n(w),
                    n(ROW - 6),
                    RecordHtml.esc(t.label() + ": " + Figures.volts(t.outputV()))));
        }
        double lx = BAR_X0 + BAR_W * limit / top;
        s.append(line("limit", lx, BAR_TOP - 4, lx, h - 10));
        s.append(text("limit-label", lx + 4, h - 2, "start", "limit " + Figures.volts(limit)));
        return s.append("</svg>\n").toString();
    }

    /** Every candidate with a price and an error: effective cost against the judged error. */
    static String scatter(Ranking r, String errorName) {
        List<Candidate> shown = r.candidates().stream()
                .filter(c -> Double.isFinite(c.effectiveCost()) && c.errorV() > 0 && Double.isFinite(c.errorV()))
                .toList();
        double limit = r.stage().limitVolts();
        double maxCost =
                shown.stream().mapToDouble(Candidate::effectiveCost).max().orElse(1);
        double xTop = 1.1 * (maxCost > 0 ? maxCost : 1);
        double lo = Math.min(
                limit, shown.stream().mapToDouble(Candidate::errorV).min().orElse(limit));
        double hi = Math.max(
                limit, shown.stream().mapToDouble(Candidate::errorV).max().orElse(limit));
        int dLo = (int) Math.floor(Math.log10(lo));
        int dHi = (int) Math.ceil(Math.log10(hi));
        if (dHi <= dLo) {
            dHi = dLo + 1;
        }
        double h = SC_Y0 + SC_H + 50;
        StringBuilder s = new StringBuilder();
        s.append(open(WIDTH, h, errorName + " error at the output against effective unit cost"));
        for (int d = dLo; d <= dHi; d++) {
            double y = y(Math.pow(10, d), dLo, dHi);
            s.append(line("grid", SC_X0, y, SC_X0 + SC_W, y));
            s.append(text("tick", SC_X0 - 6, y + 4, "end", Figures.volts(Math.pow(10, d))));
        }
        for (int i = 0; i <= 4; i++) {
            double x = SC_X0 + SC_W * i / 4.0;
            s.append(line("grid", x, SC_Y0, x, SC_Y0 + SC_H));
            s.append(text("tick", x, SC_Y0 + SC_H + 16, "middle", Figures.money(xTop * i / 4.0)));
        }
        String currency = shown.isEmpty() ? "" : shown.get(0).currency();
        s.append(text("axis", SC_X0 + SC_W / 2, SC_Y0 + SC_H + 36, "middle", "effective unit cost " + currency));
        Set<String> front = r.pareto().stream().map(Candidate::id).collect(Collectors.toSet());
        List<String> path = new ArrayList<>();
        for (Candidate c : r.pareto()) {
            if (shown.contains(c)) {
                path.add(n(x(c.effectiveCost(), xTop)) + "," + n(y(c.errorV(), dLo, dHi)));
            }
        }
        if (path.size() > 1) {
            s.append("<polyline class=\"pareto\" points=\"")
                    .append(String.join(" ", path))
                    .append("\"/>\n");
        }
        double ly = y(limit, dLo, dHi);
        s.append(line("limit", SC_X0, ly, SC_X0 + SC_W, ly));
        s.append(text("limit-label", SC_X0 + SC_W - 4, ly - 5, "end", "limit " + Figures.volts(limit)));
        List<double[]> placed = new ArrayList<>();
        for (Candidate c : shown) {
            double cx = x(c.effectiveCost(), xTop);
            double cy = y(c.errorV(), dLo, dHi);
            String cls = "candidate" + (c.fits() ? " fits" : "") + (front.contains(c.id()) ? " pareto" : "");
            s.append(String.format(
                    Locale.ROOT,
                    "<circle class=\"%s\" data-part=\"%s\" cx=\"%s\" cy=\"%s\" r=\"4\">"
                            + "<title>%s</title></circle>\n",
                    cls,
                    RecordHtml.esc(c.id()),
                    n(cx),
                    n(cy),
                    RecordHtml.esc(c.id() + ": " + Figures.volts(c.errorV()) + ", " + Figures.money(c.effectiveCost())
                            + " " + c.currency())));
            if (front.contains(c.id())) {
                label(s, placed, cx, cy, c.id());
            }
        }
        return s.append("</svg>\n").toString();
    }

    /** Approximate width of one character of an 11 px label, px. */
    private static final double CHAR_W = 6.2;

    /**
     * A point's label beside it where it overlaps no label placed before: above right, below
     * right, above left, below left; else above right anyway.
     */
    private static void label(StringBuilder s, List<double[]> placed, double cx, double cy, String words) {
        double w = CHAR_W * words.length();
        double[][] tries = {{cx + 6, cy - 6}, {cx + 6, cy + 15}, {cx - 6 - w, cy - 6}, {cx - 6 - w, cy + 15}};
        double[] at = tries[0];
        for (double[] t : tries) {
            boolean free = placed.stream()
                    .noneMatch(b -> t[0] < b[0] + b[2] && b[0] < t[0] + w && t[1] - 11 < b[1] && b[1] - 11 < t[1]);
            if (free) {
                at = t;
                break;
            }
        }
        placed.add(new double[] {at[0], at[1], w});
        s.append(text("point-label", at[0], at[1], "start", words));
    }

    static double x(double cost, double xTop) {
        return SC_X0 + SC_W * cost / xTop;
    }

    static double y(double v, int dLo, int dHi) {
        return SC_Y0 + SC_H * (dHi - Math.log10(v)) / (dHi - dLo);
    }

    private static String open(double w, double h, String title) {
        return String.format(
                Locale.ROOT,
                "<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"chart\" viewBox=\"0 0 %s %s\" "
                        + "width=\"%s\" height=\"%s\" role=\"img\" aria-label=\"%s\">\n",
                n(w),
                n(h),
                n(w),
                n(h),
                RecordHtml.esc(title));
    }

    private static String line(String cls, double x1, double y1, double x2, double y2) {
        return String.format(
                Locale.ROOT,
                "<line class=\"%s\" x1=\"%s\" y1=\"%s\" x2=\"%s\" y2=\"%s\"/>\n",
                cls,
                n(x1),
                n(y1),
                n(x2),
                n(y2));
    }

    private static String text(String cls, double x, double y, String anchor, String words) {
        return String.format(
                Locale.ROOT,
                "<text class=\"%s\" x=\"%s\" y=\"%s\" text-anchor=\"%s\">%s</text>\n",
                cls,
                n(x),
                n(y),
                anchor,
                RecordHtml.esc(words));
    }

    /** Two decimals, no trailing zeros: coordinates a test can compare with a hand figure. */
    static String n(double v) {
        return java.math.BigDecimal.valueOf(Math.round(v * 100) / 100.0)
                .stripTrailingZeros()
                .toPlainString();
    }
}
