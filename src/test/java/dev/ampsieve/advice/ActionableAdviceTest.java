package dev.ampsieve.advice;

import static dev.ampsieve.testing.PartBuilder.part;
import static dev.ampsieve.testing.StageBuilder.stage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.ConstraintFact;
import dev.ampsieve.budget.ConstraintKind;
import dev.ampsieve.budget.ConstraintResult;
import dev.ampsieve.budget.Constraints;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Range;
import dev.ampsieve.stage.Board;
import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.NonInverting;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Topology;
import dev.ampsieve.testing.AdviceFixtures;
import dev.ampsieve.testing.LinearEngine;
import dev.ampsieve.units.Dimension;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.BiFunction;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/**
 * Advice a designer can act on: part-side targets (IB, vos, drift, resistors) worked by hand from
 * the term formulas, the split of a gain too large for one stage, no resistor of 0 Ω, and no gain
 * change that moves the output past its reach. Each offered number is re-checked here by building
 * it and running the budget.
 */
class ActionableAdviceTest {

    private static Map<Change.Kind, Change> changes(Ranking r) {
        return r.advice().noFit().changes().stream().collect(Collectors.toMap(Change::kind, c -> c));
    }

    private static Map<PartTarget.Quantity, PartTarget> targets(Ranking r) {
        return r.advice().noFit().targets().stream().collect(Collectors.toMap(PartTarget::quantity, t -> t));
    }

    private static boolean fits(BudgetFunction f, Stage s, Part p) {
        Budget b = f.compute(s, p);
        return b.constraintsMet() && b.verdict() != Verdict.NO_FIT;
    }

    @Test
    void aBipolarPartOnATenMegohmSourceGetsAnIbTargetThroughTheRealBudget() {
        // follower (Rf 0), Rs 10 MΩ, 0..70 °C, limit 1 mV, no gain terms (no full scale), no supply or
        // common-mode change, no service life: what is left is offset, drift, bias and the resistor noise
        Stage s = AdviceFixtures.follower(10e6, 1e-3);
        // bipolar: vos 100 µV, drift 1 µV/°C, IB 2 nA at 25 °C and 4 nA over temperature, IOS 1 nA; no noise of its own
        Part p = AdviceFixtures.bipolar();
        BudgetFunction engine = BudgetCalculator::compute;
        Ranking r = Ranker.rank(s, List.of(p), engine);
        assertEquals("bias", r.advice().noFit().limitingTerm());
        // bias at 70 °C (bipolar: the over-temperature maximum off 25 °C): R+ IB + R+ IOS / 2
        //   = 10 MΩ x 4 nA + 10 MΩ x 1 nA / 2 = 40 mV + 5 mV = 45 mV
        assertEquals(45e-3, r.candidates().get(0).budget().term("bias").outputV(), 1e-12);
        // the other terms: offset 100 µV; drift 1 µV/°C x 45 °C = 45 µV; noise 3.3 x sqrt(4kT R (fN - fL)) with
        // T = 343.15 K, R = 10 MΩ, fN = (π/2) x 10 Hz = 15.708 Hz (first-order filter), fL = 0.1 Hz:
        //   4 x 1.380649e-23 x 343.15 x 1e7 x 15.608 = 2.9579e-12 V², rms 1.7198 µV, x 3.3 = 5.675 µV
        //   (Johnson/Nyquist; SI value of k)
        // others 100 + 45 + 5.675 = 150.675 µV. A part with IB <= X (IOS counted equal to it):
        //   10 MΩ x X + 10 MΩ x X / 2 = 15 MΩ x X <= 1 mV - 150.675 µV = 849.325 µV
        //   X <= 849.325 µV / 15 MΩ = 56.62 pA, printed rounded down: 56.6 pA, at 70 °C
        PartTarget ib = targets(r).get(PartTarget.Quantity.IB);
        assertNotNull(ib, r.advice().noFit().targets().toString());
        assertEquals(56.6e-12, ib.value(), 1e-24);
        assertEquals(70.0, ib.atC(), 0);
        // re-checked: the part with the printed figure fits; one unit more in the last digit does not
        assertTrue(fits(engine, s, PartEdit.withIb(p, 56.6e-12)));
        assertFalse(fits(engine, s, PartEdit.withIb(p, 56.7e-12)));
        // vos = 0 still leaves 45 mV of bias: no vos or drift target
        assertFalse(targets(r).containsKey(PartTarget.Quantity.VOS));
        assertFalse(targets(r).containsKey(PartTarget.Quantity.DRIFT));
    }

