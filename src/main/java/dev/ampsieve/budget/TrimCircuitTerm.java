package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.TrimCircuit;
import java.util.function.Predicate;

/**
 * What the error terms of a trim circuit share: a board-level term, counted after the trim only,
 * in the budget of a stage whose allowed trim uses one of the circuits it is about; for any other
 * stage it is none ("no-trim-circuit"). Each subclass keeps its own formula ({@link #evaluateFor}).
 */
abstract class TrimCircuitTerm implements ErrorTerm {
    private final String key;
    private final String label;
    private final boolean dc;
    private final Predicate<TrimCircuit.Kind> circuits;

    TrimCircuitTerm(String key, String label, boolean dc, Predicate<TrimCircuit.Kind> circuits) {
        this.key = key;
        this.label = label;
        this.dc = dc;
        this.circuits = circuits;
    }

    @Override
    public final String key() {
        return key;
    }

    @Override
    public final String label() {
        return label;
    }

    @Override
    public final boolean dc() {
        return dc;
    }

    @Override
    public final TermKind kind() {
        return TermKind.BOARD;
    }

    @Override
    public final boolean appliesTo(Stage s) {
        return BudgetCalculator.trimOf(s).allowed()
                && circuits.test(BudgetCalculator.trimOf(s).circuit().kind());
    }

    @Override
    public final boolean afterTrimOnly() {
        return true;
    }

    @Override
    public final TermResult evaluate(Stage s, PartValues v) {
        if (!appliesTo(s)) {
            return ErrorTerm.none(this, s, false, "no-trim-circuit"); // the stage's trim uses another circuit
        }
        return evaluateFor(s, v);
    }

    /** The term for a stage whose trim uses one of this term's circuits. */
    abstract TermResult evaluateFor(Stage s, PartValues v);
}
