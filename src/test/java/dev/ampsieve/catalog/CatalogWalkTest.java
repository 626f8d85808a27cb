package dev.ampsieve.catalog;

import static dev.ampsieve.catalog.CatalogFixtures.BASE;
import static dev.ampsieve.catalog.CatalogFixtures.with;
import static dev.ampsieve.catalog.CatalogFixtures.write;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.testing.SpecialFiles;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.nio.channels.ServerSocketChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** What the catalog walk does with links, special files and catalogs past its limits. */
class CatalogWalkTest {

    @TempDir
    Path dir;

    /** The fix given for a special file named like a catalog file. */
    private static final String SPECIAL_FIX =
            "remove it or rename it: the catalog reads only regular *.yaml and *.yml files";

    private static String part(String id) {
        return with(BASE, "id: test-amp-01", "id: " + id);
    }

    /** Loads with a hang guard: the old walk followed a link to / for minutes, and opened pipes. */
    private Catalog load() {
        return assertTimeoutPreemptively(SpecialFiles.HANG_GUARD, () -> CatalogLoader.load(dir, false));
    }

    private static List<String> ids(Catalog c) {
        return c.parts().stream().map(Part::id).toList();
    }

    private static List<String> lines(Catalog c) {
        return c.problems().stream().map(Problem::toString).toList();
    }

    @Test
    void aLinkToDevZeroIsAnErrorOfThatFileAndIsNeverRead() throws Exception {
        write(dir, "part.yaml", part("amp-a"));
        Path zero = Files.createSymbolicLink(dir.resolve("zero.yaml"), SpecialFiles.devZero());
        Catalog c = load();
        assertEquals(List.of("amp-a"), ids(c));
        assertEquals(List.of(zero + ": not a regular file (a character device); skipped; " + SPECIAL_FIX), lines(c));
        assertEquals(Problem.Severity.ERROR, c.problems().get(0).severity());
    }

    @Test
    void aNamedPipeOrSocketIsAnErrorAndOtherNamesAreIgnored() throws Exception {
        write(dir, "part.yaml", part("amp-a"));
        Path fifo = SpecialFiles.fifo(dir.resolve("pipe.yaml"));
        SpecialFiles.fifo(dir.resolve("notes.txt")); // not a catalog name: not looked at, as any other file
        Path sock = dir.resolve("sock.yml");
        try (ServerSocketChannel ch = SpecialFiles.socket(sock)) {
            assertTrue(ch.isOpen()); // the socket is listening while the catalog is read
            Catalog c = load();
            assertEquals(List.of("amp-a"), ids(c));
            assertEquals(
                    List.of(
                            fifo + ": not a regular file (a named pipe); skipped; " + SPECIAL_FIX,
                            sock + ": not a regular file (a socket); skipped; " + SPECIAL_FIX),
                    lines(c));
        }
    }

    @Test
    void aLinkToTheFileSystemRootIsSkippedWithAWarning() throws Exception {
        write(dir, "sub/part.yaml", part("amp-a"));
        Path link = Files.createSymbolicLink(dir.resolve("sub/everything"), Path.of("/"));
        Catalog c = load();
        assertEquals(List.of("amp-a"), ids(c));
        assertEquals(
                List.of(link + ": warning: the link leads outside the catalog folder (to /); skipped;"
                        + " copy what it points to into the catalog folder, or give that folder with --catalog DIR"),
                lines(c));
    }

    @Test
    void partsBehindLinksToOutsideTheCatalogAreNotRead(@TempDir Path elsewhere) throws Exception {
        write(dir, "part.yaml", part("amp-a"));
        Path outsidePart = write(elsewhere, "shared/other.yaml", part("amp-b"));
        Path folderLink = Files.createSymbolicLink(dir.resolve("shared"), elsewhere.resolve("shared"));
        Path fileLink = Files.createSymbolicLink(dir.resolve("other.yaml"), outsidePart);
        Catalog c = load();
        assertEquals(List.of("amp-a"), ids(c));
        String fix = "; copy what it points to into the catalog folder, or give that folder with --catalog DIR";
        assertEquals(
                List.of(
                        fileLink + ": warning: the link leads outside the catalog folder (to "
                                + outsidePart.toRealPath() + "); skipped" + fix,
                        folderLink + ": warning: the link leads outside the catalog folder (to "
                                + elsewhere.resolve("shared").toRealPath() + "); skipped" + fix),
                lines(c));
    }

