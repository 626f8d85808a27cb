package dev.ampsieve.commands;

import dev.ampsieve.advice.Comparison;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.report.CompareReport;
import dev.ampsieve.stage.Stage;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve compare A B --stage FILE}: two budgets side by side, term by term, and which to use. */
@Command(
        name = "compare",
        header = "Two parts in one stage, term by term.",
        mixinStandardHelpOptions = true,
        description = "Two parts in one stage, term by term: which is better and by how much, the totals, the cost, "
                + "and a one-line conclusion, for the written record of a part change or a second source.",
        footer = {
            "",
            "Example:",
            "  ampsieve compare prec-bip-02 zd-chop-04 --stage demo-catalog/stages/bridge-amp.yaml"
        })
public final class CompareCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "A", description = "First part id.")
    String a;

    @Parameters(index = "1", paramLabel = "B", description = "Second part id.")
    String b;

    @Mixin
    StageOption stageOption;

    @Mixin
    TableFormat format;

    @Override
    public Integer call() throws Exception {
        format.check();
        Catalog catalog = root.catalog();
        Candidates.noteUnusedFiles(catalog, spec.commandLine().getErr());
        Part pa;
        try {
            pa = Parts.find(catalog, a);
        } catch (Refusal missingA) {
            // name both unknown ids at once, so the user fixes the line in one go
            try {
                Parts.find(catalog, b);
            } catch (Refusal missingB) {
                throw new Refusal(
                        missingA.getMessage() + "\n" + missingB.getMessage(), ExitCode.FINDINGS, missingA.place());
            }
            throw missingA;
        }
        Part pb = Parts.find(catalog, b);
        Stage stage = stageOption.load();
        Comparison c = Comparison.of(BudgetCalculator.compute(stage, pa), BudgetCalculator.compute(stage, pb));
        String label = stageOption.label();
        String name = stageOption.name(); // text headers stay within 100 columns
        spec.commandLine()
                .getOut()
                .print(
                        format.json()
                                ? CompareReport.json(c, label)
                                : format.csv()
                                        ? CompareReport.csv(c, label)
                                        : CompareReport.text(c, name, root.textWidth()));
        return ExitCode.OK.code();
    }
}
