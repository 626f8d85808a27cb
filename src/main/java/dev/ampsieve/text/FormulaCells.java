package dev.ampsieve.text;

import java.util.regex.Pattern;

/**
 * The one rule for text a spreadsheet would run as a formula (CSV injection): a cell starting
 * with {@code = + - @}, tab or carriage return that is not a plain number gets a leading
 * {@code '}, as the OWASP "CSV Injection" page advises [from memory]. A cell that itself starts
 * with {@code '} gets one too, so {@link #restore} can undo the mark exactly.
 */
public final class FormulaCells {
    private FormulaCells() {}

    /** A plain decimal or scientific number, which a spreadsheet reads as a number and never as a formula. */
    private static final Pattern NUMBER = Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?");

    private static final String STARTS = "=+-@\t\r";

    /** Whether a spreadsheet could take {@code s} for a formula. */
    public static boolean runsAsFormula(String s) {
        return s != null
                && !s.isEmpty()
                && STARTS.indexOf(s.charAt(0)) >= 0
                && !NUMBER.matcher(s).matches();
    }

    /** {@code s} safe to put in a CSV cell: a leading {@code '} when it could run as a formula or starts with {@code '}. */
    public static String defuse(String s) {
        return runsAsFormula(s) || s != null && s.startsWith("'") ? "'" + s : s;
    }

    /** Undoes {@link #defuse}: one leading {@code '} is dropped when the rest starts with a mark character or {@code '}. */
    public static String restore(String s) {
        if (s != null && s.length() > 1 && s.charAt(0) == '\'' && (STARTS + "'").indexOf(s.charAt(1)) >= 0) {
            return s.substring(1);
        }
        return s;
    }
}
