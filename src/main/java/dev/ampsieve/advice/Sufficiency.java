package dev.ampsieve.advice;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.stage.Criterion;

/**
 * The direct answer to "can this part meet the spec without a trim?": yes only when it meets
 * every hard constraint and the limit as it is. {@code report} words the answer.
 *
 * @param untrimmedErrorV the criterion's total without any trim, output volts
 * @param margin          the criterion's own margin of that total (of yield under a yield criterion)
 * @param outcome         which answer, and why
 * @param afterTrimV      for {@link Outcome#NEEDS_TRIM}: the criterion's total after the stage's
 *                        trim, output volts; NaN otherwise
 */
public record Sufficiency(
        boolean yes, Budget budget, double untrimmedErrorV, double margin, Outcome outcome, double afterTrimV) {

    /** The answer's kind. */
    public enum Outcome {
        /** Meets every hard constraint and the limit as it is. */
        YES,
        /** Fails a hard constraint ({@link Rejected#failedConstraints()}). */
        FAILS_CONSTRAINT,
        /** Fits only after the stage's trim. */
        NEEDS_TRIM,
        /** The sampling left the untrimmed yield open: not shown met, so no. */
        UNDECIDED,
        /** Does not meet the limit untrimmed. */
        NO
    }

    public static Sufficiency of(Budget b) {
        Criterion crit = b.stage().criterion();
        double err = Candidate.total(crit, b.worstCaseV(), b.rssV());
        double margin = Candidate.marginOf(b, b.yield(), err); // the criterion's own margin
        if (!b.constraintsMet()) {
            return new Sufficiency(false, b, err, margin, Outcome.FAILS_CONSTRAINT, Double.NaN);
        }
        if (b.verdict() == Verdict.FITS) {
            return new Sufficiency(true, b, err, margin, Outcome.YES, Double.NaN);
        }
        if (b.verdict() == Verdict.FITS_AFTER_TRIM) {
            double after =
                    Candidate.total(crit, b.trimmed().worstCaseV(), b.trimmed().rssV());
            return new Sufficiency(false, b, err, margin, Outcome.NEEDS_TRIM, after);
        }
        if (b.verdict() == Verdict.UNDECIDED && b.yield().high() >= crit.yieldTarget()) {
            // not shown met: the answer to "does it suffice" is no, and why is the sampling, not a refutation
            return new Sufficiency(false, b, err, margin, Outcome.UNDECIDED, Double.NaN);
        }
        return new Sufficiency(false, b, err, margin, Outcome.NO, Double.NaN);
    }

    /** The part's failed hard constraints, in the budget's order. */
    public Rejected rejected() {
        return Rejected.of(budget);
    }
}
