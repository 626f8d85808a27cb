package dev.ampsieve.shell;

import static java.nio.charset.StandardCharsets.UTF_8;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.commands.RootCommand;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.testing.DemoCatalog;
import dev.ampsieve.testing.Flat;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.InterruptedIOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.jline.terminal.Terminal;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The shell stays in the user's hands: Ctrl-C stops a command, long lines are refused, save never writes through. */
class ShellSafetyTest {

    @TempDir
    static Path shared;

    static Path catalog;

    @TempDir
    Path dir;

    @BeforeAll
    static void copyDemo() throws IOException {
        catalog = DemoCatalog.copyTo(shared);
    }

    static String session(String... lines) {
        return Sessions.run(List.of("--catalog", catalog.toString()), null, Map.of(), lines);
    }

    // ------------------------------------------------------------------ Ctrl-C during a command

    /** Keys the test types while the shell runs on its own thread; a read waits for them. */
    static final class LiveKeys extends InputStream {
        private final LinkedBlockingQueue<Integer> keys = new LinkedBlockingQueue<>();

        void type(String text) {
            for (byte b : text.getBytes(UTF_8)) {
                keys.add(b & 0xff);
            }
        }

        void end() {
            keys.add(-1);
        }

        @Override
        public int read() throws IOException {
            try {
                int c = keys.take();
                if (c < 0) {
                    keys.add(-1); // the end stays the end
                }
                return c;
            } catch (InterruptedException e) {
                throw new InterruptedIOException("Ctrl-C");
            }
        }

        @Override
        public int read(byte[] b, int off, int len) throws IOException {
            if (len == 0) {
                return 0;
            }
            int c = read();
            if (c < 0) {
                return -1;
            }
            b[off] = (byte) c;
            return 1;
        }
    }

    private static boolean inMonteCarlo(Thread t) {
        return Arrays.stream(t.getStackTrace())
                .anyMatch(f -> f.getClassName().startsWith("dev.ampsieve.budget.YieldModel")
                        || f.getClassName().startsWith("dev.ampsieve.stats.SequentialYield"));
    }

    @Test
    void ctrlCStopsALongRankAndTheKeysTypedAfterItRunWithTheStageAsItWas() throws Exception {
        LiveKeys keys = new LiveKeys();
        ByteArrayOutputStream out = new ByteArrayOutputStream(); // its methods are synchronized: read while written
        Terminal t = Sessions.terminal(keys, out);
        Thread shell = new Thread(
                () -> new Shell(new RootCommand(), List.of("--catalog", catalog.toString()), t, null, Map.of()).run(),
                "shell-under-test");
        shell.setDaemon(true);
        // the most units a stage may ask for, every one simulated (worst-case criterion: no early stop):
        // this ranking takes minutes when nothing stops it
        keys.type("set gain 100\nset temperature -40..85 C\nset limit 1 mV\nset trials 10000000\nshow\nrank\n");
        shell.start();
        assertTimeoutPreemptively(
                Duration.ofMinutes(3),
                () -> { // hang guards only, not speed requirements
                    while (!inMonteCarlo(shell)) {
                        assertTrue(
                                shell.isAlive(), "the shell ended before the ranking sampled:\n" + out.toString(UTF_8));
                        Thread.sleep(20);
                    }
                    t.raise(Terminal.Signal.INT); // Ctrl-C while the ranking simulates units
                    keys.type("show\n"); // typed at once, before the shell is back at its prompt
                    keys.end();
                    shell.join();
                });
        t.close();
        String printed = out.toString(UTF_8).replace("\r", "");
        int stop = printed.indexOf("Interrupted; the current stage is as it was.");
        assertTrue(stop > 0, printed);
        assertFalse(printed.contains("Candidates ("), printed); // the ranking never finished
        assertFalse(printed.contains("internal error"), printed);
        // the stage shown after the interrupt is the one shown before the ranking, line for line
        String before = stageBlock(printed.substring(0, stop));
        String after = stageBlock(printed.substring(stop));
        assertTrue(before.contains("limit at the output") && before.contains("10000000"), printed);
        assertEquals(before, after, printed);
    }

    /** From "Stage (" to the line about the other keys, of the first 'show' in the text. */
    private static String stageBlock(String text) {
        int from = text.indexOf("Stage (");
        int to = text.indexOf("Other keys keep their defaults", from);
        assertTrue(from >= 0 && to > from, text);
        return text.substring(from, to);
    }

