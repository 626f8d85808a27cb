package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

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

    private static final String STAGE = Path.of("demo-catalog/stages/adc-driver.yaml").toString();

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
        return r.outLines().stream().filter(l -> l.startsWith("fx-")).map(l -> l.split("\\s+")[0]).toList();
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

    @Test
    void findReportsAFileThatFailsToReadInOneLineAndSearchesTheRest() throws Exception {
        Path broken = unreadableForAnyone();
        CliRun r = run("find", "zero-drift", "vos<=10uV");
        assertEquals(ExitCode.OK, r.code(), r.toString());
        assertEquals(List.of("fx-az-1", "fx-chop-1"), ids(r)); // as FindCommandTest finds them without the broken file
        List<String> err = r.err().lines().toList();
        assertEquals(1, err.size(), r.err());
        assertTrue(err.get(0).startsWith(cannotRead(broken)), err.get(0));
        assertTrue(err.get(0).endsWith("; check that it exists and is readable"), err.get(0));
        CliRun check = run("check");
        assertTrue(check.outLines().contains(err.get(0)), "the same line as check: " + check.out());
    }

    @Test
    void rankWithAQueryReportsItTheSameWay() throws Exception {
        Path broken = unreadableForAnyone();
        CliRun r = run("rank", "--stage", STAGE, "--query", "zero-drift");
        assertEquals(ExitCode.OK, r.code(), r.toString());
        assertTrue(r.out().contains("fx-az-1") && r.out().contains("fx-chop-1") && !r.out().contains("fx-bip-1"), r.out());
        List<String> err = r.err().lines().toList();
        assertEquals(1, err.size(), r.err());
        assertTrue(err.get(0).startsWith(cannotRead(broken)), err.get(0));
    }

    @Test
    void budgetAndCompareNameTheFileToo() throws Exception {
        Path broken = unreadableForAnyone();
        for (CliRun r : List.of(run("budget", "fx-az-1", "--stage", STAGE), run("compare", "fx-az-1", "fx-chop-1", "--stage", STAGE))) {
            assertEquals(ExitCode.OK, r.code(), r.toString());
            List<String> err = r.err().lines().toList();
            assertEquals(1, err.size(), r.err());
            assertTrue(err.get(0).startsWith(cannotRead(broken)), err.get(0));
        }
    }

    @Test
    void anUnreadableFileIsOneLineForFindAndRank() throws Exception {
        Path secret = dir.resolve("secret.yaml");
        Files.writeString(secret, FindCommandTest.CATALOG.replace("fx-", "sx-"));
        Files.setPosixFilePermissions(secret, PosixFilePermissions.fromString("---------"));
        Assumptions.assumeFalse(Files.isReadable(secret), "running as root, who reads any file: skipped");
        for (CliRun r : List.of(run("find", "zero-drift", "vos<=10uV"), run("rank", "--stage", STAGE, "--query", "zero-drift"))) {
            assertEquals(ExitCode.OK, r.code(), r.toString());
            assertEquals(List.of(secret + ": cannot read the file (permission denied: " + secret + "); check that it exists and is readable"),
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
            for (CliRun r : List.of(run("find", "zero-drift", "vos<=10uV"), run("rank", "--stage", STAGE, "--query", "zero-drift"))) {
                assertEquals(ExitCode.OK, r.code(), r.toString());
                List<String> err = r.err().lines().toList();
                assertEquals(1, err.size(), r.err());
                assertTrue(err.get(0).startsWith(locked + ": cannot read (permission denied"), err.get(0));
            }
            assertEquals(List.of("fx-az-1", "fx-chop-1"), ids(run("find", "zero-drift", "vos<=10uV")));
        } finally {
            Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("rwx------")); // so @TempDir can clean up
        }
    }

    @Test
    void anIndexFolderThatIsALinkIsNotedOnceAndTheCatalogKept() throws Exception {
        Assumptions.assumeTrue(System.getenv("XDG_CACHE_HOME") == null,
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
            assertTrue(err.get(0).contains("left untouched and the search index is kept in "
                    + dir.resolve("home/.cache/ampsieve") + "/"), err.get(0));
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
            assertEquals(List.of(".ampsieve-index", "home", "parts.yaml"),
                    s.map(p -> p.getFileName().toString()).sorted().toList(), "no index files beside the catalog");
        }
        assertFalse(Files.exists(dir.resolve("write.lock"), LinkOption.NOFOLLOW_LINKS));
    }
}
