package dev.ampsieve.cli;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.report.Caution;
import dev.ampsieve.text.Visible;
import dev.ampsieve.yaml.Problem;
import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve check}: reads every catalog file and lists every problem, one line each. */
@Command(name = "check", header = "Check every catalog file; list each problem with its place and fix.", mixinStandardHelpOptions = true,
        description = "Read the whole catalog and list every problem as file:line:col: field: problem; fix.")
public final class CheckCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        Catalog c = root.catalog();
        PrintWriter out = spec.commandLine().getOut();
        long errors = c.problems().stream().filter(Problem::isError).count();
        long warnings = c.problems().size() - errors;
        for (Problem p : c.problems()) {
            out.println(p);
        }
        out.printf("%s: %d file(s), %d part(s), %d error(s), %d warning(s)%n",
                Visible.of(c.root().toString()), c.files(), c.parts().size(), errors, warnings);
        out.println();
        out.println(Caution.TEXT);
        return errors > 0 ? ExitCode.FINDINGS : ExitCode.OK;
    }
}
