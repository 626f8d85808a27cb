package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.MinTyp;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Criterion;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;

class YieldTest {

    /** A follower whose only varying quantity is the offset. */
    private static PartFixture offsetOnly(Double typ, Double max) {
        return PartFixture.ideal().vos(typ, max, null);
    }

    @Test
    void oneNormalTermWithTheLimitAtTwoSigma() {
        // a typical-only offset is one sigma, truncated at k = 3 sigma as the worst case assumes (error-model.md
        // "Missing and typical-only figures"); limit at 2 sigma: P(|Z| <= 2) / P(|Z| <= 3)
        // = 0.9544997 / 0.9973002 = 0.9570838 (Abramowitz & Stegun table 26.1 [from memory]; commons-math3 agrees)
        double expected = 0.9544997 / 0.9973002;
        NormalDistribution nd = new NormalDistribution();
        assertEquals(expected, nd.probability(-2, 2) / nd.probability(-3, 3), 1e-6);
        StageFixture s = StageFixture.follower().limitV(2e-3);
        Budget b = BudgetCalculator.compute(s.build(), offsetOnly(1e-3, null).build());
        YieldResult y = b.yield();
        assertEquals("sampled", y.decided());
        assertEquals(20000, y.trials());
        assertTrue(
                y.low() <= expected && expected <= y.high(),
                expected + " outside the Wilson interval [" + y.low() + ", " + y.high() + "]");
    }

    @Test
    void truncatedOffsetFollowsTheTruncatedLaw() {
        // max 4 mV read at k = 4 sigma (sigma 1 mV), truncated there; limit at 2 sigma:
        // P(|Z| <= 2) / P(|Z| <= 4) from commons-math3
        NormalDistribution nd = new NormalDistribution();
        double expected = nd.probability(-2, 2) / nd.probability(-4, 4);
        StageFixture s = StageFixture.follower().limitV(2e-3);
        s.k = 4;
        YieldResult y = BudgetCalculator.compute(
                        s.build(), offsetOnly(null, 4e-3).build())
                .yield();
        assertTrue(
                y.low() <= expected && expected <= y.high(), expected + " not in [" + y.low() + ", " + y.high() + "]");
    }

    @Test
    void allPassWithoutSamplingWhenTheLargestErrorFits() {
        StageFixture s = StageFixture.follower().limitV(2e-3);
        YieldResult y = BudgetCalculator.compute(
                        s.build(), offsetOnly(null, 1e-3).build())
                .yield();
        assertEquals("all-pass", y.decided());
        assertEquals(0, y.trials());
        assertEquals(1.0, y.value(), 0.0);
        assertEquals(1.0, y.low(), 0.0);
    }

    @Test
    void aTypicalOnlyFigureIsBoundedWhereTheWorstCaseBoundsIt() {
        // typical-only 1 mV: worst case k x typ = 3 mV (k = 3), and no sampled unit exceeds it, so a limit of
        // 3 mV passes every unit (a part that fits by the worst case has a yield of 100 %)
        StageFixture s = StageFixture.follower().limitV(3e-3);
        Budget b = BudgetCalculator.compute(s.build(), offsetOnly(1e-3, null).build());
        assertEquals(3e-3, b.worstCaseV(), 1e-15);
        assertEquals("all-pass", b.yield().decided());
        assertEquals(1.0, b.yield().value(), 0.0);
    }

    @Test
    void nonePassWithoutSamplingWhenTheSmallestErrorExceeds() {
        // follower with Rf 100k: E = vos + IB x Rf (IB fixed at its maximum without a typical) = 1 mV +/- 0.1 mV
        StageFixture s = StageFixture.follower().limitV(0.8e-3);
        s.rf = 100e3;
        PartFixture p = offsetOnly(null, 0.1e-3);
        p.ib = new Spread(null, 10e-9, null);
        YieldResult y = BudgetCalculator.compute(s.build(), p.build()).yield();
        assertEquals("none-pass", y.decided());
        assertEquals(0, y.trials());
        assertEquals(0.0, y.high(), 0.0);
        // a fixed term alone above the limit decides it too
        StageFixture s2 = StageFixture.follower().limitV(0.5e-3);
        s2.cmSwing = 1;
        PartFixture p2 = offsetOnly(null, 1e-3);
        p2.cmrr = new MinTyp(60.0, null);
        assertEquals(
                "none-pass",
                BudgetCalculator.compute(s2.build(), p2.build()).yield().decided());
        // near the edge it samples
        s.limitV(1.05e-3);
        YieldResult near = BudgetCalculator.compute(s.build(), p.build()).yield();
        assertEquals("sampled", near.decided());
    }

