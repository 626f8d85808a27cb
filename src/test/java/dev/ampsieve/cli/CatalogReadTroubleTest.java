package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.failure.ExitCode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A catalog file or folder that cannot be read is one error line in every command, as in
 * {@code check}, and the other parts are still searched (safety issue, point 2); a folder the
 * index will not use is one note. The four parts are FindCommandTest's.
 */
class CatalogReadTroubleTest {

    @TempDir
    Path dir;

    private static final String STAGE =
            Path.of("demo-catalog/stages/adc-driver.yaml").toString();

    @BeforeEach
    void writeCatalog() throws Exception {
        Files.writeString(dir.resolve("parts.yaml"), FindCommandTest.CATALOG);
    }

    private CliRun run(String... args) {
        List<String> a = new ArrayList<>(List.of("--catalog", dir.toString()));
        a.addAll(List.of(args));
        return CliRun.of(a.toArray(String[]::new));
    }

    private static List<String> ids(CliRun r) {
        return r.outLines().stream()
                .filter(l -> l.startsWith("fx-"))
                .map(l -> l.split("\\s+")[0])
                .toList();
    }

    /**
     * A catalog file that fails to read as any user: a link to /proc/self/mem, which stats as a
     * regular file and fails every read at offset 0 with EIO (Linux procfs; address 0 is never mapped).
     */
    private Path unreadableForAnyone() throws IOException {
        Path mem = Path.of("/proc/self/mem");
        Assumptions.assumeTrue(Files.isRegularFile(mem), "no /proc/self/mem (not Linux): skipped");
        return Files.createSymbolicLink(dir.resolve("broken.yaml"), mem);
    }

    /** The one stderr line the loader gives a file it cannot read, as check prints it. */
    private static String cannotRead(Path file) {
        return file + ": cannot read the file (";
    }

    /*
     * A link to a file outside the catalog (here one that fails every read) is not read at all
     * (CatalogLoader.Walk: a shared catalog must not make the tool read private files): check
     * names it in one warning line, and the other commands search the rest without a word.
     */
    @Test
    void aLinkToAFileOutsideIsSkippedByFindAndNamedByCheck() throws Exception {
        Path broken = unreadableForAnyone();
        CliRun r = run("find", "zero-drift", "vos<=10uV");
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        assertEquals(List.of("fx-az-1", "fx-chop-1"), ids(r)); // as FindCommandTest finds them without the broken file
        assertEquals("", r.err(), r.toString());
        CliRun check = run("check");
        assertEquals(
                1,
                check.outLines().stream()
                        .filter(l ->
                                l.startsWith(broken + ": ") && l.contains("the link leads outside the catalog folder"))
                        .count(),
                check.out());
    }

    @Test
    void rankAndBudgetSkipItTheSameWay() throws Exception {
        unreadableForAnyone();
        CliRun rank = run("rank", "--stage", STAGE, "--query", "zero-drift");
        assertEquals(ExitCode.OK.code(), rank.code(), rank.toString());
        assertTrue(
                rank.out().contains("fx-az-1")
                        && rank.out().contains("fx-chop-1")
                        && !rank.out().contains("fx-bip-1"),
                rank.out());
        for (CliRun r : List.of(
                rank,
                run("budget", "fx-az-1", "--stage", STAGE),
                run("compare", "fx-az-1", "fx-chop-1", "--stage", STAGE))) {
            assertEquals(ExitCode.OK.code(), r.code(), r.toString());
            assertEquals("", r.err(), r.toString());
        }
    }

    @Test
    void anUnreadableFileIsOneLineForFindAndRank() throws Exception {
        Path secret = dir.resolve("secret.yaml");
        Files.writeString(secret, FindCommandTest.CATALOG.replace("fx-", "sx-"));
        Files.setPosixFilePermissions(secret, PosixFilePermissions.fromString("---------"));
        Assumptions.assumeFalse(Files.isReadable(secret), "running as root, who reads any file: skipped");
        for (CliRun r : List.of(
                run("find", "zero-drift", "vos<=10uV"), run("rank", "--stage", STAGE, "--query", "zero-drift"))) {
            assertEquals(ExitCode.OK.code(), r.code(), r.toString());
            assertEquals(
                    List.of(secret + ": cannot read the file (permission denied: " + secret
                            + "); check that it exists and is readable"),
                    r.err().lines().toList());
        }
        assertEquals(List.of("fx-az-1", "fx-chop-1"), ids(run("find", "zero-drift", "vos<=10uV")));
    }

    @Test
    void anUnreadableFolderIsOneLineForFindAndRank() throws Exception {
        Path locked = Files.createDirectory(dir.resolve("locked"));
        Files.writeString(locked.resolve("more.yaml"), FindCommandTest.CATALOG.replace("fx-", "sx-"));
        Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("---------"));
        try {
            Assumptions.assumeFalse(Files.isReadable(locked), "running as root, who reads any folder: skipped");
            for (CliRun r : List.of(
                    run("find", "zero-drift", "vos<=10uV"), run("rank", "--stage", STAGE, "--query", "zero-drift"))) {
                assertEquals(ExitCode.OK.code(), r.code(), r.toString());
                List<String> err = r.err().lines().toList();
                assertEquals(1, err.size(), r.err());
                assertTrue(err.get(0).startsWith(locked + ": cannot read (permission denied"), err.get(0));
            }
            assertEquals(List.of("fx-az-1", "fx-chop-1"), ids(run("find", "zero-drift", "vos<=10uV")));
        } finally {
            Files.setPosixFilePermissions(
                    locked, PosixFilePermissions.fromString("rwx------")); // so @TempDir can clean up
        }
    }

    @Test
    void anIndexFolderThatIsALinkIsNotedOnceAndTheCatalogKept() throws Exception {
        Assumptions.assumeTrue(
                System.getenv("XDG_CACHE_HOME") == null,
                "XDG_CACHE_HOME is set: skipped rather than write into that cache");
        Path link = Files.createSymbolicLink(dir.resolve(".ampsieve-index"), Path.of("."));
        String before = Files.readString(dir.resolve("parts.yaml"));
        String home = System.getProperty("user.home");
        System.setProperty("user.home", dir.resolve("home").toString()); // the per-user cache lands in the temp folder
        try {
            CliRun first = run("find", "zero-drift", "vos<=10uV");
            assertEquals(List.of("fx-az-1", "fx-chop-1"), ids(first));
            List<String> err = first.err().lines().toList();
            assertEquals(1, err.size(), first.err());
            assertTrue(err.get(0).startsWith("ampsieve: note: " + link + " is a symbolic link"), err.get(0));
            assertTrue(
                    err.get(0)
                            .contains("left untouched and the search index is kept in "
                                    + dir.resolve("home/.cache/ampsieve") + "/"),
                    err.get(0));
            CliRun second = run("find", "zero-drift", "vos<=10uV");
            assertEquals(List.of("fx-az-1", "fx-chop-1"), ids(second));
            assertEquals("", second.err(), "noted once per process (a shell session)");
        } finally {
            System.setProperty("user.home", home);
        }
        assertTrue(Files.isSymbolicLink(link));
        assertEquals(Path.of("."), Files.readSymbolicLink(link));
        assertEquals(before, Files.readString(dir.resolve("parts.yaml")));
        try (var s = Files.list(dir)) {
            assertEquals(
                    List.of(".ampsieve-index", "home", "parts.yaml"),
                    s.map(p -> p.getFileName().toString()).sorted().toList(),
                    "no index files beside the catalog");
        }
        assertFalse(Files.exists(dir.resolve("write.lock"), LinkOption.NOFOLLOW_LINKS));
    }
}
