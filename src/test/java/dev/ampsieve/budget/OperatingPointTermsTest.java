package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Headroom;
import dev.ampsieve.catalog.InputCrossover;
import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.MinTyp;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Range;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.catalog.TestConditions;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.report.ConstraintText;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

/**
 * The operating-point terms against values worked by hand: the offset's move from the datasheet's
 * test conditions, the crossover step of a rail-to-rail input, and the die's self-heating. (The
 * chopping ripple and its aliases: {@link ChoppingRippleTest}.)
 */
class OperatingPointTermsTest {

    private static TermResult term(Budget b, String key) {
        return b.term(key);
    }

    /** Non-inverting, 90 k / 10 k: noise gain and signal gain 10; 0..70 °C; 5 V supply. */
    private static StageFixture gainOfTen() {
        StageFixture f = StageFixture.nonInverting(90e3, 10e3);
        f.supply = 5.0;
        return f;
    }

    @Nested
    class OperatingPoint {

        private PartFixture part() {
            PartFixture p = PartFixture.ideal();
            p.psrr = new MinTyp(100.0, null);
            p.cmrr = new MinTyp(90.0, null);
            p.inHead = new Headroom(1.5, 1.5); // one input pair: no crossover in these cases
            return p;
        }

        @Test
        void theShiftFromTheTestConditionsByHand() {
            // table at 30 V, common mode 15 V (mid-supply); stage at 5 V with its pins at 1..2 V (centre 1.5 V).
            // dVs = 25 V; dVcm = (1.5 - 2.5) - (15 - 15) = -1.0 V from mid-supply.
            // input: 25 V x 10^(-100/20) + 1.0 V x 10^(-90/20) = 250 µV + 31.6228 µV = 281.6228 µV (by hand)
            // output: NG 10 x 281.6228 µV = 2.816228 mV
            PartFixture p = part();
            p.testConditions = new TestConditions(30.0, 15.0);
            StageFixture f = gainOfTen();
            f.cmRange = new Range(1.0, 2.0);
            Budget b = BudgetCalculator.compute(f.build(), p.build());
            TermResult t = term(b, OperatingPointTerm.KEY);
            assertEquals(2.816227766e-3, t.outputV(), 1e-12);
            assertEquals(281.6227766e-6, t.inputV(), 1e-13);
            assertFalse(t.estimated());
            assertEquals(TermKind.OPERATING_POINT, t.kind());
        }

        @Test
        void atTheTestConditionsNothingMoves() {
            PartFixture p = part();
            p.testConditions = new TestConditions(5.0, 2.5);
            Budget b = BudgetCalculator.compute(gainOfTen().build(), p.build());
            assertEquals(0.0, term(b, OperatingPointTerm.KEY).outputV(), 0.0);
        }

        @Test
        void aOnePointTrimRemovesIt() {
            // a static offset at the operating point: the trimmed worst case is the untrimmed one without it
            // (the ideal part's own offset is 0, so nothing else moves between the two)
            PartFixture p = part();
            p.testConditions = new TestConditions(30.0, 15.0);
            Stage s = gainOfTen().build();
            Budget b = BudgetCalculator.compute(s, p.build());
            Trimmed t = BudgetCalculator.trimmed(s, p.build(), Trim.Method.ONE_POINT);
            assertEquals(b.worstCaseV() - 250e-5, t.worstCaseV(), 1e-12); // NG 10 x 25 V / 10^5 = 2.5 mV
        }

