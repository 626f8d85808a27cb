package dev.ampsieve.report;

import dev.ampsieve.text.Visible;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Horizontal bars of error terms (output volts) against the error limit, for one part:
 * one row per term, a rule, then the totals; a vertical line marks the limit and each row
 * ends with the value and its share of the limit. Pure: data and style in, lines out.
 *
 * <pre>
 * offset     ██████▌     │  1.00 mV  50 %
 * drift      ███▎        │   500 µV  25 %
 *            ────────────┼
 * worst case █████████▊  │  1.50 mV  75 %
 *                        ▲ limit 2.00 mV
 * </pre>
 */
public final class BarChart {
    private BarChart() {}

    /** One bar: a label and a magnitude in volts (NaN when unknown: drawn empty, printed n/a). */
    public record Bar(String label, double value) {
        public Bar {
            label = Visible.of(label);
        }
    }

    /** Columns between the chart's parts. */
    private static final int GAP = 1;
    /** Bars never get narrower than this, even on a narrow terminal (lines then wrap). */
    static final int MIN_BAR = 10;

    /**
     * @param terms  the terms, in the order to draw them
     * @param totals totals drawn under a rule (may be empty)
     * @param limit  the error limit in volts, > 0
     */
    public static List<String> render(List<Bar> terms, List<Bar> totals, double limit, OutputStyle style) {
        if (!(limit > 0) || Double.isInfinite(limit)) {
            throw new IllegalArgumentException("limit must be a positive number of volts: " + limit);
        }
        Glyphs g = style.glyphs();
        List<Bar> all = new ArrayList<>(terms);
        all.addAll(totals);
        int labelW = 0;
        int valueW = 0;
        int shareW = 0;
        double max = limit;
        for (Bar b : all) {
            labelW = Math.max(labelW, b.label().length());
            valueW = Math.max(valueW, value(b).length());
            shareW = Math.max(shareW, share(b, limit).length());
            if (Double.isFinite(b.value())) {
                max = Math.max(max, Math.abs(b.value()));
            }
        }
        // the bar area holds barW cells for bars plus one so a limit at full scale still has a column
        int barW = Math.max(MIN_BAR, style.width() - labelW - valueW - shareW - 3 * GAP - 1);
        int limitCol = (int) Math.round(limit / max * barW);

        List<String> lines = new ArrayList<>();
        for (Bar b : terms) {
            lines.add(row(b, labelW, valueW, shareW, barW, limitCol, max, limit, g, style.color()));
        }
        if (!totals.isEmpty()) {
            StringBuilder rule = new StringBuilder(" ".repeat(labelW + GAP));
            for (int i = 0; i <= barW; i++) {
                rule.append(i == limitCol ? g.cross() : g.rule());
            }
            lines.add(rule.toString());
            for (Bar b : totals) {
                lines.add(row(b, labelW, valueW, shareW, barW, limitCol, max, limit, g, style.color()));
            }
        }
        String text = g.pointer() + " limit " + Units.format(limit, Dimension.VOLTAGE);
        int start = labelW + GAP + limitCol;
        if (start + text.length() > style.width()) {
            // no room to the right: write the label to the left of the pointer
            text = "limit " + Units.format(limit, Dimension.VOLTAGE) + " " + g.pointer();
            start = Math.max(0, start - text.length() + 1);
        }
        lines.add(" ".repeat(start) + text);
        return lines.stream().map(g::text).toList();
    }

    private static String row(
            Bar b,
            int labelW,
            int valueW,
            int shareW,
            int barW,
            int limitCol,
            double max,
            double limit,
            Glyphs g,
            boolean color) {
        StringBuilder bar = new StringBuilder();
        int cells = 0;
        if (Double.isFinite(b.value())) {
            int steps = g.steps();
            long units = Math.round(Math.abs(b.value()) / max * barW * steps);
            int whole = (int) (units / steps);
            int part = (int) (units % steps);
            bar.append(String.valueOf(g.full()).repeat(whole));
            cells = whole;
            if (part > 0) {
                bar.append(g.partials().charAt(part - 1));
                cells++;
            }
        }
        StringBuilder area = new StringBuilder();
        area.append(Ansi.paint(bar.toString(), Math.abs(b.value()) > limit ? Ansi.RED : Ansi.GREEN, color));
        for (int i = cells; i <= barW; i++) {
            area.append(i == limitCol ? g.vertical() : ' ');
        }
        String line = pad(b.label(), labelW)
                + " ".repeat(GAP)
                + area
                + " ".repeat(GAP)
                + lpad(value(b), valueW)
                + " ".repeat(GAP)
                + lpad(share(b, limit), shareW);
        return line.stripTrailing();
    }

    private static String value(Bar b) {
        return Units.format(Math.abs(b.value()), Dimension.VOLTAGE);
    }

    /** Share of the limit in whole percent; what a reader compares at a glance. */
    private static String share(Bar b, double limit) {
        if (!Double.isFinite(b.value())) {
            return "";
        }
        return String.format(Locale.ROOT, "%.0f %%", 100.0 * Math.abs(b.value()) / limit);
    }

    static String pad(String s, int w) {
        return s.length() >= w ? s : s + " ".repeat(w - s.length());
    }

    static String lpad(String s, int w) {
        return s.length() >= w ? s : " ".repeat(w - s.length()) + s;
    }
}
