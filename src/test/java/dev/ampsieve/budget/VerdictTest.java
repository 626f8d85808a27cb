package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.MinTyp;
import dev.ampsieve.catalog.Range;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.report.ConstraintText;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Trim;
import org.junit.jupiter.api.Test;

class VerdictTest {

    /** NG 10, offset 1 mV at the output, drift 0.45 mV (dT 45 °C). */
    private static StageFixture stage(double limit) {
        return StageFixture.nonInverting(9e3, 1e3).limitV(limit).temps(-20, 70);
    }

    private static PartFixture part() {
        return PartFixture.ideal().vos(null, 100e-6, null).drift(null, 1e-6);
    }

    private static Verdict verdict(StageFixture s, PartFixture p) {
        return BudgetCalculator.compute(s.build(), p.build()).verdict();
    }

    @Test
    void worstCaseCriterion() {
        assertEquals(Verdict.FITS, verdict(stage(1.5e-3), part()));
        assertEquals(Verdict.NO_FIT, verdict(stage(1.0e-3), part()));
        StageFixture trim = stage(1.0e-3);
        trim.trim = new Trim(true, Trim.Method.ONE_POINT, 0.1e-3, 2.0);
        assertEquals(Verdict.FITS_AFTER_TRIM, verdict(trim, part()));
        // the resolution counts: 0.45 mV drift + 0.6 mV resolution > 1 mV
        trim.trim = new Trim(true, Trim.Method.ONE_POINT, 0.6e-3, 2.0);
        assertEquals(Verdict.NO_FIT, verdict(trim, part()));
    }

    @Test
    void trimmedTotalsShownEvenWhenNotAllowed() {
        Budget b = BudgetCalculator.compute(stage(1.0e-3).build(), part().build());
        // drift and the noise allowance of the 900 Ω of Rf || Rg remain
        assertEquals(0.45e-3 + b.term("noise").outputV(), b.trimmed().worstCaseV(), 1e-15);
        assertEquals(Verdict.NO_FIT, b.verdict());
    }

    @Test
    void rssCriterion() {
        StageFixture s = stage(1.2e-3);
        assertEquals(Verdict.NO_FIT, verdict(s, part())); // WC 1.45 mV
        s.criterion = Criterion.RSS; // RSS sqrt(1 + 0.2025) mV = 1.097 mV
        assertEquals(Verdict.FITS, verdict(s, part()));
    }

    @Test
    void yieldCriterionUsesTheLowerEndOfTheInterval() {
        // typical-only 1 mV: one sigma, truncated at 3 sigma; limit at 2 sigma:
        // P(pass) = P(|Z| <= 2) / P(|Z| <= 3) = 0.9544997 / 0.9973002 = 0.95708 (A&S table 26.1 [from memory])
        StageFixture s = StageFixture.follower().limitV(2e-3);
        PartFixture p = PartFixture.ideal().vos(1e-3, null, null);
        s.criterion = Criterion.yield(0.95);
        assertEquals(Verdict.FITS, verdict(s, p));
        s.criterion = Criterion.yield(0.99);
        assertEquals(Verdict.NO_FIT, verdict(s, p));
        s.trim = new Trim(true, Trim.Method.ONE_POINT, 0.0, 1.0);
        assertEquals(Verdict.FITS_AFTER_TRIM, verdict(s, p));
        YieldResult t = BudgetCalculator.trimmedYield(s.build(), p.build());
        assertEquals("all-pass", t.decided());
        // the budget carries the same trimmed yield, so reports need not simulate again
        Budget b = BudgetCalculator.compute(s.build(), p.build());
        assertEquals(t, b.trimmed().yield());
        assertNull(BudgetCalculator.compute(stage(1.0e-3).build(), part().build())
                .trimmed()
                .yield());
    }

