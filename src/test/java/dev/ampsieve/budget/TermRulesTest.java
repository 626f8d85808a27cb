package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.LongTermDrift;
import dev.ampsieve.catalog.MinTyp;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Stage;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The missing-value and temperature rules of error-model.md, term by term. */
class TermRulesTest {

    private static Budget budget(StageFixture s, PartFixture p) {
        return BudgetCalculator.compute(s.build(), p.build());
    }

    /** The budget's one assumption of type {@code kind} about {@code field}. */
    private static <T extends Assumption> T fact(Budget b, Class<T> kind, String field) {
        List<T> found = b.assumptions().stream()
                .filter(kind::isInstance)
                .map(kind::cast)
                .filter(a -> a.field().equals(field))
                .toList();
        assertEquals(1, found.size(), b.assumptions().toString());
        return found.get(0);
    }

    @Test
    void fetBiasCurrentDoublesEvery10C() {
        // without an over-temperature figure (common practice, junction leakage): IB(T) = IB(25) x 2^((T-25)/10);
        // reference-checks §5: 85 °C x64, 125 °C x1024
        assertEquals(64e-12, PartValues.biasAt(true, 1e-12, Double.NaN, 125, 85), 1e-24);
        assertEquals(1024e-12, PartValues.biasAt(true, 1e-12, Double.NaN, 125, 125), 1e-21);
        // +7.18 %/°C (reference-checks §5 [Calc])
        assertEquals(1.0718e-12, PartValues.biasAt(true, 1e-12, Double.NaN, 125, 26), 0.00005e-12);
        // below 25 °C the 25 °C maximum is kept (the rule's x0.0625 at -15 °C would flatter the part)
        assertEquals(1e-12, PartValues.biasAt(true, 1e-12, Double.NaN, 125, -15), 0.0);
        // bipolar inputs stay at the 25 °C maximum
        assertEquals(1e-9, PartValues.biasAt(false, 1e-9, Double.NaN, 125, 125), 0.0);
    }

    @Test
    void fetBiasCurrentFollowsTheExponentialThroughBothDatasheetPoints() {
        // 1 pA at 25 °C, 1 nA at the rating's upper end 125 °C: IB(T) = 1 pA x 1000^((T-25)/100) [Calc]
        // 30 °C: 1000^0.05 = e^(0.05 x 6.907755) = e^0.345388 = 1.412538
        assertEquals(1.412538e-12, PartValues.biasAt(true, 1e-12, 1e-9, 125, 30), 0.000001e-12);
        // 85 °C: 1000^0.6 = 10^1.8 = 63.0957
        assertEquals(63.0957e-12, PartValues.biasAt(true, 1e-12, 1e-9, 125, 85), 0.0001e-12);
        // at the upper end: the over-temperature maximum itself, and never above it
        assertEquals(1e-9, PartValues.biasAt(true, 1e-12, 1e-9, 125, 125), 1e-21);
        assertEquals(1e-9, PartValues.biasAt(true, 1e-12, 1e-9, 125, 140), 0.0);
        // at or below 25 °C: the 25 °C maximum (leakage falls when cold)
        assertEquals(1e-12, PartValues.biasAt(true, 1e-12, 1e-9, 125, 20), 0.0);
        // rated to 85 °C instead: 1000^((30-25)/60) = 10^0.25 = 1.778279
        assertEquals(1.778279e-12, PartValues.biasAt(true, 1e-12, 1e-9, 85, 30), 0.000001e-12);
        // bipolar: base current rises when cold; the over-temperature maximum at both ends, 25 °C value at 25 °C
        assertEquals(8e-9, PartValues.biasAt(false, 4e-9, 8e-9, 125, 20), 0.0);
        assertEquals(8e-9, PartValues.biasAt(false, 4e-9, 8e-9, 125, 30), 0.0);
        assertEquals(4e-9, PartValues.biasAt(false, 4e-9, 8e-9, 125, 25), 0.0);
    }