        @Test
        void missingTestConditionsTakeTheFarthestSupplyAndRail() {
            // rated 2..40 V, stage at 5 V: the table is taken at 40 V (35 V away, against 3 V);
            // the stage's common mode sits at mid-supply (0 from mid), so the rail taken is the negative one,
            // 20 V below the 40 V table's mid-supply: dVcm = 20 V.
            // input: 35 x 1e-5 + 20 x 10^-4.5 = 350 µV + 632.4555 µV; output x 10 = 9.824555 mV (by hand)
            Budget b = BudgetCalculator.compute(gainOfTen().build(), part().build());
            TermResult t = term(b, OperatingPointTerm.KEY);
            assertEquals(9.82455532e-3, t.outputV(), 1e-11);
            assertTrue(t.estimated());
            // 40 V (the rated end farthest from the stage's 5 V) and the negative rail (0 V), as worked above
            assertTrue(
                    b.assumptions().contains(new Assumption.TestSupply(40.0, 5.0)),
                    b.assumptions().toString());
            assertTrue(
                    b.assumptions().contains(new Assumption.TestCommonMode(0.0, 40.0)),
                    b.assumptions().toString());
            // never better than any table the datasheet could state inside the rated supply
            PartFixture typed = part();
            typed.testConditions = new TestConditions(36.0, 0.0);
            assertTrue(t.outputV()
                    >= term(BudgetCalculator.compute(gainOfTen().build(), typed.build()), OperatingPointTerm.KEY)
                            .outputV());
        }

        @Test
        void withoutAStageSupplyItIsNotCountedAndSaysSo() {
            StageFixture f = gainOfTen();
            f.supply = null;
            Budget b = BudgetCalculator.compute(f.build(), part().build());
            assertEquals(0.0, term(b, OperatingPointTerm.KEY).outputV(), 0.0);
            assertTrue(b.notCounted()
                    .contains(new NotCounted(OperatingPointTerm.KEY, NotCounted.Reason.NO_SUPPLY_VOLTAGE)));
        }
    }

    @Nested
    class Crossover {

        /** A rail-to-rail input (headroom 0 at both rails) with a crossover 1.2 V below V+ and a 50 µV step. */
        private PartFixture part() {
            PartFixture p = PartFixture.ideal();
            p.crossover = new InputCrossover(1.2, 50e-6);
            p.testConditions = new TestConditions(5.0, 2.5);
            return p;
        }

        private Stage stage(double lo, double hi) {
            StageFixture f = gainOfTen();
            f.cmRange = new Range(lo, hi);
            return f.build();
        }

        @Test
        void insideTheCommonModeRangeTheStepCounts() {
            // 5 V supply: the crossover sits at 5 - 1.2 = 3.8 V, inside 1.0..4.0 V: NG 10 x 50 µV = 500 µV
            TermResult t = term(BudgetCalculator.compute(stage(1.0, 4.0), part().build()), InputCrossoverTerm.KEY);
            assertEquals(500e-6, t.outputV(), 1e-15);
            assertEquals(TermKind.OPERATING_POINT, t.kind());
        }

        @Test
        void outsideItCountsNothing() {
            // 0.5..3.5 V stays below 3.8 V
            assertEquals(
                    0.0,
                    term(BudgetCalculator.compute(stage(0.5, 3.5), part().build()), InputCrossoverTerm.KEY)
                            .outputV(),
                    0.0);
        }

        @Test
        void aOnePointTrimLeavesTheStep() {
            // trimmed at one common mode, the other pair's offset stays: the trimmed totals differ by the whole step.
            // The two stages differ only in their common-mode range; the trim removes the operating point's move.
            Part p = part().build();
            double inside = BudgetCalculator.trimmed(stage(1.0, 4.0), p, Trim.Method.ONE_POINT)
                    .worstCaseV();
            double outside = BudgetCalculator.trimmed(stage(0.5, 3.5), p, Trim.Method.ONE_POINT)
                    .worstCaseV();
            assertEquals(500e-6, inside - outside, 1e-15);
        }