    @Test
    void stopsEarlyAndReproducibly() {
        // true yield about 68 % against a 99 % target: decided at the first look, after 100 units (the
        // interim upper end for about 68 of 100 is near 0.82: SequentialYieldTest works the formula)
        StageFixture s = StageFixture.follower().limitV(1e-3);
        s.criterion = Criterion.yield(0.99);
        s.seed = 1234;
        PartFixture p = offsetOnly(1e-3, null);
        YieldResult a = BudgetCalculator.compute(s.build(), p.build()).yield();
        YieldResult b = BudgetCalculator.compute(s.build(), p.build()).yield();
        assertEquals(100, a.trials());
        assertEquals(a, b);
        // P(|Z| <= 1) / P(|Z| <= 3) = 0.6826895 / 0.9973002 = 0.684537 (reference-checks §7; the typical-only
        // offset is truncated at 3 sigma) inside its interval
        double expected = 0.6826895 / 0.9973002;
        assertTrue(a.low() <= expected && expected <= a.high());
        // another seed gives another sample
        s.seed = 99;
        YieldResult c = BudgetCalculator.compute(s.build(), p.build()).yield();
        assertTrue(c.value() != a.value());
    }

    @Test
    void withoutATargetAllTrialsRun() {
        StageFixture s = StageFixture.follower().limitV(1e-3);
        s.trials = 5000;
        YieldResult y = BudgetCalculator.compute(
                        s.build(), offsetOnly(1e-3, null).build())
                .yield();
        assertEquals(5000, y.trials());
    }

    @Test
    void maxOverTemperatureHoldsEveryUnitInside() {
        // vos max 1 mV (k = 3), drift 20 µV/°C over 45 °C would reach 1.9 mV; the catalog guarantees 1.2 mV over
        // temperature, so no unit exceeds it: the bounds decide all-pass at a 1.2 mV limit
        StageFixture s = StageFixture.follower().limitV(1.2e-3).temps(-20, 70);
        PartFixture p = PartFixture.ideal().vos(null, 1e-3, 1.2e-3).drift(null, 20e-6);
        YieldResult y = BudgetCalculator.compute(s.build(), p.build()).yield();
        assertEquals("all-pass", y.decided());
    }

    @Test
    void aGainErrorAndAnOffsetDoNotCancel() {
        // Non-inverting NG 2 (sensitivity S = (NG-1)/NG = 0.5, reference-checks §8), full scale 1 V,
        // ratio tolerance 1 %: gain error G ~ U(-5, 5) mV at full scale. Offset max 2.5 mV read as
        // 3 sigma: X = NG x vos ~ N(0, 1.667 mV) truncated at +/-5 mV. The gain error changes sign
        // with the signal and the offset does not, so over a +/-1 V output one end sees |X| + |G|.
        // P(|X| + |G| <= 5 mV) = E[(5 mV - |X|) / 5 mV] = 1 - E|X| / 5 mV, with
        // E|X| = sigma x 2 (phi(0) - phi(3)) / (Phi(3) - Phi(-3)) for the truncated normal
        // (commons-math3 NormalDistribution; Johnson, Kotz, Balakrishnan, Continuous Univariate
        // Distributions vol. 1, ch. 13 [from memory]).
        StageFixture s = StageFixture.nonInverting(10e3, 10e3).limitV(5e-3);
        s.fullScale = 1.0;
        s.tol = 0.01;
        s.temps(25, 25);
        PartFixture p = PartFixture.ideal().vos(null, 2.5e-3, null);
        NormalDistribution z = new NormalDistribution();
        double sigma = 2 * 2.5e-3 / 3;
        double meanAbs = sigma * 2 * (z.density(0) - z.density(3)) / z.probability(-3, 3);
        double expected = 1 - meanAbs / 5e-3;
        assertEquals(0.73628, expected, 1e-5); // [Calc]
        YieldResult y = BudgetCalculator.compute(s.build(), p.build()).yield();
        assertEquals("sampled", y.decided());
        assertTrue(
                y.low() <= expected && expected <= y.high(),
                expected + " not in [" + y.low() + ", " + y.high() + "] (signed sum would give about 0.868)");
    }

