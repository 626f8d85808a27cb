package dev.ampsieve.search;

import static dev.ampsieve.testing.PartBuilder.part;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.testing.FixtureCatalog;
import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.stream.Stream;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.store.FSDirectory;
import org.apache.lucene.store.Lock;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PartIndexTest {

    @TempDir
    Path root;

    private Path folder;

    @BeforeEach
    void catalogFile() throws IOException {
        Files.writeString(root.resolve("parts.yaml"), "# stands in for the catalog file the parts came from\n");
        folder = root.resolve(IndexLocation.FOLDER);
    }

    private Catalog catalog() {
        return FixtureCatalog.catalog(root);
    }

    private static List<String> ids(PartIndex index, String query) throws Exception {
        return index.search(QueryLanguage.parse(query)).stream().map(Hit::id).toList();
    }

    private PartIndex.Source openAndCheck(Catalog c) throws Exception {
        try (PartIndex index = PartIndex.open(c)) {
            assertEquals(c.parts().size(), index.size());
            assertEquals(List.of("PX-404"), ids(index, "zero-drift vos<10uV supply>=5V sot-23"));
            return index.source();
        }
    }

    @Test
    void firstOpenBuildsInsideTheCatalogAndTheNextReusesIt() throws Exception {
        try (PartIndex index = PartIndex.open(catalog())) {
            assertEquals(PartIndex.Source.BUILT, index.source());
            assertEquals(folder.toAbsolutePath().normalize(), index.location());
        }
        assertEquals(PartIndex.Source.REUSED, openAndCheck(catalog()));
    }

    @Test
    void catalogEditRebuildsWithoutDuplicates() throws Exception {
        openAndCheck(catalog());
        // the user lowers the price of PX-808 in the file
        Files.writeString(root.resolve("parts.yaml"), "# edited: PX-808 now 0.25\n");
        List<Part> edited = new ArrayList<>(FixtureCatalog.parts());
        edited.removeIf(p -> p.id().equals("PX-808"));
        edited.add(part("PX-808")
                .title("fast cmos amplifier")
                .gbw(50e6)
                .supply(2.5, 5.5)
                .price(0.25)
                .build());
        Catalog c = new Catalog(root, edited, List.of(), 1);
        try (PartIndex index = PartIndex.open(c)) {
            assertEquals(PartIndex.Source.BUILT, index.source());
            assertEquals(8, index.size());
            assertEquals(List.of("PX-808", "PX-101", "PX-303"), ids(index, "price<0.5"));
        }
    }

    @Test
    void aFileEditAloneRebuilds() throws Exception {
        openAndCheck(catalog());
        Files.writeString(root.resolve("more.yml"), "# a new file\n");
        assertEquals(PartIndex.Source.BUILT, openAndCheck(catalog()));
        assertEquals(PartIndex.Source.REUSED, openAndCheck(catalog()));
    }

    @Test
    void aPartRemovedFromTheCatalogLeavesTheIndex() throws Exception {
        openAndCheck(catalog());
        List<Part> fewer = FixtureCatalog.parts().stream()
                .filter(p -> !p.id().equals("PX-707"))
                .toList();
        try (PartIndex index = PartIndex.open(new Catalog(root, fewer, List.of(), 1))) {
            assertEquals(7, index.size());
            assertEquals(List.of(), ids(index, "id:px-707"));
        }
    }

    @Test
    void deletedIndexIsRebuilt() throws Exception {
        openAndCheck(catalog());
        deleteTree(folder);
        assertEquals(PartIndex.Source.BUILT, openAndCheck(catalog()));
    }

    @Test
    void truncatedDataFileIsDetectedAndRebuilt() throws Exception {
        openAndCheck(catalog());
        Path biggest = indexFiles().stream()
                .max(Comparator.comparingLong(PartIndexTest::size))
                .orElseThrow();
        try (RandomAccessFile f = new RandomAccessFile(biggest.toFile(), "rw")) {
            f.setLength(f.length() / 2);
        }
        assertEquals(PartIndex.Source.REBUILT, openAndCheck(catalog()));
        assertEquals(PartIndex.Source.REUSED, openAndCheck(catalog()));
    }

    @Test
    void truncatedCommitFileIsDetectedAndRebuilt() throws Exception {
        openAndCheck(catalog());
        Path commit = indexFiles().stream()
                .filter(p -> p.getFileName().toString().startsWith("segments_"))
                .findFirst()
                .orElseThrow();
        try (RandomAccessFile f = new RandomAccessFile(commit.toFile(), "rw")) {
            f.setLength(10);
        }
        assertEquals(PartIndex.Source.REBUILT, openAndCheck(catalog()));
    }

    @Test
    void flippedByteInsideAFileIsCaughtByItsChecksum() throws Exception {
        openAndCheck(catalog());
        Path biggest = indexFiles().stream()
                .max(Comparator.comparingLong(PartIndexTest::size))
                .orElseThrow();
        try (RandomAccessFile f = new RandomAccessFile(biggest.toFile(), "rw")) {
            long at = f.length() / 2;
            f.seek(at);
            int b = f.read();
            f.seek(at);
            f.write(b ^ 0xFF);
        }
        assertEquals(PartIndex.Source.REBUILT, openAndCheck(catalog()));
    }

    @Test
    void whileAnotherProcessHoldsTheLockACurrentIndexIsReadOnly() throws Exception {
        openAndCheck(catalog());
        try (FSDirectory other = FSDirectory.open(folder);
                Lock held = other.obtainLock(IndexWriter.WRITE_LOCK_NAME)) {
            held.ensureValid();
            assertEquals(PartIndex.Source.READ_ONLY, openAndCheck(catalog()));
        }
    }

    @Test
    void whileAnotherProcessHoldsTheLockAStaleIndexGivesWayToMemory() throws Exception {
        openAndCheck(catalog());
        List<Part> more = new ArrayList<>(FixtureCatalog.parts());
        more.add(part("PX-909").title("extra part").price(0.10).build());
        Catalog c = new Catalog(root, more, List.of(), 1);
        try (FSDirectory other = FSDirectory.open(folder);
                Lock held = other.obtainLock(IndexWriter.WRITE_LOCK_NAME)) {
            held.ensureValid();
            try (PartIndex index = PartIndex.open(c)) {
                assertEquals(PartIndex.Source.MEMORY, index.source());
                assertNull(index.location());
                assertEquals(List.of("PX-909"), ids(index, "extra"));
            }
        }
        // once the other process is done, the folder catches up
        assertEquals(PartIndex.Source.BUILT, openAndCheck(c));
    }

    @Test
    void twoOpenIndexesSearchSideBySide() throws Exception {
        try (PartIndex a = PartIndex.open(catalog());
                PartIndex b = PartIndex.open(catalog())) {
            assertEquals(PartIndex.Source.BUILT, a.source());
            assertEquals(PartIndex.Source.REUSED, b.source());
            assertEquals(ids(a, "zero-drift"), ids(b, "zero-drift"));
        }
    }

    @Test
    void twoOpensStartingTogetherBothAnswerCorrectly() throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            for (int round = 0; round < 5; round++) {
                deleteTree(folder);
                CountDownLatch start = new CountDownLatch(1);
                Callable<PartIndex.Source> job = () -> {
                    start.await();
                    return openAndCheck(catalog());
                };
                Future<PartIndex.Source> a = pool.submit(job);
                Future<PartIndex.Source> b = pool.submit(job);
                start.countDown();
                Set<PartIndex.Source> ok = Set.of(
                        PartIndex.Source.BUILT,
                        PartIndex.Source.REUSED,
                        PartIndex.Source.READ_ONLY,
                        PartIndex.Source.MEMORY);
                assertTrue(ok.contains(a.get()) && ok.contains(b.get()), a.get() + " " + b.get());
                assertTrue(
                        a.get() == PartIndex.Source.BUILT || b.get() == PartIndex.Source.BUILT,
                        "one of them builds: " + a.get() + " " + b.get());
            }
        } finally {
            pool.shutdownNow();
        }
        assertEquals(PartIndex.Source.REUSED, openAndCheck(catalog()));
    }

    @Test
    void aFolderThatCannotBeCreatedFallsBackToMemory() throws Exception {
        Path blocked = root.resolve("parts.yaml").resolve("index"); // below a regular file
        try (PartIndex index = PartIndex.open(catalog(), blocked)) {
            assertEquals(PartIndex.Source.MEMORY, index.source());
            assertEquals(List.of("PX-505", "PX-404"), ids(index, "zero-drift")); // cheaper first
        }
    }

    private List<Path> indexFiles() throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.filter(p -> !p.getFileName().toString().equals(IndexWriter.WRITE_LOCK_NAME))
                    .toList();
        }
    }

    private static long size(Path p) {
        try {
            return Files.size(p);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private static void deleteTree(Path p) throws IOException {
        if (!Files.exists(p)) {
            return;
        }
        try (Stream<Path> s = Files.walk(p)) {
            for (Path f : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(f);
            }
        }
    }
}
