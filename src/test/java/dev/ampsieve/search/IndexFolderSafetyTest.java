package dev.ampsieve.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.testing.FixtureCatalog;
import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.Comparator;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The index cache never deletes or changes anything it did not make (safety issue, point 1).
 * Each case puts something unexpected where the index would go, snapshots every file below the
 * temporary folder (bytes and link targets, links not followed), opens the index and checks that
 * nothing changed, that the folder is named as left alone, and that search still answers right
 * from the per-user cache folder or memory.
 */
class IndexFolderSafetyTest {

    @TempDir
    Path base;

    private Path catalog;
    private Path inside;
    private Map<String, String> env;
    private Path home;

    @BeforeEach
    void layOut() throws IOException {
        catalog = base.resolve("catalog");
        Files.createDirectories(catalog.resolve("sub"));
        // the user's files, some with names an index might use
        Files.writeString(catalog.resolve("parts.yaml"), "# stands in for the catalog file the parts came from\n");
        Files.writeString(catalog.resolve("sub/more.yaml"), "# a second catalog file\n");
        Files.writeString(catalog.resolve("README.md"), "my notes on these parts\n");
        inside = catalog.resolve(IndexLocation.FOLDER);
        env = Map.of("XDG_CACHE_HOME", base.resolve("cache").toString());
        home = base.resolve("home");
    }

    private Catalog parts() {
        return FixtureCatalog.catalog(catalog);
    }

    private Path cacheFolder() {
        return IndexLocation.cacheFolder(catalog.toAbsolutePath().normalize(), env, home);
    }

    /** Opens, checks the answers and returns the index (closed) for its source, location and refusals. */
    private Opened open() throws Exception {
        try (PartIndex index = PartIndex.open(parts(), env, home)) {
            // the fixture's parts (FixtureCatalog): PX-404 is the only zero-drift part with vos.max below
            // 10 uV (5 uV), a 5 V supply in range (2.7-5.5 V) and a sot-23 package; PX-505 (1.10) is
            // the other zero-drift part and cheaper than PX-404 (1.80)
            assertEquals(List.of("PX-404"), ids(index, "zero-drift vos<10uV supply>=5V sot-23"));
            assertEquals(List.of("PX-505", "PX-404"), ids(index, "zero-drift"));
            assertEquals(8, index.size());
            return new Opened(index.source(), index.location(), index.refusals());
        }
    }

    record Opened(PartIndex.Source source, Path location, List<FolderRefusal> refusals) {}

    private static List<String> ids(PartIndex index, String query) throws Exception {
        return index.search(QueryLanguage.parse(query)).stream().map(Hit::id).toList();
    }

    @Test
    void aLinkToTheCatalogFolderItselfIsLeftAndTheCacheFolderUsed() throws Exception {
        Files.createSymbolicLink(inside, Path.of("."));
        Map<String, String> before = snapshot(catalog);
        Opened o = open();
        assertEquals(before, snapshot(catalog), "nothing in the catalog folder changed, nothing was added");
        assertEquals(List.of(new FolderRefusal(inside, FolderRefusal.Reason.SYMBOLIC_LINK, null)), o.refusals());
        assertEquals(PartIndex.Source.BUILT, o.source());
        assertEquals(cacheFolder(), o.location());
        assertEquals(PartIndex.Source.REUSED, open().source(), "the cache folder is ours and reused");
        assertEquals(before, snapshot(catalog));
    }

    @Test
    void aLinkToAFolderWithADamagedLookingIndexIsNeverWiped() throws Exception {
        // the files an older version wiped: index-like names that do not open, beside the user's own
        Path elsewhere = Files.createDirectories(base.resolve("elsewhere"));
        Files.writeString(elsewhere.resolve("thesis.tex"), "\\chapter{Offset}\n");
        Files.writeString(elsewhere.resolve("segments_3"), "not an index commit\n");
        Files.writeString(elsewhere.resolve("_0.cfs"), "not a compound file\n");
        Files.writeString(elsewhere.resolve(IndexFolder.MARKER), "a marker copied in by someone\n");
        Files.createSymbolicLink(inside, elsewhere);
        Map<String, String> before = snapshotWithout(base, "cache");
        Opened o = open();
        assertEquals(
                before, snapshotWithout(base, "cache"), "neither the folder behind the link nor the catalog changed");
        assertEquals(FolderRefusal.Reason.SYMBOLIC_LINK, o.refusals().get(0).reason());
        assertEquals(cacheFolder(), o.location());
        assertTrue(snapshot(cacheFolder()).containsKey(IndexFolder.MARKER), "the cache folder it made is marked");
    }

