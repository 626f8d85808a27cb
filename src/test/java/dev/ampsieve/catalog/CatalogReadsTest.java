package dev.ampsieve.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * The loader reads files on a pool of threads ({@code CatalogLoader.Reads}) but must answer as
 * one thread did: in file order, and, when the loading thread is interrupted (the shell's
 * Ctrl-C), with the same catalog, nothing cached and the interrupt left set.
 */
class CatalogReadsTest {

    private static final Path DEMO = Path.of("demo-catalog");

    /** A cache in memory that records what was stored. */
    private static final class Recording implements CatalogLoader.Cache {
        final Map<String, byte[]> stored = new HashMap<>();

        @Override
        public synchronized byte[] get(String key) {
            return stored.get(key);
        }

        @Override
        public synchronized void put(String key, byte[] value) {
            stored.put(key, value);
        }

        @Override
        public void retain(Set<String> keys) {}
    }

    @Test
    void anInterruptedLoadAnswersAsAnyLoadCachesNothingAndKeepsTheInterrupt() throws Exception {
        Catalog plain = CatalogLoader.load(DEMO, false);
        Recording cache = new Recording();
        Catalog c;
        boolean stillInterrupted;
        Thread.currentThread().interrupt();
        try {
            c = CatalogLoader.load(DEMO, false, cache);
        } finally {
            stillInterrupted = Thread.interrupted(); // and cleared for the next test
        }
        assertTrue(stillInterrupted, "the load leaves the interrupt for its caller to see");
        // no parse made while interrupted is cached (it may come from the moment, not the bytes)
        assertTrue(cache.stored.isEmpty(), "nothing cached while interrupted");
        assertEquals(plain.parts(), c.parts());
        assertEquals(plain.problems(), c.problems());
    }

    @Test
    void aLoadAfterAnInterruptedOneReadsAndCachesEveryFileInOrder() throws Exception {
        Recording cache = new Recording();
        Catalog parsed = CatalogLoader.load(DEMO, false, cache);
        Catalog plain = CatalogLoader.load(DEMO, false);
        Catalog cached = CatalogLoader.load(DEMO, false, cache);
        // the demo catalog's files, one cache entry each (none has an error)
        assertEquals(CatalogLoader.files(DEMO).size(), cache.stored.size());
        assertEquals(plain.parts(), parsed.parts());
        assertEquals(plain.parts(), cached.parts());
        assertEquals(plain.problems(), cached.problems());
        // parts come in file order: each part's file is never before the previous part's
        List<Path> files = CatalogLoader.files(DEMO);
        int last = 0;
        for (Part p : cached.parts()) {
            int at = files.indexOf(p.where().file());
            assertTrue(at >= last, p.id() + " out of file order");
            last = at;
        }
    }
}
