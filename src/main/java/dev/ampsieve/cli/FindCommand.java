package dev.ampsieve.cli;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.report.FindReport;
import dev.ampsieve.search.QueryLanguage;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve find QUERY...}: catalog parts matching words and constraints. */
@Command(name = "find", header = "List catalog parts matching words and constraints.", mixinStandardHelpOptions = true,
        description = "List the catalog parts that match a query of words and constraints, most relevant first, then cheapest, with their key figures. Exit 0 when something matches, 1 when nothing does.",
        footer = {"", QueryLanguage.HELP})
public final class FindCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "QUERY", arity = "0..*", description = "Words and constraints; all must hold. None: every part.")
    List<String> query = List.of();

    @Option(names = "--json", description = "Print JSON instead of the table.")
    boolean json;

    @Override
    public Integer call() throws Exception {
        Catalog catalog = root.catalog();
        Candidates.noteProblems(catalog, spec.commandLine().getErr());
        String text = String.join(" ", query).strip();
        List<Part> parts = Candidates.matching(catalog, text, spec.commandLine().getErr());
        spec.commandLine().getOut().print(json ? FindReport.json(text, parts) : FindReport.text(text, parts, root.textWidth()));
        return parts.isEmpty() ? ExitCode.FINDINGS : ExitCode.OK;
    }
}
