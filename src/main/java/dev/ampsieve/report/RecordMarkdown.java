package dev.ampsieve.report;

import dev.ampsieve.text.Visible;
import java.util.List;

/**
 * A decision record as Markdown (CommonMark with GFM tables): the same blocks as the HTML
 * record, tables for the tables; no charts (a sentence says what the HTML chart shows and that
 * the table beside it has the figures); the facts in an HTML comment holding JSON.
 */
final class RecordMarkdown {
    private RecordMarkdown() {}

    static String render(List<RecordDoc.Block> blocks, String json) {
        StringBuilder o = new StringBuilder();
        for (RecordDoc.Block b : blocks) {
            if (b instanceof RecordDoc.Heading h) {
                o.append("#".repeat(h.level()))
                        .append(' ')
                        .append(esc(h.text()))
                        .append("\n\n");
            } else if (b instanceof RecordDoc.Para p) {
                o.append("caution".equals(p.kind()) ? "> " : "warning".equals(p.kind()) ? "- " : "")
                        .append(esc(p.text()))
                        .append("\n\n");
            } else if (b instanceof RecordDoc.Table t) {
                table(o, t);
            } else if (b instanceof RecordDoc.Chart c) {
                o.append('_').append(esc(c.text())).append("_\n\n");
            } else if (b instanceof RecordDoc.Pre p) {
                fence(o, p.text());
            } else {
                o.append("---\n\n");
            }
        }
        // a comment shows nothing when rendered; its JSON escapes < and >, so "-->" cannot occur inside
        o.append("<!-- ").append(RecordJson.BLOCK_ID).append('\n').append(json).append("\n-->\n");
        return o.toString();
    }

    private static void table(StringBuilder o, RecordDoc.Table t) {
        boolean head = t.head().stream().anyMatch(h -> !h.isEmpty());
        o.append('|');
        for (String h : t.head()) {
            o.append(' ').append(head ? cell(h) : " ").append(" |");
        }
        o.append("\n|");
        for (int i = 0; i < t.head().size(); i++) {
            o.append(i < t.numeric().size() && t.numeric().get(i) ? "---:|" : "---|");
        }
        o.append('\n');
        for (List<String> row : t.rows()) {
            o.append('|');
            for (String c : row) {
                o.append(' ').append(cell(c)).append(" |");
            }
            o.append('\n');
        }
        o.append('\n');
    }

    /** The stage file in a fence longer than any run of backticks inside it. */
    private static void fence(StringBuilder o, String text) {
        String v = Visible.lines(text);
        int run = 0;
        int longest = 0;
        for (char c : v.toCharArray()) {
            run = c == '`' ? run + 1 : 0;
            longest = Math.max(longest, run);
        }
        String f = "`".repeat(Math.max(3, longest + 1));
        o.append(f)
                .append("yaml\n")
                .append(v)
                .append(v.endsWith("\n") ? "" : "\n")
                .append(f)
                .append("\n\n");
    }

    /** A table cell: as {@link #esc}, with {@code |} escaped so it cannot end the cell. */
    static String cell(String s) {
        return esc(s).replace("|", "\\|");
    }

    /**
     * Text for Markdown: control characters (line feeds included) made visible, so one string
     * stays one line; markup characters escaped by a backslash, and {@code < > &} as entities, so
     * a catalog string can neither open an HTML tag nor start a link, emphasis or heading.
     */
    static String esc(String s) {
        if (s == null) {
            return "";
        }
        String v = Visible.of(s);
        StringBuilder b = new StringBuilder(v.length() + 16);
        for (int i = 0; i < v.length(); i++) {
            char c = v.charAt(i);
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '\\', '`', '*', '_', '[', ']', '#', '!' -> b.append('\\').append(c);
                default -> b.append(c);
            }
        }
        return b.toString();
    }
}
