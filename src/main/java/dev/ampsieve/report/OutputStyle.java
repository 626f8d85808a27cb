package dev.ampsieve.report;

/**
 * How text output may look on the device it goes to.
 *
 * @param width   columns available (charts and tables fit inside it)
 * @param unicode block and line characters allowed; false: plain ASCII
 * @param color   ANSI colours allowed (off with NO_COLOR, a dumb terminal, or not a terminal)
 */
public record OutputStyle(int width, boolean unicode, boolean color) {

    /** Narrower than this, no chart is readable; wider is capped so lines stay easy to follow. */
    public static final int MIN_WIDTH = 40;

    public static final int MAX_WIDTH = 160;

    /** Columns of text tables on the command line (files, pipes, logs); the shell uses its terminal's width. */
    public static final int TEXT_WIDTH = 100;

    /** Plain output for files, pipes and tests: 80 columns, Unicode, no colour. */
    public static final OutputStyle PLAIN = new OutputStyle(80, true, false);

    public OutputStyle {
        width = Math.max(MIN_WIDTH, Math.min(MAX_WIDTH, width <= 0 ? 80 : width));
    }

    public OutputStyle withUnicode(boolean u) {
        return new OutputStyle(width, u, color);
    }

    public Glyphs glyphs() {
        return unicode ? Glyphs.UNICODE : Glyphs.ASCII;
    }
}