    @Test
    void aLinkBackToAnEnclosingFolderIsALoopReadOnce() throws Exception {
        write(dir, "sub/part.yaml", part("amp-a"));
        Path loop = Files.createSymbolicLink(dir.resolve("sub/loop"), Path.of(".."));
        Path self = Files.createSymbolicLink(dir.resolve("sub/self"), Path.of("."));
        Catalog c = load();
        assertEquals(List.of("amp-a"), ids(c)); // once: no "id already used"
        assertEquals(
                List.of(
                        loop + ": warning: the link leads back to " + dir
                                + ", which holds it (a loop); skipped; remove the link",
                        self + ": warning: the link leads back to " + dir.resolve("sub")
                                + ", which holds it (a loop); skipped;" + " remove the link"),
                lines(c));
    }

    @Test
    void linksToFoldersAndFilesInsideTheCatalogDoNotReadThemTwice() throws Exception {
        Path real = write(dir, "sub/part.yaml", part("amp-a"));
        Path folderLink = Files.createSymbolicLink(dir.resolve("alias"), Path.of("sub"));
        Path fileLink = Files.createSymbolicLink(dir.resolve("a.yaml"), Path.of("sub/part.yaml"));
        Catalog c = load();
        assertEquals(List.of("amp-a"), ids(c));
        assertEquals(1, c.files());
        assertEquals(
                List.of(
                        fileLink + ": warning: the link leads to " + real
                                + ", which is read under its own name; skipped;"
                                + " remove the link (each file is read once)",
                        folderLink + ": warning: the link leads to " + dir.resolve("sub")
                                + ", a folder inside the catalog; links"
                                + " to folders are not followed (the folder is read, or skipped, in its own place); remove the link"),
                lines(c));
    }

    @Test
    void aLinkToAFileInAHiddenFolderOfTheCatalogIsRead() throws Exception {
        write(dir, ".drafts/p.yaml", part("amp-a"));
        write(dir, ".ampsieve-index/junk.yaml", ": not yaml ["); // the index folder: never read
        Files.createSymbolicLink(dir.resolve("p.yaml"), Path.of(".drafts/p.yaml"));
        Catalog c = load();
        assertEquals(List.of("amp-a"), ids(c));
        assertEquals(List.of(), lines(c));
        assertEquals(dir.resolve("p.yaml"), c.parts().get(0).where().file());
    }

    @Test
    void moreCatalogFilesThanTheLimitStopTheLoad() {
        CatalogLoader.Limits three =
                new CatalogLoader.Limits(3, CatalogLoader.MAX_TOTAL_BYTES, CatalogLoader.MAX_ENTRIES);
        for (String id : List.of("amp-a", "amp-b", "amp-c")) {
            write(dir, id + ".yaml", part(id));
        }
        assertEquals(
                3,
                assertTimeoutPreemptively(SpecialFiles.HANG_GUARD, () -> CatalogLoader.load(dir, false, three))
                        .parts()
                        .size());
        write(dir, "amp-d.yaml", part("amp-d"));
        InputException e = assertThrows(InputException.class, () -> CatalogLoader.load(dir, false, three));
        assertEquals(
                List.of(dir + ": more than 3 catalog files (*.yaml, *.yml) below this folder; stopped;"
                        + " split the catalog into folders of fewer files and give one with --catalog DIR"),
                e.problems().stream().map(Problem::toString).toList());
    }

    @Test
    void catalogFilesLargerTogetherThanTheLimitStopTheLoad() {
        Path a = write(dir, "a.yaml", part("amp-a"));
        long one = a.toFile().length();
        CatalogLoader.Limits room = new CatalogLoader.Limits(100, one, CatalogLoader.MAX_ENTRIES);
        assertEquals(
                1,
                assertTimeoutPreemptively(SpecialFiles.HANG_GUARD, () -> CatalogLoader.load(dir, false, room))
                        .parts()
                        .size());
        write(dir, "b.yaml", part("amp-b"));
        InputException e = assertThrows(InputException.class, () -> CatalogLoader.load(dir, false, room));
        assertEquals(
                dir + ": the catalog files add up to more than " + one + " bytes; stopped;"
                        + " split the catalog into smaller folders and give one with --catalog DIR",
                e.problems().get(0).toString());
    }

    @Test
    void aFolderOfManyOtherFilesStopsTheWalk() {
        CatalogLoader.Limits five = new CatalogLoader.Limits(100, CatalogLoader.MAX_TOTAL_BYTES, 5);
        write(dir, "part.yaml", part("amp-a"));
        for (int i = 0; i < 5; i++) {
            write(dir, "photos/img" + i + ".jpg", "x");
        }
        // entries: part.yaml, photos, and five in photos = 7 > 5
        InputException e = assertThrows(InputException.class, () -> CatalogLoader.load(dir, false, five));
        assertEquals(
                "more than 5 files and folders below the catalog folder; stopped",
                e.problems().get(0).message());
        assertEquals(dir, e.problems().get(0).file());
    }
}
