package dev.ampsieve.stage;

import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;

/** Placeholder so the budget command compiles; the stagefile branch holds the real loader. */
public final class StageLoader {
    private StageLoader() {
    }

    public static Stage load(Path file) throws InputException {
        throw new UnsupportedOperationException("stage loading: in progress on the stagefile branch");
    }
}
