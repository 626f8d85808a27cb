package dev.ampsieve.commands;

import dev.ampsieve.advice.Ranker;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Place;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.report.RankScatter;
import dev.ampsieve.stage.Stage;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve scatter --stage FILE}: the ranked candidates on an error-against-cost plane. */
@Command(
        name = "scatter",
        header = "Candidates plotted as error against cost, the limit marked.",
        mixinStandardHelpOptions = true,
        description = "The candidates of 'rank' (hard constraints met) as letters on a plane of output error "
                + "(log scale) against effective unit cost, with the limit drawn across and a legend. Sized to the "
                + "terminal; --ascii draws with plain characters.",
        footer = {
            "",
            "Example:",
            "  ampsieve scatter --stage demo-catalog/stages/bridge-amp.yaml --query 'input:bipolar'"
        })
public final class ScatterCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Mixin
    StageOption stageOption;

    @Mixin
    QueryOption query;

    @Option(
            names = "--top",
            paramLabel = "N",
            defaultValue = "20",
            description = "Candidates to plot, in ranking order (default ${DEFAULT-VALUE}; letters run out at 52).")
    int top;

    @Option(
            names = "--height",
            paramLabel = "ROWS",
            defaultValue = "12",
            description = "Rows of the plot (default ${DEFAULT-VALUE}).")
    int height;

    @Override
    public Integer call() throws Exception {
        if (top < 1 || height < 5) {
            throw new Refusal(
                    "--top must be 1 or more and --height 5 or more",
                    ExitCode.USAGE,
                    Place.field(top < 1 ? "--top" : "--height"));
        }
        Catalog catalog = root.catalog();
        Candidates.noteProblems(catalog, spec.commandLine().getErr());
        Stage stage = stageOption.load();
        List<Part> parts = query.parts(catalog, spec.commandLine().getErr());
        Ranking r = Ranker.rank(stage, parts, BudgetCalculator::screen);
        String name = stageOption.name();
        spec.commandLine().getOut().print(RankScatter.render(r, name, top, height, root.outputStyle()));
        return ExitCode.OK.code();
    }
}