    @Test
    void vosAndDriftTargetsThroughTheRealBudget() {
        // follower fed from 0 Ω (no bias or resistor-noise term), no noise of its own, no common-mode or supply
        // change, no gain terms (no full scale), no service life: the budget is offset + drift alone,
        // vos + drift x 45 °C (0..70 °C), against 100 µV
        Stage s = AdviceFixtures.follower(0, 100e-6);
        Part p = part("P")
                .vos(null, 80e-6)
                .drift(null, 0.51e-6)
                .ib(null, 1e-9)
                .noise(0.0, 0.0, 0.0, 0.0)
                .build();
        BudgetFunction engine = BudgetCalculator::compute;
        Ranking r = Ranker.rank(s, List.of(p), engine);
        // 80 µV + 0.51 µV/°C x 45 °C = 80 + 22.95 = 102.95 µV > 100 µV
        assertEquals(102.95e-6, r.candidates().get(0).budget().worstCaseV(), 1e-12);
        Map<PartTarget.Quantity, PartTarget> t = targets(r);
        // vos: Y + 22.95 µV <= 100 µV  ->  Y <= 77.05 µV, printed rounded down: 77.0 µV
        assertEquals(77.0e-6, t.get(PartTarget.Quantity.VOS).value(), 1e-15);
        // drift: 80 µV + Z x 45 °C <= 100 µV  ->  Z <= 20 µV / 45 °C = 0.4444 µV/°C, printed 444 nV/°C
        assertEquals(444e-9, t.get(PartTarget.Quantity.DRIFT).value(), 1e-15);
        assertTrue(fits(engine, s, PartEdit.withVos(p, 77.0e-6, p.vosDrift())));
        assertFalse(fits(engine, s, PartEdit.withVos(p, 77.1e-6, p.vosDrift())));
        assertTrue(fits(engine, s, PartEdit.withDrift(p, 444e-9)));
        assertFalse(fits(engine, s, PartEdit.withDrift(p, 445e-9)));
        // no resistance at the inputs: the bias current does nothing here, so no IB target
        assertFalse(t.containsKey(PartTarget.Quantity.IB));
    }

    @Test
    void vosAndDriftTargetsAreWorkedFromTheirTerms() {
        // LinearEngine: NG 100, 0..70 °C (dT 45), limit 1 mV; vos 8 µV -> 0.8 mV, drift 0.123 µV/°C -> 0.5535 mV
        Stage s = stage().build();
        Part p = part("P").vos(null, 8e-6).drift(null, 0.123e-6).build();
        Ranking r = Ranker.rank(s, List.of(p), new LinearEngine());
        Map<PartTarget.Quantity, PartTarget> t = targets(r);
        // vos: 100 x (Y + 0.123 µV/°C x 45 °C) <= 1 mV  ->  Y <= 10 µV - 5.535 µV = 4.465 µV, printed 4.46 µV
        assertEquals(4.46e-6, t.get(PartTarget.Quantity.VOS).value(), 1e-15);
        // drift: 100 x (8 µV + Z x 45 °C) <= 1 mV  ->  Z <= 2 µV / 45 °C = 44.44 nV/°C, printed 44.4 nV/°C
        assertEquals(44.4e-9, t.get(PartTarget.Quantity.DRIFT).value(), 1e-15);
        // no bias current in the part: no IB target
        assertFalse(t.containsKey(PartTarget.Quantity.IB));
        // vos is a 25 °C figure and drift a slope: neither has a temperature of its own
        assertTrue(Double.isNaN(t.get(PartTarget.Quantity.VOS).atC()));
        assertTrue(Double.isNaN(t.get(PartTarget.Quantity.DRIFT).atC()));
        // re-checked as printed
        LinearEngine e = new LinearEngine();
        assertTrue(fits(e, s, PartEdit.withVos(p, 4.46e-6, p.vosDrift())));
        assertFalse(fits(e, s, PartEdit.withVos(p, 4.47e-6, p.vosDrift())));
        assertTrue(fits(e, s, PartEdit.withDrift(p, 44.4e-9)));
        assertFalse(fits(e, s, PartEdit.withDrift(p, 44.5e-9)));
    }

