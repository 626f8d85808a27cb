package dev.ampsieve.shell;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

/**
 * Runs {@code src/test/shell/e2e-tmux.sh}: the launcher in a real terminal (tmux), the guided
 * questions answered by keystrokes, a ranking read back from the screen, Ctrl-C during a long
 * ranking with 'show' typed at once, a pasted megabyte line refused. Runs in Maven's
 * integration-test phase (failsafe), after the jar is built. Without tmux it is skipped with a
 * message, except under CI=true, where a missing tmux is a failure (.ci/run installs it).
 */
class ShellEndToEndIT {

    /** The script's exit code for "tmux is not installed". */
    private static final int NO_TMUX = 77;

    @Test
    void aNewUserAnswersTheQuestionsAndReadsARanking() throws IOException, InterruptedException {
        Path script = Path.of("src/test/shell/e2e-tmux.sh");
        assertTrue(Files.isRegularFile(script), script + " is missing");
        Path log = Files.createTempFile("ampsieve-e2e-", ".log");
        Process p = new ProcessBuilder("bash", script.toString())
                .redirectErrorStream(true)
                .redirectOutput(log.toFile())
                .start();
        // a guard, not a speed requirement: the script waits at most a few minutes at each step
        if (!p.waitFor(15, TimeUnit.MINUTES)) {
            p.destroyForcibly();
            fail("the end-to-end script did not finish:\n" + Files.readString(log, StandardCharsets.UTF_8));
        }
        String output = Files.readString(log, StandardCharsets.UTF_8);
        Files.deleteIfExists(log);
        if (p.exitValue() == NO_TMUX) {
            if ("true".equals(System.getenv("CI"))) {
                fail(
                        "tmux is not installed but CI=true: the end-to-end shell test must run in CI (.ci/run installs tmux)");
            }
            Assumptions.abort("tmux is not installed: end-to-end shell test skipped (install tmux to run it)");
        }
        assertEquals(0, p.exitValue(), output);
        assertTrue(output.contains("e2e: passed"), output);
    }
}
