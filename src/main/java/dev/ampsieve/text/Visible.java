package dev.ampsieve.text;

/**
 * Makes the characters a terminal would obey, rather than show, visible as escapes, so a string
 * from a catalog, a stage, a file name or the user's typing can never clear the screen, set a
 * window title (OSC 0/2), write the clipboard (OSC 52), plant a hyperlink (OSC 8), move the
 * cursor (CSI), or hide what it says behind a bidi override.
 *
 * <p>The visible form, one escape per character (backslash, then):
 * <ul>
 * <li>{@code \t}, {@code \n}, {@code \r} for tab, line feed and carriage return;</li>
 * <li>{@code \xhh} (two lower-case hex digits) for every other control character: C0
 *     (U+0000-U+001F, so ESC is {@code \x1b} and BEL {@code \x07}), DEL (U+007F) and C1
 *     (U+0080-U+009F, so the one-character CSI is {@code \x9b});</li>
 * <li><code>&#92;uhhhh</code> (four lower-case hex digits) for the bidi controls of Unicode Standard
 *     Annex #9: the embeddings and overrides U+202A-U+202E, the isolates U+2066-U+2069, the marks
 *     U+200E, U+200F, U+061C; and for the line and paragraph separators U+2028, U+2029.</li>
 * </ul>
 * Everything else, a backslash included, is left as it is: {@code µV/°C} and {@code 10 kΩ} are
 * unchanged, so the form is not reversible, and it need not be: it is for reading and
 * {@code grep -F '\x1b'}. {@code ampsieve check} says which catalog fields hold real control
 * characters. Applying it twice changes nothing more.
 */
public final class Visible {
    private Visible() {}

    /** {@code s} with every control character written as an escape; null stays null. */
    public static String of(String s) {
        if (s == null || s.codePoints().noneMatch(Visible::isControl)) {
            return s;
        }
        StringBuilder out = new StringBuilder(s.length() + 16);
        s.codePoints().forEach(c -> {
            if (!isControl(c)) {
                out.appendCodePoint(c);
            } else if (c == '\t') {
                out.append("\\t");
            } else if (c == '\n') {
                out.append("\\n");
            } else if (c == '\r') {
                out.append("\\r");
            } else {
                String hex = Integer.toHexString(c);
                int digits = c <= 0xff ? 2 : 4;
                out.append(c <= 0xff ? "\\x" : "\\u")
                        .append("0".repeat(digits - hex.length()))
                        .append(hex);
            }
        });
        return out.toString();
    }

    /** True for the characters {@link #of} rewrites. */
    public static boolean isControl(int c) {
        return Character.getType(c) == Character.CONTROL // C0, DEL, C1
                || c >= 0x202a && c <= 0x202e
                || c >= 0x2066 && c <= 0x2069
                || c == 0x200e
                || c == 0x200f
                || c == 0x061c
                || c == 0x2028
                || c == 0x2029;
    }

    /** Each line of {@code text} made visible; the line feeds between them are kept. */
    public static String lines(String text) {
        if (text == null) {
            return null;
        }
        String[] parts = text.split("\n", -1);
        for (int i = 0; i < parts.length; i++) {
            parts[i] = of(parts[i]);
        }
        return String.join("\n", parts);
    }
}
