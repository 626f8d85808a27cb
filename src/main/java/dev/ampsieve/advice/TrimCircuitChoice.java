package dev.ampsieve.advice;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.SizedTrim;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.stage.TrimCircuit;
import java.util.ArrayList;
import java.util.List;

/**
 * Which trim circuit to use for one part: each circuit the stage allows ({@code trim.circuits}) is
 * sized for the part and the whole budget re-run with it, so its own terms (null-pin drift,
 * injection drift, the DAC's drift, the injection resistor's effect on the gains), its range and
 * its resolution are judged by the stage's criterion, and its parts and hand work are priced. Pure:
 * facts only (report.TrimCircuitText words them).
 *
 * @param part        the part
 * @param trimNeeded  false when the part fits as it is (every circuit is then moot)
 * @param trimAllowed whether the stage allows a trim at all
 * @param options     one per circuit the stage allows, in the stage's order
 * @param cheapest    the cheapest circuit with which the part fits; null when none does
 */
public record TrimCircuitChoice(
        Part part, boolean trimNeeded, boolean trimAllowed, List<Option> options, TrimCircuit.Kind cheapest) {

    public TrimCircuitChoice {
        options = List.copyOf(options);
    }

    /** Why a circuit does not make the part fit (or that it does). */
    public enum Outcome {
        /** the part fits with this circuit's trim */
        FITS,
        /** the circuit cannot be used here ({@link SizedTrim#unusable()}) */
        UNUSABLE,
        /** the circuit's range does not reach the worst untrimmed offset, and what it leaves fails */
        RANGE_SHORT,
        /** the part would fit with a stored correction, but this circuit's own terms push it over */
        CIRCUIT_TERMS,
        /** the part does not fit after this trim, whatever the circuit adds */
        FAILS_AFTER_TRIM,
        /** a hard constraint fails; no trim helps */
        CONSTRAINT
    }

    /**
     * One circuit, sized and judged.
     *
     * @param kind           the circuit
     * @param sized          its sizing for the part
     * @param verdict        the budget's verdict with it
     * @param outcome        fits, or why not
     * @param effectiveCost  unit price plus the trim cost with this circuit's parts and hand work; NaN without a price
     * @param errorV         the trimmed total the criterion judges (worst case or RSS), output volts
     * @param limitV         the stage's limit, output volts
     * @param circuitV       the circuit's own terms, summed, output volts
     * @param largestCircuitTerm the circuit's largest own term; null when it has none
     */
    public record Option(
            TrimCircuit.Kind kind,
            SizedTrim sized,
            Verdict verdict,
            Outcome outcome,
            double effectiveCost,
            double errorV,
            double limitV,
            double circuitV,
            TermResult largestCircuitTerm) {

        public boolean fits() {
            return outcome == Outcome.FITS;
        }
    }

    /** Sizes and judges each circuit {@code stage} allows for {@code part}. */
    public static TrimCircuitChoice of(Stage stage, Part part) {
        Trim trim = StageEdit.trim(stage);
        List<TrimCircuit.Kind> kinds =
                trim.circuits().isEmpty() ? List.of(trim.circuit().kind()) : trim.circuits();
        boolean needed = true;
        boolean storedFits = false;
        List<Budget> budgets = new ArrayList<>();
        for (TrimCircuit.Kind k : kinds) {
            Stage sk = stage.toBuilder().trim(trim.withCircuit(k)).build();
            Budget b = BudgetCalculator.compute(sk, part);
            budgets.add(b);
            needed &= b.verdict() != Verdict.FITS;
            storedFits |= k == TrimCircuit.Kind.STORED && b.verdict().fits();
        }
        if (!kinds.contains(TrimCircuit.Kind.STORED)) {
            // whether a plain stored correction would fit tells a circuit's own failure from the part's
            Stage ss = stage.toBuilder()
                    .trim(trim.withCircuit(TrimCircuit.Kind.STORED))
                    .build();
            storedFits = BudgetCalculator.compute(ss, part).verdict().fits();
        }
        List<Option> out = new ArrayList<>();
        TrimCircuit.Kind cheapest = null;
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i < kinds.size(); i++) {
            Budget b = budgets.get(i);
            Option o = option(kinds.get(i), b, storedFits);
            out.add(o);
            double cost = Double.isNaN(o.effectiveCost()) ? Double.MAX_VALUE : o.effectiveCost();
            if (o.fits() && cost < best) {
                best = cost;
                cheapest = o.kind();
            }
        }
        return new TrimCircuitChoice(part, needed, trim.allowed(), out, cheapest);
    }

    private static Option option(TrimCircuit.Kind k, Budget b, boolean storedFits) {
        Stage s = b.stage();
        SizedTrim sized = b.trimmed().circuit();
        double error = Candidate.total(
                s.criterion(), b.trimmed().worstCaseV(), b.trimmed().rssV());
        double circuitV = 0;
        TermResult largest = null;
        for (TermResult t : b.terms()) {
            if (BudgetCalculator.afterTrimOnly(t.key())) {
                circuitV += t.outputV();
                if (largest == null || t.outputV() > largest.outputV()) {
                    largest = t;
                }
            }
        }
        Outcome outcome;
        if (!b.constraintsMet()) {
            outcome = Outcome.CONSTRAINT;
        } else if (b.verdict().fits()) {
            outcome = Outcome.FITS;
        } else if (sized.unusable() != SizedTrim.Unusable.NONE) {
            outcome = Outcome.UNUSABLE;
        } else if (!sized.covers()) {
            outcome = Outcome.RANGE_SHORT;
        } else if (storedFits) {
            outcome = Outcome.CIRCUIT_TERMS;
        } else {
            outcome = Outcome.FAILS_AFTER_TRIM;
        }
        double cost =
                Candidate.price(b.part(), s.quantity()) + StageEdit.trim(s).totalCost();
        return new Option(k, sized, b.verdict(), outcome, cost, error, b.limitV(), circuitV, largest);
    }
}
