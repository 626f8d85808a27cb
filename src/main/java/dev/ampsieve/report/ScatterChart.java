package dev.ampsieve.report;

import dev.ampsieve.text.Visible;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.util.ArrayList;
import java.util.List;

/**
 * Candidates as letters on a plane of error (vertical, logarithmic: errors of competing parts
 * span decades) against cost (horizontal, linear), with the limit drawn across; a legend names
 * each letter. Parts under the line fit; the cheapest of them is the leftmost. Pure: data and
 * style in, lines out.
 *
 * <pre>
 *  10.0 mV ┤ b
 *          │
 *  1.00 mV ┼──────────a── limit
 *   100 µV ┤             c
 *          └─────────────
 *           0.5       4.2 USD
 * </pre>
 */
public final class ScatterChart {
    private ScatterChart() {}

    /**
     * One candidate.
     *
     * @param error   output error in volts by the stage's criterion (worst case unless stated)
     * @param cost    effective unit cost (price at the quantity plus any trim)
     * @param verdict fits, fits-after-trim or no-fit (colours the letter)
     */
    public record Point(String id, double error, double cost, String verdict) {
        public Point {
            id = Visible.of(id);
        }
    }

    private static final String MARKS = "abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQRSTUVWXYZ";
    private static final String LIMIT_WORD = " limit";
    /** Fewer rows cannot separate three decades; more do not add information. */
    public static final int MIN_HEIGHT = 5;

    /** The letter for the {@code i}-th point; '#' once the alphabet is used up. */
    public static char mark(int i) {
        return i < MARKS.length() ? MARKS.charAt(i) : '#';
    }

