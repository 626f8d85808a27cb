package dev.ampsieve.yaml;

import dev.ampsieve.failure.Place;
import dev.ampsieve.text.Visible;
import java.nio.file.Path;

/**
 * One finding in a user's file: where it is, which field, what is wrong and what to do.
 * Printed as {@code file:line:col: field.path: problem; fix}, with any control character of
 * a file name or an echoed value made visible ({@link Visible}).
 *
 * @param file   the file, as the user named it (may be null for values typed in the shell)
 * @param line   1-based line, 0 when unknown
 * @param column 1-based column, 0 when unknown
 * @param field  dotted field path, e.g. {@code parts[3].vos.max}; empty for the whole file
 */
public record Problem(Severity severity, Path file, int line, int column, String field, String message, String fix) {

    public enum Severity {
        ERROR,
        WARNING
    }

    public Problem {
        field = field == null ? "" : field;
        fix = fix == null ? "" : fix;
    }

    public static Problem error(Located at, String field, String message, String fix) {
        return new Problem(Severity.ERROR, at.file(), at.line(), at.column(), field, message, fix);
    }

    public static Problem warning(Located at, String field, String message, String fix) {
        return new Problem(Severity.WARNING, at.file(), at.line(), at.column(), field, message, fix);
    }

    /** Where it is, as the error model types places. */
    public Place place() {
        return new Place(file, line, column, field);
    }

    public boolean isError() {
        return severity == Severity.ERROR;
    }

    @Override
    public String toString() {
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
        if (!fix.isEmpty()) {
            sb.append("; ").append(Visible.of(fix));
        }
        return sb.toString();
    }
}
