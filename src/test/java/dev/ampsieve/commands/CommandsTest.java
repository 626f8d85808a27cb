package dev.ampsieve.commands;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The command line builds only the command its words name ({@link Commands#onlyCommand}); these
 * check that the names match the classes, which words get the whole tree, and that a command
 * built alone answers exactly as in the whole tree (the second method: the tree with every command).
 */
class CommandsTest {

    @Test
    void eachNameIsItsClasssCommandName() {
        for (String name : Commands.NAMES) {
            Command c = Commands.newCommand(name).getClass().getAnnotation(Command.class);
            assertEquals(name, c.name());
        }
    }

    @Test
    void theUsageListsTheCommandsInTheirOrderThenHelp() {
        // the order the root command's annotation declared before the commands were added one by one
        List<String> expected = List.of(
                "check",
                "budget",
                "find",
                "rank",
                "compare",
                "suffices",
                "offset-rig",
                "bars",
                "scatter",
                "new-part",
                "import",
                "export",
                "completion",
                "record",
                "recheck",
                "help");
        String usage = run(null, "--help").out;
        List<String> listed = new ArrayList<>();
        boolean in = false;
        for (String line : usage.lines().toList()) {
            if (line.equals("Commands:")) {
                in = true;
            } else if (in && line.startsWith("  ")) {
                listed.add(line.strip().split(" +")[0]);
            } else if (in) {
                break;
            }
        }
        assertEquals(expected, listed);
    }

    @Test
    void onlyPlainRootOptionsThenACommandBuildOneCommand() {
        assertEquals("rank", Commands.onlyCommand(new String[] {"rank", "--stage", "s.yaml"}));
        assertEquals("rank", Commands.onlyCommand(new String[] {"--catalog", "c", "--strict", "--ascii", "rank"}));
        assertEquals("budget", Commands.onlyCommand(new String[] {"--catalog=c", "--verbose", "budget", "p"}));
        assertEquals("find", Commands.onlyCommand(new String[] {"--catalog=", "find", "rank"}));
    }

    @Test
    void helpVersionErrorsAndArgumentFilesGetTheWholeTree() {
        String[][] whole = {
            {},
            {"--help"},
            {"-h", "rank"},
            {"-V", "rank"},
            {"help", "rank"},
            {"completion", "bash"},
            {"rnak"},
            {"RANK"},
            {"--strict", "--strict", "rank"},
            {"--catalog", "rank", "rank"},
            {"--catalog", "--strict", "rank"},
            {"--catalog"},
            {"--catalog=a", "--catalog", "b", "rank"},
            {"@args.txt"},
            {"rank", "@more.txt"},
            {"--", "rank"},
        };
        for (String[] args : whole) {
            assertNull(Commands.onlyCommand(args), String.join(" ", args));
        }
    }

    @Test
    void aCommandBuiltAloneAnswersAsInTheWholeTree() {
        String[][] cases = {
            {"rank", "--stage", "no-such-stage.yaml"},
            {"rank", "--no-such-option"},
            {"rank", "--stage", "s.yaml", "--top=abc"},
            {"rank", "--stage", "s.yaml", "extra"},
            {"rank", "-h"},
            {"rank", "-V"},
            {"find", "--help"},
            {"budget"},
            {"check", "--bogus"},
            {"--catalog=", "rank", "--stage", "s.yaml"},
        };
        for (String[] args : cases) {
            String name = Commands.onlyCommand(args);
            Run alone = run(name, args);
            Run whole = run(null, args);
            String what = String.join(" ", args);
            assertEquals(args[0].startsWith("--catalog") ? args[1] : args[0], name, what);
            assertEquals(whole.code, alone.code, what);
            assertEquals(whole.out, alone.out, what);
            assertEquals(whole.err, alone.err, what);
        }
    }

    @Test
    void theShellsTreeHasEveryCommand() {
        StringWriter sink = new StringWriter();
        CommandLine tree = Commands.build(new RootCommand(), new PrintWriter(sink), new PrintWriter(sink));
        Map<String, CommandLine> subs = tree.getSubcommands();
        assertEquals(Commands.NAMES, List.copyOf(subs.keySet()));
    }

    private record Run(int code, String out, String err) {}

    private static Run run(String only, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        PrintWriter o = new PrintWriter(out);
        PrintWriter e = new PrintWriter(err);
        int code = Commands.build(new RootCommand(), o, e, true, only).execute(args);
        o.flush();
        e.flush();
        return new Run(code, out.toString(), err.toString());
    }
}
