package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The index and the parsed-catalog cache under faults, each run in a child JVM of the production
 * main class ({@link Main}) on a copied catalog: killed with SIGKILL at twenty moments while it
 * parses, writes the cache and builds the index; five at once on one catalog; a damaged cache; a
 * read-only catalog folder. Afterwards a run answers exactly as a clean build on an untouched copy
 * does, and the catalog's files are byte for byte as they were.
 */
class CacheFaultTest {

    private static final Path SYNTHETIC = Path.of("src/test/catalogs/synthetic-300");
    /** Found in the synthetic catalog: a dozen or so matches, spread over the files. */
    private static final String QUERY = "zero-drift vos<3uV";

    @TempDir
    Path tmp;

    private Path xdg;
    private Path home;

    @BeforeEach
    void places() throws IOException {
        xdg = Files.createDirectories(tmp.resolve("xdg"));
        home = Files.createDirectories(tmp.resolve("home"));
    }

    /** What a run printed and how it ended. */
    record Run(int exit, String out, String err) {}

    /**
     * Six files, 600 parts: the synthetic catalog and a copy of it under other ids, so a run takes
     * long enough (parse, cache, index) for kills to land in every step.
     */
    private Path catalog(String name) throws IOException {
        Path dir = Files.createDirectories(tmp.resolve(name));
        try (Stream<Path> s = Files.list(SYNTHETIC)) {
            for (Path p : s.filter(p -> p.toString().endsWith(".yaml")).sorted().toList()) {
                String text = Files.readString(p);
                Files.writeString(dir.resolve(p.getFileName()), text);
                Files.writeString(dir.resolve("copy-" + p.getFileName()), text.replace("id: syn-", "id: syc-"));
            }
        }
        return dir;
    }

    private ProcessBuilder command(Path catalog, Path out, Path err) {
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        List<String> cmd = new ArrayList<>(List.of(
                java.toString(),
                "-cp",
                System.getProperty("java.class.path"),
                // a short command: C1 only starts it sooner (bench/RESULTS.md, start-up options)
                "-XX:TieredStopAtLevel=1",
                "-Xmx512m",
                Main.class.getName(),
                "--catalog",
                catalog.toString(),
                "find",
                QUERY));
        ProcessBuilder pb = new ProcessBuilder(cmd).directory(tmp.toFile());
        Map<String, String> env = pb.environment();
        env.remove("AMPSIEVE_CATALOG");
        env.put("XDG_CACHE_HOME", xdg.toString());
        env.put("HOME", home.toString());
        env.put("COLUMNS", "120");
        pb.redirectInput(Path.of("/dev/null").toFile());
        pb.redirectOutput(out.toFile());
        pb.redirectError(err.toFile());
        return pb;
    }

    private Run run(Path catalog) throws Exception {
        Path out = Files.createTempFile(tmp, "out", ".txt");
        Path err = Files.createTempFile(tmp, "err", ".txt");
        Process p = command(catalog, out, err).start();
        assertTrue(p.waitFor(3, TimeUnit.MINUTES), "a run did not end");
        return new Run(p.exitValue(), Files.readString(out), Files.readString(err));
    }

    /** The answer with the catalog's own folder name replaced, so runs on two copies compare. */
    private static Run neutral(Run r, Path catalog) {
        String c = catalog.toString();
        return new Run(r.exit(), r.out().replace(c, "CATALOG"), r.err().replace(c, "CATALOG"));
    }

    @Test
    void killedTwentyTimesWhileBuildingThenAnswersAsACleanBuild() throws Exception {
        Path work = catalog("work");
        // how long a whole run takes here, from nothing: the kills spread over it
        long start = System.nanoTime();
        Run first = run(work);
        long whole = Math.max(200, (System.nanoTime() - start) / 1_000_000);
        assertEquals(0, first.exit(), first.err());
        assertTrue(first.out().contains("syc-"), first.out());

        List<Path> files = catalogFiles(work);
        int killed = 0;
        for (int i = 0; i < 20; i++) {
            // something to do for the killed run: one file edited (its cache entry and its documents
            // change); every other time the whole index and cache deleted, as a user may, so the
            // run parses and builds everything and the kill lands inside that work
            Path edited = files.get(i % files.size());
            Files.writeString(
                    edited, "# edit " + i + "\n" + Files.readString(edited).replaceFirst("^# edit \\d+\n", ""));
            if (i % 2 == 0) {
                deleteTree(work.resolve(".ampsieve-index"));
            }
            Map<Path, String> before = hashes(work);
            Path out = Files.createTempFile(tmp, "killed", ".txt");
            Process p = command(work, out, out).start();
            // from the JVM's start to near the end of a whole run
            long delay = whole * (i + 1) / 22;
            if (!p.waitFor(delay, TimeUnit.MILLISECONDS)) {
                p.destroyForcibly(); // SIGKILL on Linux: no shutdown hook, no close, no unlock
                killed++;
            }
            assertTrue(p.waitFor(1, TimeUnit.MINUTES));
            assertEquals(before, hashes(work), "catalog files changed by run " + i);
        }
        assertTrue(killed >= 10, "runs killed before they ended: " + killed);
        Run afterKills = run(work);
        Path clean = copyFiles(work, "clean");
        Run cleanBuild = run(clean);
        assertEquals(0, cleanBuild.exit(), cleanBuild.err());
        assertEquals(neutral(cleanBuild, clean), neutral(afterKills, work));
        assertEquals(neutral(cleanBuild, clean), neutral(run(work), work)); // and again, all from the cache
        assertOnlyOurFiles(work);

        // every cache entry damaged in its middle: still the same answer, nothing else touched
        Map<Path, String> before = hashes(work);
        try (Stream<Path> s = Files.list(work.resolve(".ampsieve-index"))) {
            for (Path e : s.filter(e -> e.getFileName().toString().startsWith("parsed-"))
                    .toList()) {
                byte[] b = Files.readAllBytes(e);
                b[b.length / 2] ^= 1;
                Files.write(e, b);
            }
        }
        assertEquals(neutral(cleanBuild, clean), neutral(run(work), work));
        assertEquals(before, hashes(work));
    }

