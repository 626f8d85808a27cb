package dev.ampsieve.catalog;

import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;

/** Reads every *.yaml / *.yml file below a folder into validated {@link Part}s. */
public final class CatalogLoader {
    private CatalogLoader() {
    }

    /**
     * @param strict when true, any error fails the whole load with an {@link InputException}
     */
    public static Catalog load(Path root, boolean strict) throws InputException {
        throw new UnsupportedOperationException("catalog loading: in progress");
    }
}
