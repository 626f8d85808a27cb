package dev.ampsieve.report;

/**
 * Folds prose lines (advice, warnings, the caution) at word boundaries so they read well in
 * a terminal of the given width. Table rows are left alone: a line whose text holds a run of
 * two spaces is taken to be columns, and folding it would scramble them.
 */
public final class Wrap {
    private Wrap() {}

    /** Every prose line of {@code text} longer than {@code width} folded; other lines unchanged. */
    public static String prose(String text, int width) {
        if (width < 20) {
            return text;
        }
        StringBuilder out = new StringBuilder(text.length() + 64);
        String[] lines = text.split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            if (i > 0) {
                out.append('\n');
            }
            out.append(fold(lines[i], width));
        }
        return out.toString();
    }

    /** One line folded, continuation lines indented under the text (after any "- " bullet). */
    static String fold(String line, int width) {
        if (line.codePointCount(0, line.length()) <= width) {
            return line;
        }
        int lead = 0;
        while (lead < line.length() && line.charAt(lead) == ' ') {
            lead++;
        }
        String body = line.substring(lead);
        int hang = lead + (body.startsWith("- ") ? 2 : 0);
        int gap = body.indexOf("  ");
        if (gap >= 0) {
            // "label    value": one gap is a label column, fold the value under itself;
            // more gaps make a table row, which folding would scramble
            int value = gap;
            while (value < body.length() && body.charAt(value) == ' ') {
                value++;
            }
            if (body.indexOf("  ", value) >= 0 || lead + value > width / 2) {
                return line;
            }
            return foldAt(line.substring(0, lead + value), body.substring(value), lead + value, width);
        }
        return foldAt(line.substring(0, lead), body, hang, width);
    }

    private static String foldAt(String head, String body, int hang, int width) {
        int lead = head.length();
        String pad = " ".repeat(hang);
        StringBuilder out = new StringBuilder();
        StringBuilder cur = new StringBuilder(head);
        boolean first = true;
        for (String word : words(body)) {
            int curLen = cur.codePointCount(0, cur.length());
            boolean empty = first ? curLen == lead : curLen == hang;
            if (!empty && curLen + 1 + word.codePointCount(0, word.length()) > width) {
                out.append(stripEnd(cur)).append('\n');
                cur = new StringBuilder(pad);
                first = false;
                empty = true;
            }
            if (!empty) {
                cur.append(' ');
            }
            cur.append(word);
        }
        out.append(stripEnd(cur));
        return out.toString();
    }

    /** A unit symbol after a number, with any closing punctuation: "%)", "mV;", "µV/°C". */
    private static final java.util.regex.Pattern UNIT =
            java.util.regex.Pattern.compile("(%|°?C|dB|ppm\\S*|[pnuµmkMG]?(V|A|Hz|Ω|ohm|s)(/\\S*)?)[;,.)]*");

    /** Words at spaces, a unit kept on the number before it so "(71.5 %)" never breaks. */
    private static java.util.List<String> words(String body) {
        java.util.List<String> out = new java.util.ArrayList<>();
        for (String w : body.split(" ")) {
            int last = out.size() - 1;
            if (last >= 0 && out.get(last).matches(".*\\d") && UNIT.matcher(w).matches()) {
                out.set(last, out.get(last) + " " + w);
            } else {
                out.add(w);
            }
        }
        return out;
    }

    private static String stripEnd(StringBuilder sb) {
        int n = sb.length();
        while (n > 0 && sb.charAt(n - 1) == ' ') {
            n--;
        }
        return sb.substring(0, n);
    }
}
