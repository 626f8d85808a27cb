package dev.ampsieve.stage;

import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;

/** THROWAWAY STUB so branch 'search' compiles before branch 'stagefile' lands; reverted before merging main. */
public final class StageLoader {
    private StageLoader() {
    }

    public static Stage load(Path file) throws InputException {
        throw new UnsupportedOperationException("stage files: in progress");
    }
}
