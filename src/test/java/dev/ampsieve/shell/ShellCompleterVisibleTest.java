package dev.ampsieve.shell;

import static java.nio.charset.StandardCharsets.UTF_8;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.commands.Commands;
import dev.ampsieve.commands.RootCommand;
import dev.ampsieve.report.OutputStyle;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.jline.reader.Candidate;
import org.jline.reader.LineReader;
import org.jline.reader.LineReaderBuilder;
import org.jline.reader.Parser.ParseContext;
import org.jline.reader.impl.DefaultParser;
import org.jline.terminal.Terminal;
import org.jline.terminal.impl.DumbTerminal;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** What Tab offers never carries a raw control character: catalog titles and file names are shown escaped. */
class ShellCompleterVisibleTest {

    private static final char ESC = 0x1b;

    /** An invented part whose title sets the window title (OSC 0 ... BEL), written with YAML escapes. */
    private static final String PART = String.join(
            "\n",
            "id: title-amp",
            "title: \"quiet \\e]0;owned\\a\\u202eamp\"",
            "architecture: standard",
            "input: cmos",
            "vos: {typ: 0.2 mV, max: 1 mV}",
            "gbw: 2 MHz",
            "supply: {min: 2.7 V, max: 5.5 V}",
            "temperature: {min: -40 C, max: 125 C}",
            "price: {unit: 0.60, quantity: 1000}",
            "");

    private List<Candidate> complete(Path catalog, String line) throws IOException {
        try (Terminal terminal = new DumbTerminal(
                "test", "dumb", new ByteArrayInputStream(new byte[0]), new ByteArrayOutputStream(), UTF_8)) {
            LineReader reader = LineReaderBuilder.builder().terminal(terminal).build();
            PrintWriter sink = new PrintWriter(new StringWriter());
            RootCommand root = new RootCommand();
            CommandLine tree = Commands.build(root, sink, sink);
            tree.parseArgs("--catalog", catalog.toString());
            ShellContext ctx = new ShellContext(root, reader, sink, OutputStyle.PLAIN);
            ShellCommands.all(ctx).forEach(tree::addSubcommand);
            List<Candidate> out = new ArrayList<>();
            new ShellCompleter(ctx, tree)
                    .complete(reader, new DefaultParser().parse(line, line.length(), ParseContext.COMPLETE), out);
            return out;
        }
    }

    @Test
    void aPartTitleIsDescribedEscaped(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("amp.yaml"), PART);
        List<Candidate> c = complete(dir, "budget ");
        assertEquals(1, c.size(), c.toString());
        assertEquals("title-amp", c.get(0).value());
        assertEquals("quiet \\x1b]0;owned\\x07\\u202eamp", c.get(0).descr());
    }

    @Test
    void aFileNameWithEscIsOfferedEscaped(@TempDir Path dir) throws IOException {
        Files.createFile(dir.resolve("st" + ESC + "[2Jage.yaml"));
        String line = "rank --stage " + dir + "/st";
        List<Candidate> c = complete(dir, line);
        assertEquals(1, c.size(), c.toString());
        assertTrue(c.get(0).value().endsWith("st\\x1b[2Jage.yaml"), c.get(0).value());
        assertEquals("st\\x1b[2Jage.yaml", c.get(0).displ());
    }

    @Test
    void everyFieldOfACandidateIsMadeVisible() {
        Candidate raw = new Candidate(
                "id" + ESC + "[2J",
                "shown" + (char) 0x9b,
                "group" + (char) 7,
                "about" + (char) 0x202e,
                null,
                "key",
                true,
                3);
        Candidate v = ShellCompleter.visible(raw);
        assertEquals("id\\x1b[2J", v.value());
        assertEquals("shown\\x9b", v.displ());
        assertEquals("group\\x07", v.group());
        assertEquals("about\\u202e", v.descr());
        assertEquals("key", v.key());
        assertEquals(3, v.sort());
        assertTrue(v.complete());
    }
}
