package dev.ampsieve.shell;

import static java.nio.charset.StandardCharsets.US_ASCII;
import static java.nio.charset.StandardCharsets.UTF_8;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.commands.RootCommand;
import dev.ampsieve.report.OutputStyle;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.Charset;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.jline.terminal.Size;
import org.jline.terminal.Terminal;
import org.jline.terminal.impl.DumbTerminal;
import org.jline.terminal.impl.ExternalTerminal;
import org.junit.jupiter.api.Test;

/** Colours, charset and width from the terminal and the environment; where history goes. */
class ShellLookTest {

    private static Terminal xterm(Charset cs, int columns) throws IOException {
        Terminal t = new ExternalTerminal(
                "test", "xterm-256color", new ByteArrayInputStream(new byte[0]), new ByteArrayOutputStream(), cs);
        t.setSize(new Size(columns, 40));
        return t;
    }

    @Test
    void coloursOnlyOnARealTerminalWithoutNoColor() throws IOException {
        try (Terminal t = xterm(UTF_8, 120)) {
            assertTrue(Shell.look(t, Map.of(), false).color());
            // no-color.org: present and not empty disables colour; an empty value does not
            assertFalse(Shell.look(t, Map.of("NO_COLOR", "1"), false).color());
            assertTrue(Shell.look(t, Map.of("NO_COLOR", ""), false).color());
            assertEquals(120, Shell.look(t, Map.of(), false).width());
        }
        try (Terminal dumb = new DumbTerminal(
                "test", "dumb", new ByteArrayInputStream(new byte[0]), new ByteArrayOutputStream(), UTF_8)) {
            OutputStyle s = Shell.look(dumb, Map.of(), false);
            assertFalse(s.color());
            assertEquals(80, s.width()); // a dumb terminal reports no width
        }
    }

    @Test
    void commandsGetTheTerminalsWidthForTheirTables() throws IOException {
        RootCommand root = new RootCommand();
        assertEquals(OutputStyle.TEXT_WIDTH, root.textWidth()); // the command line: a fixed width for files and pipes
        try (Terminal t = new ExternalTerminal(
                "test",
                "xterm-256color",
                new ByteArrayInputStream("help\n".getBytes(UTF_8)),
                new ByteArrayOutputStream(),
                UTF_8)) {
            t.setSize(new Size(132, 40));
            new Shell(root, List.of(), t, null, Map.of()).run();
        }
        assertEquals(132, root.textWidth());
        assertEquals(132, root.outputStyle().width());
    }

    @Test
    void asciiWhenTheCharsetIsNotUtf8OrWhenAsked() throws IOException {
        try (Terminal t = xterm(US_ASCII, 100)) {
            assertFalse(Shell.look(t, Map.of(), false).unicode());
        }
        try (Terminal t = xterm(UTF_8, 100)) {
            assertTrue(Shell.look(t, Map.of(), false).unicode());
            assertFalse(Shell.look(t, Map.of(), true).unicode());
        }
    }

    @Test
    void asciiSessionsSpellUnitsInLetters() {
        String printed =
                Sessions.run(List.of("--ascii"), null, Map.of(), "set gain 100", "set limit 10 uV input", "show");
        assertTrue(printed.matches("(?s).*limit at the input\\s+10\\.0 uV.*"), printed);
        assertFalse(printed.contains("µ"), printed);
    }

    @Test
    void historyFollowsXdg() {
        // XDG Base Directory Specification 0.8: $XDG_DATA_HOME, else ~/.local/share; a relative value is ignored
        assertEquals(Path.of("/data/ampsieve/history"), XdgPaths.history(Map.of("XDG_DATA_HOME", "/data"), "/home/u"));
        assertEquals(Path.of("/home/u/.local/share/ampsieve/history"), XdgPaths.history(Map.of(), "/home/u"));
        assertEquals(
                Path.of("/home/u/.local/share/ampsieve/history"),
                XdgPaths.history(Map.of("XDG_DATA_HOME", "relative/dir"), "/home/u"));
        assertEquals(
                Path.of("/home/u/.local/share/ampsieve/history"),
                XdgPaths.history(Map.of("XDG_DATA_HOME", ""), "/home/u"));
    }

    @Test
    void everyUnitOfferedIsOneTheParserReads() throws Exception {
        for (Dimension d : Dimension.values()) {
            for (String u : UnitHints.of(d)) {
                double v = Units.parse("300" + u, d); // throws when the parser does not read the unit
                assertTrue(Double.isFinite(v), d + " " + u);
            }
        }
        // one check of the scale: 2 uV is 2e-6 V (SI prefix micro, SI Brochure table 7)
        assertEquals(2e-6, Units.parse("2uV", Dimension.VOLTAGE), 1e-21);
    }
}
