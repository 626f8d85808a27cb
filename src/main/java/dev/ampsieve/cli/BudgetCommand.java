package dev.ampsieve.cli;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.report.BudgetJson;
import dev.ampsieve.report.BudgetText;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.text.Visible;
import dev.ampsieve.yaml.Fields;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParentCommand;
import picocli.CommandLine.Spec;

/** {@code ampsieve budget PART --stage FILE [--json]}: the full error budget of one part in one stage. */
@Command(name = "budget", header = "Full error budget of one part in one stage.", mixinStandardHelpOptions = true,
        description = "Full output error budget of one catalog part in one stage: every term output- and input-referred, "
            + "largest first, with its share of the limit and the temperature where it is worst; worst-case and RSS "
            + "totals; integrated noise; the Monte Carlo yield with its 95 %% interval; what each trim method "
            + "leaves; the hard constraints; the verdict and the limiting term; and a warning for every value that "
            + "was estimated, typical-only or missing. The stage's own warnings go to stderr.",
        footer = {"", "Examples:",
            "  ampsieve budget prec-bip-02 --stage demo-catalog/stages/bridge-amp.yaml",
            "  ampsieve budget prec-bip-02 --stage my-stage.yaml --json > budget.json",
            "Stage keys: 'ampsieve help stage-keys'."})
public final class BudgetCommand implements Callable<Integer> {

    @ParentCommand
    RootCommand root;

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PART", description = "Part id from the catalog.")
    String partId;

    @Mixin
    StageOption stageOption;

    @Option(names = "--json", description = "Print JSON (keys described in README) instead of the table.")
    boolean json;

    @Override
    public Integer call() throws Exception {
        Catalog catalog = root.catalog();
        Candidates.noteUnusedFiles(catalog, spec.commandLine().getErr());
        Part part = find(catalog, partId);
        Stage stage = stageOption.load();
        Budget b = BudgetCalculator.compute(stage, part);
        String label = stageOption.label();
        // the yield at other readings of a datasheet maximum: extra Monte Carlo runs, for this one part only
        var bySigma = BudgetCalculator.yieldBySigma(b);
        spec.commandLine().getOut().print(json ? BudgetJson.render(b, bySigma, label)
                : BudgetText.render(b, bySigma, label, root.textWidth()));
        return ExitCode.OK;
    }

    /** The part, or a one-line error naming the closest id. */
    static Part find(Catalog catalog, String id) {
        Optional<Part> p = catalog.find(id);
        if (p.isPresent()) {
            return p.get();
        }
        String near = Fields.closest(id, catalog.parts().stream().map(Part::id).toList());
        String msg = "no part '" + Visible.of(id) + "' in the catalog " + Visible.of(catalog.root().toString())
                + (near != null ? "; did you mean '" + near + "'?" : "; 'ampsieve check' lists what was read");
        if (catalog.hasErrors()) {
            msg += " (some catalog files have errors and were left out: run 'ampsieve check')";
        }
        throw new UserException(msg, ExitCode.FINDINGS);
    }
}
