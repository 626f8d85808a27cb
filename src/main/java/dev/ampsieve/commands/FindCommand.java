package dev.ampsieve.commands;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.report.FindReport;
import dev.ampsieve.search.QueryLanguage;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve find QUERY...}: catalog parts matching words and constraints. */
@Command(
        name = "find",
        header = "List catalog parts matching words and constraints.",
        mixinStandardHelpOptions = true,
        description = "List the catalog parts that match a query of words and constraints, most relevant first, then "
                + "cheapest, with their key figures (offset, drift, bias current, gain-bandwidth, noise, supply). Every "
                + "term must hold; a word with a leading '-' excludes the parts that have it, with no '--' needed. "
                + "Exit 0 when something matches, 1 when nothing does.")
public final class FindCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    /**
     * Lets {@code -word} through as a query term (picocli would take it for an unknown option;
     * real options still win) and sets the help footer from the query language's own tables.
     */
    static void configure(CommandLine find) {
        find.setUnmatchedOptionsArePositionalParams(true);
        // "-hot" must not read as -h plus "ot"
        find.setPosixClusteredShortOptionsAllowed(false);
        List<String> footer = new ArrayList<>();
        footer.add("");
        // picocli formats footer lines: a % of ours must stay a %
        QueryLanguage.helpLines().forEach(l -> footer.add(l.replace("%", "%%")));
        footer.add("");
        footer.add("More: 'ampsieve help query' (every field with its meaning), 'ampsieve help units'.");
        find.getCommandSpec().usageMessage().footer(footer.toArray(String[]::new));
    }

    /**
     * Takes every word up to the next real option (an exact option name, or one with '=') as a
     * query term. picocli alone would still take {@code -hot} or {@code -Vx} for an option,
     * because their second letter names a short option ({@code -h}, {@code -V}).
     */
    static final class QueryWords implements CommandLine.IParameterPreprocessor {
        @Override
        public boolean preprocess(
                java.util.Stack<String> args,
                CommandLine.Model.CommandSpec spec,
                CommandLine.Model.ArgSpec argSpec,
                java.util.Map<String, Object> info) {
            List<String> words =
                    new ArrayList<>(argSpec.getValue() == null ? List.of() : argSpec.<List<String>>getValue());
            while (!args.isEmpty() && !realOption(args.peek(), spec)) {
                words.add(args.pop());
            }
            argSpec.setValue(words);
            return true;
        }

        private static boolean realOption(String arg, CommandLine.Model.CommandSpec spec) {
            int eq = arg.indexOf('=');
            return arg.equals("--")
                    || spec.optionsMap().containsKey(arg)
                    || arg.startsWith("--") && eq > 0 && spec.optionsMap().containsKey(arg.substring(0, eq));
        }
    }

    @Parameters(
            paramLabel = "QUERY",
            arity = "0..*",
            preprocessor = QueryWords.class,
            description = "Words and constraints; all must hold; -word excludes. None: every part.")
    List<String> query = List.of();

    @Mixin
    JsonOption format;

    @Override
    public Integer call() throws Exception {
        Catalog catalog = root.catalog();
        Candidates.noteProblems(catalog, spec.commandLine().getErr());
        String text = String.join(" ", query).strip();
        List<Part> parts = Candidates.matching(catalog, text, spec.commandLine().getErr());
        spec.commandLine()
                .getOut()
                .print(format.json() ? FindReport.json(text, parts) : FindReport.text(text, parts, root.textWidth()));
        return parts.isEmpty() ? ExitCode.FINDINGS.code() : ExitCode.OK.code();
    }
}
