package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/**
 * An unreadable catalog file and an unreadable folder, as a user who really cannot read them.
 * The unit tests of this case skip when they run as root (root reads everything), and CI runs as
 * root; so this test runs the built jar as the unprivileged user {@code nobody} through
 * {@code runuser} when it is root, and as itself otherwise. Every command answers with one line
 * per unreadable entry, searches the rest, and leaves every file as it was.
 */
class UnreadableAsOtherUserIT {

    private static final Path JAR = Path.of("target/ampsieve.jar").toAbsolutePath();
    private Path dir;
    private Path catalog;
    private Path file;
    private Path folder;

    @BeforeEach
    void makeCatalog() throws IOException {
        Assumptions.assumeTrue(Files.isRegularFile(JAR), "no target/ampsieve.jar: run in the integration-test phase");
        // not @TempDir: that folder is private to us, and 'nobody' must be able to reach the catalog
        dir = Files.createTempDirectory(Path.of("/tmp"), "ampsieve-perm-");
        Files.setPosixFilePermissions(dir, PosixFilePermissions.fromString("rwxr-xr-x"));
        catalog = dir.resolve("catalog");
        copy(Path.of("demo-catalog"), catalog);
        file = catalog.resolve("zero-drift/chopper.yaml");
        folder = Files.createDirectory(catalog.resolve("locked"));
        Files.copy(Path.of("demo-catalog/zero-drift/auto-zero.yaml"), folder.resolve("more.yaml"));
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("---------"));
        Files.setPosixFilePermissions(folder, PosixFilePermissions.fromString("---------"));
    }

    @AfterEach
    void cleanUp() throws IOException {
        if (dir == null) {
            return;
        }
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-r--r--"));
        Files.setPosixFilePermissions(folder, PosixFilePermissions.fromString("rwxr-xr-x"));
        try (Stream<Path> all = Files.walk(dir)) {
            for (Path p : all.sorted((a, b) -> b.compareTo(a)).toList()) {
                Files.delete(p);
            }
        }
    }

    @Test
    void eachCommandNamesTheUnreadableEntriesInOneLineEachAndGoesOn() throws Exception {
        boolean root = "root".equals(System.getProperty("user.name"));
        boolean runuser =
                Files.isExecutable(Path.of("/usr/sbin/runuser")) || Files.isExecutable(Path.of("/sbin/runuser"));
        if (root && !runuser && "true".equals(System.getenv("CI"))) {
            throw new AssertionError("CI runs as root without runuser: .ci/run must install util-linux");
        }
        Assumptions.assumeTrue(
                !root
                        || Files.isExecutable(Path.of("/usr/sbin/runuser"))
                        || Files.isExecutable(Path.of("/sbin/runuser")),
                "running as root without runuser (util-linux): cannot act as an unprivileged user");
        Map<String, String> before = snapshot();
        String stage = catalog.resolve("stages/bridge-amp.yaml").toString();
        List<List<String>> commands = List.of(
                List.of("find", "zero-drift"),
                List.of("rank", "--stage", stage),
                List.of("rank", "--stage", stage, "--query", "zero-drift"),
                List.of("budget", "prec-bip-02", "--stage", stage),
                List.of("compare", "prec-bip-02", "zd-az-07", "--stage", stage));
        String cannotReadFile =
                file + ": cannot read the file (permission denied: " + file + "); check that it exists and is readable";
        String cannotReadFolder = folder + ": cannot read (permission denied: " + folder + "); check its permissions";
        for (List<String> command : commands) {
            Result r = run(root, command);
            assertEquals(0, r.code, command + "\n" + r.err + r.out);
            // the two lines check prints for them, in catalog order, and nothing else
            assertEquals(
                    List.of(cannotReadFolder, cannotReadFile), r.err.lines().toList(), command.toString());
            assertFalse(r.out.contains("internal error"), r.out);
            assertTrue(r.out.contains("Caution"), command + ": a full answer\n" + r.out);
        }
        // the readable zero-drift parts are still found (demo catalog: zd-az-05, -06, -07 live in auto-zero.yaml)
        assertTrue(run(root, List.of("find", "zero-drift")).out.contains("zd-az-07"));
        assertEquals(before, snapshot(), "no catalog file changed");
    }

    private record Result(int code, String out, String err) {}

    private Result run(boolean root, List<String> args) throws IOException, InterruptedException {
        String java = ProcessHandle.current().info().command().orElse("java");
        List<String> cmd = new ArrayList<>();
        if (root) {
            cmd.addAll(List.of("runuser", "-u", "nobody", "--"));
        }
        cmd.addAll(List.of(java, "-jar", JAR.toString()));
        cmd.addAll(args);
        cmd.addAll(List.of("--catalog", catalog.toString()));
        ProcessBuilder pb = new ProcessBuilder(cmd).directory(dir.toFile());
        pb.environment().put("NO_COLOR", "1");
        pb.environment().put("XDG_CACHE_HOME", dir.resolve("cache").toString());
        Path out = dir.resolve("out.txt");
        Path err = dir.resolve("err.txt");
        pb.redirectOutput(out.toFile()).redirectError(err.toFile());
        Process p = pb.start();
        if (!p.waitFor(5, TimeUnit.MINUTES)) { // a hang guard, not a speed requirement
            p.destroyForcibly();
            throw new AssertionError(args + " did not finish");
        }
        Result r = new Result(
                p.exitValue(),
                Files.readString(out, StandardCharsets.UTF_8),
                Files.readString(err, StandardCharsets.UTF_8));
        Files.delete(out);
        Files.delete(err);
        return r;
    }

    /** Every readable regular file below the catalog (as root: the test reads them all) and its SHA-256. */
    private Map<String, String> snapshot() throws IOException {
        Map<String, String> m = new TreeMap<>();
        try (Stream<Path> all = Files.walk(catalog)) {
            for (Path p : all.filter(Files::isRegularFile).toList()) {
                if (p.startsWith(catalog.resolve(".ampsieve-index"))) {
                    continue;
                }
                try {
                    m.put(
                            catalog.relativize(p).toString(),
                            HexFormat.of()
                                    .formatHex(
                                            MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(p))));
                } catch (java.security.NoSuchAlgorithmException e) {
                    throw new IllegalStateException(e);
                }
            }
        }
        return m;
    }

    private static void copy(Path from, Path to) throws IOException {
        try (Stream<Path> all = Files.walk(from)) {
            for (Path p : all.toList()) {
                Path target = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(target);
                } else {
                    Files.copy(p, target);
                }
            }
        }
        try (Stream<Path> all = Files.walk(to)) {
            for (Path p : all.toList()) {
                Files.setPosixFilePermissions(
                        p, PosixFilePermissions.fromString(Files.isDirectory(p) ? "rwxr-xr-x" : "rw-r--r--"));
            }
        }
    }
}
