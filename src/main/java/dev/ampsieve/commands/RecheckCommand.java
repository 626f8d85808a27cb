package dev.ampsieve.commands;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.record.DecisionRecord;
import dev.ampsieve.record.Finding;
import dev.ampsieve.record.PartFacts;
import dev.ampsieve.record.Recheck;
import dev.ampsieve.record.RecordFacts;
import dev.ampsieve.report.ProblemText;
import dev.ampsieve.report.RecordReport;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.text.Visible;
import dev.ampsieve.yaml.BoundedFiles;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.ParseResult;
import picocli.CommandLine.Spec;

/** {@code ampsieve recheck RECORD...}: does each recorded decision still hold against today's catalog? */
@Command(
        name = "recheck",
        header = "Re-check decision records against today's catalog.",
        mixinStandardHelpOptions = true,
        description =
                "Re-runs each record written by 'ampsieve record' (HTML or Markdown) with its recorded stage against "
                        + "today's catalog (--catalog DIR, else the folder the record names) and says whether it still holds: a "
                        + "part's catalog entry changed (each field, old and new), a part disappeared, a cheaper part now fits, a "
                        + "verdict or the largest term changed. Exit code 0 when every record holds, 1 when any changed.",
        footer = {"", "Example:", "  ampsieve recheck reviews/*.html"})
public final class RecheckCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Parameters(
            arity = "1..*",
            paramLabel = "RECORD",
            description = "Record files (.html or .md) written by 'ampsieve record'.")
    List<Path> records;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        boolean chosen = catalogChosen();
        int code = ExitCode.OK.code();
        List<Problem> problems = new ArrayList<>();
        for (Path file : records) {
            RecordFacts was;
            Stage stage;
            Catalog catalog;
            try {
                String text = new String(
                        BoundedFiles.read(file, RecordCommand.MAX_RECORD_BYTES, "record"), StandardCharsets.UTF_8);
                was = RecordReport.read(text, file);
                stage = StageLoader.parse(was.stageYaml(), file);
                catalog = chosen ? root.catalog() : CatalogLoader.load(Path.of(was.catalogPath()), false);
            } catch (InputException e) {
                problems.addAll(e.problems()); // the other records are still checked
                continue;
            }
            if (catalog.hasErrors()) {
                // a part in a file with errors is missing from today's catalog: say why it may be reported gone
                err.println("ampsieve: note: the catalog "
                        + Visible.of(catalog.root().toString()) + " has files with errors;"
                        + " their parts are left out ('ampsieve check' lists them)");
                err.flush();
            }
            List<Part> present = new ArrayList<>();
            for (PartFacts p : was.parts()) {
                catalog.find(p.id()).ifPresent(present::add);
            }
            // a change needs both parts; with one gone the rest is checked as a shortlist
            boolean change = was.kind() == RecordFacts.Kind.CHANGE && present.size() == 2;
            DecisionRecord today = DecisionRecord.build(
                    stage,
                    was.stagePath(),
                    catalog.root().toString(),
                    Parts.withLots(catalog.parts()),
                    present,
                    change,
                    was.date(),
                    was.toolVersion());
            List<Finding> findings = Recheck.compare(was, today.facts());
            out.print(RecordReport.recheck(file.toString(), was, catalog.root().toString(), findings));
            out.flush();
            if (!findings.isEmpty()) {
                code = ExitCode.FINDINGS.code();
            }
        }
        if (!problems.isEmpty()) {
            for (Problem p : problems) {
                err.println(ProblemText.line(p));
            }
            err.flush();
            return ExitCode.FINDINGS.code();
        }
        return code;
    }

    /** True when --catalog was given on this command line (before or after the command's name). */
    private boolean catalogChosen() {
        for (ParseResult pr = spec.root().commandLine().getParseResult(); pr != null; pr = pr.subcommand()) {
            if (pr.hasMatchedOption("--catalog")) {
                return true;
            }
        }
        return false;
    }
}