    @Test
    void aDanglingLinkIsLeftAndItsTargetNeverCreated() throws Exception {
        Files.createSymbolicLink(inside, base.resolve("missing"));
        Map<String, String> before = snapshotWithout(base, "cache");
        Opened o = open();
        assertEquals(before, snapshotWithout(base, "cache"));
        assertFalse(Files.exists(base.resolve("missing"), LinkOption.NOFOLLOW_LINKS));
        assertEquals(List.of(new FolderRefusal(inside, FolderRefusal.Reason.SYMBOLIC_LINK, null)), o.refusals());
        assertEquals(cacheFolder(), o.location());
    }

    @Test
    void aPlainFileInThePlaceOfTheFolderIsLeft() throws Exception {
        Files.writeString(inside, "the user's own file of this name\n");
        Map<String, String> before = snapshot(catalog);
        Opened o = open();
        assertEquals(before, snapshot(catalog));
        assertEquals(List.of(new FolderRefusal(inside, FolderRefusal.Reason.NOT_A_FOLDER, null)), o.refusals());
        assertEquals(cacheFolder(), o.location());
    }

    @Test
    void aFolderWithoutTheMarkerHoldingAUserFileIsLeft() throws Exception {
        Files.createDirectory(inside);
        Files.writeString(inside.resolve("notes.txt"), "kept here by the user\n");
        Map<String, String> before = snapshot(catalog);
        Opened o = open();
        assertEquals(before, snapshot(catalog), "no index files were added beside the user's file");
        assertEquals(
                List.of(new FolderRefusal(inside, FolderRefusal.Reason.FOREIGN_ENTRY, inside.resolve("notes.txt"))),
                o.refusals());
        assertEquals(cacheFolder(), o.location());
    }

    @Test
    void aDamagedIndexInOurFolderWithAStrayUserFileIsNotRebuiltThere() throws Exception {
        assertEquals(inside, open().location());
        truncateBiggestIndexFile(inside);
        Files.writeString(inside.resolve("stray.txt"), "put here by the user\n");
        Map<String, String> before = snapshot(catalog);
        Opened o = open();
        assertEquals(before, snapshot(catalog), "the stray file and the damaged index are both left as they were");
        assertEquals(FolderRefusal.Reason.FOREIGN_ENTRY, o.refusals().get(0).reason());
        assertEquals(inside.resolve("stray.txt"), o.refusals().get(0).entry());
        assertEquals(cacheFolder(), o.location());
    }

    @Test
    void aDamagedIndexInOurFolderIsRebuiltAndOnlyItsFilesReplaced() throws Exception {
        assertEquals(inside, open().location());
        truncateBiggestIndexFile(inside);
        Map<String, String> catalogFiles = snapshotWithout(catalog, IndexLocation.FOLDER);
        String marker = Files.readString(inside.resolve(IndexFolder.MARKER));
        Opened o = open();
        assertEquals(PartIndex.Source.REBUILT, o.source());
        assertEquals(inside, o.location());
        assertEquals(List.of(), o.refusals());
        assertEquals(catalogFiles, snapshotWithout(catalog, IndexLocation.FOLDER));
        assertEquals(marker, Files.readString(inside.resolve(IndexFolder.MARKER)));
    }

    @Test
    void aLinkInsideOurFolderIsForeignEvenWithAnIndexName() throws Exception {
        assertEquals(inside, open().location());
        truncateBiggestIndexFile(inside); // a damaged index would be wiped
        Files.createSymbolicLink(inside.resolve("_9.cfs"), catalog.resolve("parts.yaml"));
        Map<String, String> before = snapshot(catalog);
        Opened o = open();
        assertEquals(before, snapshot(catalog));
        assertEquals(
                new FolderRefusal(inside, FolderRefusal.Reason.FOREIGN_ENTRY, inside.resolve("_9.cfs")),
                o.refusals().get(0));
    }

    @Test
    void anIndexOfAnOlderVersionWithoutTheMarkerIsAdopted() throws Exception {
        open();
        Files.delete(inside.resolve(IndexFolder.MARKER)); // as an older version left it: Lucene files and write.lock
        Opened o = open();
        assertEquals(PartIndex.Source.REUSED, o.source());
        assertEquals(inside, o.location());
        assertEquals(IndexFolder.MARKER_TEXT, Files.readString(inside.resolve(IndexFolder.MARKER)));
    }

