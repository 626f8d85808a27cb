package dev.ampsieve.budget;

import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import java.util.List;

/**
 * The full output error budget of one part in one stage.
 *
 * @param terms        every term, sorted largest first
 * @param worstCaseV   sum of term magnitudes (output volts)
 * @param rssV         root-sum-square of the same
 * @param noiseRmsV    integrated output noise, rms volts
 * @param limitV       the stage limit, output volts
 * @param trimmed      totals after the stage's trim method (one-point unless the stage names another method)
 * @param limitingTerm key of the largest term (for no-fit: the one that most needs to shrink)
 * @param assumptions  what stood in for missing or typical-only catalog and stage values, and the stage's
 *                     caveats (chopper, calibration, noise band), in the order found; the report words them
 */
public record Budget(
        Part part,
        Stage stage,
        double noiseGain,
        List<TermResult> terms,
        double worstCaseV,
        double rssV,
        double noiseRmsV,
        double limitV,
        YieldResult yield,
        Trimmed trimmed,
        Verdict verdict,
        String limitingTerm,
        List<ConstraintResult> constraints,
        List<Assumption> assumptions) {

    public Budget {
        terms = List.copyOf(terms);
        constraints = List.copyOf(constraints);
        assumptions = List.copyOf(assumptions);
    }

    /** All hard constraints met. */
    public boolean constraintsMet() {
        return constraints.stream().allMatch(ConstraintResult::ok);
    }

    /** Terms left out (or counted as 0 V) for want of a stage or catalog value, and why ({@link NotCounted#of}). */
    public List<NotCounted> notCounted() {
        return NotCounted.of(stage, part);
    }

    /** The part's measured lot fitted beside the datasheet ({@link Measurements}); empty without one. */
    public List<Measurement> measured() {
        return Measurements.of(part, stage);
    }

    public TermResult term(String key) {
        return terms.stream().filter(t -> t.key().equals(key)).findFirst().orElse(null);
    }

    /**
     * The counted terms, largest first, whose value rests on a figure that is not a guaranteed
     * catalog value (estimated, assumed or typical-only): where the verdict rests on them, the
     * ranking marks the row and the advice says so.
     *
     * @param afterTrim leave out the initial offset, which a trim removes
     */
    public List<TermResult> estimatedTerms(boolean afterTrim) {
        return terms.stream()
                .filter(t -> t.estimated() && t.outputV() > 0 && BudgetCalculator.counts(stage, t.key()))
                .filter(t -> !(afterTrim && t.key().equals(OffsetTerm.KEY)))
                .filter(t -> afterTrim || !BudgetCalculator.afterTrimOnly(t.key()))
                .toList();
    }
}
