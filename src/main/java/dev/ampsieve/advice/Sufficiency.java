package dev.ampsieve.advice;

import static dev.ampsieve.advice.Phrases.volts;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.stage.Criterion;

/**
 * The direct answer to "can this part meet the spec without a trim?": yes only when it meets
 * every hard constraint and the limit as it is.
 *
 * @param untrimmedErrorV the criterion's total without any trim, output volts
 * @param answer          one line beginning "yes:" or "no:"
 */
public record Sufficiency(boolean yes, Budget budget, double untrimmedErrorV, double margin, String answer) {

    public static Sufficiency of(Budget b) {
        Criterion crit = b.stage().criterion();
        double err = Candidate.total(crit, b.worstCaseV(), b.rssV());
        double margin = Candidate.marginOf(b, b.yield(), err); // the criterion's own margin
        String id = b.part().id();
        String name = Phrases.totalName(crit);
        String figure = name + " " + volts(err) + " against " + volts(b.limitV());
        if (crit.kind() == Criterion.Kind.YIELD && b.yield() != null) {
            figure = "yield " + Phrases.yieldPercent(b.yield().value()) + " (95 % interval from "
                    + Phrases.yieldPercent(b.yield().low()) + ", target " + Phrases.percentFine(crit.yieldTarget())
                    + "), " + figure;
        }
        if (!b.constraintsMet()) {
            return new Sufficiency(
                    false,
                    b,
                    err,
                    margin,
                    "no: " + id + " fails a hard constraint: "
                            + String.join(", ", Rejected.of(b).failed()));
        }
        if (b.verdict() == Verdict.FITS) {
            return new Sufficiency(
                    true,
                    b,
                    err,
                    margin,
                    "yes: " + id + " meets the limit untrimmed; " + figure + " (" + Phrases.margin(crit, margin)
                            + ").");
        }
        TermResult t = b.limitingTerm() == null ? null : b.term(b.limitingTerm());
        String limited = t == null ? "" : ", limited by " + t.label() + " (" + volts(t.outputV()) + ")";
        if (b.verdict() == Verdict.FITS_AFTER_TRIM) {
            double after =
                    Candidate.total(crit, b.trimmed().worstCaseV(), b.trimmed().rssV());
            return new Sufficiency(
                    false,
                    b,
                    err,
                    margin,
                    "no: " + id + " needs the trim; untrimmed " + figure + limited + "; after the trim " + volts(after)
                            + ".");
        }
        if (b.verdict() == Verdict.UNDECIDED && b.yield().high() >= crit.yieldTarget()) {
            // not shown met: the answer to "does it suffice" is no, and why is the sampling, not a refutation
            return new Sufficiency(
                    false,
                    b,
                    err,
                    margin,
                    "no: " + id + " is undecided untrimmed: after " + b.yield().trials()
                            + " simulated units the 95 % interval of its yield still holds the target; " + figure
                            + limited + ".");
        }
        return new Sufficiency(
                false,
                b,
                err,
                margin,
                "no: " + id + " does not meet the limit untrimmed; " + figure
                        + (margin < 0 ? " (" + Phrases.margin(crit, margin) + ")" : "") + limited + ".");
    }
}
