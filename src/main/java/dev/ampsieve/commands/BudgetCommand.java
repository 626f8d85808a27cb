package dev.ampsieve.commands;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.report.BudgetCsv;
import dev.ampsieve.report.BudgetJson;
import dev.ampsieve.report.BudgetText;
import dev.ampsieve.stage.Stage;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve budget PART --stage FILE [--json]}: the full error budget of one part in one stage. */
@Command(
        name = "budget",
        header = "Full error budget of one part in one stage.",
        mixinStandardHelpOptions = true,
        description =
                "Full output error budget of one catalog part in one stage: every term output- and input-referred, "
                        + "largest first, with its share of the limit and the temperature where it is worst; worst-case and RSS "
                        + "totals; integrated noise; the Monte Carlo yield with its 95 %% interval; what each trim method "
                        + "leaves; the hard constraints; the verdict and the limiting term; and a warning for every value that "
                        + "was estimated, typical-only or missing. The stage's own warnings go to stderr.",
        footer = {
            "",
            "Examples:",
            "  ampsieve budget prec-bip-02 --stage demo-catalog/stages/bridge-amp.yaml",
            "  ampsieve budget prec-bip-02 --stage my-stage.yaml --json > budget.json",
            "  ampsieve budget prec-bip-02 --stage my-stage.yaml --measured lot.csv",
            "Stage keys: 'ampsieve help stage-keys'."
        })
public final class BudgetCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Mixin
    PartArgument part;

    @Mixin
    StageOption stageOption;

    @Mixin
    TableFormat format;

    @Option(
            names = "--measured",
            paramLabel = "FILE",
            description = "A lot of this part measured on the bench (CSV: a header such as 'unit, vos (uV), ib (pA)',"
                    + " then one line per unit; README \"Measured units\"). Used in place of the catalog's"
                    + " 'measured' file: the Monte Carlo draws the offset from the lot's fit.")
    Path measured;

    @Override
    public Integer call() throws Exception {
        format.check();
        Catalog catalog = root.catalog();
        Candidates.noteUnusedFiles(catalog, spec.commandLine().getErr());
        Part p = part.in(catalog);
        if (measured != null) {
            p = Parts.withLot(p, measured);
        }
        Stage stage = stageOption.load();
        Budget b = BudgetCalculator.compute(stage, p);
        // with a lot, the same part from its datasheet alone: what the lot changed
        YieldResult datasheet = p.measured() == null
                ? null
                : BudgetCalculator.compute(stage, p.withMeasured(null)).yield();
        String label = stageOption.label();
        // the yield at other readings of a datasheet maximum: extra Monte Carlo runs, for this one part only
        var bySigma = BudgetCalculator.yieldBySigma(b);
        spec.commandLine()
                .getOut()
                .print(
                        format.json()
                                ? BudgetJson.render(b, bySigma, label, datasheet)
                                : format.csv()
                                        ? BudgetCsv.render(b, label)
                                        : BudgetText.render(b, bySigma, label, root.textWidth(), datasheet));
        return ExitCode.OK.code();
    }
}
