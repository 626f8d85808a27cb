package dev.ampsieve.shell;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.testing.Flat;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine.Command;

/**
 * Every kind of failure a user can cause reaches the shell's user through the one handler
 * ({@code commands.Failures}, in the shell's voice: no program name in front) with its place and
 * its exit code; the shell goes on. The same files and places as the command line's
 * {@code cli.FailureKindsTest}, counted by hand there.
 */
class ShellFailureKindsTest {

    @TempDir
    Path dir;

    private static final String BAD_PART = """
            id: kind-amp
            architecture: standard
            input: cmos
            vos: {max: 1 mV}
            gbw: 2 mA
            supply: {min: 2.7 V, max: 5.5 V}
            temperature: {min: -40 C, max: 125 C}
            price: {unit: 0.60, quantity: 1000}
            """;

    private static final String STAGE = "demo-catalog/stages/bridge-amp.yaml";

    private static Sessions.Ran session(String... lines) {
        return Sessions.withCodes(List.of(), List.of(), lines);
    }

    @Test
    void catalog() throws IOException {
        Path part = Files.writeString(dir.resolve("amp.yaml"), BAD_PART);
        Sessions.Ran r = Sessions.withCodes(List.of("--catalog", dir.toString(), "--strict"), List.of(), "find");
        assertEquals(List.of(ExitCode.FINDINGS.code()), r.codes(), r.printed());
        assertTrue(
                Flat.of(r.printed())
                        .contains("> " + part + ":5:6: gbw: '2 mA' is a current but a frequency belongs here;"
                                + " write a frequency such as '1.5 MHz'"),
                r.printed());
    }

    @Test
    void stage() throws IOException {
        Path stage = Files.writeString(dir.resolve("bad.yaml"), "gain: 10\nlimit: 1 mV\nrf: 10 kV\n");
        Sessions.Ran r = session("load " + stage, "budget prec-bip-01 --stage " + stage);
        assertEquals(List.of(ExitCode.FINDINGS.code(), ExitCode.FINDINGS.code()), r.codes(), r.printed());
        String line = stage
                + ":3:5: rf: '10 kV' is a voltage but a resistance belongs here; write a resistance such as '100 kohm'";
        assertEquals(2, Flat.of(r.printed()).split(java.util.regex.Pattern.quote(line), -1).length - 1, r.printed());
        assertFalse(r.printed().contains("[bad.yaml]"), r.printed()); // not loaded
    }

    @Test
    void query() {
        Sessions.Ran r = session("find vos<abc");
        assertEquals(List.of(ExitCode.FINDINGS.code()), r.codes(), r.printed());
        assertTrue(
                Flat.of(r.printed())
                        .contains("> query term 'vos<abc': 'abc' does not start with a number; write a voltage"
                                + " such as '2.5 uV'"),
                r.printed());
    }

    @Test
    void io() {
        Path missing = dir.resolve("missing.yaml");
        Sessions.Ran r = session("load " + missing);
        assertEquals(List.of(ExitCode.FINDINGS.code()), r.codes(), r.printed());
        assertTrue(
                Flat.of(r.printed())
                        .contains("> " + missing + ": cannot read the file (no such file: " + missing
                                + "); check that it exists and is readable"),
                r.printed());
    }

    @Test
    void usage() {
        Sessions.Ran r = session("load " + STAGE, "rank --top 0", "rnak", "budget nope-01");
        assertEquals(
                List.of(ExitCode.OK.code(), ExitCode.USAGE.code(), ExitCode.USAGE.code(), ExitCode.FINDINGS.code()),
                r.codes(),
                r.printed());
        String flat = Flat.of(r.printed());
        assertTrue(flat.contains("> --top must be 1 or more, not 0"), r.printed());
        assertTrue(
                flat.contains("> unknown command 'rnak'; did you mean 'rank'? ('help' lists the commands)"),
                r.printed());
        assertTrue(flat.contains("> no part 'nope-01' in the catalog "), r.printed());
        assertFalse(flat.contains("ampsieve: "), r.printed()); // the shell's voice: no program name in front
        Sessions.Ran none = session("rank");
        assertEquals(List.of(ExitCode.USAGE.code()), none.codes(), none.printed());
    }

    /** A command that fails the way only a bug can. */
    @Command(name = "explode")
    static final class Explode implements Callable<Integer> {
        @Override
        public Integer call() {
            throw new IllegalStateException("boom");
        }
    }

    @Test
    void internalIsOneLineAndTheTraceOnlyWithVerbose() {
        Sessions.Ran r = Sessions.withCodes(List.of(), List.of(new Explode()), "explode", "show");
        assertEquals(
                List.of(ExitCode.INTERNAL.code(), ExitCode.OK.code()), r.codes(), r.printed()); // the shell goes on
        assertTrue(
                Flat.of(r.printed())
                        .contains("> internal error: java.lang.IllegalStateException: boom (add --verbose to the"
                                + " command for the details)"),
                r.printed());
        assertFalse(r.printed().contains("\tat "), r.printed());
        Sessions.Ran v = Sessions.withCodes(List.of("--verbose"), List.of(new Explode()), "explode");
        assertEquals(List.of(ExitCode.INTERNAL.code()), v.codes(), v.printed());
        // the trace's tabs are shown as \t by the output guard, and long frames are folded
        assertTrue(
                Flat.of(v.printed()).contains("\\tat dev.ampsieve.shell.ShellFailureKindsTest$Explode.call("),
                v.printed());
    }
}
