package dev.ampsieve.advice;

import java.util.Comparator;
import java.util.List;

/**
 * The Pareto front of error against effective cost: a candidate is on it when no other is
 * at least as good in both and strictly better in one (lower error, lower cost). Candidates
 * without a price take no part.
 */
public final class Pareto {
    private Pareto() {}

    public static List<Candidate> front(List<Candidate> candidates) {
        List<Candidate> priced = candidates.stream()
                .filter(c -> Double.isFinite(c.effectiveCost()) && Double.isFinite(c.errorV()))
                .toList();
        return priced.stream()
                .filter(c -> priced.stream().noneMatch(d -> dominates(d, c)))
                .sorted(Comparator.comparingDouble(Candidate::effectiveCost)
                        .thenComparing(Candidate::errorV)
                        .thenComparing(Candidate::id))
                .toList();
    }

    /** d is no worse than c in both and better in one (exact comparisons: ties are not domination). */
    static boolean dominates(Candidate d, Candidate c) {
        return d.effectiveCost() <= c.effectiveCost()
                && d.errorV() <= c.errorV()
                && (d.effectiveCost() < c.effectiveCost() || d.errorV() < c.errorV());
    }
}
