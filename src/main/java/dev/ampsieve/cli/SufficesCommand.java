package dev.ampsieve.cli;

import dev.ampsieve.advice.Sufficiency;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.report.SufficesReport;
import dev.ampsieve.stage.Stage;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve suffices PART --stage FILE}: can this part meet the spec without a trim? */
@Command(name = "suffices", header = "Does this part meet the stage untrimmed? yes or no.", mixinStandardHelpOptions = true,
        description = "Answer whether one part meets the stage's limit and hard constraints as it is, with no trim: 'yes' or 'no' on the first line, then worst-case, RSS, yield and the largest term. Exit 0 for yes, 1 for no, so scripts can test it.",
        footer = {"", "Example:",
            "  ampsieve suffices prec-bip-02 --stage demo-catalog/stages/bridge-amp.yaml && echo keep it"})
public final class SufficesCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PART", description = "Part id from the catalog.")
    String partId;

    @Mixin
    StageOption stageOption;

    @Option(names = "--json", description = "Print JSON instead of text.")
    boolean json;

    @Override
    public Integer call() throws Exception {
        Catalog catalog = root.catalog();
        Candidates.noteUnusedFiles(catalog, spec.commandLine().getErr());
        Part part = BudgetCommand.find(catalog, partId);
        Stage stage = stageOption.load();
        Sufficiency s = Sufficiency.of(BudgetCalculator.compute(stage, part));
        String label = stageOption.label();
        String name = stageOption.name(); // text headers stay within 100 columns
        spec.commandLine().getOut().print(json ? SufficesReport.json(s, label) : SufficesReport.text(s, name, root.textWidth()));
        return s.yes() ? ExitCode.OK : ExitCode.FINDINGS;
    }
}
