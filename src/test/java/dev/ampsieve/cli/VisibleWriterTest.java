package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.commands.VisibleWriter;
import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/** The last guard on stdout and stderr: our colours pass, any other control is shown as an escape. */
class VisibleWriterTest {

    private static final String ESC = String.valueOf((char) 0x1b);

    @Test
    void ourColoursPassEverythingElseIsShown() {
        // SGR 31 red and 0 reset are what report.Ansi writes (ECMA-48 8.3.117)
        assertEquals(ESC + "[31mfail" + ESC + "[0m", VisibleWriter.guard(ESC + "[31mfail" + ESC + "[0m"));
        assertEquals(
                ESC + "[1mbold" + ESC + "[0m \\x1b[2J",
                VisibleWriter.guard(ESC + "[1mbold" + ESC + "[0m " + ESC + "[2J"));
        // SGR 8 (conceal) is not one of ours: it would hide text
        assertEquals("\\x1b[8mhidden", VisibleWriter.guard(ESC + "[8mhidden"));
        assertEquals(
                "\\x1b]0;title\\x07 \\x9b2J \\u202e",
                VisibleWriter.guard(ESC + "]0;title" + (char) 7 + " " + (char) 0x9b + "2J " + (char) 0x202e));
    }

    @Test
    void lineFeedsStayAndAPartialLineGoesOutOnFlush() {
        StringWriter sink = new StringWriter();
        PrintWriter w = new PrintWriter(VisibleWriter.over(sink));
        w.print("a" + ESC + "[3"); // a sequence split across two writes is still one line
        w.print("1mred" + ESC + "[0m\nb\tc");
        w.flush();
        assertEquals("a" + ESC + "[31mred" + ESC + "[0m\nb\\tc", sink.toString());
    }
}
