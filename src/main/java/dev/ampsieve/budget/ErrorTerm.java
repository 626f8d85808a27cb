package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;

/**
 * One contribution to the output error of a stage (error-model.md, terms 1 to 10).
 * Implementations are small, final, stateless, and hold their formula with its published
 * source in Javadoc; the value returned is the worst-case magnitude at the worst
 * temperature of the stage's range, output-referred, with the input-referred value
 * (divided by the magnitude of the signal gain, so referred to the signal source) beside it.
 */
public interface ErrorTerm {

    /** Stable key used in JSON and tables: offset, drift, bias, ... */
    String key();

    /** Words for tables. */
    String label();

    /** True for static (DC) terms, which an AC-coupled stage counts only toward headroom. */
    boolean dc();

    /** Where the term comes from; the part's own figures unless a term says otherwise. */
    default TermKind kind() {
        return TermKind.PART;
    }

    /** Whether the term belongs in this stage's budget: every part term does; a board-level term only when named. */
    default boolean appliesTo(Stage stage) {
        return true;
    }

    /**
     * Whether the term exists only once the stage's trim is applied (what a trim circuit adds):
     * such a term is left out of the untrimmed totals and counted in the trimmed ones.
     */
    default boolean afterTrimOnly() {
        return false;
    }

    /** Evaluates the term for one part (its values already resolved) in one stage. */
    TermResult evaluate(Stage stage, PartValues values);

    /** Builds a result with the input-referred value derived from the output value. */
    static TermResult result(
            ErrorTerm t, Stage s, double outputV, double worstAtC, boolean estimated, TermWorking working) {
        return new TermResult(
                t.key(), t.label(), outputV, outputV / s.sourceGain(), worstAtC, estimated, working, t.kind());
    }

    /** A result of zero with a formula that has no operands (the term was not counted or does not apply). */
    static TermResult none(ErrorTerm t, Stage s, boolean estimated, String formula) {
        return result(t, s, 0.0, Double.NaN, estimated, TermWorking.plain(formula));
    }
}
