package dev.ampsieve.catalog;

import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Problem;
import java.util.List;

/**
 * What one catalog file's bytes gave, before the catalog-wide checks (duplicate ids, currencies):
 * the problems of the file as a whole, in the order found, then one entry per part read. A pure
 * function of the file's bytes and name, so it can be kept in {@link CatalogLoader.Cache} and
 * replayed: replaying it gives the same parts and problems as reading the file again.
 *
 * @param leading problems found before any part (YAML syntax, keys beside {@code parts:}, an
 *                empty file, a stage file)
 * @param entries each part as read, in file order
 */
record ParsedFile(List<Problem> leading, List<Entry> entries) {
    ParsedFile {
        leading = List.copyOf(leading);
        entries = List.copyOf(entries);
    }

    /**
     * One part as read: its id and where it was written (for the duplicate check, made even when
     * the part has errors), the part or null when it has an error, and its own problems.
     */
    record Entry(String prefix, String id, Located idAt, Part part, List<Problem> problems) {
        Entry {
            problems = List.copyOf(problems);
        }
    }

    /** Whether any problem of the file is an error (such files are not cached; see {@link CatalogLoader}). */
    boolean hasErrors() {
        return leading.stream().anyMatch(Problem::isError)
                || entries.stream()
                        .anyMatch(e -> e.part() == null || e.problems().stream().anyMatch(Problem::isError));
    }
}