    /**
     * @param points   candidates, in legend order (letters a, b, c ... in this order)
     * @param limit    error limit in volts, > 0
     * @param currency shown after the cost axis
     * @param height   rows of the plotting area, at least {@link #MIN_HEIGHT}
     */
    public static List<String> render(
            List<Point> points, double limit, String currency, int height, OutputStyle style) {
        if (!(limit > 0) || Double.isInfinite(limit)) {
            throw new IllegalArgumentException("limit must be a positive number of volts: " + limit);
        }
        Glyphs g = style.glyphs();
        int rows = Math.max(MIN_HEIGHT, height);
        currency = Visible.of(currency);

        double yHi = limit;
        double yLo = limit;
        double xLo = Double.POSITIVE_INFINITY;
        double xHi = Double.NEGATIVE_INFINITY;
        for (Point p : points) {
            if (p.error() > 0 && Double.isFinite(p.error())) {
                yHi = Math.max(yHi, p.error());
                yLo = Math.min(yLo, p.error());
            }
            if (Double.isFinite(p.cost())) {
                xLo = Math.min(xLo, p.cost());
                xHi = Math.max(xHi, p.cost());
            }
        }
        // at least a factor of 1.5 each side of the limit, so the line is never an edge
        yHi = Math.max(yHi, 1.5 * limit);
        yLo = Math.min(yLo, limit / 1.5);
        if (xLo > xHi) {
            xLo = 0;
            xHi = 1;
        }

        String top = Units.format(yHi, Dimension.VOLTAGE);
        String bottom = Units.format(yLo, Dimension.VOLTAGE);
        String lim = Units.format(limit, Dimension.VOLTAGE);
        int labelW = Math.max(top.length(), Math.max(bottom.length(), lim.length()));
        int plotW = Math.max(10, style.width() - labelW - 2 - LIMIT_WORD.length());

        int limitRow = row(limit, yHi, yLo, rows);
        char[][] grid = new char[rows][plotW];
        int[][] owner = new int[rows][plotW];
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < plotW; c++) {
                grid[r][c] = r == limitRow ? g.rule() : ' ';
                owner[r][c] = -1;
            }
        }
        for (int i = 0; i < points.size(); i++) {
            Point p = points.get(i);
            if (!Double.isFinite(p.cost())) {
                continue;
            }
            int r = p.error() > 0 && Double.isFinite(p.error()) ? row(p.error(), yHi, yLo, rows) : rows - 1;
            // the one thing the chart must not get wrong: under the line means under the limit.
            // A row spans a range of errors, so a part near the limit moves off the line to its side.
            if (p.error() < limit && r <= limitRow) {
                r = Math.min(rows - 1, limitRow + 1);
            } else if (p.error() > limit && r >= limitRow) {
                r = Math.max(0, limitRow - 1);
            }
            int c = xHi == xLo ? plotW / 2 : (int) Math.round((p.cost() - xLo) / (xHi - xLo) * (plotW - 1));
            boolean taken = owner[r][c] >= 0 || owner[r][c] == -2;
            grid[r][c] = taken ? g.collide() : mark(i);
            owner[r][c] = taken ? -2 : i;
        }

        List<String> lines = new ArrayList<>();
        for (int r = 0; r < rows; r++) {
            String label = r == limitRow ? lim : r == 0 ? top : r == rows - 1 ? bottom : "";
            char axis = r == limitRow
                    ? (style.unicode() ? g.cross() : g.tick())
                    : label.isEmpty() ? g.vertical() : g.tick();
            StringBuilder sb =
                    new StringBuilder(BarChart.lpad(label, labelW)).append(' ').append(axis);
            for (int c = 0; c < plotW; c++) {
                int o = owner[r][c];
                String cell = String.valueOf(grid[r][c]);
                sb.append(
                        o >= 0 ? Ansi.paint(cell, Ansi.forVerdict(points.get(o).verdict()), style.color()) : cell);
            }
            if (r == limitRow) {
                sb.append(LIMIT_WORD);
            }
            lines.add(sb.toString().stripTrailing());
        }
        lines.add(" ".repeat(labelW + 1) + g.corner() + String.valueOf(g.rule()).repeat(plotW));
        // lowest cost under the first plot column, highest ending under the last
        String lo = cost(xLo);
        String hi = cost(xHi);
        int gap = Math.max(1, plotW - lo.length() - hi.length());
        lines.add(" ".repeat(labelW + 2) + lo + " ".repeat(gap) + hi + " " + currency);
        lines.addAll(legend(points, currency, style));
        return lines.stream().map(g::text).toList();
    }

    /** Row 0 at the top; log scale between yHi and yLo. */
    private static int row(double y, double yHi, double yLo, int rows) {
        double t = Math.log(yHi / y) / Math.log(yHi / yLo);
        return (int) Math.max(0, Math.min(rows - 1, Math.round(t * (rows - 1))));
    }

    /** Money: cents below 100, whole units above (a price list's precision). */
    static String cost(double c) {
        if (!Double.isFinite(c)) {
            return "n/a";
        }
        return String.format(java.util.Locale.ROOT, Math.abs(c) < 100 ? "%.2f" : "%.0f", c);
    }

    private static List<String> legend(List<Point> points, String currency, OutputStyle style) {
        int idW = 0;
        int errW = 0;
        int costW = 0;
        for (Point p : points) {
            idW = Math.max(idW, p.id().length());
            errW = Math.max(errW, Units.format(p.error(), Dimension.VOLTAGE).length());
            costW = Math.max(costW, cost(p.cost()).length());
        }
        List<String> out = new ArrayList<>();
        for (int i = 0; i < points.size(); i++) {
            Point p = points.get(i);
            String m = Ansi.paint(String.valueOf(mark(i)), Ansi.forVerdict(p.verdict()), style.color());
            out.add(("  " + m + "  " + BarChart.pad(p.id(), idW) + "  "
                            + BarChart.lpad(Units.format(p.error(), Dimension.VOLTAGE), errW) + "  "
                            + BarChart.lpad(cost(p.cost()), costW) + " " + currency + "  " + p.verdict())
                    .stripTrailing());
        }
        return out;
    }
}
