package dev.ampsieve.catalog;

import dev.ampsieve.yaml.Located;
import java.nio.file.Path;

/**
 * A part's measured lot: the catalog's {@code measured: {file: lot.csv}} (a path relative to the
 * catalog file) or a file given on the command line. The catalog parse only records where the
 * file is; its units are read when a budget needs them ({@link LotReader}), so a changed lot never
 * hides behind a cached catalog and a catalog parse stays cheap.
 *
 * @param file  the path as written (for messages)
 * @param path  the path resolved against the catalog file's folder (or the working folder)
 * @param where where the reference was written; {@link Located#nowhere} for a command-line file
 * @param lot   the units read from the file; null until read
 */
public record Measured(String file, Path path, Located where, MeasuredLot lot) {

    /** The same reference with its units read. */
    public Measured withLot(MeasuredLot read) {
        return new Measured(file, path, where, read);
    }
}