    @Test
    void fiveProcessesAtOnceAllAnswerAsACleanBuild() throws Exception {
        Path shared = catalog("shared");
        Map<Path, String> before = hashes(shared);
        List<Process> ps = new ArrayList<>();
        List<Path> outs = new ArrayList<>();
        List<Path> errs = new ArrayList<>();
        for (int i = 0; i < 5; i++) {
            outs.add(tmp.resolve("out" + i));
            errs.add(tmp.resolve("err" + i));
            ps.add(command(shared, outs.get(i), errs.get(i)).start());
        }
        List<Run> runs = new ArrayList<>();
        for (int i = 0; i < 5; i++) {
            assertTrue(ps.get(i).waitFor(3, TimeUnit.MINUTES));
            runs.add(neutral(
                    new Run(ps.get(i).exitValue(), Files.readString(outs.get(i)), Files.readString(errs.get(i))),
                    shared));
        }
        Path clean = catalog("clean");
        Run reference = neutral(run(clean), clean);
        assertEquals(0, reference.exit(), reference.err());
        for (Run r : runs) {
            assertEquals(reference, r);
        }
        assertEquals(reference, neutral(run(shared), shared));
        assertEquals(before, hashes(shared));
        assertOnlyOurFiles(shared);
    }

    /**
     * A catalog folder its user may not write: the index and the cache go to the per-user cache
     * folder, the catalog gains nothing. Root writes anywhere, so this runs only as another user
     * (as the project's other permission tests do; ParsedCacheTest checks the choice as any user).
     */
    @Test
    void aReadOnlyCatalogFolderIsAnsweredFromThePerUserCache() throws Exception {
        Assumptions.assumeFalse(
                "root".equals(System.getProperty("user.name")), "running as root, who writes anywhere: skipped");
        Path ro = catalog("ro");
        Path clean = catalog("clean");
        Run reference = neutral(run(clean), clean);
        Map<Path, String> before = hashes(ro);
        Files.setPosixFilePermissions(ro, PosixFilePermissions.fromString("r-xr-xr-x"));
        try {
            assertEquals(reference, neutral(run(ro), ro));
            assertEquals(reference, neutral(run(ro), ro));
        } finally {
            Files.setPosixFilePermissions(ro, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
        assertEquals(before, hashes(ro));
        assertTrue(Files.notExists(ro.resolve(".ampsieve-index")));
        try (Stream<Path> s = Files.walk(xdg.resolve("ampsieve"))) {
            assertTrue(s.anyMatch(p -> p.getFileName().toString().startsWith("parsed-")));
        }
    }

    // ------------------------------------------------------------------ helpers

    private static List<Path> catalogFiles(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(p -> p.toString().endsWith(".yaml")).sorted().toList();
        }
    }

    private Path copyFiles(Path from, String name) throws IOException {
        Path to = Files.createDirectories(tmp.resolve(name));
        for (Path p : catalogFiles(from)) {
            Files.copy(p, to.resolve(p.getFileName()));
        }
        return to;
    }

    /** The catalog folder holds its files and the index folder, which holds only names ampsieve writes. */
    private static void assertOnlyOurFiles(Path catalog) throws IOException {
        try (Stream<Path> s = Files.list(catalog)) {
            for (Path p : s.toList()) {
                String n = p.getFileName().toString();
                assertTrue(n.endsWith(".yaml") || n.equals(".ampsieve-index"), n);
            }
        }
        try (Stream<Path> s = Files.list(catalog.resolve(".ampsieve-index"))) {
            for (Path p : s.toList()) {
                String n = p.getFileName().toString();
                assertTrue(Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS), n);
                boolean ours = n.equals("made-by-ampsieve.txt")
                        || n.equals("write.lock")
                        || n.startsWith("segments")
                        || n.startsWith("pending_segments")
                        || n.startsWith("_")
                        || n.matches("parsed-[0-9a-f]{64}\\.bin(\\.[0-9a-f]{16}\\.tmp)?");
                assertTrue(ours, n);
            }
        }
    }

    /** SHA-256 of each catalog file (the index folder left out), by name. */
    private static Map<Path, String> hashes(Path dir) throws Exception {
        Map<Path, String> out = new TreeMap<>();
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.filter(p -> !dir.relativize(p).toString().startsWith(".ampsieve-index"))
                    .filter(p -> Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS))
                    .toList()) {
                out.put(
                        dir.relativize(p),
                        HexFormat.of()
                                .formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(p))));
            }
        }
        return out;
    }

    private static void deleteTree(Path dir) throws IOException {
        if (!Files.exists(dir, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }
}
