package dev.ampsieve.commands;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogKeys;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.report.ProblemText;
import dev.ampsieve.sheet.SheetImport;
import dev.ampsieve.text.Visible;
import dev.ampsieve.yaml.AtomicFiles;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Problem;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve import FILE.csv --into DIR}: a spreadsheet of parts into catalog part files. */
@Command(
        name = "import",
        header = "Turn a spreadsheet (CSV) of parts into catalog part files.",
        mixinStandardHelpOptions = true,
        description =
                "Read a CSV export of a spreadsheet (a header row of catalog keys such as id, architecture, input,"
                        + " vos.max [uV], gbw [MHz], one part a row) and write one part file per row, <id>.yaml, into DIR."
                        + " Each row is checked with the catalog's own rules before it is written; a row that does not"
                        + " convert is reported as file.csv:row:col: field: problem; fix, and the other rows are still"
                        + " written. An existing file is left as it is unless --force; each file is written whole or not"
                        + " at all. Exit 0 when every row converted, 1 when a row or the header has an error.",
        footer = {
            "",
            "Example:",
            "  ampsieve import parts.csv --into my-catalog",
            "  ampsieve --catalog my-catalog check",
            "",
            "Columns, units and the accepted spellings: README, section \"Spreadsheets\"; 'ampsieve export --csv' writes the layout."
        })
public final class ImportCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Parameters(
            index = "0",
            paramLabel = "FILE.csv",
            description = "The CSV file (UTF-8, comma-separated, decimal point).")
    Path csv;

    @Option(
            names = "--into",
            paramLabel = "DIR",
            required = true,
            description = "Folder to write the part files into (made if missing); usually your catalog folder.")
    Path into;

    @Option(names = "--force", description = "Replace a part file of the same name that already exists.")
    boolean force;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        SheetImport.Result r = SheetImport.read(csv);
        List<Problem> problems = new ArrayList<>(r.problems());
        if (r.headerFailed()) {
            problems.forEach(p -> err.println(ProblemText.line(p)));
            err.println("ampsieve: nothing imported: the header needs fixing first");
            err.flush();
            return ExitCode.FINDINGS.code();
        }
        prepare(into);
        Map<String, Located> known = knownIds(into);
        int written = 0;
        for (SheetImport.Row row : r.rows()) {
            Path target = into.resolve(row.id() + ".yaml");
            Located at = new Located(csv, row.row(), row.idColumn());
            Located there = known.get(row.id());
            if (there != null && !sameFile(there.file(), target)) {
                problems.add(Problem.error(
                        at,
                        CatalogKeys.ID,
                        "id '" + row.id() + "' is already in " + there.file() + ":" + there.line() + "; not written",
                        "give the part another id, or remove the other one"));
                continue;
            }
            try {
                AtomicFiles.write(target, row.yaml(), force, "");
                written++;
            } catch (InputException e) {
                Problem p = e.problems().get(0);
                boolean exists = ProblemText.message(p).startsWith("the file already exists");
                problems.add(Problem.error(
                        at,
                        CatalogKeys.ID,
                        target + ": " + ProblemText.message(p),
                        exists ? "add --force to replace it, or give the part another id" : ProblemText.fix(p)));
            }
        }
        problems.sort(Comparator.comparingInt(Problem::line).thenComparingInt(Problem::column));
        problems.forEach(p -> err.println(ProblemText.line(p)));
        err.flush();
        long failed = r.dataRows() - written;
        out.println(Visible.of(csv.toString()) + ": " + r.dataRows() + " row(s), " + written
                + " part file(s) written to " + Visible.of(into.toString())
                + (failed > 0 ? ", " + failed + " row(s) not written (see above)" : ""));
        out.flush();
        if (written > 0) {
            root.forgetCatalog(); // the shell reads the catalog again before its next command
        }
        return problems.stream().anyMatch(Problem::isError) ? ExitCode.FINDINGS.code() : ExitCode.OK.code();
    }

    static void prepare(Path dir) throws Refusal {
        if (Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new Refusal(
                    Visible.of(dir.toString()) + " is not a folder; give the folder to write into with --into DIR",
                    ExitCode.USAGE);
        }
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw new Refusal(
                    "cannot make the folder " + Visible.of(dir.toString()) + " ("
                            + dev.ampsieve.yaml.YamlFiles.describe(e) + ")",
                    ExitCode.FINDINGS);
        }
    }

    /** Ids already in the folder, and where; a folder that does not load as a catalog has none to clash with. */
    static Map<String, Located> knownIds(Path dir) {
        Map<String, Located> ids = new HashMap<>();
        try {
            Catalog c = CatalogLoader.load(dir, false);
            for (Part p : c.parts()) {
                ids.put(p.id(), p.where());
            }
        } catch (InputException e) {
            // an unreadable folder: the writes report it
        }
        return ids;
    }

    private static boolean sameFile(Path a, Path b) {
        try {
            return a != null && Files.exists(b, LinkOption.NOFOLLOW_LINKS) && Files.isSameFile(a, b);
        } catch (IOException e) {
            return false;
        }
    }
}
