package dev.ampsieve.yaml;

import java.nio.file.Path;

/** A place in a file: 1-based line and column (0 when unknown). */
public record Located(Path file, int line, int column) {
    public static Located nowhere(Path file) {
        return new Located(file, 0, 0);
    }
}