    @Test
    void aResistorRatioTargetIsWorkedFromTheResistorTerm() {
        // LinearEngine resistor term VFS x (NG - 1)/NG x tol = 2.5 V x 0.99 x tol = 2.475 V x tol; offset 100 x 5 µV
        // = 0.5 mV; with tol 0.1 % the total is 2.975 mV against 1 mV
        Stage s = stage().ratioTolerance(0.001).build();
        Part p = part("P").vos(null, 5e-6).build();
        Ranking r = Ranker.rank(s, List.of(p), new LinearEngine());
        Change c = changes(r).get(Change.Kind.BETTER_RESISTORS);
        // 0.5 mV + 2.475 V x tol <= 1 mV  ->  tol <= 0.5 mV / 2.475 V = 2.0202e-4, printed 0.0202 %
        assertEquals(2.02e-4, c.values().get("ratioTolerance"), 1e-12);
        assertTrue(fits(new LinearEngine(), StageEdit.withResistors(s, 2.02e-4 / 0.001), p));
        assertFalse(fits(new LinearEngine(), StageEdit.withResistors(s, 2.03e-4 / 0.001), p));
        // the gain is not the answer here: half the gain (50) leaves 0.25 mV + 1.25 V x 0.98 x 0.1 % = 1.475 mV
        assertFalse(changes(r).containsKey(Change.Kind.LOWER_GAIN));
    }

    @Test
    void aGainTooLargeForOneStageIsSplitWithALaterStage() {
        // gain 1000 (Rf 999 k, Rg 1 k), full scale 2.5 V, limit 10 µV at the input, vos 2 µV, A = 1e5.
        // One stage of gain G: G x 2 µV + (2.5 V x G / 1000) x G / (1e5 + G) <= 10 µV x G
        //   <=> 2.5e-3 x G / (1e5 + G) <= 8e-6  <=>  G <= 320 / (1 - 3.2e-3) = 321.03
        // Half the gain (500) does not fit: no lower gain is offered. Split: G1 here and 1000 / G1 after it,
        // this stage held to the limit divided by the later gain (10 mV x G1 / 1000 = 10 µV x G1): the same
        // inequality, so G1 <= 321.03; Rf = 320.03 k rounded down to 320 k gives G1 = 321, the later stage
        // 1000 / 321 = 3.115.
        Stage s = stage().rf(999e3)
                .rg(1e3)
                .limit(new Limit(Limit.Kind.INPUT, 10e-6, 0, 0))
                .build();
        Part p = part("P").vos(null, 2e-6).build();
        BudgetFunction engine = AdviceFixtures.withGainError(1e5);
        Ranking r = Ranker.rank(s, List.of(p), engine);
        Map<Change.Kind, Change> c = changes(r);
        assertFalse(c.containsKey(Change.Kind.LOWER_GAIN), c.toString());
        Change split = c.get(Change.Kind.SPLIT_GAIN);
        assertNotNull(split, c.toString());
        assertEquals(320e3, split.values().get("rf"), 1e-9);
        // G1 = 1 + 320 k / 1 k = 321, noise gain the same (non-inverting), the later stage 1000 / 321 = 3.1153
        assertEquals(321.0, split.values().get("gainHere"), 1e-12);
        assertEquals(321.0, split.values().get("noiseGain"), 1e-12);
        assertEquals(321.0, split.values().get("sourceGainHere"), 1e-12);
        assertEquals(1000.0 / 321, split.values().get("gainAfter"), 1e-12);
        // this stage's share of the limit: 10 µV at the input x 321 = 3.21 mV at its output
        assertEquals(3.21e-3, split.values().get("limitHereV"), 1e-15);
        // the network as built: Rf 320 k with the same Rg 1 k
        NonInverting built = (NonInverting) split.network();
        assertEquals(320e3, built.feedback(), 1e-9);
        assertEquals(1e3, built.rg(), 1e-12);
        // re-checked: the split stage as printed fits; Rf one unit higher (321 k, G1 = 322) does not
        assertTrue(fits(engine, Advisor.splitAt(s, 320e3), p));
        assertFalse(fits(engine, Advisor.splitAt(s, 321e3), p));
    }

