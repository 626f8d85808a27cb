package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Trim;
import org.junit.jupiter.api.Test;

/** What a calibration at 25 °C leaves of the offset terms. */
class TrimResidualTest {

    /** Follower (noise gain 1, no resistors, no noise), 25 to 70 °C: dT 45 °C. */
    private static StageFixture stage() {
        StageFixture s = StageFixture.follower().temps(25, 70).limitV(1e-3);
        s.trim = new Trim(true, Trim.Method.ONE_POINT, 0, 0);
        return s;
    }

    @Test
    void theOverTemperatureCapDoesNotShrinkTheDriftLeftAfterATrim() {
        // vos max 10 µV, max over temperature 15 µV, drift max 0.5 µV/°C
        Budget b = BudgetCalculator.compute(
                stage().build(),
                PartFixture.ideal().vos(null, 10e-6, 15e-6).drift(null, 0.5e-6).build());
        // untrimmed: offset + drift never exceed the over-temperature maximum (error-model.md term 2)
        assertEquals(10e-6, b.term("offset").outputV(), 1e-18);
        assertEquals(5e-6, b.term("drift").outputV(), 1e-18);
        assertEquals(15e-6, b.worstCaseV(), 1e-18);
        // after a trim at 25 °C the residual is the drift from 25 °C, TCVOS x |T - 25|
        // (reference-checks.md §5, one-point trim residual [Calc]): 0.5 µV/°C x 45 °C = 22.5 µV.
        // The cap cannot bound it: a unit at 0 µV at 25 °C and 15 µV at 70 °C meets the offset,
        // the over-temperature and the drift (0.33 µV/°C) guarantees, and keeps 15 µV after the trim.
        assertEquals(22.5e-6, b.trimmed().worstCaseV(), 1e-15);
    }

    @Test
    void theResidualNeverExceedsWhatTheTwoOffsetGuaranteesAllow() {
        // drift max 1 µV/°C x 45 °C = 45 µV, but |vos(T) - vos(25)| <= vos over temperature + vos at 25 °C
        // = 15 + 10 = 25 µV whatever the drift [Calc, triangle inequality]
        Budget b = BudgetCalculator.compute(
                stage().build(),
                PartFixture.ideal().vos(null, 10e-6, 15e-6).drift(null, 1e-6).build());
        assertEquals(25e-6, b.trimmed().worstCaseV(), 1e-15);
    }

    @Test
    void withoutAnOverTemperatureFigureTheResidualIsTheDrift() {
        // no cap at all: drift 0.5 µV/°C x 45 °C, before and after the trim
        Budget b = BudgetCalculator.compute(
                stage().build(),
                PartFixture.ideal().vos(null, 10e-6, null).drift(null, 0.5e-6).build());
        assertEquals(22.5e-6, b.term("drift").outputV(), 1e-15);
        assertEquals(22.5e-6, b.trimmed().worstCaseV(), 1e-15);
    }

    @Test
    void anOffsetGivenOnlyOverTemperatureDoesNotMakeATrimLeaveNothing() {
        // only "vos max over temperature 100 µV" and no drift figure: untrimmed, the over-temperature
        // maximum bounds offset plus drift (100 µV); after a trim at 25 °C nothing bounds the change, so
        // the missing drift is estimated as vos / T (bipolar pair: GHLM5 ch. 3 [from memory];
        // reference-checks §5, 3.354 µV/°C per mV): 100 µV / 298.15 K x 45 °C = 15.093 µV, flagged
        Budget b = BudgetCalculator.compute(
                stage().build(),
                PartFixture.ideal().vos(null, null, 100e-6).drift(null, null).build());
        assertEquals(100e-6, b.worstCaseV(), 1e-15);
        assertEquals(100e-6 / 298.15 * 45, b.trimmed().worstCaseV(), 1e-15);
        org.junit.jupiter.api.Assertions.assertTrue(b.term("drift").estimated());
    }

