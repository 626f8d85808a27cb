package dev.ampsieve.advice;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.ConstraintResult;
import dev.ampsieve.catalog.Part;
import java.util.List;

/**
 * A part that fails a hard constraint (supply, temperature grade, swing, slew, price ceiling). The
 * failed constraints are facts; {@code report.ConstraintText} words the reason.
 */
public record Rejected(Part part, Budget budget) {

    public String id() {
        return part.id();
    }

    static Rejected of(Budget b) {
        return new Rejected(b.part(), b);
    }

    /** The failed constraints, in the budget's order. */
    public List<ConstraintResult> failedConstraints() {
        return budget.constraints().stream().filter(c -> !c.ok()).toList();
    }

    /** Names of the failed constraints. */
    public List<String> failed() {
        return failedConstraints().stream().map(ConstraintResult::name).toList();
    }
}