    @Test
    void aFetPartInARoomTemperatureStageIsNotChargedItsHotLeakage() {
        // CMOS, IB 1 pA at 25 °C and 1 nA over -40..125 °C; stage 20..30 °C, follower with Rf = 0 and R+ = 1 GΩ:
        // |NG R+ - Rf| IB + (NG R+ + Rf) IOS/2 with IOS = IB assumed: 1e9 x 1.412538 pA x 1.5 = 2.118807 mV
        // (Eggleston §6.4; IB at 30 °C from the exponential above). The old rule charged 1 nA: 1.5 V.
        StageFixture s = StageFixture.follower().limitV(1).temps(20, 30);
        s.rs = 1e9;
        PartFixture p = PartFixture.ideal();
        p.input = InputType.CMOS;
        p.temperature = new dev.ampsieve.catalog.Range(-40, 125);
        p.ib = new Spread(null, 1e-12, 1e-9);
        p.ios = Spread.NONE;
        TermResult t = budget(s, p).term("bias");
        assertEquals(2.118807e-3, t.outputV(), 0.000002e-3);
        assertEquals(30.0, t.worstAtC(), 0.0);
    }

    @Test
    void fetBiasTermIsWorstAtTheHotEnd() {
        StageFixture s = StageFixture.nonInverting(1e6, 1e6).limitV(1).temps(-40, 85);
        s.rs = 1e6;
        PartFixture p = PartFixture.ideal();
        p.input = InputType.CMOS;
        p.ib = new Spread(null, 1e-12, null);
        p.ios = new Spread(null, 0.5e-12, null);
        TermResult t = budget(s, p).term("bias");
        double ng = 2;
        double ib = 64e-12;
        double ios = 32e-12;
        // |NG R+ - Rf| IB + (NG R+ + Rf) IOS/2 at 85 °C
        assertEquals(Math.abs(ng * 1e6 - 1e6) * ib + (ng * 1e6 + 1e6) * ios / 2, t.outputV(), 1e-18);
        assertEquals(85.0, t.worstAtC(), 0.0);
        // the hot-end currents come from the doubling rule, not the catalog: marked and explained
        assertTrue(t.estimated());
        // 2^((85 - 25)/10) = 64 (by hand): 1 pA becomes 64 pA at 85 °C
        assertEquals(
                new Assumption.IbDoubling(1e-12, 64.0, 64e-12, 85.0, false),
                fact(budget(s, p), Assumption.IbDoubling.class, "ib"));
        // with the datasheet's over-temperature maxima at the rating's upper end 85 °C the figure is the catalog's own
        p.temperature = new dev.ampsieve.catalog.Range(-40, 85);
        p.ib = new Spread(null, 1e-12, 64e-12);
        p.ios = new Spread(null, 0.5e-12, 32e-12);
        TermResult given = budget(s, p).term("bias");
        assertEquals(t.outputV(), given.outputV(), 1e-18);
        assertFalse(given.estimated());
    }

    @Test
    void bipolarBiasDoesNotDependOnTemperature() {
        StageFixture s = StageFixture.nonInverting(100e3, 1e3).limitV(1);
        PartFixture p = PartFixture.ideal();
        p.ib = new Spread(null, 10e-9, null);
        p.ios = new Spread(null, 1e-9, null);
        TermResult t = budget(s, p).term("bias");
        assertEquals(100e3 * 10e-9 + 100e3 * 1e-9 / 2, t.outputV(), 1e-15);
        assertTrue(Double.isNaN(t.worstAtC()));
    }

