package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Trim;
import org.junit.jupiter.api.Test;

/**
 * The two-temperature trimmed yield follows the same three outcomes as the untrimmed one
 * (UndecidedYieldTest), sampling up to {@code max-trials} while its interval holds the target.
 *
 * <p>Worked by hand: an ideal follower whose only error is its offset (typical-only 1 mV, with
 * the drift estimated from it: both linear in temperature), calibrated at the range ends 0 and
 * 70 °C. The calibration removes offset and drift entirely; what is left at a temperature T is
 * the line through the two reading errors e1, e2 (each uniform in ±r, r the resolution):
 * e1·(70 − T)/70 + e2·T/70, a convex combination, so its largest magnitude over 0..70 °C is
 * max(|e1|, |e2|). A unit passes a limit L < r when both |e1| and |e2| are within L:
 * P = (L/r)², for independent uniform errors (probability of two independent events).
 */
class TwoTemperatureUndecidedTest {

    private static final double R = 10e-6;

    private static StageFixture stage(double limit, double target) {
        StageFixture s = StageFixture.follower().limitV(limit);
        s.tMin = 0;
        s.tMax = 70;
        s.criterion = Criterion.yield(target);
        s.trials = 2000;
        s.maxTrials = 20_000;
        s.trim = new Trim(true, Trim.Method.TWO_TEMPERATURE, R, 0.0);
        return s;
    }

    private static final PartFixture PART = PartFixture.ideal().vos(1e-3, null, null);

    @Test
    void aTargetAtTheTrueTrimmedYieldIsSampledToTheCapAndLeftUndecided() {
        double limit = 9.5e-6;
        double p = (limit / R) * (limit / R); // 0.9025
        assertEquals(0.9025, p, 1e-12);
        Budget b = BudgetCalculator.compute(stage(limit, p).build(), PART.build());
        var y = b.trimmed().yield();
        assertEquals(20_000, y.trials(), () -> "sampled up to max-trials, past trials (2000): " + y);
        assertTrue(y.low() < p && p <= y.high(), () -> "interval " + y + " should hold " + p);
        assertEquals(Verdict.UNDECIDED, b.verdict());
    }

    @Test
    void aTargetWellBelowTheTrimmedYieldIsDemonstrated() {
        double limit = 9.5e-6;
        Budget b = BudgetCalculator.compute(stage(limit, 0.80).build(), PART.build());
        var y = b.trimmed().yield();
        assertEquals(Verdict.FITS_AFTER_TRIM, b.verdict());
        assertTrue(y.low() >= 0.80, () -> "interval " + y);
        // stopped at an interim look, well before the cap: 0.9025 is 0.10 above the target, while the
        // z = 3.29 half-width sqrt(0.9025 x 0.0975 / 1000) x 3.29 is about 0.031 at 1000 units
        assertTrue(y.trials() <= 2000, () -> y.trials() + " units");
    }

    @Test
    void theOffsetsCurvatureIsSaidToBeUncounted() {
        // no datasheet gives the offset's curvature over temperature (a drift figure bounds a box, not a line):
        // the budget must say the calibration's benefit rests on a straight line
        Budget b = BudgetCalculator.compute(stage(9.5e-6, 0.80).build(), PART.build());
        assertTrue(
                b.assumptions().contains(new Assumption.Note("trim", Assumption.Rule.STRAIGHT_LINE_CALIBRATION)),
                () -> b.assumptions().toString());
    }
}
