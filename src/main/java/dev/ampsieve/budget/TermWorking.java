package dev.ampsieve.budget;

import dev.ampsieve.units.Dimension;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * How a term was computed, as data: which formula (a stable id, the term's key or a variant of
 * it), the operands it was evaluated with, and the remarks that qualify it. The report renders
 * it into words (report/TermNotes); the engine never does.
 *
 * @param formula  stable formula id: "offset", "drift", "aging-estimated", "not-counted", ...
 * @param operands values in the order the formula reads them
 * @param remarks  qualifications (typical-only figure, estimate, branch taken)
 */
public record TermWorking(String formula, List<Operand> operands, Set<TermRemark> remarks) {

    public TermWorking {
        operands = List.copyOf(operands);
        remarks = remarks.isEmpty() ? Set.of() : Collections.unmodifiableSet(EnumSet.copyOf(remarks));
    }

    /** A formula with no operands: a term that was not counted, or a test's stand-in. */
    public static TermWorking plain(String formula) {
        return new TermWorking(formula, List.of(), Set.of());
    }

    public static Builder of(String formula) {
        return new Builder(formula);
    }

    /** The named operand, if the formula used it. */
    public Optional<Operand> operand(String name) {
        return operands.stream().filter(o -> o.name().equals(name)).findFirst();
    }

    /** The named operand's value; NaN when absent. */
    public double value(String name) {
        return operand(name).map(Operand::value).orElse(Double.NaN);
    }

    public boolean has(TermRemark r) {
        return remarks.contains(r);
    }

    /** Collects operands and remarks in reading order. */
    public static final class Builder {
        private final String formula;
        private final List<Operand> operands = new ArrayList<>();
        private final Set<TermRemark> remarks = EnumSet.noneOf(TermRemark.class);

        private Builder(String formula) {
            this.formula = formula;
        }

        public Builder put(String name, double value, Dimension d) {
            operands.add(new Operand(name, value, d));
            return this;
        }

        public Builder remark(TermRemark r) {
            remarks.add(r);
            return this;
        }

        public Builder remark(boolean when, TermRemark r) {
            return when ? remark(r) : this;
        }

        public TermWorking build() {
            return new TermWorking(formula, operands, remarks);
        }
    }
}
