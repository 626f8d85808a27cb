package dev.ampsieve.shell;

import static java.nio.charset.StandardCharsets.UTF_8;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.commands.RootCommand;
import dev.ampsieve.testing.DemoCatalog;
import dev.ampsieve.testing.Flat;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CountDownLatch;
import java.util.function.Predicate;
import java.util.stream.Stream;
import org.jline.terminal.Terminal;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The prompt comes before the catalog is read (issue 13): the read is held back by a latch the
 * test opens, so every check is an order of events, never a time. Lines typed while the read runs
 * wait for it and then answer exactly as when the catalog was read before the prompt.
 */
class ShellBackgroundLoadTest {

    @TempDir
    static Path shared;

    static Path catalog;

    @BeforeAll
    static void copyDemo() throws IOException {
        catalog = DemoCatalog.copyTo(shared);
    }

    private static final String FIND = "find --query \"vos<100uV\"";

    /** A shell on its own thread, the keys the test types, what it printed, and the latch holding its read. */
    private static final class Live implements AutoCloseable {
        final ShellSafetyTest.LiveKeys keys = new ShellSafetyTest.LiveKeys();
        final ByteArrayOutputStream out = new ByteArrayOutputStream(); // synchronized: read while written
        final CountDownLatch release = new CountDownLatch(1);
        final CountDownLatch reading = new CountDownLatch(1);
        final Terminal terminal;
        final Thread thread;

        Live(List<String> rootArgs) throws IOException {
            terminal = Sessions.terminal(keys, out);
            Shell shell = new Shell(new RootCommand(), rootArgs, terminal, null, Map.of()).catalogRead(true, () -> {
                reading.countDown();
                try {
                    release.await();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            });
            thread = new Thread(shell::run, "shell-under-test");
            thread.setDaemon(true);
            thread.start();
        }

        /** What it printed, folded lines and all white space read as one space ({@link Flat}). */
        String printed() {
            return Flat.of(out.toString(UTF_8));
        }

        /** Waits until the printed text passes {@code test}; a hang guard only, not a speed requirement. */
        void until(Predicate<String> test) {
            assertTimeoutPreemptively(Duration.ofSeconds(90), () -> {
                while (!test.test(printed())) {
                    assertTrue(thread.isAlive(), "the shell ended early:\n" + printed());
                    Thread.sleep(10);
                }
            });
        }

        String end() {
            keys.end();
            assertTimeoutPreemptively(Duration.ofSeconds(90), () -> thread.join());
            return printed();
        }

        @Override
        public void close() throws IOException {
            release.countDown();
            keys.end();
            terminal.close();
        }
    }

