package dev.ampsieve.sheet;

import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;

/** YAML scalars written by hand: plain where that reads back as the same text, else double-quoted. */
final class YamlText {
    private YamlText() {}

    /** Words YAML 1.1 reads as booleans or null when plain. */
    private static final Set<String> SPECIAL = Set.of("true", "false", "yes", "no", "on", "off", "y", "n", "null", "~");

    private static final Pattern PLAIN_WORD = Pattern.compile("[a-z][a-z0-9]*(?:-[a-z0-9]+)*");
    static final Pattern NUMBER = Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?");
    private static final Pattern INTEGER = Pattern.compile("\\d+");

    /** A lower-case word plain ({@code standard}, {@code my-part-01}), anything else quoted. */
    static String word(String s) {
        return PLAIN_WORD.matcher(s).matches() && !SPECIAL.contains(s.toLowerCase(Locale.ROOT)) ? s : quoted(s);
    }

    /** A number plain ({@code 1.25}), anything else quoted (the catalog then says what is wrong). */
    static String number(String s) {
        return NUMBER.matcher(s).matches() ? s : quoted(s);
    }

    static String integer(String s) {
        return INTEGER.matcher(s).matches() ? s : quoted(s);
    }

    static String bool(String s) {
        String t = s.toLowerCase(Locale.ROOT);
        return t.equals("true") || t.equals("false") ? t : quoted(s);
    }

    /**
     * A double-quoted scalar (YAML 1.2, 7.3.1): backslash and quote escaped, and every character
     * a reader might not take literally (C0, DEL, C1, line and paragraph separators, the byte
     * order mark) as an escape, so the text reads back exactly.
     */
    static String quoted(String s) {
        StringBuilder b = new StringBuilder(s.length() + 2).append('"');
        s.codePoints().forEach(c -> {
            switch (c) {
                case '\\' -> b.append("\\\\");
                case '"' -> b.append("\\\"");
                case '\n' -> b.append("\\n");
                case '\t' -> b.append("\\t");
                case '\r' -> b.append("\\r");
                default -> {
                    if (c < 0x20 || c == 0x7f || (c >= 0x80 && c <= 0x9f)) {
                        b.append(String.format(Locale.ROOT, "\\x%02x", c));
                    } else if (c == 0x2028
                            || c == 0x2029
                            || c == 0xfeff
                            || Character.getType(c) == Character.FORMAT
                            || Character.getType(c) == Character.SURROGATE) {
                        b.append(String.format(Locale.ROOT, "\\u%04x", c));
                    } else {
                        b.appendCodePoint(c);
                    }
                }
            }
        });
        return b.append('"').toString();
    }
}