    @Test
    void maxOverTemperatureCapsOffsetPlusDrift() {
        // error-model.md term 2: terms 1 + 2 never exceed NG x vos.maxOverTemp
        StageFixture s = StageFixture.nonInverting(9e3, 1e3).limitV(1).temps(-20, 70); // dT 45 °C, NG 10
        PartFixture p = PartFixture.ideal().vos(null, 100e-6, 150e-6).drift(null, 2e-6); // raw drift 90 µV
        Budget b = budget(s, p);
        assertEquals(1e-3, b.term("offset").outputV(), 1e-15);
        assertEquals(0.5e-3, b.term("drift").outputV(), 1e-15);
        assertTrue(b.term("drift").working().has(TermRemark.DRIFT_CAPPED));
        // the cap's operand is the catalog's vos over temperature, 150 µV (set above)
        assertEquals(150e-6, b.term("drift").working().value("vosOverTemperature"), 0.0);
        // under the cap nothing changes
        p.drift(null, 0.5e-6);
        assertEquals(10 * 0.5e-6 * 45, budget(s, p).term("drift").outputV(), 1e-15);
    }

    @Test
    void maxOverTemperatureStandsInForAMissingDrift() {
        StageFixture s = StageFixture.nonInverting(9e3, 1e3).limitV(1);
        PartFixture p = PartFixture.ideal().vos(null, 100e-6, 180e-6);
        p.drift = Spread.NONE;
        Budget b = budget(s, p);
        assertEquals(10 * 80e-6, b.term("drift").outputV(), 1e-15);
        assertFalse(b.term("drift").estimated());
    }

    @Test
    void missingBipolarDriftIsEstimatedAsVosOverT() {
        // GHLM5 ch. 3, AoE3 ch. 5 [from memory]; reference-checks §5: 1 mV at 25 °C -> 3.354 µV/°C
        assertEquals(3.354e-6, PartValues.estimatedDrift(1e-3), 0.0005e-6);
        StageFixture s = StageFixture.nonInverting(9e3, 1e3).limitV(1).temps(25, 85);
        PartFixture p = PartFixture.ideal().vos(null, 1e-3, null);
        p.drift = Spread.NONE;
        Budget b = budget(s, p);
        TermResult d = b.term("drift");
        assertEquals(10 * 1e-3 / 298.15 * 60, d.outputV(), 1e-15);
        assertTrue(d.estimated());
        assertEquals(85.0, d.worstAtC(), 0.0);
        Assumption.DriftFromOffset est = fact(b, Assumption.DriftFromOffset.class, "vos-drift");
        assertEquals(Assumption.Rule.DRIFT_FROM_OFFSET, est.rule());
        assertEquals(1e-3, est.vos(), 0.0);
        assertEquals(3.354e-6, est.used(), 0.0005e-6); // reference-checks §5, as above
        assertEquals(InputType.BIPOLAR, est.input());
        // the report adds "may understate" for any other input; the fact carries the input it holds for
        p.input = InputType.JFET;
        assertEquals(
                InputType.JFET,
                fact(budget(s, p), Assumption.DriftFromOffset.class, "vos-drift")
                        .input());
    }

    @Test
    void typicalOnlyIsUsedAndFlagged() {
        StageFixture s = StageFixture.follower().limitV(1);
        Budget b = budget(s, PartFixture.ideal().vos(50e-6, null, null));
        // a typical-only figure enters the worst case as max-to-sigma x typ (error-model.md), k = 3: 150 µV
        assertEquals(150e-6, b.term("offset").outputV(), 1e-18);
        assertTrue(b.term("offset").estimated());
        Assumption.TypicalAsLimit vos = fact(b, Assumption.TypicalAsLimit.class, "vos");
        assertEquals(50e-6, vos.typical(), 0.0);
        assertEquals(3.0, vos.factor(), 0.0);
        assertEquals(150e-6, vos.used(), 1e-18);
    }

