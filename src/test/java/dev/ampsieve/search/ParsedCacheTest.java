package dev.ampsieve.search;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.testing.DemoCatalog;
import dev.ampsieve.yaml.Problem;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.security.MessageDigest;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The parsed-catalog cache gives exactly what a clean parse gives (parts field by field, problems
 * with their file, line and column), never trusts a damaged entry, and never touches what it did
 * not write.
 */
class ParsedCacheTest {

    /** Written by {@code bench/make-catalog 300 DIR --seed 13 --files 3}: 300 parts, 204 warnings. */
    static final Path SYNTHETIC = Path.of("src/test/catalogs/synthetic-300");

    @TempDir
    Path tmp;

    /** A cache that counts what the loader asked of it. */
    static final class Counting implements CatalogLoader.Cache {
        final ParsedCache inner;
        final AtomicInteger hits = new AtomicInteger();
        final AtomicInteger misses = new AtomicInteger();
        final AtomicInteger puts = new AtomicInteger();

        Counting(ParsedCache inner) {
            this.inner = inner;
        }

        @Override
        public byte[] get(String key) {
            byte[] b = inner.get(key);
            (b == null ? misses : hits).incrementAndGet();
            return b;
        }

        @Override
        public void put(String key, byte[] value) {
            puts.incrementAndGet();
            inner.put(key, value);
        }

        @Override
        public void retain(Set<String> keys) {
            inner.retain(keys);
        }
    }

