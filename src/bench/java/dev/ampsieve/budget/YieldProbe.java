package dev.ampsieve.budget;

import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import java.util.List;

/**
 * Benchmark access to the package-private Monte Carlo ({@link YieldModel}): the untrimmed
 * yield of one part in one stage, set up exactly as {@link BudgetCalculator#compute} sets it
 * up, so a benchmark can time the sampling loop without the term evaluation around it.
 * Lives in the benchmark sources only; nothing in the program uses it.
 */
public final class YieldProbe {
    private final YieldModel model;

    private YieldProbe(YieldModel model) {
        this.model = model;
    }

    public static YieldProbe untrimmed(Stage stage, Part part) {
        PartValues v = PartValues.of(part, stage);
        List<TermResult> terms =
                BudgetCalculator.TERMS.stream().map(t -> t.evaluate(stage, v)).toList();
        double fixed = BudgetCalculator.fixedInYield(stage, terms, false, false);
        return new YieldProbe(new YieldModel(stage, v, fixed, false, false));
    }

    /** Runs the estimate; {@code target} NaN runs every trial, otherwise it may stop early. */
    public YieldResult run(double target) {
        return model.run(target);
    }
}