    @Test
    void aFailedConstraintIsNoFitButTermsAreStillComputed() {
        StageFixture s = stage(1.0);
        PartFixture p = part();
        p.temperature = new Range(0, 70);
        Budget b = BudgetCalculator.compute(s.build(), p.build());
        assertEquals(Verdict.NO_FIT, b.verdict());
        assertFalse(b.constraintsMet());
        assertEquals(1e-3, b.term("offset").outputV(), 1e-15);
        assertTrue(b.worstCaseV() < b.limitV());
    }

    @Test
    void oneAndTwoPointTrim() {
        StageFixture s = stage(1.0);
        s.fullScale = 1.0;
        s.tol = 1e-3;
        s.tc = 10e-6;
        PartFixture p = part();
        p.aol = new MinTyp(80.0, null);
        p.ib = new Spread(null, 10e-9, null);
        p.ios = new Spread(null, 1e-9, null);
        Budget b = BudgetCalculator.compute(s.build(), p.build());
        double aolErr = 10.0 / (1e4 + 10);
        double tolPart = 0.9 * 1e-3;
        double tcPart = 0.9 * 10e-6 * 45;
        double drift = 0.45e-3;
        // one-point: the offset goes. The bias term (R+ 0: Rf x IB + Rf x IOS/2) has no over-temperature figure,
        // so its change from 25 °C is bounded by the 25 °C maxima alone: a plain bipolar IB keeps its sign, so it
        // changes by at most 10 nA; IOS may change sign, so by up to 1 + 1 nA. 9 k x 10 nA + 9 k x 2 nA / 2 = 99 µV
        // (error-model.md term 3 after a trim; Eggleston §6.4 for the coefficients)
        double bias = 9e3 * 10e-9 + 9e3 * 2e-9 / 2;
        assertEquals(99e-6, bias, 1e-18);
        double noise = b.term("noise").outputV();
        assertEquals(
                drift + bias + aolErr + tolPart + tcPart + noise, b.trimmed().worstCaseV(), 1e-15);
        s.trim = new Trim(false, Trim.Method.TWO_POINT, 10e-6, 0);
        Budget two = BudgetCalculator.compute(s.build(), p.build());
        assertEquals(drift + bias + tcPart + 10e-6 + noise, two.trimmed().worstCaseV(), 1e-15);
        assertEquals(
                Math.sqrt(drift * drift + bias * bias + tcPart * tcPart + 1e-10 + noise * noise),
                two.trimmed().rssV(),
                1e-15);
        // the comparison function gives the same totals for either method
        assertEquals(two.trimmed(), BudgetCalculator.trimmed(s.build(), p.build(), Trim.Method.TWO_POINT));
        assertEquals(
                drift + bias + aolErr + tolPart + tcPart + noise + 10e-6,
                BudgetCalculator.trimmed(s.build(), p.build(), Trim.Method.ONE_POINT)
                        .worstCaseV(),
                1e-15);
    }

    @Test
    void acCoupledStagesCountDcTermsOnlyTowardHeadroom() {
        StageFixture s = stage(1.0e-3);
        s.acCoupled = true;
        s.supply = 5.0;
        s.fullScale = 2.0; // peak: the output must reach 2.5 V +/- 2 V, widened by the DC error it carries
        Budget b = BudgetCalculator.compute(s.build(), part().build());
        assertEquals(1e-3, b.term("offset").outputV(), 1e-15); // still shown
        assertEquals(b.term("noise").outputV(), b.worstCaseV(), 1e-15); // noise is all that counts here
        assertEquals(Verdict.FITS, b.verdict());
        assertFalse(BudgetCalculator.counts(s.build(), "offset"));
        assertTrue(BudgetCalculator.counts(s.build(), "cmrr"));
        ConstraintResult swing = b.constraints().stream()
                .filter(c -> c.name().equals("output-swing"))
                .findFirst()
                .orElseThrow();
        assertTrue(ConstraintText.detail(swing).contains("AC-coupled"), ConstraintText.detail(swing));
    }
}
