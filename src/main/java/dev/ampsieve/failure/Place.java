package dev.ampsieve.failure;

import java.nio.file.Path;

/**
 * Where a user-caused failure sits: a file, a 1-based line and column in it, and a dotted field
 * path. Each part is absent when it does not apply: {@code file} null (a value typed, a query),
 * {@code line} and {@code column} 0, {@code field} empty.
 */
public record Place(Path file, int line, int column, String field) {

    /** Nowhere in particular: the failure is about the request as a whole. */
    public static final Place NONE = new Place(null, 0, 0, "");

    public Place {
        field = field == null ? "" : field;
        line = Math.max(0, line);
        column = line == 0 ? 0 : Math.max(0, column);
    }

    /** A whole file. */
    public static Place of(Path file) {
        return new Place(file, 0, 0, "");
    }

    /** A field without a file: an option, a typed value, a query term. */
    public static Place field(String field) {
        return new Place(null, 0, 0, field);
    }

    public boolean isNone() {
        return equals(NONE);
    }
}