        @Test
        void aRailToRailInputWithoutACrossoverGetsTheConservativeStep() {
            // no input-crossover: a crossover is assumed 0.5..2 V below V+ (3.0..4.5 V at 5 V), with a step of
            // 2 x vos = 2 x 25 µV = 50 µV; a range up to 3.2 V reaches it: NG 10 x 50 µV = 500 µV, flagged
            PartFixture f = part();
            f.crossover = null;
            f.vos = new Spread(null, 25e-6, null);
            Part p = f.build();
            TermResult t = term(BudgetCalculator.compute(stage(1.0, 3.2), p), InputCrossoverTerm.KEY);
            assertEquals(500e-6, t.outputV(), 1e-15);
            assertTrue(t.estimated());
            // up to 2.9 V it stays clear of the assumed band
            assertEquals(
                    0.0,
                    term(BudgetCalculator.compute(stage(1.0, 2.9), p), InputCrossoverTerm.KEY)
                            .outputV(),
                    0.0);
        }

        @Test
        void anInputWithOnePairHasNone() {
            PartFixture f = part();
            f.crossover = null;
            f.inHead = new Headroom(0.0, 1.5); // does not reach the positive rail
            f.vos = new Spread(null, 25e-6, null);
            assertEquals(
                    0.0,
                    term(BudgetCalculator.compute(stage(1.0, 3.4), f.build()), InputCrossoverTerm.KEY)
                            .outputV(),
                    0.0);
        }
    }

    @Nested
    class SelfHeating {

        /**
         * A JFET input whose bias current doubles every 10 °C: 10 pA at 25 °C and 10 pA x 2^10 = 10.24 nA at the
         * rated 125 °C (the exponential through the two points is 10 pA x 2^((T - 25)/10)); IOS 0; drift 1 µV/°C;
         * 1 mA quiescent; 200 °C/W.
         */
        private PartFixture part() {
            PartFixture p = PartFixture.ideal();
            p.input = InputType.JFET;
            p.temperature = new Range(-40, 125);
            p.ib = new Spread(null, 10e-12, 10.24e-9);
            p.ios = new Spread(null, 0.0, 0.0);
            p.drift = new Spread(null, 1e-6, null);
            p.iq = 1e-3;
            p.thetaJa = 200.0;
            p.testConditions = new TestConditions(10.0, 5.0);
            return p;
        }

        /** Follower from a 1 Mohm source, 10 V supply, 0..70 °C, full scale 2.5 V, a 1 kohm load to mid-supply. */
        private Stage stage(Double load) {
            StageFixture f = StageFixture.follower();
            f.rs = 1e6;
            f.supply = 10.0;
            f.fullScale = 2.5;
            return f.build().toBuilder().loadResistance(load).build();
        }

        @Test
        void outputPowerByHand() {
            // (Vs/2 - |x|) |x| / RL, largest at |x| = Vs/4 = 2.5 V: 2.5 x 2.5 / 1 k = 6.25 mW = Vs^2/(16 RL)
            assertEquals(6.25e-3, SelfHeatingTerm.outputPower(10, 1e3, -2.5, 2.5), 1e-15);
            assertEquals(6.25e-3, SelfHeatingTerm.outputPower(10, 1e3, -5, 5), 1e-15);
            // 1..2 V never reaches 2.5 V: at 2 V, (5 - 2) x 2 / 1 k = 6 mW
            assertEquals(6e-3, SelfHeatingTerm.outputPower(10, 1e3, 1, 2), 1e-15);
            // 3..4 V: at 3 V, 2 x 3 / 1 k = 6 mW (4 V: 1 x 4 / 1 k = 4 mW)
            assertEquals(6e-3, SelfHeatingTerm.outputPower(10, 1e3, -4, -3), 1e-15);
        }

