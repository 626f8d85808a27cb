package dev.ampsieve.commands;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.report.Caution;
import dev.ampsieve.report.ProblemText;
import dev.ampsieve.text.Visible;
import dev.ampsieve.yaml.Problem;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/**
 * {@code ampsieve check}: reads every catalog file and lists every problem, grouped by file:
 * a heading line per file (its parts and its counts), then one line per problem, each still
 * starting with {@code file:line:col:} so editors and grep can jump to it.
 */
@Command(
        name = "check",
        header = "Check every catalog file; list each problem with its place and fix.",
        mixinStandardHelpOptions = true,
        description = {
            "Read the whole catalog and list every problem, grouped by file: a heading line naming the file, "
                    + "the parts it holds and how many errors and warnings it has, then one line per problem as "
                    + "file:line:col: field: problem; fix. An error leaves its part out of every search and ranking; a "
                    + "warning says what the budget will estimate or leave out. A file that looks like a stage file is "
                    + "skipped with one line. Exit 0 when there is no error, 1 when there is one."
        },
        footer = {
            "",
            "Examples:",
            "  ampsieve check                      every problem, grouped by file",
            "  ampsieve check --quiet              errors only, and the summary line",
            "  ampsieve --catalog ~/amps check --strict   refuse the catalog at the first file with an error"
        })
public final class CheckCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Option(
            names = {"-q", "--quiet"},
            description = "Show only errors (and the summary line); leave out warnings.")
    boolean quiet;

    @Override
    public Integer call() throws Exception {
        Catalog c = root.catalog();
        PrintWriter out = spec.commandLine().getOut();
        long errors = c.problems().stream().filter(Problem::isError).count();
        long warnings = c.problems().size() - errors;
        Map<Path, List<Problem>> byFile = new LinkedHashMap<>();
        for (Problem p : c.problems()) {
            if (!quiet || p.isError()) {
                byFile.computeIfAbsent(p.file(), f -> new ArrayList<>()).add(p);
            }
        }
        for (Map.Entry<Path, List<Problem>> e : byFile.entrySet()) {
            out.println(heading(e.getKey(), e.getValue(), c.parts()));
            e.getValue().forEach(p -> out.println(ProblemText.line(p)));
            out.println();
        }
        out.printf(
                "%s: %d file(s), %d part(s), %d error(s), %d warning(s)%n",
                Visible.of(c.root().toString()), c.files(), c.parts().size(), errors, warnings);
        if (!quiet) {
            out.println();
            out.println(Caution.TEXT);
        }
        return errors > 0 ? ExitCode.FINDINGS.code() : ExitCode.OK.code();
    }

    /** {@code == FILE: parts a, b: 1 error, 2 warnings}. */
    static String heading(Path file, List<Problem> problems, List<Part> parts) {
        long e = problems.stream().filter(Problem::isError).count();
        long w = problems.size() - e;
        List<String> ids = parts.stream()
                .filter(p -> p.where() != null && Objects.equals(p.where().file(), file))
                .map(Part::id)
                .toList();
        String what = ids.isEmpty()
                ? "no part loaded"
                : (ids.size() == 1 ? "part " : "parts ")
                        + String.join(", ", ids.subList(0, Math.min(5, ids.size())))
                        + (ids.size() > 5 ? " and " + (ids.size() - 5) + " more" : "");
        List<String> counts = new ArrayList<>();
        if (e > 0) {
            counts.add(count(e, "error"));
        }
        if (w > 0) {
            counts.add(count(w, "warning"));
        }
        return "== " + (file == null ? "(catalog)" : Visible.of(file.toString())) + ": " + Visible.of(what) + ": "
                + String.join(", ", counts);
    }

    /** "1 error", "3 errors". */
    static String count(long n, String noun) {
        return n + " " + noun + (n == 1 ? "" : "s");
    }
}
