package dev.ampsieve.search;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * After a catalog edit the index replaces only the documents of the files that changed, and then
 * answers exactly as an index built from nothing does.
 */
class IncrementalIndexTest {

    @TempDir
    Path tmp;

    private static final List<String> QUERIES =
            List.of("", "zero-drift", "vos<50uV", "input:jfet gbw>5MHz", "price<0.05", "series-3");

    private static List<String> ids(PartIndex index, String query) throws Exception {
        return index.search(QueryLanguage.parse(query)).stream().map(Hit::id).toList();
    }

    /** Every query answered alike by {@code index} and by an index of {@code c} built in memory. */
    private static void answersAsAFreshBuild(PartIndex index, Catalog c) throws Exception {
        try (PartIndex fresh = PartIndex.inMemory(c)) {
            for (String q : QUERIES) {
                assertEquals(ids(fresh, q), ids(index, q), q);
            }
        }
    }

    @Test
    void anEditedFileIsTheOnlyOneIndexedAgain() throws Exception {
        Path cat = Files.createDirectories(tmp.resolve("cat"));
        try (Stream<Path> s = Files.list(ParsedCacheTest.SYNTHETIC)) {
            for (Path p : s.toList()) {
                Files.copy(p, cat.resolve(p.getFileName()));
            }
        }
        Path folder = tmp.resolve("index");
        Catalog before = CatalogLoader.load(cat, false);
        try (PartIndex index = PartIndex.open(before, folder)) {
            assertEquals(PartIndex.Source.BUILT, index.source());
            assertEquals(300, index.written());
        }
        // the first part of the second file (syn-000101) becomes the cheapest of all: the
        // generator's prices start at 0.20, so it alone is below 0.05
        Path second = cat.resolve("syn-0002.yaml");
        String text = Files.readString(second);
        int at = text.indexOf("price: {unit: ");
        int end = text.indexOf(',', at);
        Files.writeString(second, text.substring(0, at) + "price: {unit: 0.01" + text.substring(end));
        Catalog edited = CatalogLoader.load(cat, false);
        try (PartIndex index = PartIndex.open(edited, folder)) {
            assertEquals(PartIndex.Source.BUILT, index.source());
            assertEquals(300, index.size());
            // the edited file's 100 documents written again, no other
            assertEquals(100, index.written());
            assertEquals(List.of("syn-000101"), ids(index, "price<0.05"));
            answersAsAFreshBuild(index, edited);
        }
        // a file removed: its documents go, nothing is written
        Files.delete(cat.resolve("syn-0003.yaml"));
        Catalog removed = CatalogLoader.load(cat, false);
        try (PartIndex index = PartIndex.open(removed, folder)) {
            assertEquals(200, index.size());
            assertEquals(0, index.written());
            answersAsAFreshBuild(index, removed);
        }
        // a part moved to another file: both files change, the moved part is indexed once
        Path first = cat.resolve("syn-0001.yaml");
        String one = Files.readString(first);
        int cut = one.lastIndexOf("  - id: ");
        Files.writeString(first, one.substring(0, cut));
        Files.writeString(second, Files.readString(second) + one.substring(cut));
        Catalog moved = CatalogLoader.load(cat, false);
        try (PartIndex index = PartIndex.open(moved, folder)) {
            assertEquals(200, index.size());
            assertEquals(200, index.written()); // both files changed
            answersAsAFreshBuild(index, moved);
        }
    }

    /** A catalog put together in memory has no file keys: every part is indexed as before. */
    @Test
    void aCatalogWithoutFileKeysIsIndexedWhole() throws Exception {
        Catalog loaded = CatalogLoader.load(ParsedCacheTest.SYNTHETIC, false);
        Catalog plain = new Catalog(loaded.root(), loaded.parts(), loaded.problems(), loaded.files());
        assertEquals(null, PartIndex.fileTerms(plain));
        Path folder = tmp.resolve("index");
        PartIndex.open(plain, folder).close();
        // the same parts again with one part fewer: every remaining part is written
        Catalog fewer = new Catalog(loaded.root(), loaded.parts().subList(1, 300), loaded.problems(), loaded.files());
        try (PartIndex index = PartIndex.open(fewer, folder)) {
            assertEquals(299, index.written());
            answersAsAFreshBuild(index, fewer);
        }
    }
}