    @Test
    void ctrlCAtThePromptStillOnlyDropsTheLine() {
        String printed = session("set gain 100", "show --al\u0003", "show");
        assertFalse(printed.contains("Interrupted"), printed);
        assertTrue(printed.contains("Stage (typed in, not saved)"), printed); // the 'show' after it ran
        assertFalse(printed.contains("default: non-inverting"), printed); // the dropped 'show --all' did not
    }

    // ------------------------------------------------------------------ over-long lines

    @Test
    void aLongLineIsRefusedWithOneLineAndKeptOutOfTheHistory() throws IOException {
        // a third of a megabyte here (the end-to-end test pastes a whole one into a real terminal)
        Path history = dir.resolve("data/ampsieve/history");
        String huge = "set gain " + "9".repeat(300_000 - 9);
        String printed = assertTimeoutPreemptively(
                Duration.ofMinutes(2), // a hang guard
                () -> Sessions.run(
                        List.of("--catalog", catalog.toString()), history, Map.of(), "help", huge, "show --all"));
        // 300 000 characters typed; the limit is LineLimit.MAX = 4096 (README "The shell")
        assertTrue(
                Flat.of(printed)
                        .contains("Refused a line of 300000 characters: the shell takes lines of at most 4096 "
                                + "characters; nothing was run or kept in the history."),
                printed);
        assertEquals(1, printed.split("Refused a line", -1).length - 1, printed);
        assertFalse(printed.contains("gain = "), printed); // the set did not run
        assertTrue(printed.contains("default: non-inverting"), printed); // the line after it did
        List<String> lines = Files.readAllLines(history);
        assertTrue(lines.stream().anyMatch(l -> l.endsWith("help")), lines.toString());
        assertTrue(lines.stream().anyMatch(l -> l.endsWith("show --all")), lines.toString());
        assertTrue(lines.stream().noneMatch(l -> l.contains("999999")), "the long line reached the history");
    }

    @Test
    void theLimitIs4096CharactersExactly() {
        // "show" padded with spaces to 4096 characters runs; one character more is refused
        String at = "show" + " ".repeat(4096 - 4);
        String over = at + " ";
        String printed = session("set gain 100", at, "set gain 20", over);
        assertTrue(printed.contains("Stage (typed in, not saved)"), printed);
        assertTrue(Flat.of(printed).contains("Refused a line of 4097 characters"), printed);
        assertEquals(1, printed.split("Stage \\(typed in", -1).length - 1, printed); // only the first show ran
    }

    @Test
    void anOverLongAnswerStopsTheQuestionsLikeCtrlC() {
        String printed = session("ask", "", "100", "x".repeat(5000), "show");
        assertTrue(Flat.of(printed).contains("Refused a line of 5000 characters"), printed);
        assertTrue(printed.contains("Stopped;"), printed);
    }

    // ------------------------------------------------------------------ save

    @Test
    void saveRefusesASymbolicLinkAndLeavesLinkAndTargetAsTheyWere() throws IOException {
        Path target = dir.resolve("target.yaml");
        Files.writeString(target, "# not a stage of ours\n");
        Path link = Files.createSymbolicLink(dir.resolve("link.yaml"), target);
        for (String save : List.of("save ", "save --force ")) {
            String printed = session("set gain 100", "set limit 1 mV", save + link, "y");
            assertTrue(
                    Flat.of(printed)
                            .contains(link + " is a symbolic link to " + target
                                    + "; save replaces only regular files, so it was left as it is"),
                    printed);
            assertFalse(printed.contains("Replace it?"), printed); // refused before asking
        }
        assertTrue(Files.isSymbolicLink(link));
        assertEquals(target, Files.readSymbolicLink(link));
        assertEquals("# not a stage of ours\n", Files.readString(target));
        assertEquals(List.of("link.yaml", "target.yaml"), names(dir));
    }

    @Test
    void saveRefusesADanglingLinkToo() throws IOException {
        Path link = Files.createSymbolicLink(dir.resolve("dangling.yaml"), dir.resolve("nowhere.yaml"));
        String printed = session("set gain 100", "set limit 1 mV", "save " + link);
        assertTrue(Flat.of(printed).contains(link + " is a symbolic link to " + dir.resolve("nowhere.yaml")), printed);
        assertFalse(Files.exists(dir.resolve("nowhere.yaml")));
        assertTrue(Files.isSymbolicLink(link));
    }

