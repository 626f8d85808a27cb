package dev.ampsieve.advice;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.ConstraintResult;
import dev.ampsieve.catalog.Part;
import java.util.List;
import java.util.stream.Collectors;

/** A part that fails a hard constraint (supply, temperature grade, swing, slew, price ceiling). */
public record Rejected(Part part, Budget budget, String reason) {

    public String id() {
        return part.id();
    }

    static Rejected of(Budget b) {
        String reason = b.constraints().stream()
                .filter(c -> !c.ok())
                .map(c -> c.name() + ": " + c.detail())
                .collect(Collectors.joining("; "));
        return new Rejected(b.part(), b, reason);
    }

    /** The first failed constraint in full, the others by name: one line for a table. */
    public String shortReason() {
        List<ConstraintResult> failed =
                budget.constraints().stream().filter(c -> !c.ok()).toList();
        if (failed.size() <= 1) {
            return reason;
        }
        return failed.get(0).name() + ": " + failed.get(0).detail() + "; also "
                + failed.subList(1, failed.size()).stream()
                        .map(ConstraintResult::name)
                        .collect(Collectors.joining(", "));
    }

    /** Names of the failed constraints. */
    public List<String> failed() {
        return budget.constraints().stream()
                .filter(c -> !c.ok())
                .map(ConstraintResult::name)
                .toList();
    }
}
