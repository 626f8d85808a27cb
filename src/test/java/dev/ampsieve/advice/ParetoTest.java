package dev.ampsieve.advice;

import static dev.ampsieve.testing.Budgets.budget;
import static dev.ampsieve.testing.PartBuilder.part;
import static dev.ampsieve.testing.StageBuilder.stage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** Property test over seeded random candidate sets (values on a coarse grid, so ties occur often). */
class ParetoTest {

    private static final Stage STAGE = stage().build();

    private static Candidate candidate(String id, double cost, double errorV) {
        Part p = part(id).price(cost).build();
        return Candidate.of(
                budget(STAGE, p, errorV / 2, errorV / 2, errorV / 2, errorV <= 1e-3 ? Verdict.FITS : Verdict.NO_FIT));
    }

    @Test
    void frontHoldsExactlyTheUndominatedCandidates() {
        Random rnd = new Random(20240611L);
        for (int round = 0; round < 500; round++) {
            int n = 1 + rnd.nextInt(30);
            List<Candidate> cs = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                double cost = 0.25 * (1 + rnd.nextInt(12));
                double err = 0.1e-3 * (1 + rnd.nextInt(20));
                cs.add(candidate("P" + i, cost, err));
            }
            List<Candidate> front = Pareto.front(cs);
            Set<String> on = new HashSet<>(front.stream().map(Candidate::id).toList());
            for (Candidate c : cs) {
                boolean dominated = cs.stream()
                        .anyMatch(d -> d.effectiveCost() <= c.effectiveCost()
                                && d.errorV() <= c.errorV()
                                && (d.effectiveCost() < c.effectiveCost() || d.errorV() < c.errorV()));
                // on the front exactly when no other candidate is at least as good in both and better in one
                assertEquals(!dominated, on.contains(c.id()), "round " + round + " " + c.id());
            }
            for (int i = 1; i < front.size(); i++) {
                // along the front, more money must buy less error (identical candidates sit side by side)
                Candidate prev = front.get(i - 1);
                Candidate cur = front.get(i);
                boolean same = cur.effectiveCost() == prev.effectiveCost() && cur.errorV() == prev.errorV();
                assertTrue(
                        same || cur.effectiveCost() > prev.effectiveCost() && cur.errorV() < prev.errorV(),
                        "round " + round);
            }
            assertFalse(front.isEmpty());
        }
    }

    @Test
    void identicalCandidatesAreBothOnTheFront() {
        List<Candidate> front = Pareto.front(List.of(candidate("A", 1, 0.5e-3), candidate("B", 1, 0.5e-3)));
        assertEquals(List.of("A", "B"), front.stream().map(Candidate::id).toList());
    }

    @Test
    void partsWithoutAPriceStayOffTheFront() {
        Part noPrice = part("NP").noPrice().build();
        Candidate np = Candidate.of(budget(STAGE, noPrice, 1e-6, 1e-6, 1e-6, Verdict.FITS));
        List<Candidate> front = Pareto.front(List.of(np, candidate("A", 2, 0.5e-3)));
        assertEquals(List.of("A"), front.stream().map(Candidate::id).toList());
    }
}
