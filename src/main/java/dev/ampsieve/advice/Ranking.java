package dev.ampsieve.advice;

import dev.ampsieve.stage.Stage;
import java.util.List;

/**
 * The answer for one stage: candidates (hard constraints met) in ranking order, rejected
 * parts with the reason, the Pareto front of error against effective cost, the advice.
 *
 * @param candidates parts that fit (as they are or after the trim) by effective cost, then by
 *                   margin; then undecided parts, then parts that do not fit, each closest first
 * @param pareto     the candidates on the Pareto front, cheapest first
 */
public record Ranking(
        Stage stage, List<Candidate> candidates, List<Rejected> rejected, List<Candidate> pareto, Advice advice) {
    public Ranking {
        candidates = List.copyOf(candidates);
        rejected = List.copyOf(rejected);
        pareto = List.copyOf(pareto);
    }

    public List<String> paretoIds() {
        return pareto.stream().map(Candidate::id).toList();
    }
}