    @Test
    void missingRejectionAndGainAreAssumedPessimistically() {
        StageFixture s = StageFixture.follower().limitV(1);
        s.cmSwing = 1;
        s.supplyVariation = 1;
        s.fullScale = 1.0;
        PartFixture p = PartFixture.ideal();
        p.cmrr = MinTyp.NONE;
        p.psrr = MinTyp.NONE;
        p.aol = MinTyp.NONE;
        Budget b = budget(s, p);
        assertEquals(1e-3, b.term("cmrr").outputV(), 1e-15); // 60 dB
        assertEquals(1e-3, b.term("psrr").outputV(), 1e-15);
        assertEquals(1.0 / (1e4 + 1), b.term("open-loop-gain").outputV(), 1e-15); // 80 dB
        assertTrue(b.term("cmrr").estimated());
        // the defaults of budget/Assumed: 60 dB and 80 dB, worked above
        assertEquals(60.0, fact(b, Assumption.Default.class, "cmrr").used(), 0.0);
        assertEquals(
                Assumption.Rule.PESSIMISTIC_REJECTION,
                fact(b, Assumption.Default.class, "cmrr").rule());
        assertEquals(80.0, fact(b, Assumption.Default.class, "aol").used(), 0.0);
        // a guaranteed value, even a poor one, is not flagged
        p.cmrr = new MinTyp(50.0, null);
        assertFalse(budget(s, p).term("cmrr").estimated());
    }

    @Test
    void agingGrowsWithTheSquareRootOfTime() {
        // reference-checks §6 [Calc, √t model]: 1 µV per 1000 h -> 2000 h 1.4142 µV, 1 year (8760 h) 2.9597 µV, 10 y
        // 9.3595 µV
        LongTermDrift d = new LongTermDrift(1e-6, 1000 * 3600.0);
        assertEquals(1.4142e-6, AgingTerm.inputAging(d, 2000 * 3600.0), 0.00005e-6);
        assertEquals(2.9597e-6, AgingTerm.inputAging(d, 8760 * 3600.0), 0.00005e-6);
        assertEquals(9.3595e-6, AgingTerm.inputAging(d, 87600 * 3600.0), 0.00005e-6);
        StageFixture s = StageFixture.nonInverting(9e3, 1e3).limitV(1);
        s.life = 8760 * 3600.0;
        PartFixture p = PartFixture.ideal();
        p.aging = d;
        // the figure is typical (datasheets publish aging as typical): the worst case takes k = 3 times it,
        // NG 10 x 3 x 2.9597 µV = 88.791 µV, flagged
        assertEquals(10 * 3 * 2.9597e-6, budget(s, p).term("aging").outputV(), 0.0015e-6);
        assertTrue(budget(s, p).term("aging").estimated());
    }

    @Test
    void noiseTermUsesTheNoiseBandwidthAndAllowance() {
        // first-order filter at fH (the fixture's): fN = π/2 x min(fH, GBW/NG); resistors at the hottest
        // temperature, 70 °C = 343.15 K (re-derived: was 298.15 K); counted as 3.3 x rms (error-model.md term 10)
        StageFixture sf = StageFixture.nonInverting(99e3, 1e3).limitV(1);
        sf.fH = 1e3;
        sf.rs = 1e3;
        PartFixture p = PartFixture.ideal();
        p.gbw = 10e6; // closed-loop pole 100 kHz: fH limits
        p.noise = new dev.ampsieve.catalog.Noise(10e-9, 5.0, 1e-12, 50.0);
        Stage s = sf.build();
        Budget b = BudgetCalculator.compute(s, p.build());
        // the density NG² [en²(1 + 5/f) + in²(1 + 50/f)(R+² + R-²) + 4kT(R+ + R-)], NG 100, R+ 1 k, R- 990 Ω,
        // integrated numerically (Simpson's rule on ln f, 2e6 steps, a second method beside the closed form)
        // from 0.1 Hz to π/2 x 1 kHz: 47.45540 µV rms
        double rms = 47.45540181e-6;
        assertEquals(rms, b.noiseRmsV(), rms * 1e-8);
        assertEquals(3.3 * rms, b.term("noise").outputV(), rms * 1e-8);
        p.gbw = 50e3; // closed-loop pole 500 Hz: the amplifier limits
        double rms2 = 33.92231492e-6; // the same integral to π/2 x 500 Hz
        assertEquals(rms2, BudgetCalculator.compute(s, p.build()).noiseRmsV(), rms2 * 1e-8);
    }