    @Test
    void saveRefusesAFifoWithoutBlocking() throws Exception {
        Path fifo = dir.resolve("pipe.yaml");
        Process p = new ProcessBuilder("mkfifo", fifo.toString())
                .redirectErrorStream(true)
                .start();
        Assumptions.assumeTrue(
                p.waitFor(30, TimeUnit.SECONDS) && p.exitValue() == 0, "mkfifo is not available: FIFO case skipped");
        // opening a FIFO for writing blocks until a reader comes: the guard catches a hang
        String printed = assertTimeoutPreemptively(
                Duration.ofMinutes(1), () -> session("set gain 100", "set limit 1 mV", "save --force " + fifo));
        assertTrue(
                Flat.of(printed).contains(fifo + " is a named pipe (FIFO); save replaces only regular files"), printed);
        assertEquals("a named pipe (FIFO)", ShellCommands.Save.notARegularFile(fifo));
        assertEquals(List.of("pipe.yaml"), names(dir));
    }

    @Test
    void saveRefusesAFolder() throws IOException {
        Path folder = Files.createDirectory(dir.resolve("stages.yaml"));
        String printed = session("set gain 100", "set limit 1 mV", "save --force " + folder);
        assertTrue(Flat.of(printed).contains(folder + " is a folder; save replaces only regular files"), printed);
        assertTrue(Files.isDirectory(folder, LinkOption.NOFOLLOW_LINKS));
        assertEquals(List.of(), names(folder));
    }

    @Test
    void saveRefusesADevice() throws Exception {
        // a character device like /dev/null (major 1, minor 3 on Linux, devices.txt [from memory]);
        // only root may make one
        Path device = dir.resolve("null.yaml");
        Process p = new ProcessBuilder("mknod", device.toString(), "c", "1", "3")
                .redirectErrorStream(true)
                .start();
        Assumptions.assumeTrue(
                p.waitFor(30, TimeUnit.SECONDS) && p.exitValue() == 0,
                "cannot make a device node (needs root and mknod): device case skipped");
        String printed = session("set gain 100", "set limit 1 mV", "save --force " + device);
        assertTrue(
                Flat.of(printed).contains(device + " is a character device; save replaces only regular files"),
                printed);
        assertEquals("a character device", ShellCommands.Save.notARegularFile(device));
    }

    @Test
    void replacingAFileAfterYesPutsANewFileInPlaceAndLeavesNoTemporaryFile() throws Exception {
        Path file = dir.resolve("stage.yaml");
        String printed = session("set gain 100", "set limit 1 mV", "save " + file);
        assertTrue(printed.contains("Saved " + file), printed);
        assertEquals(1e-3, StageLoader.load(file).limitVolts(), 1e-15);
        Object inodeBefore = Files.getAttribute(file, "unix:ino");
        // a second name for the same file: a write in place would change what it reads too
        Path second = Files.createLink(dir.resolve("second-name.yaml"), file);
        String old = Files.readString(file);

        printed = session("set gain 20", "set limit 2 mV", "save " + file, "y");
        assertTrue(printed.contains(file + " exists. Replace it? [y/N]"), printed);
        assertTrue(printed.contains("Saved " + file), printed);
        assertEquals(20.0, StageLoader.load(file).noiseGain(), 1e-12);
        // the name now points at a new file (moved into place in one step); the old one is intact
        assertNotEquals(inodeBefore, Files.getAttribute(file, "unix:ino"));
        assertEquals(old, Files.readString(second));
        assertEquals(List.of("second-name.yaml", "stage.yaml"), names(dir)); // no temporary file left
    }

    @Test
    void sayingNoLeavesTheFileAndTheFolderAsTheyWere() throws IOException {
        Path file = dir.resolve("stage.yaml");
        Files.writeString(file, "# mine\n");
        String printed = session("set gain 100", "set limit 1 mV", "save " + file, "n");
        assertTrue(printed.contains("Left " + file + " as it was."), printed);
        assertEquals("# mine\n", Files.readString(file));
        assertEquals(List.of("stage.yaml"), names(dir));
    }

    private static List<String> names(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void aRegularFileOrNothingIsNotRefused() throws IOException {
        Path file = Files.writeString(dir.resolve("a.yaml"), "x");
        assertEquals(null, ShellCommands.Save.notARegularFile(file));
        assertEquals(null, ShellCommands.Save.notARegularFile(dir.resolve("absent.yaml")));
    }
}