        @Test
        void theDieTemperatureRaisesDriftAndBiasByHand() {
            // P = 10 V x 1 mA + 6.25 mW = 16.25 mW; rise 200 °C/W x 16.25 mW = 3.25 °C (hot end), 2.0 °C quiescent
            // only.
            // Die 2.0 .. 73.25 °C. Drift: 1 µV/°C x (48.25 - 45) °C = 3.25 µV.
            // Bias through 1 Mohm: 10 pA x 2^(4.825) = 283.4456 pA at the die against 10 pA x 2^4.5 = 226.2742 pA at
            // 70 °C ambient: 283.4456 µV - 226.2742 µV = 57.1714 µV. Total 60.4214 µV (by hand; 2^0.325 = 1.25266).
            Part p = part().build();
            Stage s = stage(1e3);
            PartValues v = PartValues.of(p, s);
            SelfHeatingTerm.Die d = SelfHeatingTerm.die(s, v);
            assertEquals(16.25e-3, d.power(), 1e-15);
            assertEquals(73.25, d.hot(), 1e-12);
            assertEquals(2.0, d.cold(), 1e-12);
            TermResult t = term(BudgetCalculator.compute(s, p), SelfHeatingTerm.KEY);
            assertEquals(60.42143613e-6, t.outputV(), 1e-12);
            assertFalse(t.estimated());
            assertEquals(TermKind.OPERATING_POINT, t.kind());
            // the bias term itself stays at the ambient's 226.27 µV: the rise is this term's alone
            assertEquals(
                    226.2741700e-6,
                    term(BudgetCalculator.compute(s, p), BiasTerm.KEY).outputV(),
                    1e-12);
        }

        @Test
        void withoutALoadItIsNotCounted() {
            Budget b = BudgetCalculator.compute(stage(null), part().build());
            assertEquals(0.0, term(b, SelfHeatingTerm.KEY).outputV(), 0.0);
            assertTrue(
                    b.notCounted().contains(new NotCounted(SelfHeatingTerm.KEY, NotCounted.Reason.NO_LOAD_RESISTANCE)));
            assertTrue(b.constraints().stream().noneMatch(c -> c.name().equals(Constraints.DIE_TEMPERATURE)));
        }

        @Test
        void aDieAboveTheRatedRangeFailsTheConstraint() {
            // 100 ohm: 2.5 x 2.5 / 100 = 62.5 mW + 10 mW = 72.5 mW; 1000 °C/W x 72.5 mW = 72.5 °C above 70 °C:
            // 142.5 °C against the rated 125 °C, 17.5 °C too hot
            PartFixture f = part();
            f.thetaJa = 1000.0;
            Budget b = BudgetCalculator.compute(stage(100.0), f.build());
            ConstraintResult c = b.constraints().stream()
                    .filter(x -> x.name().equals(Constraints.DIE_TEMPERATURE))
                    .findFirst()
                    .orElseThrow();
            assertFalse(c.ok());
            ConstraintFact.Die d = (ConstraintFact.Die) c.fact();
            assertEquals(142.5, d.hot(), 1e-9);
            assertEquals(70, d.ambient(), 0);
            assertEquals(1000, d.thetaJa(), 0);
            assertEquals(72.5e-3, d.powerW(), 1e-12);
            assertEquals(125, d.ratedHigh(), 0);
            assertEquals(17.5, d.tooHot(), 1e-9);
            assertTrue(ConstraintText.detail(c).startsWith("die up to 142.5 °C"), ConstraintText.detail(c));
            assertTrue(ConstraintText.detail(c).endsWith("17.5 °C too hot"), ConstraintText.detail(c));
            assertEquals(Verdict.NO_FIT, b.verdict());
        }

        @Test
        void aMissingThermalResistanceIsAssumedAndFlagged() {
            // 250 °C/W (Assumed.THETA_JA) x 16.25 mW = 4.0625 °C: a larger rise than the typed 200 °C/W gives
            PartFixture f = part();
            f.thetaJa = null;
            Stage s = stage(1e3);
            Budget b = BudgetCalculator.compute(s, f.build());
            assertEquals(
                    70 + 4.0625,
                    SelfHeatingTerm.die(s, PartValues.of(f.build(), s)).hot(),
                    1e-12);
            assertTrue(term(b, SelfHeatingTerm.KEY).estimated());
            assertTrue(term(b, SelfHeatingTerm.KEY).outputV() > 60.42e-6);
            assertTrue(
                    b.assumptions().contains(new Assumption.Default("theta-ja", Assumption.Rule.DEFAULT_VALUE, 250.0)),
                    b.assumptions().toString());
        }
    }
}
