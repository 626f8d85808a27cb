package dev.ampsieve.commands;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.sheet.SheetExport;
import dev.ampsieve.text.Visible;
import dev.ampsieve.yaml.AtomicFiles;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve export --csv [--out FILE]}: the catalog as one spreadsheet. */
@Command(
        name = "export",
        header = "Write the catalog as a spreadsheet (CSV).",
        mixinStandardHelpOptions = true,
        description = "Write every part of the catalog as one CSV sheet, one part a row, in the layout 'import' reads:"
                + " a header of catalog keys with units in brackets (vos.max [uV], gbw [MHz]), every number exact, price"
                + " breaks as '1: 2.10; 1000: 1.25'. A text cell a spreadsheet could run as a formula (starting with"
                + " = + - @) gets a leading ' that import takes off again. Parts of catalog files with errors are left"
                + " out ('ampsieve check' lists them). Without --out the sheet goes to standard output.",
        footer = {
            "",
            "Example:",
            "  ampsieve --catalog my-catalog export --csv --out parts.csv",
            "  (edit parts.csv in a spreadsheet, export it as CSV again)",
            "  ampsieve import parts.csv --into my-catalog --force"
        })
public final class ExportCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Option(
            names = "--csv",
            required = true,
            description = "Write CSV (the one format there is; named so others can follow).")
    boolean csv;

    @Option(
            names = "--out",
            paramLabel = "FILE",
            description = "Write to FILE (whole or not at all) instead of standard output.")
    Path out;

    @Option(names = "--force", description = "Replace FILE when it exists.")
    boolean force;

    @Override
    public Integer call() throws Exception {
        Catalog catalog = root.catalog();
        PrintWriter o = spec.commandLine().getOut();
        Candidates.noteProblems(catalog, spec.commandLine().getErr());
        if (out == null) {
            o.print(SheetExport.csv(catalog.parts(), "\n"));
            o.flush();
            return ExitCode.OK.code();
        }
        AtomicFiles.write(
                out, SheetExport.csv(catalog.parts()), force, "add --force to replace it, or give another --out FILE");
        o.println(catalog.parts().size() + " part(s) written to " + Visible.of(out.toString()));
        o.flush();
        return ExitCode.OK.code();
    }
}