    @Test
    void worstCaseAndRssOfThreeTerms() {
        // GUM (JCGM 100:2008) eq. 10; reference-checks §7: 3, 4, 12 µV -> WC 19 µV, RSS 13 µV
        StageFixture s = StageFixture.follower().limitV(1).temps(25, 65); // dT 40 °C
        s.cmSwing = 1;
        PartFixture p = PartFixture.ideal().vos(null, 3e-6, null).drift(null, 0.1e-6);
        p.cmrr = new MinTyp(-20 * Math.log10(12e-6), null);
        Budget b = budget(s, p);
        assertEquals(19e-6, b.worstCaseV(), 1e-15);
        assertEquals(13e-6, b.rssV(), 1e-15);
        assertEquals("cmrr", b.limitingTerm());
        assertEquals("cmrr", b.terms().get(0).key()); // sorted largest first
        assertEquals("drift", b.terms().get(1).key());
    }

    @Test
    void aMissingBiasCurrentIsEstimatedByInputTypeNeverZero() {
        // follower fed through 10 k, 25 °C only: |R+ - Rf| IB + (R+ + Rf) IOS/2 with IOS = IB assumed (Eggleston §6.4).
        // Bipolar, no ib: 500 nA (budget/Assumed, common practice): 10 k x 500 nA x 1.5 = 7.5 mV, flagged
        StageFixture s = StageFixture.follower().limitV(1).temps(25, 25);
        s.rs = 10e3;
        PartFixture p = PartFixture.ideal();
        p.ib = Spread.NONE;
        p.ios = Spread.NONE;
        Budget b = budget(s, p);
        assertEquals(7.5e-3, b.term("bias").outputV(), 1e-15);
        assertTrue(b.term("bias").estimated());
        assertEquals(
                new Assumption.ByInputKind("ib", 500e-9, InputType.BIPOLAR, false),
                fact(b, Assumption.ByInputKind.class, "ib"));
        // CMOS: 200 pA: 10 k x 200 pA x 1.5 = 3 µV
        p.input = InputType.CMOS;
        assertEquals(3e-6, budget(s, p).term("bias").outputV(), 1e-18);
    }

    @Test
    void missingNoiseFiguresAreEstimatedByInputType() {
        // bipolar follower without resistors, no noise figures: en 30 nV/√Hz with a 100 Hz corner (budget/Assumed,
        // common practice). fN = π/2 x 10 Hz = 15.70796 Hz; from 0.1 Hz: (15.60796 + 100 ln 157.0796) Hz = 521.2833 Hz;
        // rms 30 nV x sqrt(521.2833) = 684.9489 nV; allowance 3.3 x rms = 2.260331 µV (Franco ch. 7 [from memory])
        StageFixture s = StageFixture.follower().limitV(1);
        PartFixture p = PartFixture.ideal();
        p.noise = dev.ampsieve.catalog.Noise.NONE;
        Budget b = budget(s, p);
        assertEquals(2.260331e-6, b.term("noise").outputV(), 0.000001e-6);
        assertTrue(b.term("noise").estimated());
        assertEquals(
                new Assumption.ByInputKind("noise.en", 30e-9, InputType.BIPOLAR, false),
                fact(b, Assumption.ByInputKind.class, "noise.en"));
        // and its 1/f corner, 100 Hz (budget/Assumed), as worked above
        assertEquals(
                100.0, fact(b, Assumption.ByInputKind.class, "noise.en-corner").value(), 0.0);
    }

    @Test
    void aTypicalOnlyRejectionIsTakenMaxToSigmaTimesWorse() {
        // CMRR typical 100 dB only, k = 3: 100 - 20 log10 3 = 90.45757 dB, so the error is 3 x 10 µV/V:
        // dVcm 1 V x 30 µV/V = 30 µV (error-model.md "Missing and typical-only figures")
        StageFixture s = StageFixture.follower().limitV(1);
        s.cmSwing = 1;
        PartFixture p = PartFixture.ideal();
        p.cmrr = new MinTyp(null, 100.0);
        TermResult t = budget(s, p).term("cmrr");
        assertEquals(30e-6, t.outputV(), 1e-15);
        assertTrue(t.estimated());
    }
}
