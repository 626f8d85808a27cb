package dev.ampsieve.advice;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Stage;

/**
 * One part as it would be built in the stage.
 *
 * @param trimmed       the figures include the stage's trim: its cost is in {@code effectiveCost}
 *                      and {@code errorV} is the total left after it
 * @param effectiveCost unit price at the stage quantity (its price break) plus the trim cost (with its circuit's parts) when trimmed; NaN when the catalog has no price
 * @param errorV        the total the criterion judges (worst-case sum; RSS for the RSS and
 *                      yield criteria), output volts
 * @param margin        the margin of the criterion in force: (E - errorV) / E with E the stage limit under
 *                      the worst-case and RSS criteria; under a yield criterion the lower end of the
 *                      yield's 95 % interval minus the target (as a fraction: 0.0005 is 0.05 points),
 *                      never an RSS figure; negative when the criterion is not shown met
 */
public record Candidate(Part part, Budget budget, boolean trimmed, double effectiveCost, double errorV, double margin) {

    public String id() {
        return part.id();
    }

    public Verdict verdict() {
        return budget.verdict();
    }

    public boolean constraintsMet() {
        return budget.constraintsMet();
    }

    /** Meets every hard constraint and the limit, as it is or after the stage's trim (an undecided yield does not). */
    public boolean fits() {
        return constraintsMet() && verdict().fits();
    }

    /** The counted terms of the figures the verdict judges (after the trim when trimmed) that rest on an estimate. */
    public java.util.List<dev.ampsieve.budget.TermResult> estimatedTerms() {
        return budget.estimatedTerms(trimmed);
    }

    /** True when some counted term of the judged figures rests on an estimated, assumed or typical-only figure. */
    public boolean restsOnEstimate() {
        return !estimatedTerms().isEmpty();
    }

    public double limitV() {
        return budget.limitV();
    }

    /** Catalog currency of the price ("USD" when the catalog does not say). */
    public String currency() {
        return part.price() == null ? "" : part.price().currency();
    }

    /** The candidate as the verdict has it: trimmed exactly when the part needs the trim to fit. */
    public static Candidate of(Budget b) {
        Stage s = b.stage();
        double untrimmed = total(s.criterion(), b.worstCaseV(), b.rssV());
        double after = b.trimmed() == null
                ? Double.NaN
                : total(s.criterion(), b.trimmed().worstCaseV(), b.trimmed().rssV());
        return switch (b.verdict()) {
            case FITS -> untrimmed(b, untrimmed);
            case FITS_AFTER_TRIM -> trimmed(b, after);
            // a part that fits neither way is shown as it comes closest, trim included when allowed
            case UNDECIDED, NO_FIT -> closer(b, untrimmed, after);
        };
    }

    /** The untrimmed or (when the stage allows it) trimmed figures, whichever stand closer to the criterion. */
    private static Candidate closer(Budget b, double untrimmed, double after) {
        if (!StageEdit.trim(b.stage()).allowed()) {
            return untrimmed(b, untrimmed);
        }
        if (b.stage().criterion().kind() == Criterion.Kind.YIELD && b.trimmed().yield() != null) {
            return b.trimmed().yield().low() > b.yield().low() ? trimmed(b, after) : untrimmed(b, untrimmed);
        }
        return after < untrimmed ? trimmed(b, after) : untrimmed(b, untrimmed);
    }

    /** The part with the stage's trim applied, whatever its verdict (used to weigh a trim not yet allowed). */
    public static Candidate withTrim(Budget b) {
        return trimmed(
                b,
                total(
                        b.stage().criterion(),
                        b.trimmed().worstCaseV(),
                        b.trimmed().rssV()));
    }

    private static Candidate untrimmed(Budget b, double error) {
        return new Candidate(
                b.part(), b, false, price(b.part(), b.stage().quantity()), error, marginOf(b, b.yield(), error));
    }

    private static Candidate trimmed(Budget b, double error) {
        double cost = price(b.part(), b.stage().quantity())
                + StageEdit.trim(b.stage()).totalCost(); // the circuit's parts and hand work included
        YieldResult y = b.trimmed() == null ? null : b.trimmed().yield();
        if (y == null && b.stage().criterion().kind() == Criterion.Kind.YIELD) {
            // a trim the stage does not allow was not simulated with the budget: simulate it for its margin
            y = BudgetCalculator.trimmedYield(b.stage(), b.part());
        }
        return new Candidate(b.part(), b, true, cost, error, marginOf(b, y, error));
    }

    /**
     * The margin of the criterion in force: under a yield criterion the lower end of the 95 %
     * interval of {@code y} minus the target (never the RSS margin, which says nothing about the
     * yield); otherwise (E - error) / E.
     */
    public static double marginOf(Budget b, YieldResult y, double error) {
        Criterion c = b.stage().criterion();
        if (c.kind() == Criterion.Kind.YIELD) {
            return y == null ? Double.NaN : y.low() - c.yieldTarget();
        }
        return margin(b.limitV(), error);
    }

    /** Unit price for a build of {@code quantity}: the catalog's price break for it ({@code Price.at}). */
    public static double price(Part p, int quantity) {
        return p.price() == null ? Double.NaN : p.price().at(quantity);
    }

    private static double margin(double limit, double error) {
        return (limit - error) / limit;
    }

    /**
     * The total a criterion compares with the limit. The yield criterion is decided by the
     * Monte Carlo yield; its error figure for the Pareto front is the RSS total,
     * the statistical sum the yield spreads around.
     */
    public static double total(Criterion c, double worstCaseV, double rssV) {
        return c.kind() == Criterion.Kind.WORST_CASE ? worstCaseV : rssV;
    }
}
