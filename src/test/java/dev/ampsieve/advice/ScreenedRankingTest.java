package dev.ampsieve.advice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Price;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Stage;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** {@code rank} skips the Monte Carlo of a part that fails a hard constraint, and ranks the same. */
class ScreenedRankingTest {

    /** Follower, limit 2 mV, yield 95 %, a price ceiling of 3.00. */
    private static Stage stage() {
        StageFixture s = StageFixture.follower().limitV(2e-3);
        s.criterion = Criterion.yield(0.95);
        s.trials = 2000;
        s.maxTrials = 4000;
        s.maxPrice = 3.0;
        return s.build();
    }

    /** Typical-only offsets of 0.8 to 1.2 mV (bound 3 typ above the limit: sampled); prices 1 to 5, half over the ceiling. */
    private static List<Part> parts() {
        List<Part> parts = new ArrayList<>();
        for (int i = 0; i < 10; i++) {
            PartFixture p = PartFixture.ideal().vos(0.8e-3 + 0.4e-3 * (i % 5) / 4, null, null);
            p.id = "P" + i;
            p.price = new Price(i < 5 ? 1.0 + i * 0.4 : 3.5 + (i - 5) * 0.4, 1, "USD");
            parts.add(p.build());
        }
        return parts;
    }

    @Test
    void aPartOverThePriceCeilingIsNotSampled() {
        Stage s = stage();
        Part over = parts().get(7); // 4.30 USD against a 3.00 ceiling
        Budget full = BudgetCalculator.compute(s, over);
        Budget screened = BudgetCalculator.screen(s, over);
        assertTrue(full.yield().trials() > 0, "compute samples it: " + full.yield());
        assertEquals(0, screened.yield().trials());
        assertEquals(0.0, screened.yield().high(), 0.0);
        assertEquals(Verdict.NO_FIT, full.verdict());
        assertEquals(Verdict.NO_FIT, screened.verdict());
        assertEquals(full.constraints(), screened.constraints());
        assertEquals(full.worstCaseV(), screened.worstCaseV(), 0.0);
    }

    @Test
    void theRankingIsTheSameAsWithEveryPartSampled() {
        Stage s = stage();
        Ranking a = Ranker.rank(s, parts(), BudgetCalculator::compute);
        Ranking b = Ranker.rank(s, parts(), BudgetCalculator::screen);
        assertEquals(
                List.of("P0", "P1", "P2", "P3", "P4"),
                b.candidates().stream().map(Candidate::id).sorted().toList());
        assertEquals(
                a.candidates().stream().map(Candidate::id).toList(),
                b.candidates().stream().map(Candidate::id).toList());
        assertEquals(
                a.candidates().stream().map(Candidate::margin).toList(),
                b.candidates().stream().map(Candidate::margin).toList());
        assertEquals(
                a.rejected().stream().map(Rejected::failed).toList(),
                b.rejected().stream().map(Rejected::failed).toList());
        // the advice's findings: the same pick, part as it is, trim and zero-drift findings
        assertEquals(id(a.advice().pick()), id(b.advice().pick()));
        assertEquals(id(a.advice().cheapestAsIs()), id(b.advice().cheapestAsIs()));
        assertEquals(a.advice().trim().status(), b.advice().trim().status());
        assertEquals(a.advice().zeroDrift().status(), b.advice().zeroDrift().status());
        assertEquals(a.advice().rejected().size(), b.advice().rejected().size());
    }

    private static String id(Candidate c) {
        return c == null ? null : c.id();
    }
}
