package dev.ampsieve.report;

import dev.ampsieve.text.Visible;
import java.util.ArrayList;
import java.util.List;

/**
 * A plain-text table that fits a terminal width: every column as wide as its widest cell,
 * except one flexible column (a title or a reason) which takes what is left and is cut with
 * an ellipsis. Cells and headers are made {@link Visible}: a control character or line feed
 * from the catalog shows as an escape and never breaks the layout or drives the terminal.
 */
final class TextTable {

    /** Width all our tables are sized to. */
    static final int WIDTH = OutputStyle.TEXT_WIDTH;

    private record Column(String header, boolean right, boolean flex) {}

    /** Long flexible cells continue on further lines (true) or are cut with an ellipsis (false). */
    private boolean wrap;

    /** Let long cells of the flexible column continue on further lines instead of being cut. */
    TextTable wrapFlex() {
        wrap = true;
        return this;
    }

    private final List<Column> columns = new ArrayList<>();
    private final List<String[]> rows = new ArrayList<>();

    TextTable left(String header) {
        columns.add(new Column(Visible.of(header), false, false));
        return this;
    }

    TextTable right(String header) {
        columns.add(new Column(Visible.of(header), true, false));
        return this;
    }

    /** The column that shrinks to fit (at most one). */
    TextTable flex(String header) {
        columns.add(new Column(Visible.of(header), false, true));
        return this;
    }

    TextTable row(String... cells) {
        if (cells.length != columns.size()) {
            throw new IllegalArgumentException(cells.length + " cells for " + columns.size() + " columns");
        }
        String[] shown = new String[cells.length];
        for (int i = 0; i < cells.length; i++) {
            shown[i] = Visible.of(cells[i]);
        }
        rows.add(shown);
        return this;
    }

    boolean isEmpty() {
        return rows.isEmpty();
    }

    /** Lines of the table, each at most {@code width} characters (given a flexible column). */
    List<String> lines(int width) {
        int n = columns.size();
        int[] w = new int[n];
        for (int i = 0; i < n; i++) {
            w[i] = columns.get(i).header().length();
            for (String[] r : rows) {
                w[i] = Math.max(w[i], len(r[i]));
            }
        }
        int gaps = 2 * (n - 1);
        int total = gaps;
        for (int x : w) {
            total += x;
        }
        for (int i = 0; i < n; i++) {
            if (columns.get(i).flex() && total > width) {
                w[i] = Math.max(columns.get(i).header().length(), w[i] - (total - width));
            }
        }
        List<String> out = new ArrayList<>();
        String[] head = columns.stream().map(Column::header).toArray(String[]::new);
        out.add(format(head, w));
        int flex = -1;
        for (int i = 0; i < n; i++) {
            if (columns.get(i).flex()) {
                flex = i;
            }
        }
        for (String[] r : rows) {
            if (!wrap || flex < 0 || len(r[flex]) <= w[flex]) {
                out.add(format(r, w));
                continue;
            }
            List<String> pieces = wrapText(r[flex], w[flex]);
            String[] first = r.clone();
            first[flex] = pieces.get(0);
            out.add(format(first, w));
            for (String piece : pieces.subList(1, pieces.size())) {
                String[] more = new String[n];
                java.util.Arrays.fill(more, "");
                more[flex] = piece;
                out.add(format(more, w));
            }
        }
        return out;
    }

    /** Words, with a unit kept on the number it follows ("150 mV" never breaks). */
    private static List<String> glued(String s) {
        List<String> words = new ArrayList<>();
        for (String w : s.split(" ")) {
            int last = words.size() - 1;
            if (last >= 0 && words.get(last).matches(".*\\d") && w.matches("[\\p{L}°µΩ%/√]{1,7}[;,.)]?")) {
                words.set(last, words.get(last) + " " + w);
            } else {
                words.add(w);
            }
        }
        return words;
    }

    /** Splits at spaces into lines of at most {@code width} (a longer word is cut). */
    static List<String> wrapText(String s, int width) {
        List<String> out = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : glued(s)) {
            if (line.length() > 0 && len(line + " " + word) > width) {
                out.add(line.toString());
                line.setLength(0);
            }
            if (line.length() > 0) {
                line.append(' ');
            }
            line.append(word);
        }
        if (line.length() > 0 || out.isEmpty()) {
            out.add(cut(line.toString(), width));
        }
        return out;
    }

    private String format(String[] cells, int[] w) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < cells.length; i++) {
            String c = cut(cells[i] == null ? "" : cells[i], w[i]);
            String pad = " ".repeat(w[i] - len(c));
            if (i > 0) {
                sb.append("  ");
            }
            sb.append(columns.get(i).right() ? pad + c : c + pad);
        }
        return strip(sb);
    }

    static String cut(String s, int width) {
        return len(s) <= width ? s : s.substring(0, Math.max(0, width - 1)) + "…";
    }

    /** Length in characters as a terminal shows them (all our symbols are one cell wide). */
    private static int len(String s) {
        return s == null ? 0 : s.codePointCount(0, s.length());
    }

    private static String strip(StringBuilder sb) {
        int end = sb.length();
        while (end > 0 && sb.charAt(end - 1) == ' ') {
            end--;
        }
        return sb.substring(0, end);
    }
}