    @Test
    void noSourceResistanceBelowTheFloorIsOffered() {
        // LinearEngine, NG 100: offset 100 x 9.995 µV = 999.5 µV, bias 100 x 1 nA x Rs. Fit needs
        // 100 x 1 nA x Rs <= 0.5 µV  ->  Rs <= 5 Ω: the old search offered "5.00 Ω or lower" (in effect,
        // remove the source resistor). Nothing below 10 Ω is offered: no source change at all.
        Stage s = stage().source(10e3).build();
        Part p = part("P").vos(null, 9.995e-6).ib(null, 1e-9).build();
        Ranking r = Ranker.rank(s, List.of(p), new LinearEngine());
        assertFalse(
                changes(r).containsKey(Change.Kind.LOWER_SOURCE_RESISTANCE),
                changes(r).toString());
        // and no change carries a source resistance under the 10 Ω floor
        assertTrue(
                r.advice().noFit().changes().stream()
                        .map(ch -> ch.values().get("sourceResistance"))
                        .noneMatch(rs -> rs != null && rs < 10),
                changes(r).toString());
        // half the gain does fit (50 x 9.995 µV + 50 x 1 nA x 10 kΩ = 999.75 µV): that is offered instead
        assertTrue(changes(r).containsKey(Change.Kind.LOWER_GAIN));
    }

    /**
     * LinearEngine plus an error of 2 µV per ohm of source resistance and the output-swing check of
     * the tool (mid-supply +/- the full-scale output against 0.4 V from each rail).
     */
    private static BudgetFunction withSwing() {
        LinearEngine linear = new LinearEngine();
        BiFunction<Stage, Part, Budget> f = (s, p) -> {
            Budget b = linear.compute(s, p);
            double extra = 2e-6 * s.sourceResistance();
            double wc = b.worstCaseV() + extra;
            Range need = Constraints.neededOutput(s);
            boolean ok = need.min() >= 0.4 && need.max() <= s.supplyVoltage() - 0.4;
            List<ConstraintResult> cs = new ArrayList<>(b.constraints());
            cs.add(new ConstraintResult(
                    ConstraintKind.OUTPUT_SWING,
                    ok,
                    ConstraintFact.Span.of(
                            need.min(), need.max(), new Range(0.4, s.supplyVoltage() - 0.4), Dimension.VOLTAGE, null)));
            Verdict v = ok && wc <= b.limitV() ? Verdict.FITS : Verdict.NO_FIT;
            return new Budget(
                    p,
                    s,
                    b.noiseGain(),
                    b.terms(),
                    wc,
                    wc,
                    0,
                    b.limitV(),
                    b.yield(),
                    b.trimmed(),
                    v,
                    b.limitingTerm(),
                    cs,
                    List.of());
        };
        return f::apply;
    }