    @Test
    void theNonePassShortcutCountsTheGainErrorOnlyAsWidening() {
        // NG 2 (Rf = Rg = 100 k), IB 60 nA held at its maximum (no typical): 60 nA x Rf = 6 mV of
        // fixed offset (reference-checks §2, "no compensation") against a 5 mV limit. The gain error
        // (S 0.5 x 1 V x +/-0.4 % = +/-2 mV) adds to the offset at one end of the swing, so no
        // unit can pass whatever its resistors: decided without sampling
        StageFixture s = StageFixture.nonInverting(100e3, 100e3).limitV(5e-3);
        s.fullScale = 1.0;
        s.tol = 0.004;
        PartFixture p = PartFixture.ideal();
        p.ib = new Spread(null, 60e-9, null);
        YieldResult y = BudgetCalculator.compute(s.build(), p.build()).yield();
        assertEquals("none-pass", y.decided());
        assertEquals(0.0, y.value(), 0.0);
    }

    @Test
    void aDriftEstimatedFromTheOffsetIsTheSameUnitsOffsetOverT() {
        // vos max 3 mV (k = 3: sigma 1 mV), no drift figure: each unit's drift is its own vos / T (bipolar pair,
        // GHLM5 ch. 3 [from memory]), so at 125 °C its offset is vos x (1 + 100 / 298.15) = 1.335402 x vos and at
        // 25 °C vos. Limit 1.335402 x 2 mV: a unit passes when |vos| <= 2 mV, P = P(|Z|<=2) / P(|Z|<=3)
        // = 0.9544997 / 0.9973002 = 0.957084 (A&S table 26.1 [from memory]). Independent drift draws would
        // let some units with |vos| > 2 mV pass and some below fail.
        StageFixture s = StageFixture.follower().limitV(1.335402 * 2e-3).temps(25, 125);
        PartFixture p = PartFixture.ideal().vos(null, 3e-3, null).drift(null, null);
        YieldResult y = BudgetCalculator.compute(s.build(), p.build()).yield();
        double expected = 0.9544997 / 0.9973002;
        assertTrue(
                y.low() <= expected && expected <= y.high(), expected + " not in [" + y.low() + ", " + y.high() + "]");
        assertTrue(
                Math.abs(y.value() - expected) < 0.004, "a correlated drift gives " + expected + ", not " + y.value());
    }

    @Test
    void plainBipolarBiasCurrentIsNeverSampledBelowZero() {
        // follower with Rf 100 k at 25 °C only: E = Rf x IB (R+ = 0; Eggleston §6.4). IB typ 10 nA, max 40 nA, k 3:
        // N(10 nA, 10 nA) truncated at [0, 40 nA] (a bipolar input's base current has one sign). Limit 1 mV passes
        // IB <= 10 nA: P = (Phi(0) - Phi(-1)) / (Phi(3) - Phi(-1)) = (0.5 - 0.1586553) / (0.9986501 - 0.1586553)
        // = 0.406365 (A&S table 26.1 [from memory]). Sampling down to -20 nA would give 0.4785.
        StageFixture s = StageFixture.follower().limitV(1e-3).temps(25, 25);
        s.rf = 100e3;
        PartFixture p = PartFixture.ideal();
        p.ib = new Spread(10e-9, 40e-9, null);
        YieldResult y = BudgetCalculator.compute(s.build(), p.build()).yield();
        double expected = (0.5 - 0.1586553) / (0.9986501 - 0.1586553);
        assertTrue(
                y.low() <= expected && expected <= y.high(), expected + " not in [" + y.low() + ", " + y.high() + "]");
    }

    @Test
    void anOffsetCurrentMayChangeSignBetween25CAndTheRangeEnd() {
        // follower, Rf 100 k, R+ 0, 25..70 °C, one-point trim; IOS max 1 nA at 25 °C and 2 nA over temperature
        // (bipolar: at the range end), no IB. Each unit's IOS at 25 °C and at 70 °C are its own draws,
        // N(0, 1/3 nA) and N(0, 2/3 nA) truncated at their maxima; E = -(Rf/2) (IOS(70) - IOS(25)) (DcModel).
        // Limit 50 µV passes |IOS(70) - IOS(25)| <= 1 nA. The difference of the two (untruncated) normals has
        // sigma sqrt(1/9 + 4/9) = 0.745356 nA: P(|D| <= 1 nA) = P(|Z| <= 1.341641) = 0.820287 (A&S 26.1 [from
        // memory]); truncation at 3 sigma changes it by under 0.003. A unit scaled with its limit (the old
        // model, IOS(70) = 2 IOS(25)) would give P(|IOS(25)| <= 1 nA) = 1.
        StageFixture s = StageFixture.follower().limitV(50e-6).temps(25, 70);
        s.rf = 100e3;
        s.trim = new dev.ampsieve.stage.Trim(true, dev.ampsieve.stage.Trim.Method.ONE_POINT, 0, 0);
        PartFixture p = PartFixture.ideal();
        p.ios = new Spread(null, 1e-9, 2e-9);
        YieldResult y = BudgetCalculator.trimmedYield(s.build(), p.build());
        assertEquals("sampled", y.decided());
        assertEquals(20000, y.trials());
        assertTrue(Math.abs(y.value() - 0.820287) < 0.012, "0.820 expected, got " + y.value());
    }

