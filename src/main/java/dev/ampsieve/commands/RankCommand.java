package dev.ampsieve.commands;

import dev.ampsieve.advice.Ranker;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Place;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.report.RankReport;
import dev.ampsieve.stage.Stage;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve rank --stage FILE}: every candidate budgeted, ranked, with the stage advice. */
@Command(
        name = "rank",
        header = "Rank the catalog for a stage, with trim and zero-drift advice.",
        mixinStandardHelpOptions = true,
        description =
                "Budget every catalog part (or those matching --query) in a stage, drop those failing a hard constraint, and rank the rest: parts that fit by unit cost (trim included where needed), then by margin; the Pareto front of error against cost; and advice on trims and zero-drift parts.",
        footer = {
            "",
            "--query takes the language of 'ampsieve find' ('ampsieve help query' lists every field), e.g.",
            "  --query \"input:cmos supply>=5V\"",
            "",
            "Examples:",
            "  ampsieve rank --stage demo-catalog/stages/bridge-amp.yaml",
            "  ampsieve rank --stage my-stage.yaml --query '-chopper vos<50uV' --csv > ranking.csv"
        })
public final class RankCommand implements Callable<Integer> {

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
            defaultValue = "15",
            description =
                    "Candidates (and, in the text, rejected parts) to list (default ${DEFAULT-VALUE}); advice and Pareto"
                            + " front use all.")
    int top;

    @Option(
            names = "--all",
            description = "Pareto front of every candidate, not only of the parts that fit (CSV: its pareto column).")
    boolean all;

    @Mixin
    TableFormat format;

    @Override
    public Integer call() throws Exception {
        format.check();
        if (top < 1) {
            throw new Refusal("--top must be 1 or more, not " + top, ExitCode.USAGE, Place.field("--top"));
        }
        Catalog catalog = root.catalog();
        Candidates.noteProblems(catalog, spec.commandLine().getErr());
        Stage stage = stageOption.load();
        List<Part> parts = query.parts(catalog, spec.commandLine().getErr());
        Ranking r = Ranker.rank(stage, parts, BudgetCalculator::screen);
        String label = stageOption.label();
        String name = stageOption.name(); // text headers stay within 100 columns
        String out = format.json()
                ? RankReport.json(r, label, query.text(), top, all)
                : format.csv()
                        ? RankReport.csv(r, label, query.text(), top, all)
                        : RankReport.text(r, name, query.text(), top, root.textWidth(), all);
        spec.commandLine().getOut().print(out);
        return ExitCode.OK.code();
    }
}