    @Test
    void biasCurrentsGivenOnlyOverTemperatureAreNotTrimmedAway() {
        // follower with Rf 100 k: |R+ - Rf| IB + (R+ + Rf) IOS/2 = 100 k x 10 nA + 100 k x 2 nA / 2 = 1.1 mV
        // (Eggleston §6.4), from over-temperature maxima only. The 25 °C currents are unknown, so a trim at
        // 25 °C cannot be credited with removing any of it (taking the same figure at 25 °C would make the
        // trim remove it all)
        StageFixture s = stage();
        s.rf = 100e3;
        PartFixture p = PartFixture.ideal();
        p.ib = new dev.ampsieve.catalog.Spread(null, null, 10e-9);
        p.ios = new dev.ampsieve.catalog.Spread(null, null, 2e-9);
        Budget b = BudgetCalculator.compute(s.build(), p.build());
        assertEquals(1.1e-3, b.term("bias").outputV(), 1e-15);
        double noise = b.term("noise").outputV(); // Rf's thermal noise, untouched by any trim
        assertEquals(1.1e-3 + noise, b.trimmed().worstCaseV(), 1e-15);
        // with 25 °C maxima too, what the trim leaves is bounded by the datasheet, not by units scaling with
        // their limits (error-model.md term 3): a plain bipolar IB keeps its sign, so it changes by at most
        // max(10, 5) = 10 nA; IOS may change sign, so by up to 2 + 1 = 3 nA. 100 k x 10 nA + 100 k x 3 nA / 2
        // = 1.15 mV (the old proportional reading gave 0.55 mV)
        p.ib = new dev.ampsieve.catalog.Spread(null, 5e-9, 10e-9);
        p.ios = new dev.ampsieve.catalog.Spread(null, 1e-9, 2e-9);
        assertEquals(
                1.15e-3 + noise,
                BudgetCalculator.compute(s.build(), p.build()).trimmed().worstCaseV(),
                1e-15);
    }

    @Test
    void withoutAnOverTemperatureFigureTheBiasResidualIsEstimatedNeverZero() {
        // bipolar IB 5 nA, IOS 1 nA at 25 °C, nothing over temperature; follower with Rf 100 k, 25..70 °C.
        // IB may change by up to 5 nA (known sign), IOS by up to 2 x 1 nA: 100 k x 5 nA + 100 k x 2 nA / 2 = 0.6 mV
        StageFixture s = stage();
        s.rf = 100e3;
        PartFixture p = PartFixture.ideal();
        p.ib = new dev.ampsieve.catalog.Spread(null, 5e-9, null);
        p.ios = new dev.ampsieve.catalog.Spread(null, 1e-9, null);
        Budget b = BudgetCalculator.compute(s.build(), p.build());
        assertEquals(0.6e-3 + b.term("noise").outputV(), b.trimmed().worstCaseV(), 1e-15);
        // bipolar, not chopping: no doubling rule, and ib's sign is known (its larger end, as worked above)
        org.junit.jupiter.api.Assertions.assertTrue(
                b.assumptions().contains(new Assumption.TrimBiasResidual(false, true)),
                b.assumptions().toString());
    }

    @Test
    void aFetBiasCurrentMayCrossZeroSoBothEndsAdd() {
        // CMOS, IB 1 pA at 25 °C, 1 nA at the rating's upper end 125 °C, IOS not given (= IB); stage 25..85 °C,
        // follower fed through 1 GΩ. IB(85) = 1 pA x 1000^(60/100) = 63.0957 pA [Calc]. A CMOS input's bias
        // current is a difference of leakages and may change sign: |dIB| <= 63.0957 + 1 pA, and the same for
        // IOS. Residual = 1 GΩ x 64.0957 pA + 1 GΩ x 64.0957 pA / 2 = 96.1436 mV
        StageFixture s = StageFixture.follower().limitV(1).temps(25, 85);
        s.rs = 1e9;
        s.trim = new Trim(true, Trim.Method.ONE_POINT, 0, 0);
        PartFixture p = PartFixture.ideal();
        p.input = dev.ampsieve.catalog.InputType.CMOS;
        p.temperature = new dev.ampsieve.catalog.Range(-40, 125);
        p.ib = new dev.ampsieve.catalog.Spread(null, 1e-12, 1e-9);
        p.ios = dev.ampsieve.catalog.Spread.NONE;
        Budget b = BudgetCalculator.compute(s.build(), p.build());
        double noise = b.term("noise").outputV();
        assertEquals(96.1436e-3 + noise, b.trimmed().worstCaseV(), 0.0001e-3);
    }

    @Test
    void driftInferredFromTheOverTemperatureOffsetLeavesTheSumAfterATrim() {
        // vos max 10 µV, over temperature 15 µV, no drift figure: untrimmed, offset + drift <= 15 µV; after a trim
        // a unit may go from -10 µV at 25 °C to +15 µV at 70 °C: NG x (15 + 10) = 25 µV [Calc, triangle inequality]
        Budget b = BudgetCalculator.compute(
                stage().build(),
                PartFixture.ideal().vos(null, 10e-6, 15e-6).drift(null, null).build());
        assertEquals(15e-6, b.worstCaseV(), 1e-18);
        assertEquals(25e-6, b.trimmed().worstCaseV(), 1e-15);
    }
}
