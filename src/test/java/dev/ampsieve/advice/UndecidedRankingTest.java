package dev.ampsieve.advice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Price;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Criterion;
import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;

/** Undecided parts rank between the fits and the no-fits; the margin column is the criterion's own. */
class UndecidedRankingTest {

    /** P(|Z| ≤ z), commons-math3. */
    private static double within(double z) {
        NormalDistribution n = new NormalDistribution(0, 1);
        return n.cumulativeProbability(z) - n.cumulativeProbability(-z);
    }

    private static PartFixture part(String id, double vosTyp, double price) {
        PartFixture p = PartFixture.ideal().vos(vosTyp, null, null);
        p.id = id;
        p.price = new Price(price, 1, "USD");
        return p;
    }

    @Test
    void fitsThenUndecidedThenNoFit() {
        // follower, limit 2 mV, typical-only offsets read as sigma, truncated at 3 sigma (error-model.md):
        // typ 0.5 mV: truncated at 1.5 mV, every unit passes; typ 1 mV: P(|Z|<=2)/P(|Z|<=3) = the target exactly;
        // typ 2 mV: P(|Z|<=1)/P(|Z|<=3) = 0.684, far below it
        double target = within(2) / within(3);
        StageFixture s = StageFixture.follower().limitV(2e-3);
        s.criterion = Criterion.yield(target);
        s.trials = 2000;
        s.maxTrials = 20_000;
        // the cheapest first would be the wrong order: price must not lift an undecided part over a fit
        List<dev.ampsieve.catalog.Part> parts = List.of(
                part("no-fit", 2e-3, 0.5).build(),
                part("undecided", 1e-3, 1.0).build(),
                part("fits", 0.5e-3, 3.0).build());
        Ranking r = Ranker.rank(s.build(), parts, BudgetCalculator::compute);
        assertEquals(
                List.of("fits", "undecided", "no-fit"),
                r.candidates().stream().map(Candidate::id).toList());
        assertEquals(
                List.of(Verdict.FITS, Verdict.UNDECIDED, Verdict.NO_FIT),
                r.candidates().stream().map(Candidate::verdict).toList());
        // an undecided part is no pick, and the advice says what would settle it
        assertEquals("fits", r.advice().pick().id());
        Unsettled u = r.advice().undecided();
        assertNotNull(u);
        assertEquals("undecided", u.candidate().id());
        // sampled to max-trials (20000) without settling: the interval still holds the target
        assertEquals(20_000, u.yield().trials());
        assertEquals(20_000, u.cap());
        assertEquals(target, u.target(), 0);
        assertTrue(
                u.yield().low() <= target && target <= u.yield().high(),
                u.yield().toString());
        // untrimmed: the stage allows no trim
        assertTrue(!u.trimmed() && !u.trimAllowed());
    }

    @Test
    void sufficesAnswersNoForAnUndecidedPartAndSaysWhy() {
        StageFixture s = StageFixture.follower().limitV(2e-3);
        s.criterion = Criterion.yield(within(2) / within(3)); // the part's true yield exactly
        s.trials = 2000;
        s.maxTrials = 20_000;
        Sufficiency a = Sufficiency.of(
                BudgetCalculator.compute(s.build(), part("p", 1e-3, 1.0).build()));
        assertTrue(!a.yes());
        assertEquals(Sufficiency.Outcome.UNDECIDED, a.outcome());
        assertEquals(20_000, a.budget().yield().trials());
        assertTrue(Double.isNaN(a.afterTrimV()));
    }

    @Test
    void unitsToSettleFollowTheNormalHalfWidth() {
        // p = 0.999, t = 0.998: n = 1.96² · 0.999 · 0.001 / 0.001² = 3837.7 -> 3838 (by hand)
        assertEquals(3838, Unsettled.unitsToSettle(0.999, 0.998));
        assertEquals(Long.MAX_VALUE, Unsettled.unitsToSettle(0.999, 0.999));
    }

    @Test
    void marginUnderWorstCaseAndRss() {
        // follower, -20..70 °C (dT 45 °C): offset max 1 mV, drift max 10 uV/°C -> 0.45 mV; limit 2 mV
        StageFixture s = StageFixture.follower().limitV(2e-3).temps(-20, 70);
        PartFixture p = PartFixture.ideal().vos(null, 1e-3, null).drift(null, 10e-6);
        // worst case 1.45 mV: (2 - 1.45) / 2 = 0.275
        assertEquals(
                0.275,
                Candidate.of(BudgetCalculator.compute(s.build(), p.build())).margin(),
                1e-12);
        // RSS sqrt(1 + 0.2025) mV = 1.0965856 mV: (2 - 1.0965856) / 2 = 0.4517072
        s.criterion = Criterion.RSS;
        assertEquals(
                0.4517072,
                Candidate.of(BudgetCalculator.compute(s.build(), p.build())).margin(),
                1e-7);
    }

    @Test
    void marginUnderAYieldCriterionIsTheYieldsNeverTheRss() {
        // typical-only 1 mV offset, k = 3: every unit within 3 mV; limit 3.5 mV -> yield 100 % without sampling.
        // Target 99 %: margin = 1 - 0.99 = 0.01 (one point of yield); the RSS margin would be (3.5 - 3) / 3.5 = 0.143
        StageFixture s = StageFixture.follower().limitV(3.5e-3);
        s.criterion = Criterion.yield(0.99);
        PartFixture p = PartFixture.ideal().vos(1e-3, null, null);
        Candidate c = Candidate.of(BudgetCalculator.compute(s.build(), p.build()));
        assertEquals(0.01, c.margin(), 1e-15);
        // in words "+1.00 %": report.TargetWordingTest
        // limit 1 mV: yield P(|Z| <= 1) / P(|Z| <= 3) = 0.6826895 / 0.9973002 = 0.6845 (A&S table 26.1 [from memory]),
        // sampled and decided at the first look, 100 units; the margin is the interval's lower end minus the target,
        // where the RSS margin would be (1 - 3) / 1 = -2. The 95 % Wilson lower end at p = 0.6845, n = 100:
        // (p + z^2/2n - z sqrt(p(1-p)/n + z^2/4n^2)) / (1 + z^2/n) = (0.70371 - 0.09308) / 1.03842 = 0.5880 [Calc],
        // so the margin is about 0.588 - 0.99 = -0.402, give or take the sampling spread of p at n = 100 (sd 0.046)
        s.limitV(1e-3);
        Candidate d = Candidate.of(BudgetCalculator.compute(s.build(), p.build()));
        assertEquals(100, d.budget().yield().trials());
        assertEquals(d.budget().yield().low() - 0.99, d.margin(), 0.0);
        assertEquals(0.5880 - 0.99, d.margin(), 0.1);
    }
}
