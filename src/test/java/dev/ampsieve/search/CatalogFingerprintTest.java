package dev.ampsieve.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Spread;
import java.io.IOException;
import java.lang.reflect.RecordComponent;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.UnaryOperator;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The fingerprint decides whether the index on disk is stale (issue 4, point 1: rebuilt when
 * the catalog changes): it must be the same for the same catalog and differ when any value of
 * any part differs, however small or deeply nested.
 */
class CatalogFingerprintTest {

    private static Catalog demo() throws Exception {
        return CatalogLoader.load(Path.of("demo-catalog"), true);
    }

    /** {@code p} with the named components replaced, through the canonical constructor. */
    private static Part with(Part p, Map<String, Object> changes) throws Exception {
        RecordComponent[] rc = Part.class.getRecordComponents();
        Class<?>[] types = new Class<?>[rc.length];
        Object[] values = new Object[rc.length];
        for (int i = 0; i < rc.length; i++) {
            types[i] = rc[i].getType();
            values[i] = changes.containsKey(rc[i].getName())
                    ? changes.get(rc[i].getName())
                    : rc[i].getAccessor().invoke(p);
        }
        return Part.class.getDeclaredConstructor(types).newInstance(values);
    }

    private static String fingerprintWithFirstPart(Catalog c, Part first) {
        List<Part> parts = new ArrayList<>(c.parts());
        parts.set(0, first);
        return CatalogFingerprint.of(new Catalog(c.root(), parts, c.problems(), c.files()));
    }

    @Test
    void theSameCatalogLoadedTwiceHasTheSameFingerprint() throws Exception {
        assertEquals(CatalogFingerprint.of(demo()), CatalogFingerprint.of(demo()));
    }

    @Test
    void anyChangedValueChangesTheFingerprint() throws Exception {
        Catalog loaded = demo();
        // put together in memory, so the parts themselves are hashed (a loaded catalog's fingerprint
        // stands on its sources instead: the loader's code and the files' bytes)
        Catalog c = new Catalog(loaded.root(), loaded.parts(), loaded.problems(), loaded.files());
        Part p = c.parts().get(0);
        String base = CatalogFingerprint.of(c);
        double vosMax = p.vos().max() == null ? 1e-3 : p.vos().max();
        Map<String, UnaryOperator<Map<String, Object>>> cases = new LinkedHashMap<>();
        // a number two records deep, changed in its last bit
        cases.put(
                "vos.max",
                m -> put(
                        m,
                        "vos",
                        new Spread(p.vos().typ(), Math.nextUp(vosMax), p.vos().maxOverTemp())));
        cases.put("gbw", m -> put(m, "gbw", Math.nextUp(p.gbw())));
        cases.put("channels", m -> put(m, "channels", p.channels() + 1));
        cases.put("nullPins", m -> put(m, "nullPins", !p.nullPins()));
        cases.put(
                "architecture",
                m -> put(
                        m,
                        "architecture",
                        p.architecture() == Architecture.CHOPPER ? Architecture.AUTO_ZERO : Architecture.CHOPPER));
        cases.put("notes", m -> put(m, "notes", p.notes() + "."));
        cases.put("slew given or not", m -> put(m, "slew", p.slew() == null ? 1.0 : null));
        // the same characters split differently between two fields, or between list items
        cases.put("title/notes boundary", m -> put(put(m, "title", "ab"), "notes", "c"));
        cases.put("tags boundary", m -> put(m, "tags", List.of("ab", "c")));
        String titleNotes = fingerprintWithFirstPart(c, with(p, Map.of("title", "a", "notes", "bc")));
        String tags = fingerprintWithFirstPart(c, with(p, Map.of("tags", List.of("a", "bc"))));
        for (var e : cases.entrySet()) {
            String changed = fingerprintWithFirstPart(c, with(p, e.getValue().apply(new LinkedHashMap<>())));
            assertNotEquals(base, changed, e.getKey());
            if (e.getKey().equals("title/notes boundary")) {
                assertNotEquals(titleNotes, changed, e.getKey());
            }
            if (e.getKey().equals("tags boundary")) {
                assertNotEquals(tags, changed, e.getKey());
            }
        }
        assertEquals(base, fingerprintWithFirstPart(c, with(p, Map.of())), "an unchanged copy");
    }

    @TempDir
    Path dir;

    /** Two demo catalog files in a temporary catalog folder. */
    private Path twoFiles() throws IOException {
        Files.copy(Path.of("demo-catalog/zero-drift/zd-az-07.yaml"), dir.resolve("one.yaml"));
        Files.copy(Path.of("demo-catalog/zero-drift/chopper.yaml"), dir.resolve("two.yaml"));
        return dir;
    }

    /**
     * A catalog file that fails to read as any user: a link to /proc/self/mem stats as a regular
     * file and every read at offset 0 fails with EIO (Linux procfs; address 0 is never mapped).
     */
    private Path unreadableForAnyone(String name) throws IOException {
        Path mem = Path.of("/proc/self/mem");
        Assumptions.assumeTrue(Files.isRegularFile(mem), "no /proc/self/mem (not Linux): skipped");
        return Files.createSymbolicLink(dir.resolve(name), mem);
    }