    @Test
    void beforeAndAfterTheTrimEachYieldIsWhatItsOwnRunGives() {
        // follower, -40..85 °C (dT -65 and +60), vos max 1 mV (N(0, 1/3 mV) truncated at 1 mV), drift max
        // 5 µV/°C (N(0, 5/3) truncated at 5), limit 250 µV, target 99 %, one-point trim with a 10 µV resolution
        // (uniform). The yields by a second method, numerical integration over the same laws (below, commons-math3
        // normal CDF): untrimmed |vos - 65 d| <= 250 µV and |vos + 60 d| <= 250 µV, 0.381, so that run stops at its
        // first look; trimmed |-65 d + r| <= 250 µV and |60 d + r| <= 250 µV, 0.981, so it runs on past it. Both are
        // simulated together on the same units (BudgetCalculator); each must be exactly the estimate its model
        // gives alone: the untrimmed one as the same stage without a trim gives it, the trimmed one as
        // BudgetCalculator.trimmedYield gives it.
        StageFixture s = StageFixture.follower().limitV(250e-6).temps(-40, 85);
        s.criterion = Criterion.yield(0.99);
        PartFixture p = PartFixture.ideal().vos(null, 1e-3, null).drift(null, 5e-6);
        StageFixture plain = StageFixture.follower().limitV(250e-6).temps(-40, 85);
        plain.criterion = Criterion.yield(0.99);
        s.trim = new dev.ampsieve.stage.Trim(true, dev.ampsieve.stage.Trim.Method.ONE_POINT, 10e-6, 0);
        Budget both = BudgetCalculator.compute(s.build(), p.build());
        YieldResult before = BudgetCalculator.compute(plain.build(), p.build()).yield();
        YieldResult after = BudgetCalculator.trimmedYield(s.build(), p.build());
        assertEquals(before, both.yield());
        assertEquals(after, both.trimmed().yield());
        assertEquals(100, before.trials());
        assertTrue(after.trials() > 100, "trimmed run stopped at " + after.trials());
        NormalDistribution vos = new NormalDistribution(0, 1e-3 / 3);
        NormalDistribution drift = new NormalDistribution(0, 5e-6 / 3);
        double vosKept = vos.probability(-1e-3, 1e-3);
        double driftKept = drift.probability(-5e-6, 5e-6);
        // untrimmed: midpoint rule over the drift, the offset's mass in closed form for each drift
        double untrimmed = 0;
        int n = 4000;
        for (int i = 0; i < n; i++) {
            double d = -5e-6 + 10e-6 * (i + 0.5) / n;
            double lo = Math.max(Math.max(-250e-6 + 65 * d, -250e-6 - 60 * d), -1e-3);
            double hi = Math.min(Math.min(250e-6 + 65 * d, 250e-6 - 60 * d), 1e-3);
            double w = drift.density(d) * 10e-6 / n / driftKept;
            untrimmed += hi > lo ? w * vos.probability(lo, hi) / vosKept : 0;
        }
        // trimmed: midpoint rule over the resolution, the drift's mass in closed form for each
        double trimmed = 0;
        for (int i = 0; i < n; i++) {
            double r = -10e-6 + 20e-6 * (i + 0.5) / n;
            double lo = Math.max(Math.max((r - 250e-6) / 65, (-250e-6 - r) / 60), -5e-6);
            double hi = Math.min(Math.min((r + 250e-6) / 65, (250e-6 - r) / 60), 5e-6);
            trimmed += hi > lo ? drift.probability(lo, hi) / driftKept / n : 0;
        }
        assertEquals(0.381, untrimmed, 0.001); // the same integral in a second script [Calc]: 0.38127
        assertEquals(0.981, trimmed, 0.001); // [Calc]: 0.98145
        assertTrue(
                before.low() <= untrimmed && untrimmed <= before.high(),
                untrimmed + " not in [" + before.low() + ", " + before.high() + "]");
        assertTrue(
                after.low() <= trimmed && trimmed <= after.high(),
                trimmed + " not in [" + after.low() + ", " + after.high() + "]");
    }
}
