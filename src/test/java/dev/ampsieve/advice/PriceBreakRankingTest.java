package dev.ampsieve.advice;

import static dev.ampsieve.testing.Budgets.budget;
import static dev.ampsieve.testing.PartBuilder.part;
import static dev.ampsieve.testing.StageBuilder.stage;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Price;
import dev.ampsieve.report.ConstraintText;
import dev.ampsieve.stage.Stage;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Price breaks in a ranking: the stage's quantity picks each part's break, so two parts that
 * fit equally well swap places between a small and a large build. Costs worked by hand.
 */
class PriceBreakRankingTest {

    /** Dear in small orders, cheap in large ones: 2.00 from 1, 1.40 from 1000, 0.90 from 10000. */
    private static final Part VOLUME = part("volume")
            .price(new Price(
                    List.of(new Price.Break(1, 2.00), new Price.Break(1000, 1.40), new Price.Break(10_000, 0.90)),
                    "USD"))
            .build();
    /** Flatter: 1.50 from 1, 1.20 from 10000. */
    private static final Part STEADY = part("steady")
            .price(new Price(List.of(new Price.Break(1, 1.50), new Price.Break(10_000, 1.20)), "USD"))
            .build();

    private static Ranking rank(int quantity) {
        Stage s = stage().quantity(quantity).build();
        // both fit as they are with the same budget: 0.2 mV + 0.3 mV = 0.5 mV against the 1 mV limit
        return Ranker.rank(s, List.of(VOLUME, STEADY), (st, p) -> budget(st, p, 0.2e-3, 0.3e-3, 0.31e-3, Verdict.FITS));
    }

    @Test
    void smallBuildPaysTheSmallOrderPrices() {
        Ranking r = rank(10);
        // 10 units: volume pays its 1-unit break 2.00 (10 < 1000), steady its 1.50: steady first
        assertEquals(
                List.of("steady", "volume"),
                r.candidates().stream().map(Candidate::id).toList());
        assertEquals(1.50, r.candidates().get(0).effectiveCost(), 0);
        assertEquals(2.00, r.candidates().get(1).effectiveCost(), 0);
    }

    @Test
    void largeBuildPaysTheVolumePrices() {
        Ranking r = rank(10_000);
        // 10000 units: volume 0.90, steady 1.20: the order flips
        assertEquals(
                List.of("volume", "steady"),
                r.candidates().stream().map(Candidate::id).toList());
        assertEquals(0.90, r.candidates().get(0).effectiveCost(), 0);
        assertEquals(1.20, r.candidates().get(1).effectiveCost(), 0);
        assertEquals("volume", r.advice().pick().id());
    }

    @Test
    void theBreakBetweenTwoQuantitiesIsTheLowerOne() {
        // 5000 units: volume's largest break not above 5000 is 1000 (1.40); steady's is 1 (1.50)
        Ranking r = rank(5000);
        assertEquals(
                List.of("volume", "steady"),
                r.candidates().stream().map(Candidate::id).toList());
        assertEquals(1.40, r.candidates().get(0).effectiveCost(), 0);
    }

    @Test
    void thePriceCeilingUsesTheBreakToo() {
        Stage s = stage().quantity(10).maxPrice(1.80).build();
        Budget b = dev.ampsieve.budget.BudgetCalculator.compute(s, VOLUME);
        // at 10 units volume costs 2.00, over the 1.80 ceiling by 0.20
        assertEquals(
                "ceiling 1.80 USD; part 2.00 USD; over by 0.20 USD",
                ConstraintText.detail(b.constraints().stream()
                        .filter(c -> c.name().equals("price"))
                        .findFirst()
                        .orElseThrow()));
    }
}
