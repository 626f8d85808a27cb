package dev.ampsieve.shell;

import static java.nio.charset.StandardCharsets.UTF_8;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.commands.Commands;
import dev.ampsieve.commands.RootCommand;
import dev.ampsieve.report.OutputStyle;
import dev.ampsieve.testing.DemoCatalog;
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
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** What Tab offers, from the command tree's spec, the catalog and the stage keys. */
class ShellCompleterTest {

    @TempDir
    static Path shared;

    static Path catalog;

    private Terminal terminal;
    private LineReader reader;
    private ShellContext ctx;
    private ShellCompleter completer;

    @BeforeAll
    static void copyDemo() throws IOException {
        catalog = DemoCatalog.copyTo(shared);
    }

    @BeforeEach
    void tree() throws IOException {
        terminal = new DumbTerminal(
                "test", "dumb", new ByteArrayInputStream(new byte[0]), new ByteArrayOutputStream(), UTF_8);
        reader = LineReaderBuilder.builder().terminal(terminal).build();
        PrintWriter sink = new PrintWriter(new StringWriter());
        RootCommand root = new RootCommand();
        CommandLine tree = Commands.build(root, sink, sink);
        tree.parseArgs("--catalog", catalog.toString());
        ctx = new ShellContext(root, reader, sink, OutputStyle.PLAIN);
        ShellCommands.all(ctx).forEach(tree::addSubcommand);
        completer = new ShellCompleter(ctx, tree);
    }

    @AfterEach
    void close() throws IOException {
        terminal.close();
    }

    private List<String> complete(String line) {
        List<Candidate> out = new ArrayList<>();
        completer.complete(reader, new DefaultParser().parse(line, line.length(), ParseContext.COMPLETE), out);
        return out.stream().map(Candidate::value).toList();
    }

    @Test
    void commandNamesFromTheTreeIncludingTheShellsOwn() {
        List<String> c = complete("");
        for (String name : List.of(
                "ask",
                "set",
                "show",
                "save",
                "load",
                "help",
                "quit",
                "check",
                "budget",
                "rank",
                "find",
                "compare",
                "suffices",
                "bars",
                "scatter")) {
            assertTrue(c.contains(name), name + " in " + c);
        }
    }

    @Test
    void optionsFromTheCommandsSpec() {
        List<String> c = complete("rank --");
        assertTrue(c.containsAll(List.of("--stage", "--query", "--top", "--json", "--csv")), c.toString());
        assertTrue(complete("show -").contains("--all"));
    }

    @Test
    void partIdsWhereACommandTakesAPart() {
        List<String> c = complete("budget ");
        assertTrue(c.contains("zd-chop-01"), c.toString());
        assertEquals(48, c.size()); // every part of the demo catalog, nothing else
        assertTrue(complete("bars --stage s.yaml ").contains("zd-chop-01"));
    }

    @Test
    void fileNamesForAFileOption() throws IOException {
        Path f = Files.createFile(shared.resolve("my-stage.yaml"));
        List<Candidate> out = new ArrayList<>();
        String line = "rank --stage " + shared + "/my-";
        completer.complete(reader, new DefaultParser().parse(line, line.length(), ParseContext.COMPLETE), out);
        assertTrue(out.stream().anyMatch(c -> c.value().endsWith(f.getFileName().toString())), out.toString());
    }

    @Test
    void stageKeysAfterSetAndUnitsAfterANumber() {
        List<String> keys = complete("set ");
        assertTrue(
                keys.containsAll(List.of("gain", "temperature", "temperature.min", "limit", "limit.input", "rf")),
                keys.toString());
        assertEquals(List.of("10V", "10mV", "10uV", "10nV"), complete("set limit 10"));
        assertEquals(List.of("100ohm", "100kohm", "100Mohm"), complete("set rf 100"));
        assertEquals(
                List.of("non-inverting", "inverting", "follower", "difference", "transimpedance"),
                complete("set topology "));
        assertTrue(complete("set gain 100").isEmpty()); // a plain number has no unit to offer
        assertTrue(complete("unset tr").contains("trim.allowed"));
    }

    @Test
    void duringAQuestionOnlyThatQuestionsWords() {
        ctx.question = "temperature";
        assertEquals(List.of("-40..85C", "-40..85K"), complete("-40..85"));
        ctx.question = "limit";
        List<String> c = complete("10 u");
        assertTrue(c.contains("uV") && c.contains("mV"), c.toString());
        ctx.question = "trim.allowed";
        assertEquals(List.of("true", "false"), complete(""));
        assertFalse(complete("").contains("rank"));
    }

    @Test
    void keyReasonsInTheMenuAreWholeWordsWithNoBracketLeftOpen() {
        for (String id : Answers.ids()) {
            String why = Questions.why(id);
            String b = ShellCompleter.brief(why);
            org.junit.jupiter.api.Assertions.assertTrue(b.length() <= 60, id + ": " + b);
            long open = b.chars().filter(c -> c == '(').count();
            long close = b.chars().filter(c -> c == ')').count();
            org.junit.jupiter.api.Assertions.assertEquals(open, close, id + ": " + b);
            String body = b.endsWith("…") ? b.substring(0, b.length() - 1) : b;
            // the menu text is the reason's start, cut only where a word ends
            org.junit.jupiter.api.Assertions.assertTrue(why.startsWith(body), id + ": " + b);
            org.junit.jupiter.api.Assertions.assertTrue(
                    body.length() == why.length() || !Character.isLetterOrDigit(why.charAt(body.length())),
                    id + ": " + b);
        }
        // by hand: the supply variation's first clause is 53 characters, under the menu's 60
        org.junit.jupiter.api.Assertions.assertEquals(
                "peak supply change, times the part's supply rejection",
                ShellCompleter.brief(Questions.why("supply.variation")));
    }
}
