package dev.ampsieve.advice;

import dev.ampsieve.stage.Stage;
import java.util.List;

/**
 * The stage advice, in numbers and kinds; {@code report.AdviceText} puts it into words.
 *
 * @param pick             the first candidate of the ranking that fits, or null
 * @param cheapestAsIs     the cheapest part that fits without a trim, or null
 * @param noFit            what would make the closest part fit; null when something fits
 * @param undecided        the best-ranked part whose yield the sampling left undecided; null when none
 * @param stage            the stage advised on
 * @param anyRanked        at least one part met the hard constraints and was ranked
 * @param boardLimited     the pick's largest term is a board-level one; null otherwise
 * @param rejected         the parts that fail a hard constraint
 * @param currencies       the distinct currencies of the ranked parts' prices, sorted
 * @param quotedQuantities the order quantities, above the stage's, that ranked parts' prices were
 *                         quoted for (nothing to pick a price break from), ascending
 * @param trimCircuits     the trim circuits the stage allows compared for the part the trim advice is
 *                         about; null when the stage names one circuit or allows no trim
 */
public record Advice(
        Candidate pick,
        Candidate cheapestAsIs,
        TrimAdvice trim,
        ZeroDriftAdvice zeroDrift,
        NoFitAdvice noFit,
        Unsettled undecided,
        Stage stage,
        boolean anyRanked,
        BoardLimited boardLimited,
        List<Rejected> rejected,
        List<String> currencies,
        List<Integer> quotedQuantities,
        TrimCircuitChoice trimCircuits) {
    public Advice {
        rejected = List.copyOf(rejected);
        currencies = List.copyOf(currencies);
        quotedQuantities = List.copyOf(quotedQuantities);
    }

    /** Nothing to rank at all: the catalog (or the query) gave no part. */
    public boolean nothingToRank() {
        return !anyRanked && rejected.isEmpty();
    }
}
