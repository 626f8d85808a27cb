package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.commands.Commands;
import dev.ampsieve.failure.ExitCode;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * Every kind of failure a user can cause reaches the command line through the one handler
 * ({@code commands.Failures}) with its place and its exit code; anything else is an internal
 * error in one line. The shell's counterpart is {@code shell.ShellFailureKindsTest}. The places
 * are counted by hand in the files written here (line 1 is the first line, column 1 its first
 * character).
 */
class FailureKindsTest {

    @TempDir
    Path dir;

    /** An invented part whose gain-bandwidth is written as a current: line 5, the value at column 6 ("gbw: " is 5 characters). */
    static final String BAD_PART = """
            id: kind-amp
            architecture: standard
            input: cmos
            vos: {max: 1 mV}
            gbw: 2 mA
            supply: {min: 2.7 V, max: 5.5 V}
            temperature: {min: -40 C, max: 125 C}
            price: {unit: 0.60, quantity: 1000}
            """;

    /** A stage whose rf is written as a voltage: line 3, the value at column 5 ("rf: " is 4 characters). */
    static final String BAD_STAGE = "gain: 10\nlimit: 1 mV\nrf: 10 kV\n";

    static final String STAGE = "demo-catalog/stages/bridge-amp.yaml";

    @Test
    void catalog() throws IOException {
        Path part = Files.writeString(dir.resolve("amp.yaml"), BAD_PART);
        CliRun r = CliRun.of("--catalog", dir.toString(), "--strict", "find");
        assertEquals(ExitCode.FINDINGS.code(), r.code(), r.toString());
        assertEquals(
                part + ":5:6: gbw: '2 mA' is a current but a frequency belongs here; write a frequency such as"
                        + " '1.5 MHz'\n",
                r.err());
    }

    @Test
    void stage() throws IOException {
        Path stage = Files.writeString(dir.resolve("bad.yaml"), BAD_STAGE);
        CliRun r = CliRun.of("budget", "prec-bip-01", "--stage", stage.toString());
        assertEquals(ExitCode.FINDINGS.code(), r.code(), r.toString());
        assertEquals(
                stage + ":3:5: rf: '10 kV' is a voltage but a resistance belongs here; write a resistance such as"
                        + " '100 kohm'\n",
                r.err());
        assertEquals("", r.out());
    }

    @Test
    void query() {
        CliRun r = CliRun.of("find", "vos<abc");
        assertEquals(ExitCode.FINDINGS.code(), r.code(), r.toString());
        // no file: the place is the query term
        assertEquals(
                "query term 'vos<abc': 'abc' does not start with a number; write a voltage such as '2.5 uV'\n",
                r.err());
    }

    @Test
    void io() {
        Path missing = dir.resolve("missing.yaml");
        CliRun r = CliRun.of("rank", "--stage", missing.toString());
        assertEquals(ExitCode.FINDINGS.code(), r.code(), r.toString());
        assertEquals(
                missing + ": cannot read the file (no such file: " + missing
                        + "); check that it exists and is readable\n",
                r.err());
    }

    @Test
    void usage() {
        CliRun r = CliRun.of("rank", "--stage", STAGE, "--top", "0");
        assertEquals(ExitCode.USAGE.code(), r.code(), r.toString());
        assertEquals("ampsieve: --top must be 1 or more, not 0\n", r.err()); // the place is the option it names
        CliRun unknown = CliRun.of("budget", "nope-01", "--stage", STAGE);
        assertEquals(ExitCode.FINDINGS.code(), unknown.code(), unknown.toString());
        assertTrue(unknown.err().startsWith("ampsieve: no part 'nope-01' in the catalog "), unknown.err());
    }

    /** A command that fails the way only a bug can. */
    @Command(name = "explode")
    static final class Explode implements Callable<Integer> {
        @Override
        public Integer call() {
            throw new IllegalStateException("boom");
        }
    }

    private static CliRun internal(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine tree = Commands.build(new PrintWriter(out), new PrintWriter(err));
        tree.addSubcommand(new Explode());
        tree.setOut(new PrintWriter(out)).setErr(new PrintWriter(err)); // picocli hands them to the subcommands present
        int code = tree.execute(args);
        return new CliRun(code, out.toString(), err.toString());
    }

    @Test
    void internalIsOneLineAndTheTraceOnlyWithVerbose() {
        CliRun r = internal("explode");
        assertEquals(ExitCode.INTERNAL.code(), r.code(), r.toString());
        assertEquals(
                "ampsieve: internal error: java.lang.IllegalStateException: boom (run again with --verbose for the"
                        + " details)\n",
                r.err());
        CliRun v = internal("--verbose", "explode");
        assertEquals(ExitCode.INTERNAL.code(), v.code(), v.toString());
        assertEquals(
                "ampsieve: internal error: java.lang.IllegalStateException: boom",
                v.err().lines().findFirst().orElse(""));
        assertTrue(v.err().contains("\tat dev.ampsieve.cli.FailureKindsTest$Explode.call("), v.err());
        assertFalse(r.err().contains("\tat "), r.err());
    }
}
