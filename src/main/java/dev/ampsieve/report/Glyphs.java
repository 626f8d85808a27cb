package dev.ampsieve.report;

/**
 * The characters charts are drawn with: Unicode block elements and box drawing, or an ASCII
 * stand-in for each when the terminal's charset cannot show them.
 *
 * @param partials blocks for 1/8 .. 7/8 of a cell, in order; empty when only whole cells can be drawn
 * @param full     a whole cell of bar
 * @param vertical the limit line crossing a row; the vertical axis
 * @param rule     horizontal rule and limit line
 * @param cross    where the limit line crosses a rule
 * @param tick     a labelled place on the vertical axis
 * @param corner   where the two axes meet
 * @param pointer  points up at the limit, under a bar chart
 * @param collide  two or more points in one cell of a scatter
 */
public record Glyphs(
        String partials,
        char full,
        char vertical,
        char rule,
        char cross,
        char tick,
        char corner,
        char pointer,
        char collide) {

    public static final Glyphs UNICODE = new Glyphs("▏▎▍▌▋▊▉", '█', '│', '─', '┼', '┤', '└', '▲', '◆');

    public static final Glyphs ASCII = new Glyphs("", '#', '|', '-', '+', '+', '+', '^', '*');

    public Glyphs {
        if (!partials.isEmpty() && partials.length() != 7) {
            throw new IllegalArgumentException("partials: 7 characters (1/8 .. 7/8) or none");
        }
    }

    /** Sub-cell resolution: 8 steps per cell with partial blocks, else 1. */
    public int steps() {
        return partials.isEmpty() ? 1 : 8;
    }

    /** {@code s} as this charset can show it: unchanged in Unicode, else {@link #ascii(String)}. */
    public String text(String s) {
        return partials.isEmpty() ? ascii(s) : s;
    }

    /**
     * Plain-ASCII spellings of the non-ASCII characters our output uses (unit symbols, box
     * drawing, blocks); anything else outside ASCII becomes '?', as a non-UTF-8 terminal would.
     */
    public static String ascii(String s) {
        if (s.chars().allMatch(c -> c < 128)) {
            return s;
        }
        StringBuilder b = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '\u00b5', '\u03bc' -> b.append('u'); // micro sign, Greek mu
                case '\u00b0' -> {} // degree sign: "°C" reads as "C"
                case '\u03a9', '\u2126' -> b.append("ohm");
                case '\u221a' -> b.append("rt");
                case '\u00b1' -> b.append("+/-");
                case '\u00d7' -> b.append('x');
                case '\u2026' -> b.append("...");
                case '\u2013', '\u2014', '\u2500', '\u2501' -> b.append('-');
                case '\u2502', '\u2503' -> b.append('|');
                case '\u253c', '\u2524', '\u251c', '\u2514', '\u2518', '\u250c', '\u2510' -> b.append('+');
                case '\u2588', '\u2589', '\u258a', '\u258b', '\u258c', '\u258d', '\u258e', '\u258f' -> b.append('#');
                case '\u25b2' -> b.append('^');
                case '\u25c6' -> b.append('*');
                default -> b.append(c < 128 ? c : '?');
            }
        }
        return b.toString();
    }
}
