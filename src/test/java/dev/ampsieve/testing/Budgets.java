package dev.ampsieve.testing;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.ConstraintResult;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.Trimmed;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/** Budgets built by hand for advice tests: the totals and verdict are what the test says. */
public final class Budgets {
    private Budgets() {}

    /**
     * A budget with two terms (offset and drift) adding up to {@code worstCaseV}; RSS taken as
     * 0.8 of it; after the trim only the drift part is left.
     */
    public static Budget budget(Stage s, Part p, double offsetV, double driftV, double trimmedWorstV, Verdict v) {
        List<TermResult> terms = new ArrayList<>(List.of(
                new TermResult(
                        "offset",
                        "initial offset",
                        offsetV,
                        offsetV / s.sourceGain(),
                        Double.NaN,
                        false,
                        dev.ampsieve.budget.TermWorking.plain("test")),
                new TermResult(
                        "drift",
                        "offset drift",
                        driftV,
                        driftV / s.sourceGain(),
                        s.tMax(),
                        false,
                        dev.ampsieve.budget.TermWorking.plain("test"))));
        terms.sort(Comparator.comparingDouble(TermResult::outputV).reversed());
        double wc = offsetV + driftV;
        return new Budget(
                p,
                s,
                s.noiseGain(),
                terms,
                wc,
                0.8 * wc,
                0,
                s.limitVolts(),
                new YieldResult(wc <= s.limitVolts() ? 1 : 0, 0, 1, 0, "test"),
                new Trimmed(trimmedWorstV, 0.8 * trimmedWorstV),
                v,
                terms.get(0).key(),
                List.of(),
                List.of());
    }

    /** Same, with a failed hard constraint. */
    public static Budget rejected(Stage s, Part p, ConstraintResult failed) {
        return new Budget(
                p,
                s,
                s.noiseGain(),
                List.of(),
                0,
                0,
                0,
                s.limitVolts(),
                new YieldResult(0, 0, 0, 0, "test"),
                new Trimmed(0, 0),
                Verdict.NO_FIT,
                null,
                List.of(failed),
                List.of());
    }
}