    @Test
    void whenTheCacheFolderIsALinkTooTheIndexStaysInMemory() throws Exception {
        Files.createSymbolicLink(inside, Path.of("."));
        Path mine = Files.createDirectories(base.resolve("mine"));
        Files.writeString(mine.resolve("photo.jpg"), "bytes of a photo\n");
        Files.createDirectories(cacheFolder().getParent());
        Files.createSymbolicLink(cacheFolder(), mine);
        Map<String, String> before = snapshot(base);
        Opened o = open();
        assertEquals(before, snapshot(base));
        assertEquals(PartIndex.Source.MEMORY, o.source());
        assertEquals(
                List.of(
                        new FolderRefusal(inside, FolderRefusal.Reason.SYMBOLIC_LINK, null),
                        new FolderRefusal(cacheFolder(), FolderRefusal.Reason.SYMBOLIC_LINK, null)),
                o.refusals());
    }

    @Test
    void aCacheFolderHoldingSomeoneElsesFilesIsLeft() throws Exception {
        Files.writeString(inside, "not a folder\n");
        Files.createDirectories(cacheFolder());
        Files.writeString(cacheFolder().resolve("other.db"), "someone else's\n");
        Map<String, String> before = snapshot(base);
        Opened o = open();
        assertEquals(before, snapshot(base));
        assertEquals(PartIndex.Source.MEMORY, o.source());
        assertEquals(2, o.refusals().size());
        assertEquals(FolderRefusal.Reason.FOREIGN_ENTRY, o.refusals().get(1).reason());
    }

    @Test
    void theExplicitFolderFormIsGuardedToo() throws Exception {
        Files.createSymbolicLink(inside, Path.of("."));
        Map<String, String> before = snapshot(catalog);
        try (PartIndex index = PartIndex.open(parts(), inside)) {
            assertEquals(PartIndex.Source.MEMORY, index.source());
            assertEquals(List.of("PX-505", "PX-404"), ids(index, "zero-drift"));
            assertEquals(
                    FolderRefusal.Reason.SYMBOLIC_LINK, index.refusals().get(0).reason());
        }
        assertEquals(before, snapshot(catalog));
    }

    @Test
    void indexFileNamesAreLucenesOwn() {
        // names Lucene 9 writes in our index folder (seen in a built .ampsieve-index) and its
        // IndexFileDeleter's rule (segments*, pending_segments*, _<segment>[_...].<ext>)
        for (String n : List.of(
                "segments_1",
                "segments_a",
                "pending_segments_2",
                "_0.cfs",
                "_0.cfe",
                "_0.si",
                "_1a_Lucene90_0.doc",
                "_0_Lucene90FieldsIndex-doc_ids_0.tmp",
                "write.lock")) {
            assertTrue(IndexFolder.isIndexFile(n), n);
        }
        for (String n : List.of(IndexFolder.MARKER, "notes.txt", "_notes", "README", "parts.yaml", "0.cfs")) {
            assertFalse(IndexFolder.isIndexFile(n), n);
        }
    }

    private static void truncateBiggestIndexFile(Path folder) throws IOException {
        Path biggest;
        try (Stream<Path> s = Files.list(folder)) {
            biggest = s.filter(p -> p.getFileName().toString().startsWith("_"))
                    .max(Comparator.comparingLong(p -> p.toFile().length()))
                    .orElseThrow();
        }
        try (RandomAccessFile f = new RandomAccessFile(biggest.toFile(), "rw")) {
            f.setLength(f.length() / 2);
        }
    }

    /** Every entry below {@code dir} by relative path: a file's SHA-256, a link's target, or "folder"; links not followed. */
    static Map<String, String> snapshot(Path dir) throws IOException {
        return snapshotWithout(dir, null);
    }

    private static Map<String, String> snapshotWithout(Path dir, String skip) throws IOException {
        Map<String, String> out = new TreeMap<>();
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.toList()) {
                String rel = dir.relativize(p).toString();
                if (skip != null && (rel.equals(skip) || rel.startsWith(skip + "/"))) {
                    continue;
                }
                if (Files.isSymbolicLink(p)) {
                    out.put(rel, "link to " + Files.readSymbolicLink(p));
                } else if (Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS)) {
                    out.put(rel, "folder");
                } else {
                    out.put(rel, sha256(Files.readAllBytes(p)));
                }
            }
        }
        return out;
    }

    private static String sha256(byte[] b) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(b));
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
