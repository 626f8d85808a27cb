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
public record Glyphs(String partials, char full, char vertical, char rule, char cross, char tick, char corner,
        char pointer, char collide) {

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
}
