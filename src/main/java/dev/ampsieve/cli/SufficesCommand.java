package dev.ampsieve.cli;

import dev.ampsieve.advice.Sufficiency;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.report.SufficesReport;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve suffices PART --stage FILE}: can this part meet the spec without a trim? */
@Command(name = "suffices", header = "Does this part meet the stage untrimmed? yes or no.", mixinStandardHelpOptions = true,
        description = {"Answer whether one part meets the stage's limit and hard constraints as it is, with no",
            "trim: 'yes' or 'no' on the first line, then worst-case, RSS, yield and the largest term.",
            "Exit 0 for yes, 1 for no."})
public final class SufficesCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PART", description = "Part id from the catalog.")
    String partId;

    @Option(names = "--stage", required = true, paramLabel = "FILE", description = "Stage file (YAML).")
    Path stageFile;

    @Option(names = "--json", description = "Print JSON instead of text.")
    boolean json;

    @Override
    public Integer call() throws Exception {
        Part part = BudgetCommand.find(root.catalog(), partId);
        Stage stage = StageLoader.load(stageFile);
        Sufficiency s = Sufficiency.of(BudgetCalculator.compute(stage, part));
        String label = stageFile.toString();
        String name = String.valueOf(stageFile.getFileName()); // text headers stay within 100 columns
        spec.commandLine().getOut().print(json ? SufficesReport.json(s, label) : SufficesReport.text(s, name));
        return s.yes() ? ExitCode.OK : ExitCode.FINDINGS;
    }
}