    @Test
    void aChangeThatRaisesTheGainPastTheOutputSwingIsNotOffered() {
        // inverting, Rf 20 k, Rg 1 k, Rs 1 k: signal gain -10, full scale 2 V on 5 V: 0.5 V to 4.5 V, inside 0.4-4.6 V.
        // vos 10 µV: NG x 10 µV + 2 µV/Ω x Rs <= 1 mV. At Rs 400 Ω: NG = 1 + 20/1.4 = 15.29, 152.9 µV + 800 µV fits.
        // But Rs is in series with Rg: at 400 Ω the gain is 20/1.4 = 14.29 and the full scale 2.857 V, so the
        // output must reach 2.5 V +/- 2.857 V, past both rails: not offered. (The largest Rs keeping the swing,
        // 20 k / 10.5 - 1 k = 904.8 Ω, leaves 2 µV/Ω x 904.8 Ω = 1.81 mV: nothing between fits.)
        Stage s = stage().topology(Topology.INVERTING)
                .rf(20e3)
                .rg(1e3)
                .source(1e3)
                .fullScale(2.0)
                .build();
        Part p = part("P").vos(null, 10e-6).build();
        BudgetFunction engine = withSwing();
        // the old edit (Rs changed, output left at 2 V) would have fitted at 400 Ω
        Stage old = new Stage(
                s.network().withSourceResistance(400),
                s.tMin(),
                s.tMax(),
                s.supplyVoltage(),
                s.supplyVariation(),
                s.commonModeSwing(),
                s.commonModeRange(),
                s.outputRange(),
                s.bandLow(),
                s.bandHigh(),
                s.filterOrder(),
                s.fullScaleOutput(),
                s.ratioTolerance(),
                s.ratioTempco(),
                s.serviceLife(),
                s.limit(),
                s.criterion(),
                s.maxToSigma(),
                s.trials(),
                s.maxTrials(),
                s.seed(),
                s.trim(),
                s.quantity(),
                s.maxPrice(),
                s.acCoupled(),
                null,
                null,
                Board.NONE,
                null);
        assertTrue(fits(engine, old, p));
        assertEquals(
                2.0 * (20.0 / 1.4) / 10.0,
                StageEdit.withSourceResistance(s, 400).fullScaleOutput(),
                1e-12);
        Ranking r = Ranker.rank(s, List.of(p), engine);
        assertFalse(
                changes(r).containsKey(Change.Kind.LOWER_SOURCE_RESISTANCE),
                changes(r).toString());
    }

    @Test
    void betterResistorsAreOfferedBesideAWarrantedZeroDriftPart() {
        // LinearEngine, NG 100, ratio tolerance 0.01 %: resistor term 2.5 V x 0.99 x 1e-4 = 247.5 µV.
        // Zero-drift Z (3.00): 100 x 1 µV + 247.5 µV = 347.5 µV fits, the only part that does.
        // Standard S (1.00): 100 x 8 µV + 247.5 µV = 1.0475 mV misses; with resistors of
        // tol <= (1 mV - 0.8 mV) / 2.475 V = 8.0808e-5 it fits: printed 0.00808 % (rounded down)
        Stage s = stage().ratioTolerance(1e-4).build();
        Part z = part("Z")
                .architecture(dev.ampsieve.catalog.Architecture.CHOPPER)
                .price(3.0)
                .vos(null, 1e-6)
                .build();
        Part std = part("S").price(1.0).vos(null, 8e-6).build();
        Ranking r = Ranker.rank(s, List.of(z, std), new LinearEngine());
        ZeroDriftAdvice zd = r.advice().zeroDrift();
        assertEquals(ZeroDriftAdvice.Status.ONLY_OPTION, zd.status());
        assertEquals("Z", zd.selfCorrecting().id());
        assertNotNull(zd.resistorOption(), zd.toString());
        assertEquals("S", zd.resistorOption().part().id());
        assertEquals(1.00, zd.resistorOption().part().effectiveCost(), 1e-12);
        assertFalse(zd.resistorOption().part().trimmed());
        assertEquals(Change.Kind.BETTER_RESISTORS, zd.resistorOption().change().kind());
        assertEquals(8.08e-5, zd.resistorOption().change().values().get("ratioTolerance"), 1e-17);
        // re-checked as printed
        assertTrue(fits(new LinearEngine(), StageEdit.withResistors(s, 8.08e-5 / 1e-4), std));
        assertFalse(fits(new LinearEngine(), StageEdit.withResistors(s, 8.09e-5 / 1e-4), std));
    }
}