    private Path copy(Path from, String name) throws IOException {
        Path to = tmp.resolve(name);
        try (Stream<Path> s = Files.walk(from)) {
            for (Path p :
                    s.filter(p -> !p.toString().contains(IndexLocation.FOLDER)).toList()) {
                Path t = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(t);
                } else {
                    Files.copy(p, t);
                }
            }
        }
        return to;
    }

    private ParsedCache cacheIn(String name) throws IOException {
        Path folder = tmp.resolve(name);
        assertNull(IndexFolder.claim(folder));
        return ParsedCache.in(folder);
    }

    /** Parts one by one (Part.equals: every field, nested records and the place), then the problems. */
    private static void assertSame(Catalog expected, Catalog actual) {
        assertEquals(expected.parts().size(), actual.parts().size());
        for (int i = 0; i < expected.parts().size(); i++) {
            assertEquals(expected.parts().get(i), actual.parts().get(i), "part " + i);
        }
        assertEquals(expected.problems(), actual.problems());
        assertEquals(expected.files(), actual.files());
        assertEquals(expected, actual);
    }

    private void cachedEqualsParsed(Path catalog, int files) throws Exception {
        Catalog plain = CatalogLoader.load(catalog, false);
        Counting cold = new Counting(cacheIn("cache"));
        assertSame(plain, CatalogLoader.load(catalog, false, cold));
        assertEquals(files, cold.misses.get());
        assertEquals(files, cold.puts.get());
        Counting warm = new Counting(cold.inner);
        Catalog cached = CatalogLoader.load(catalog, false, warm);
        // every file from the cache, none parsed again
        assertEquals(files, warm.hits.get());
        assertEquals(0, warm.puts.get());
        assertSame(plain, cached);
    }

    @Test
    void demoCatalogFromTheCacheEqualsAFreshParse() throws Exception {
        Path demo = DemoCatalog.copyTo(tmp);
        cachedEqualsParsed(demo, CatalogLoader.files(demo).size());
    }

    @Test
    void syntheticCatalogFromTheCacheEqualsAFreshParse() throws Exception {
        Path syn = copy(SYNTHETIC, "syn");
        cachedEqualsParsed(syn, 3);
        assertEquals(300, CatalogLoader.load(syn, false).parts().size());
    }

    /**
     * A warning that is a fact (a CatalogFact: 600 °C/W is above the 500 °C/W warning bound) and a
     * part with a measured lot (demo prec-bip-01) come back from the cache equal to a fresh parse.
     */
    @Test
    void aWarningFactAndAMeasuredLotSurviveTheCache() throws Exception {
        Path demo = DemoCatalog.copyTo(tmp);
        Path fast = null;
        for (Path f : CatalogLoader.files(demo)) {
            if (Files.readString(f).contains("id: fast-06")) {
                fast = f;
            }
        }
        Files.writeString(
                fast,
                Files.readString(fast)
                        .replace("quiescent-current: \"4.5 mA\"", "quiescent-current: \"4.5 mA\"\ntheta-ja: 600 C/W"));
        Catalog plain = CatalogLoader.load(demo, false);
        assertTrue(
                plain.problems().stream().anyMatch(p -> p.fact() instanceof dev.ampsieve.catalog.CatalogFact),
                plain.problems().toString());
        assertTrue(plain.find("prec-bip-01").orElseThrow().measured() != null);
        cachedEqualsParsed(demo, CatalogLoader.files(demo).size());
    }

    /**
     * Warnings keep their file, line and column through the cache. Each "not given" warning of the
     * synthetic catalog sits at its part's mapping: the line of the part's "  - id:" in the file,
     * column 5. Those lines are found here by reading the text, not by the loader.
     */
    @Test
    void cachedWarningsNameFileLineAndColumn() throws Exception {
        Path syn = copy(SYNTHETIC, "syn");
        ParsedCache cache = cacheIn("cache");
        CatalogLoader.load(syn, false, cache);
        Catalog cached = CatalogLoader.load(syn, false, new Counting(cache));
        Path file = syn.resolve("syn-0001.yaml");
        List<Integer> partLines = new ArrayList<>();
        List<String> lines = Files.readAllLines(file);
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).startsWith("  - id: ")) {
                partLines.add(i + 1);
            }
        }
        assertEquals(100, partLines.size());
        int checked = 0;
        for (Problem p : cached.problems()) {
            if (!p.file().equals(file)) {
                continue;
            }
            assertTrue(p.message().startsWith("not given"), p.toString());
            int k = Integer.parseInt(
                    p.field().substring("parts[".length(), p.field().indexOf(']')));
            assertEquals(partLines.get(k), p.line(), p.toString());
            assertEquals(5, p.column(), p.toString());
            checked++;
        }
        assertTrue(checked > 20, "warnings checked: " + checked);
        // a part names its file and line too
        Part first = cached.parts().get(0);
        assertEquals(file, first.where().file());
        assertEquals(partLines.get(0), first.where().line());
    }

    /** A copy of the catalog elsewhere finds the entries by bytes, and every place names the copy. */
    @Test
    void aCopiedCatalogGetsItsOwnFileNames() throws Exception {
        Path a = copy(SYNTHETIC, "a");
        Path b = copy(SYNTHETIC, "b");
        ParsedCache cache = cacheIn("cache");
        CatalogLoader.load(a, false, cache);
        Counting warm = new Counting(cache);
        Catalog fromCache = CatalogLoader.load(b, false, warm);
        assertEquals(3, warm.hits.get());
        assertSame(CatalogLoader.load(b, false), fromCache);
        assertEquals(
                b.resolve("syn-0001.yaml"), fromCache.parts().get(0).where().file());
    }

    @Test
    void anEditedFileIsTheOnlyOneParsedAgainAndItsOldEntryGoes() throws Exception {
        Path syn = copy(SYNTHETIC, "syn");
        ParsedCache cache = cacheIn("cache");
        CatalogLoader.load(syn, false, cache);
        Path edited = syn.resolve("syn-0002.yaml");
        Files.writeString(
                edited, Files.readString(edited).replace("id: syn-000101", "id: syn-edited"), StandardCharsets.UTF_8);
        Counting c = new Counting(cache);
        Catalog after = CatalogLoader.load(syn, false, c);
        assertEquals(2, c.hits.get());
        assertEquals(1, c.misses.get());
        assertEquals(1, c.puts.get());
        assertSame(CatalogLoader.load(syn, false), after);
        assertEquals("syn-edited", after.parts().get(100).id());
        assertEquals(3, entries(cache.folder()).size()); // the edited file's old entry was dropped
    }

    /** A file with an error is parsed each time and never stored; the others still come from the cache. */
    @Test
    void aFileWithAnErrorIsNotCached() throws Exception {
        Path syn = copy(SYNTHETIC, "syn");
        Path broken = syn.resolve("syn-0003.yaml");
        Files.writeString(broken, Files.readString(broken).replaceFirst("gbw: \"[^\"]*\"", "gbw: \"fast\""));
        ParsedCache cache = cacheIn("cache");
        CatalogLoader.load(syn, false, cache);
        Counting c = new Counting(cache);
        Catalog cached = CatalogLoader.load(syn, false, c);
        assertEquals(2, c.hits.get());
        assertEquals(1, c.misses.get());
        assertEquals(0, c.puts.get());
        assertTrue(cached.hasErrors());
        assertSame(CatalogLoader.load(syn, false), cached);
    }

    // ------------------------------------------------------------------ damaged entries

    /**
     * Every way an entry can be damaged: cut at every length from the header to the end, each
     * byte of the header and the checksum flipped, payload bytes flipped throughout, a byte added.
     * Each time the load equals a clean parse and the entry is written again, whole.
     */
    @Test
    void aDamagedEntryIsIgnoredAndWrittenAgain() throws Exception {
        Path one = tmp.resolve("one");
        Files.createDirectories(one);
        Files.copy(Path.of("demo-catalog/precision/low-noise.yaml"), one.resolve("low-noise.yaml"));
        Catalog plain = CatalogLoader.load(one, false);
        ParsedCache cache = cacheIn("cache");
        CatalogLoader.load(one, false, cache);
        Path entry = entries(cache.folder()).get(0);
        byte[] good = Files.readAllBytes(entry);
        int header = ParsedCache.MAGIC.length() + 4 + 64 + 4;
        List<byte[]> damaged = new ArrayList<>();
        for (int n = 0; n < good.length; n += n < header + 8 ? 1 : 97) {
            damaged.add(Arrays.copyOf(good, n)); // truncated
        }
        damaged.add(Arrays.copyOf(good, good.length - 1));
        damaged.add(Arrays.copyOf(good, good.length + 1)); // a zero byte added
        for (int i = 0; i < good.length; i += i < header || i >= good.length - 8 ? 1 : 61) {
            byte[] b = good.clone();
            b[i] ^= (byte) 0x5a;
            damaged.add(b);
        }
        assertTrue(damaged.size() > 100, "cases: " + damaged.size());
        for (byte[] d : damaged) {
            Files.write(entry, d);
            Counting c = new Counting(cache);
            assertSame(plain, CatalogLoader.load(one, false, c));
            assertEquals(1, c.misses.get(), "a damaged entry was trusted");
            assertEquals(1, c.puts.get());
            assertArrayEquals(good, Files.readAllBytes(entry)); // written again, whole
        }
    }

    /** An entry whose checksum holds but whose payload is not a parsed file (crafted): parsed afresh. */
    @Test
    void aWellFormedEntryWithNonsenseInsideIsNotTrusted() throws Exception {
        Path one = tmp.resolve("one");
        Files.createDirectories(one);
        Files.copy(Path.of("demo-catalog/precision/low-noise.yaml"), one.resolve("low-noise.yaml"));
        Catalog plain = CatalogLoader.load(one, false);
        ParsedCache cache = cacheIn("cache");
        CatalogLoader.load(one, false, cache);
        Path entry = entries(cache.folder()).get(0);
        String key = entry.getFileName().toString().substring("parsed-".length(), "parsed-".length() + 64);
        byte[] payload = cache.get(key);
        for (byte[] nonsense : List.of(
                new byte[0],
                new byte[] {1},
                new byte[] {1, 0x7f, 0x7f, 0x7f, 0x7f}, // a list "of two billion problems"
                Arrays.copyOf(payload, payload.length / 2),
                Arrays.copyOf(payload, payload.length + 3))) {
            Files.write(entry, ParsedCache.entry(key, nonsense));
            Counting c = new Counting(cache);
            assertSame(plain, CatalogLoader.load(one, false, c));
            assertEquals(1, c.puts.get());
        }
        // an entry stored under another key (another file's bytes, or another program) is not read
        Files.write(entry, ParsedCache.entry("0".repeat(64), payload));
        assertNull(cache.get(key));
    }

    // ------------------------------------------------------------------ the folder's rules

    @Test
    void theIndexFolderAcceptsCacheFilesAndARebuildKeepsThem() throws Exception {
        Path demo = DemoCatalog.copyTo(tmp);
        ParsedCache cache = ParsedCache.forCatalog(demo, Map.of(), tmp.resolve("home"), p -> true);
        assertNotNull(cache);
        assertEquals(demo.toAbsolutePath().normalize().resolve(IndexLocation.FOLDER), cache.folder());
        Catalog c = CatalogLoader.load(demo, false, cache);
        int n = entries(cache.folder()).size();
        assertTrue(n > 10, "entries: " + n);
        try (PartIndex index = PartIndex.open(c, cache.folder())) {
            assertEquals(PartIndex.Source.BUILT, index.source()); // the folder was not refused
        }
        // damage the index: the rebuild deletes Lucene's files only
        try (Stream<Path> s = Files.list(cache.folder())) {
            for (Path p : s.toList()) {
                if (p.getFileName().toString().startsWith("segments")) {
                    Files.write(p, new byte[] {1, 2, 3});
                }
            }
        }
        try (PartIndex index = PartIndex.open(c, cache.folder())) {
            assertEquals(PartIndex.Source.REBUILT, index.source());
        }
        assertEquals(n, entries(cache.folder()).size());
    }

    @Test
    void aForeignFileStillMakesTheFolderRefusedAndUntouched() throws Exception {
        Path demo = DemoCatalog.copyTo(tmp);
        Path folder = demo.resolve(IndexLocation.FOLDER);
        Files.createDirectories(folder);
        Files.writeString(folder.resolve("notes.txt"), "mine\n");
        Path home = tmp.resolve("home");
        ParsedCache cache = ParsedCache.forCatalog(demo, Map.of(), home, p -> true);
        assertNotNull(cache);
        // the per-user folder instead; the user's folder keeps only its file
        assertEquals(IndexLocation.cacheFolder(demo.toAbsolutePath().normalize(), Map.of(), home), cache.folder());
        assertEquals(List.of("notes.txt"), names(folder));
    }

    /** A catalog folder that may not be written: the cache goes to the per-user folder, nothing is added to the catalog. */
    @Test
    void aReadOnlyCatalogKeepsItsCacheInThePerUserFolder() throws Exception {
        Path demo = DemoCatalog.copyTo(tmp);
        Map<Path, String> before = hashes(demo);
        Path home = tmp.resolve("home");
        Path xdg = tmp.resolve("xdg");
        Map<String, String> env = Map.of("XDG_CACHE_HOME", xdg.toString());
        // the catalog and everything in it is read-only; the cache home is not
        ParsedCache cache = ParsedCache.forCatalog(demo, env, home, p -> !p.startsWith(demo));
        assertNotNull(cache);
        assertTrue(
                cache.folder().startsWith(xdg.resolve("ampsieve")),
                cache.folder().toString());
        Catalog plain = CatalogLoader.load(demo, false);
        assertSame(plain, CatalogLoader.load(demo, false, cache));
        Counting warm = new Counting(cache);
        assertSame(plain, CatalogLoader.load(demo, false, warm));
        assertEquals(0, warm.misses.get());
        assertEquals(before, hashes(demo));
        assertTrue(Files.notExists(demo.resolve(IndexLocation.FOLDER)));
    }

    /** A link under an entry's name is never read through, and a write replaces the link, not its target. */
    @Test
    void anEntryNamedLinkIsNeitherReadNorWrittenThrough() throws Exception {
        Path one = tmp.resolve("one");
        Files.createDirectories(one);
        Files.copy(Path.of("demo-catalog/precision/low-noise.yaml"), one.resolve("low-noise.yaml"));
        ParsedCache cache = cacheIn("cache");
        CatalogLoader.load(one, false, cache);
        Path entry = entries(cache.folder()).get(0);
        Path outside = tmp.resolve("precious.bin");
        Files.move(entry, outside); // a valid entry's bytes, now outside the folder
        byte[] precious = Files.readAllBytes(outside);
        Files.createSymbolicLink(entry, outside);
        Counting c = new Counting(cache);
        assertSame(CatalogLoader.load(one, false), CatalogLoader.load(one, false, c));
        assertEquals(1, c.misses.get());
        assertArrayEquals(precious, Files.readAllBytes(outside));
        assertTrue(Files.isRegularFile(entry, LinkOption.NOFOLLOW_LINKS)); // the link was replaced
    }

    @Test
    void retainDeletesOnlyItsOwnNames() throws Exception {
        ParsedCache cache = cacheIn("cache");
        Path folder = cache.folder();
        String keep = "a".repeat(64);
        String drop = "b".repeat(64);
        cache.put(keep, new byte[] {1});
        cache.put(drop, new byte[] {2});
        Path oldTemp = folder.resolve(ParsedCache.entryName(drop) + ".0123456789abcdef.tmp");
        Path newTemp = folder.resolve(ParsedCache.entryName(drop) + ".fedcba9876543210.tmp");
        Files.write(oldTemp, new byte[] {3});
        Files.write(newTemp, new byte[] {4});
        Files.setLastModifiedTime(
                oldTemp,
                FileTime.from(Instant.now().minus(ParsedCache.STALE_TEMP).minusSeconds(60)));
        Files.writeString(folder.resolve("parsed-notes.bin"), "not ours by name\n");
        cache.retain(Set.of(keep));
        assertEquals(
                List.of(
                        IndexFolder.MARKER,
                        ParsedCache.entryName(keep),
                        newTemp.getFileName().toString(),
                        "parsed-notes.bin"),
                names(folder));
        assertArrayEquals(new byte[] {1}, cache.get(keep));
    }

    static List<Path> entries(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.filter(p -> p.getFileName().toString().matches("parsed-[0-9a-f]{64}\\.bin"))
                    .sorted()
                    .toList();
        }
    }

    static List<String> names(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    /** SHA-256 of every regular file below {@code dir}, by relative path. */
    static Map<Path, String> hashes(Path dir) throws Exception {
        Map<Path, String> out = new TreeMap<>();
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.filter(p -> Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS))
                    .toList()) {
                out.put(
                        dir.relativize(p),
                        HexFormat.of()
                                .formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(p))));
            }
        }
        return out;
    }
}