    @Test
    void aFileTheLoaderCouldNotReadIsNotOpenedAgain() throws Exception {
        twoFiles();
        Path broken = unreadableForAnyone("broken.yaml");
        Catalog c = CatalogLoader.load(dir, false);
        assertEquals(broken, c.problems().get(0).file(), "the loader reports it: " + c.problems());
        List<Path> opened = new ArrayList<>();
        CatalogFingerprint.of(c, f -> {
            opened.add(f);
            return Files.newInputStream(f);
        });
        assertEquals(List.of(dir.resolve("one.yaml"), dir.resolve("two.yaml")), opened);
    }

    @Test
    void aFileThatFailsToReadNowCountsByAMarkInsteadOfFailing() throws Exception {
        twoFiles();
        Catalog c = CatalogLoader.load(dir, true);
        Path broken = dir.resolve("broken.yaml"); // appears after the load, so nothing says it is unreadable
        Files.writeString(broken, "# first content\n");
        CatalogFingerprint.Opener failing = f -> {
            if (f.equals(broken)) {
                throw new IOException("Input/output error");
            }
            return Files.newInputStream(f);
        };
        String first = CatalogFingerprint.of(c, failing);
        // the mark names the failure, not the content
        Files.writeString(broken, "# other content\n");
        assertEquals(first, CatalogFingerprint.of(c, failing));
        Files.delete(broken);
        assertNotEquals(CatalogFingerprint.of(c), first, "a failed file still counts by its name");
    }

    @Test
    void aFileThatVanishesBetweenListingAndReadingCountsByAMark() throws Exception {
        twoFiles();
        Catalog c = CatalogLoader.load(dir, true);
        String intact = CatalogFingerprint.of(c);
        Path two = dir.resolve("two.yaml");
        String vanished = CatalogFingerprint.of(c, f -> {
            if (f.equals(two)) {
                Files.delete(f); // another program removes it at the worst moment
            }
            return Files.newInputStream(f);
        });
        assertNotEquals(intact, vanished);
        // the mark names the failure, not the content: the same for a file that is back with other bytes
        Files.writeString(two, "# rewritten\n");
        String missingAgain = CatalogFingerprint.of(c, f -> {
            if (f.equals(two)) {
                throw new NoSuchFileException(f.toString());
            }
            return Files.newInputStream(f);
        });
        assertEquals(vanished, missingAgain);
    }

    @Test
    void anUnreadableFolderCountsByAMarkInsteadOfFailing() throws Exception {
        twoFiles();
        Path locked = Files.createDirectory(dir.resolve("locked"));
        Files.copy(Path.of("demo-catalog/zero-drift/auto-zero.yaml"), locked.resolve("three.yaml"));
        Catalog c = CatalogLoader.load(dir, false);
        String readable = CatalogFingerprint.of(c);
        Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("---------"));
        try {
            Assumptions.assumeFalse(Files.isReadable(locked), "running as root, who reads any folder: skipped");
            String unreadable = CatalogFingerprint.of(c);
            assertNotEquals(readable, unreadable);
            assertEquals(unreadable, CatalogFingerprint.of(c));
        } finally {
            Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("rwx------"));
        }
    }

    @Test
    void filesCountAsTheLoaderFindsThem() throws Exception {
        twoFiles();
        Catalog c = CatalogLoader.load(dir, true);
        String base = CatalogFingerprint.of(c);
        // the loader reads neither stage files nor hidden folders (the index lives in one)
        Files.createDirectories(dir.resolve("stages"));
        Files.writeString(dir.resolve("stages/stage.yaml"), "# a stage\n");
        Files.createDirectories(dir.resolve(".hidden"));
        Files.writeString(dir.resolve(".hidden/x.yaml"), "# hidden\n");
        Files.writeString(dir.resolve(".dot.yaml"), "# hidden\n");
        assertEquals(base, CatalogFingerprint.of(c));
        // nor a linked folder (the loader follows no link to a folder: CatalogLoader.Walk)
        Path elsewhere = Files.createDirectories(dir.resolveSibling(dir.getFileName() + "-more"));
        try {
            Files.writeString(elsewhere.resolve("more.yaml"), "# more parts\n");
            Files.createSymbolicLink(dir.resolve("linked"), elsewhere);
            assertEquals(List.of(dir.resolve("one.yaml"), dir.resolve("two.yaml")), CatalogLoader.files(dir));
            assertEquals(base, CatalogFingerprint.of(c));
        } finally {
            Files.delete(dir.resolve("linked"));
            Files.delete(elsewhere.resolve("more.yaml"));
            Files.delete(elsewhere);
        }
        // a link to a folder above is neither followed nor a failure
        Files.createSymbolicLink(dir.resolve("loop"), Path.of("."));
        assertEquals(List.of(dir.resolve("one.yaml"), dir.resolve("two.yaml")), CatalogLoader.files(dir));
        assertEquals(base, CatalogFingerprint.of(c));
        // while a new part file is counted
        Files.copy(Path.of("demo-catalog/zero-drift/auto-zero.yaml"), dir.resolve("three.yaml"));
        assertNotEquals(base, CatalogFingerprint.of(c));
    }

    private static Map<String, Object> put(Map<String, Object> m, String k, Object v) {
        m.put(k, v);
        return m;
    }
}