    /** Catalog files counted by a walk of our own: every *.yaml below the folder except those in stages/. */
    private static long catalogFiles(Path dir) throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            return s.filter(p -> p.getFileName().toString().endsWith(".yaml"))
                    .filter(p -> !dir.relativize(p).startsWith("stages"))
                    .count();
        }
    }

    private static int count(String text, String part) {
        int n = 0;
        for (int at = text.indexOf(part); at >= 0; at = text.indexOf(part, at + 1)) {
            n++;
        }
        return n;
    }

    /** The banner's catalog line when the catalog is read before the banner, as before issue 13. */
    private static String countsLine() {
        return countsLine(Sessions.run(List.of("--catalog", catalog.toString()), null, Map.of(), "help"));
    }

    /** The banner's catalog line (folded to the terminal's width: up to the caution below it), flat. */
    private static String countsLine(String printed) {
        String flat = Flat.of(printed);
        int from = flat.indexOf("Catalog ");
        return flat.substring(from, flat.indexOf(" Caution:", from));
    }

    /**
     * What the one line typed printed in a session where the catalog was read before the banner,
     * flat: from the first prompt to the last (the dumb terminal does not echo the keys).
     */
    private static String answerOf(String flat) {
        return flat.substring(flat.indexOf("ampsieve>") + "ampsieve>".length(), flat.lastIndexOf("ampsieve>"))
                .strip();
    }

    @Test
    void thePromptComesBeforeTheReadAndALineTypedMeanwhileIsAnsweredAfterIt() throws Exception {
        List<String> args = List.of("--catalog", catalog.toString());
        String before = Flat.of(Sessions.run(args, null, Map.of(), FIND));
        String counts = countsLine(before);
        String answer = answerOf(before);
        assertTrue(answer.contains("prec-"), before); // a real answer (some precision part), not an error

        try (Live live = new Live(args)) {
            live.until(p -> p.endsWith("ampsieve>"));
            // the prompt is up while the read has not even begun to read files: it waits for the latch
            assertEquals(1, live.release.getCount());
            String atPrompt = live.printed();
            assertTrue(atPrompt.contains("Catalog: loading; its counts follow."), atPrompt);
            assertFalse(atPrompt.contains("part(s)"), atPrompt);

            live.reading.await(); // the tree is built and the files counted; the read itself is held
            live.keys.type(FIND + "\n");
            String note = "The catalog is still loading (" + catalogFiles(catalog) + " file(s)); 'find' runs when it"
                    + " is read. Ctrl-C stops waiting.";
            live.until(p -> p.contains("Ctrl-C stops waiting."));
            assertTrue(live.printed().contains(note), live.printed());
            assertFalse(live.printed().contains("part(s)"), live.printed()); // nothing of the answer yet

            live.release.countDown();
            live.until(p -> count(p, "ampsieve>") == 2 && p.endsWith("ampsieve>"));
            String printed = live.end();
            // the counts once, after the note, then the answer exactly as with the catalog read first
            assertEquals(1, count(printed, counts), printed);
            int noteAt = printed.indexOf(note);
            int countsAt = printed.indexOf(counts);
            int answerAt = printed.indexOf(answer);
            assertTrue(noteAt > 0 && countsAt > noteAt && answerAt > countsAt, printed + "\n---\n" + answer);
        }
    }

    @Test
    void countsComeAboveThePromptWhenTheReadEndsWhileTheUserTypes() throws Exception {
        try (Live live = new Live(List.of("--catalog", catalog.toString()))) {
            live.until(p -> p.endsWith("ampsieve>"));
            String help = answerOf(
                    Flat.of(Sessions.run(List.of("--catalog", catalog.toString()), null, Map.of(), "help set")));
            live.keys.type("help s"); // a line begun, not yet entered
            live.release.countDown();
            live.until(p -> p.contains("part(s)"));
            live.keys.type("et\n"); // the line, finished after the counts came above it
            live.until(p -> p.contains(help) && p.endsWith("ampsieve>"));
            String printed = live.end();
            int promptAt = printed.indexOf("ampsieve>");
            int countsAt = printed.indexOf(countsLine());
            assertTrue(promptAt > 0 && countsAt > promptAt && printed.indexOf(help) > countsAt, printed);
            assertEquals(1, count(printed, "part(s)"), printed);
        }
    }

    @Test
    void ctrlCWhileWaitingGoesBackToThePromptAndTheReadGoesOn() throws Exception {
        try (Live live = new Live(List.of("--catalog", catalog.toString()))) {
            live.until(p -> p.endsWith("ampsieve>"));
            live.keys.type(FIND + "\n");
            live.until(p -> p.contains("Ctrl-C stops waiting."));
            live.terminal.raise(Terminal.Signal.INT);
            live.until(p -> p.contains("Interrupted."));
            assertFalse(live.printed().contains("part(s)"), live.printed()); // the read is still held
            live.keys.type("check\n");
            live.until(p -> count(p, "Ctrl-C stops waiting.") == 2);
            live.release.countDown();
            live.until(p -> count(p, "ampsieve>") == 3 && p.endsWith("ampsieve>")); // first, after Ctrl-C, after check
            String printed = live.end();
            assertFalse(printed.contains("Candidates"), printed); // the interrupted find never ran
            assertFalse(printed.contains("parts match"), printed);
            assertEquals(1, count(printed, countsLine()), printed);
            assertFalse(printed.contains("internal error"), printed);
        }
    }

    @Test
    void aReadThatFailsSaysSoOnceAsBefore() throws Exception {
        List<String> args =
                List.of("--catalog", shared.resolve("no-such-folder").toString());
        String before = Flat.of(Sessions.run(args, null, Map.of(), "check"));
        String line = countsLine(before);
        assertTrue(line.endsWith("1 problem(s); 'check' lists them."), line);
        try (Live live = new Live(args)) {
            live.until(p -> p.endsWith("ampsieve>"));
            live.release.countDown();
            live.until(p -> p.contains(line));
            live.keys.type("check\n");
            // what 'check' itself says is what it said with the catalog read first
            String checkBefore = answerOf(before);
            live.until(p -> p.contains(checkBefore) && p.endsWith("ampsieve>"));
            String printed = live.end();
            assertEquals(1, count(printed, line), printed);
        }
    }
}
