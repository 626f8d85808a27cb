package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Criterion;
import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;

/**
 * The three outcomes of a yield criterion, on a follower with an ideal part whose only error is
 * a typical-only offset: vos ~ N(0, typ) truncated at ±k·typ (error-model.md), so a unit passes
 * a limit L with probability P(|Z| ≤ L/typ) / P(|Z| ≤ k), computed here with commons-math3's
 * NormalDistribution (an implementation independent of the engine's TruncatedNormal sampler).
 */
class UndecidedYieldTest {

    private static final double TYP = 1e-3;

    /** P(|Z| ≤ z) for a standard normal Z, by commons-math3. */
    private static double within(double z) {
        NormalDistribution n = new NormalDistribution(0, 1);
        return n.cumulativeProbability(z) - n.cumulativeProbability(-z);
    }

    /** The closed-form yield of the typical-only offset at limit {@code limit} with max-to-sigma {@code k}. */
    private static double closedForm(double limit, double k) {
        return limit >= k * TYP ? 1.0 : within(limit / TYP) / within(k);
    }

    private static StageFixture stage(double limit, double target) {
        StageFixture s = StageFixture.follower().limitV(limit);
        s.criterion = Criterion.yield(target);
        s.trials = 2000;
        s.maxTrials = 20_000; // small, so the undecided case reaches its cap quickly
        return s;
    }

    private static final PartFixture PART = PartFixture.ideal().vos(TYP, null, null);

    @Test
    void closedFormMatchesTheTabulatedNormal() {
        // P(|Z| <= 2) = 0.9544997, P(|Z| <= 3) = 0.9973002 (Abramowitz & Stegun table 26.1 [from memory])
        assertEquals(0.9544997 / 0.9973002, closedForm(2e-3, 3), 1e-6);
    }

    @Test
    void aTargetAtTheTrueYieldEndsUndecidedAtTheCap() {
        double p = closedForm(2e-3, 3); // 0.957083
        Budget b = BudgetCalculator.compute(stage(2e-3, p).build(), PART.build());
        assertEquals(Verdict.UNDECIDED, b.verdict());
        assertEquals("undecided", b.verdict().key());
        assertEquals(20_000, b.yield().trials()); // sampled up to max-trials, past trials (2000)
        assertTrue(b.yield().low() < p && p <= b.yield().high(), () -> "interval " + b.yield() + " should hold " + p);
    }

    @Test
    void aTargetWellBelowIsDemonstratedEarly() {
        double p = closedForm(2e-3, 3);
        Budget b = BudgetCalculator.compute(stage(2e-3, 0.90).build(), PART.build());
        assertEquals(Verdict.FITS, b.verdict());
        assertTrue(b.yield().low() >= 0.90);
        // at n units the z = 3.29 interval half-width is about 3.29·sqrt(p(1-p)/n): 0.067 at 1000, under the 0.057 gap
        // by 2000
        assertTrue(b.yield().trials() <= 2000, () -> b.yield().trials() + " units");
        assertTrue(b.yield().low() <= p && p <= b.yield().high());
    }

    @Test
    void aTargetWellAboveIsRefutedEarly() {
        double p = closedForm(2e-3, 3);
        Budget b = BudgetCalculator.compute(stage(2e-3, 0.99).build(), PART.build());
        assertEquals(Verdict.NO_FIT, b.verdict());
        assertTrue(b.yield().high() < 0.99);
        assertTrue(b.yield().trials() <= 2000, () -> b.yield().trials() + " units");
        assertTrue(b.yield().low() <= p && p <= b.yield().high());
    }

    @Test
    void anUndecidedPartThatATrimDemonstratesFitsAfterTheTrim() {
        // after a one-point trim at 25 °C nothing of a pure offset is left: every unit passes
        StageFixture s = stage(2e-3, closedForm(2e-3, 3));
        s.trim = new dev.ampsieve.stage.Trim(true, dev.ampsieve.stage.Trim.Method.ONE_POINT, 0, 1.0);
        assertEquals(
                Verdict.FITS_AFTER_TRIM,
                BudgetCalculator.compute(s.build(), PART.build()).verdict());
    }

    @Test
    void yieldAtMaxToSigmaTwoAndFourAgainstTheClosedForm() {
        // limit 2.5 typ: k = 2 truncates at 2 typ, inside the limit (100 %); k = 3: 0.98758/0.99730; k = 4:
        // 0.98758/0.99994
        StageFixture s = StageFixture.follower().limitV(2.5e-3);
        Budget b = BudgetCalculator.compute(s.build(), PART.build());
        List<SigmaYield> by = BudgetCalculator.yieldBySigma(b);
        assertEquals(
                List.of(2.0, 3.0, 4.0), by.stream().map(SigmaYield::maxToSigma).toList());
        assertEquals(1.0, by.get(0).yield(), 0.0);
        assertEquals(0, by.get(0).trials()); // decided without sampling
        for (SigmaYield y : by.subList(1, 3)) {
            double p = closedForm(2.5e-3, y.maxToSigma());
            assertEquals(20_000, y.trials()); // no yield criterion: the stage's trials, no early stop
            assertTrue(y.low() <= p && p <= y.high(), () -> "k " + y.maxToSigma() + ": " + y + " should hold " + p);
        }
        // the stage's own reading is the budget's yield itself
        assertEquals(b.yield().value(), by.get(1).yield(), 0.0);
        assertEquals(0.98758 / 0.99730, closedForm(2.5e-3, 3), 1e-4); // A&S table 26.1 [from memory]
        assertTrue(by.get(2).yield() < by.get(1).yield()); // a wider spread (k = 4) passes fewer units
    }
}
