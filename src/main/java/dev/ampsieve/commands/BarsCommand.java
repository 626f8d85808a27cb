package dev.ampsieve.commands;

import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.report.BudgetBars;
import dev.ampsieve.stage.Stage;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve bars PART --stage FILE}: one part's error terms as bars against the limit. */
@Command(
        name = "bars",
        header = "One part's error terms as bars against the limit.",
        mixinStandardHelpOptions = true,
        description = "Each error term of one part in a stage as a bar at the output, the totals below, and the "
                + "limit marked across: which term to attack first, at a glance. Sized to the terminal; --ascii "
                + "draws with plain characters.",
        footer = {"", "Example:", "  ampsieve bars prec-bip-02 --stage demo-catalog/stages/bridge-amp.yaml"})
public final class BarsCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Mixin
    PartArgument part;

    @Mixin
    StageOption stageOption;

    @Override
    public Integer call() throws Exception {
        Catalog catalog = root.catalog();
        Candidates.noteUnusedFiles(catalog, spec.commandLine().getErr());
        Part p = part.in(catalog);
        Stage stage = stageOption.load();
        String name = stageOption.name();
        spec.commandLine()
                .getOut()
                .print(BudgetBars.render(BudgetCalculator.compute(stage, p), name, root.outputStyle()));
        return ExitCode.OK.code();
    }
}
