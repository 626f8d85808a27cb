package dev.ampsieve.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;

class IndexLocationTest {

    private static final Path CATALOG = Path.of("/data/catalog");
    private static final Path HOME = Path.of("/home/user");

    @Test
    void writableCatalogKeepsItsIndexInsideIt() {
        assertEquals(CATALOG.resolve(".ampsieve-index"), IndexLocation.choose(CATALOG, Map.of(), HOME, p -> true));
    }

    @Test
    void readOnlyCatalogUsesTheXdgCacheFolder() {
        Path chosen = IndexLocation.choose(CATALOG, Map.of("XDG_CACHE_HOME", "/var/cache/u"), HOME, p -> false);
        assertEquals(Path.of("/var/cache/u/ampsieve"), chosen.getParent());
        assertEquals(16, chosen.getFileName().toString().length());
    }

    @Test
    void withoutXdgOrWithARelativeOneTheHomeCacheIsUsed() {
        Path a = IndexLocation.choose(CATALOG, Map.of(), HOME, p -> false);
        Path b = IndexLocation.choose(CATALOG, Map.of("XDG_CACHE_HOME", "relative/cache"), HOME, p -> false);
        assertEquals(HOME.resolve(".cache/ampsieve"), a.getParent());
        assertEquals(a, b);
    }

    @Test
    void differentCatalogsGetDifferentCacheFolders() {
        Path a = IndexLocation.choose(CATALOG, Map.of(), HOME, p -> false);
        Path b = IndexLocation.choose(Path.of("/data/other"), Map.of(), HOME, p -> false);
        assertNotEquals(a, b);
    }
}
