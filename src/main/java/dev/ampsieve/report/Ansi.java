package dev.ampsieve.report;

/** The few ANSI SGR sequences the text output uses (ECMA-48, section 8.3.117). */
final class Ansi {
    private Ansi() {}

    static final String RED = "\u001b[31m";
    static final String GREEN = "\u001b[32m";
    static final String YELLOW = "\u001b[33m";
    static final String RESET = "\u001b[0m";

    static String paint(String text, String colour, boolean on) {
        return on && !text.isEmpty() ? colour + text + RESET : text;
    }

    /** Colour for a verdict key: fits green, fits-after-trim yellow, anything else red. */
    static String forVerdict(String verdict) {
        if ("fits".equals(verdict)) {
            return GREEN;
        }
        return "fits-after-trim".equals(verdict) ? YELLOW : RED;
    }
}
