package dev.ampsieve.yaml;

import dev.ampsieve.failure.Place;
import dev.ampsieve.text.Visible;
import java.nio.file.Path;

/**
 * One finding in a user's file: where it is, which field, what is wrong and what to do.
 * Printed as {@code file:line:col: field.path: problem; fix}, with any control character of
 * a file name or an echoed value made visible ({@link Visible}).
 *
 * <p>A problem is told either in words ({@code message} and {@code fix}, for problems that hold no
 * number of ours) or as a {@link ProblemFact} (a value past a bound, two ends in the wrong order:
 * the numbers with their dimensions), which {@code report.ProblemText} words; then
 * {@code message} and {@code fix} are empty. Everything that shows problems to a user prints them
 * through {@code report.ProblemText}; {@link #toString} shows a fact unworded.
 *
 * @param file   the file, as the user named it (may be null for values typed in the shell)
 * @param line   1-based line, 0 when unknown
 * @param column 1-based column, 0 when unknown
 * @param field  dotted field path, e.g. {@code parts[3].vos.max}; empty for the whole file
 * @param fact   what was found, as facts, in place of {@code message} and {@code fix}; null for a problem in words
 */
public record Problem(
        Severity severity,
        Path file,
        int line,
        int column,
        String field,
        String message,
        String fix,
        ProblemFact fact) {

    public enum Severity {
        ERROR,
        WARNING
    }

    public Problem {
        field = field == null ? "" : field;
        message = message == null ? "" : message;
        fix = fix == null ? "" : fix;
        if (fact != null && !(message.isEmpty() && fix.isEmpty())) {
            throw new IllegalArgumentException("a problem is told in words or as a fact, not both: " + message);
        }
    }

    /** A problem in words. */
    public Problem(Severity severity, Path file, int line, int column, String field, String message, String fix) {
        this(severity, file, line, column, field, message, fix, null);
    }

    public static Problem error(Located at, String field, String message, String fix) {
        return new Problem(Severity.ERROR, at.file(), at.line(), at.column(), field, message, fix);
    }

    public static Problem warning(Located at, String field, String message, String fix) {
        return new Problem(Severity.WARNING, at.file(), at.line(), at.column(), field, message, fix);
    }

    /** An error told as a fact. */
    public static Problem error(Located at, String field, ProblemFact fact) {
        return new Problem(Severity.ERROR, at.file(), at.line(), at.column(), field, "", "", fact);
    }

    /** A warning told as a fact. */
    public static Problem warning(Located at, String field, ProblemFact fact) {
        return new Problem(Severity.WARNING, at.file(), at.line(), at.column(), field, "", "", fact);
    }

    /** The same finding (severity, words or fact) at another place: a typed answer, a spreadsheet cell. */
    public Problem at(Path file, int line, int column, String field) {
        return new Problem(severity, file, line, column, field, message, fix, fact);
    }

    /** Where it is, as the error model types places. */
    public Place place() {
        return new Place(file, line, column, field);
    }

    public boolean isError() {
        return severity == Severity.ERROR;
    }

    /**
     * The problem unworded: its words, or its fact as the record prints itself. What a user reads
     * comes from {@code report.ProblemText}, which words a fact and lays it out with {@link #text}.
     */
    @Override
    public String toString() {
        return fact == null ? text(message, fix) : text(String.valueOf(fact), "");
    }

    /**
     * The problem's line with {@code message} and {@code fix} as its words: {@code file:line:col:
     * [warning: ]field: message; fix}, the file name, the field and the words made visible.
     */
    public String text(String message, String fix) {
        StringBuilder sb = new StringBuilder();
        // a value typed on the command line or in the shell has no file: the field names it
        if (file != null) {
            sb.append(Visible.of(file.toString()));
            if (line > 0) {
                sb.append(':').append(line);
                if (column > 0) {
                    sb.append(':').append(column);
                }
            }
            sb.append(": ");
        }
        if (severity == Severity.WARNING) {
            sb.append("warning: ");
        }
        if (!field.isEmpty()) {
            sb.append(Visible.of(field)).append(": ");
        }
        // messages and fixes quote what the user wrote
        sb.append(Visible.of(message));
        if (fix != null && !fix.isEmpty()) {
            sb.append("; ").append(Visible.of(fix));
        }
        return sb.toString();
    }
}
