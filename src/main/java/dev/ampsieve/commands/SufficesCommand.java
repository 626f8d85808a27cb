package dev.ampsieve.commands;

import dev.ampsieve.advice.Sufficiency;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.report.SufficesReport;
import dev.ampsieve.stage.Stage;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve suffices PART --stage FILE}: can this part meet the spec without a trim? */
@Command(
        name = "suffices",
        header = "Does this part meet the stage untrimmed? yes or no.",
        mixinStandardHelpOptions = true,
        description =
                "Answer whether one part meets the stage's limit and hard constraints as it is, with no trim: 'yes' or 'no' on the first line, then worst-case, RSS, yield and the largest term. Exit 0 for yes, 1 for no, so scripts can test it.",
        footer = {
            "",
            "Example:",
            "  ampsieve suffices prec-bip-02 --stage demo-catalog/stages/bridge-amp.yaml && echo keep it"
        })
public final class SufficesCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Mixin
    PartArgument part;

    @Mixin
    StageOption stageOption;

    @Mixin
    JsonOption format;

    @Override
    public Integer call() throws Exception {
        Catalog catalog = root.catalog();
        Candidates.noteUnusedFiles(catalog, spec.commandLine().getErr());
        Part p = part.in(catalog);
        Stage stage = stageOption.load();
        Sufficiency s = Sufficiency.of(BudgetCalculator.compute(stage, p));
        String label = stageOption.label();
        String name = stageOption.name(); // text headers stay within 100 columns
        spec.commandLine()
                .getOut()
                .print(format.json() ? SufficesReport.json(s, label) : SufficesReport.text(s, name, root.textWidth()));
        return s.yes() ? ExitCode.OK.code() : ExitCode.FINDINGS.code();
    }
}
