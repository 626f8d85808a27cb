package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.commands.Commands;
import dev.ampsieve.failure.ExitCode;
import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/** A word no command takes is named with the nearest command, not with picocli's "Unmatched argument at index". */
class UnknownCommandTest {

    private static String[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Commands.run(args, new PrintWriter(out), new PrintWriter(err));
        return new String[] {Integer.toString(code), out.toString(), err.toString()};
    }

    @Test
    void aMisspelledCommandGetsTheNearestOne() {
        String[] r = run("rnak");
        assertEquals(Integer.toString(ExitCode.USAGE.code()), r[0]);
        assertEquals(
                "ampsieve: unknown command 'rnak'; did you mean 'rank'? ('ampsieve --help' lists the commands)\n",
                r[2].replace("\r", ""));
    }

    @Test
    void aWordFarFromEveryCommandGetsNoGuess() {
        String[] r = run("xyzzyq");
        assertEquals(
                "ampsieve: unknown command 'xyzzyq' ('ampsieve --help' lists the commands)\n", r[2].replace("\r", ""));
        assertTrue(!r[2].contains("Unmatched argument"), r[2]);
    }

    @Test
    void anExtraWordAfterACommandIsNamedWithIt() {
        String[] r = run("rank", "--stage", "s.yaml", "extra");
        assertEquals(Integer.toString(ExitCode.USAGE.code()), r[0]);
        assertEquals(
                "ampsieve rank: unexpected word 'extra' ('ampsieve rank --help' shows what it takes)\n",
                r[2].replace("\r", ""));
    }
}
