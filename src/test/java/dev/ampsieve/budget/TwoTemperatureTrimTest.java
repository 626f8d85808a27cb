package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.MinTyp;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Range;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.stage.Trim;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * What a two-temperature calibration (offset read at two temperatures, the line through the two
 * readings subtracted) leaves, each residual worked by hand; and the Monte Carlo of the trimmed
 * yield never simulating a unit beyond that bound.
 */
class TwoTemperatureTrimTest {

    private static Trim twoTemperature(double resolution, double cold, double hot) {
        return new Trim(true, Trim.Method.TWO_TEMPERATURE, resolution, 0, cold, hot);
    }

    /**
     * Follower fed through 100 kΩ, -40..85 °C, full scale 1 V: NG 1, R+ 100 kΩ, Rf 0, so the bias term is
     * 100 k x IB + 100 k x IOS / 2 (Eggleston §6.4, eqs. 6.16-6.18).
     */
    private static StageFixture bipolarStage(Trim trim) {
        StageFixture s = StageFixture.follower().temps(-40, 85).limitV(1);
        s.rs = 100e3;
        s.fullScale = 1.0;
        s.trim = trim;
        return s;
    }

    /** Bipolar: vos 100 µV, drift 2 µV/°C; IB 5 nA (10 nA over temperature), IOS 1 nA (2 nA); AOL 100 dB. */
    private static PartFixture bipolarPart() {
        PartFixture p = PartFixture.ideal().vos(null, 100e-6, null).drift(null, 2e-6);
        p.ib = new Spread(null, 5e-9, 10e-9);
        p.ios = new Spread(null, 1e-9, 2e-9);
        p.aol = new MinTyp(100.0, null);
        return p;
    }

    @Test
    void aBipolarPartCalibratedAtTheRangeEnds() {
        Budget b = BudgetCalculator.compute(
                bipolarStage(twoTemperature(10e-6, -40, 85)).build(),
                bipolarPart().build());
        double noise = b.term("noise").outputV(); // 100 kΩ's thermal noise: no calibration touches it
        double small = b.term("cmrr").outputV() + b.term("psrr").outputV(); // 400 dB: below 1e-19 V
        // untrimmed for comparison: offset 100 µV + drift 2 µV/°C x 65 °C = 130 µV [Calc]
        assertEquals(130e-6, b.term("drift").outputV(), 1e-15);
        // open-loop gain error VFS x NG / (AOL + NG) = 1 V / (1e5 + 1) = 9.99990 µV (error-model.md term 6); an
        // offset calibration, even at two temperatures, corrects no gain: it stays
        double aol = 1.0 / (1e5 + 1);
        assertEquals(aol, b.term("open-loop-gain").outputV(), 1e-15);
        // two-temperature, by hand:
        // - offset and drift are linear in T per unit: the line through the two readings removes both;
        // - resolution 10 µV at both points, the range lies between them: |w1| + |w2| = 1, 10 µV;
        // - IB: no shape known, each reading only in [0, 10 nA] (known sign); a line between two readings in
        //   [0, 10 nA] stays in it, so |IB(T) - line| <= 10 nA; at 25 °C IB <= 5 nA and the line <= 10 nA: 10 nA;
        // - IOS (either sign): near a calibration point IOS(T) - IOS(cold) can reach 2 + 2 = 4 nA (no shape
        //   says it changes little there), at 25 °C 1 + 0.48 x 2 + 0.52 x 2 = 3 nA: 4 nA;
        // bias residual 100 k x 10 nA + 100 k x 4 nA / 2 = 1.2 mV [Calc]
        assertEquals(1.2e-3 + 10e-6 + aol + noise + small, b.trimmed().worstCaseV(), 1e-12);
        // the one-point trim at 25 °C leaves drift 130 µV, bias 100 k x max(10, 5) nA + 100 k x (2 + 1) nA / 2 =
        // 1.15 mV (TrimResidualTest), the same resolution and gain error: two temperatures help the offset only
        Trimmed one = BudgetCalculator.trimmed(b.stage(), bipolarPart().build(), Trim.Method.ONE_POINT);
        assertEquals(130e-6 + 1.15e-3 + 10e-6 + aol + noise + small, one.worstCaseV(), 1e-12);
    }

    @Test
    void calibrationPointsInsideTheRangeLetTheResolutionAndTheCurrentsGrowOutside() {
        // calibrated at 0 and 50 °C for -40..85 °C: the line is extrapolated. At -40 °C the weights are
        // w1 = (50 + 40)/50 = 1.8 and w2 = (-40 - 0)/50 = -0.8, so two readings each off by up to r = 10 µV
        // put the line off by up to (1.8 + 0.8) r = 26 µV; at 85 °C (0.7 + 1.7) r = 24 µV: 26 µV [Calc]
        // (= r (1 + 2 d/(T2 - T1)), d = 40 °C beyond the cold point).
        StageFixture s = StageFixture.follower().temps(-40, 85).limitV(1);
        s.trim = twoTemperature(10e-6, 0, 50);
        Budget ideal = BudgetCalculator.compute(
                s.build(),
                PartFixture.ideal().vos(null, 100e-6, null).drift(null, 1e-6).build());
        assertEquals(26e-6, ideal.trimmed().worstCaseV(), 1e-15);

        // bipolar currents, shape unknown: at -40 °C IB(T) - 1.8 IB(0) + 0.8 IB(50), readings in [0, 10 nA]:
        // at most 10 + 0.8 x 10 = 18 nA; IOS (either sign) 2 + 1.8 x 2 + 0.8 x 2 = 7.2 nA; at 85 °C 17 and
        // 6.8 nA. 100 k x 18 nA + 100 k x 7.2 nA / 2 = 2.16 mV [Calc]
        Budget b = BudgetCalculator.compute(
                bipolarStage(twoTemperature(10e-6, 0, 50)).build(),
                bipolarPart().build());
        double rest = b.term("noise").outputV()
                + b.term("open-loop-gain").outputV()
                + b.term("cmrr").outputV()
                + b.term("psrr").outputV();
        assertEquals(2.16e-3 + 26e-6 + rest, b.trimmed().worstCaseV(), 1e-12);
    }

    /** Follower fed through 1 GΩ, -40..85 °C; CMOS rated -40..125 °C, IB 1 pA at 25 °C and 1 nA at 125 °C, IOS = IB. */
    private static Stage cmosStage(Trim trim) {
        StageFixture s = StageFixture.follower().temps(-40, 85).limitV(1);
        s.rs = 1e9;
        s.trim = trim;
        return s.build();
    }

    private static Part cmosPart() {
        PartFixture p = PartFixture.ideal().vos(null, 1e-3, null).drift(null, 5e-6);
        p.input = InputType.CMOS;
        p.temperature = new Range(-40, 125);
        p.ib = new Spread(null, 1e-12, 1e-9);
        p.ios = Spread.NONE;
        return p.build();
    }

    @Test
    void aCmosBiasCurrentLeavesItsCurvatureAfterTheLine() {
        // calibrated at the range ends (trim.cold / trim.hot not given). The engine's curve: I = 1 pA up to
        // 25 °C, then 1 pA x 1000^((T - 25)/100) (through 1 nA at 125 °C), so I(-40) = 1 pA, I(85) = 63.0957 pA.
        // Chord slope m = 62.0957 pA / 125 °C = 0.496766 pA/°C; the exponential's rate b = ln(1000)/100 =
        // 0.0690776 /°C; the chord is parallel to the curve where b I = m: I = 7.19142 pA at
        // T* = 25 + ln(7.19142)/b = 53.5605 °C, where the chord is 1 + m x 93.5605 = 47.4777 pA:
        // deviation 40.2862 pA [Calc]. Follower through 1 GΩ: 1 GΩ x 40.2862 pA + 1 GΩ x 40.2862 pA / 2 =
        // 60.4294 mV. Offset (1 mV) and drift (5 µV/°C) are gone; no resolution given.
        Stage s = cmosStage(new Trim(true, Trim.Method.TWO_TEMPERATURE, 0, 0));
        Budget b = BudgetCalculator.compute(s, cmosPart());
        double noise = b.term("noise").outputV();
        assertEquals(60.4294e-3 + noise, b.trimmed().worstCaseV(), 0.0001e-3);
        // neither trim.cold nor trim.hot given: the stage's range ends, -40 °C and 85 °C
        assertTrue(
                b.assumptions().contains(new Assumption.CalibrationPoints(-40.0, 85.0, false, false)),
                b.assumptions().toString());

        // second method: a dense scan (every 0.001 °C) of |I(T) - chord(T)| on the engine's own curve
        PartValues v = PartValues.of(cmosPart(), s);
        double cold = v.ibAt(-40);
        double hot = v.ibAt(85);
        double worst = 0;
        for (int i = 0; i <= 125_000; i++) {
            double t = -40 + i * 0.001;
            worst = Math.max(worst, Math.abs(v.ibAt(t) - (cold + (hot - cold) * (t + 40) / 125)));
        }
        double closedForm = BiasTerm.afterTwoTemperature(s, v, CalibrationLine.of(s, s.trim())) / 1.5e9;
        assertEquals(worst, closedForm, 1e-9 * worst);
        assertEquals(40.2862e-12, closedForm, 0.0001e-12);

        // the one-point trim at 25 °C keeps the drift 5 µV/°C x 65 °C = 325 µV and the bias change
        // (63.0957 + 1) pA x 1.5 GΩ = 96.1436 mV (TrimResidualTest)
        assertEquals(
                325e-6 + 96.1436e-3 + noise,
                BudgetCalculator.trimmed(s, cmosPart(), Trim.Method.ONE_POINT).worstCaseV(),
                0.0001e-3);
    }

    @Test
    void theClosedFormMatchesADenseScanForOtherCurvesAndPoints() {
        // second method only: |I(T) - chord(T)| scanned every 0.001 °C over -40..85 °C on the engine's curve, for
        // the curve with and without an over-temperature figure (doubling every 10 °C) and for calibration points
        // at the ends, inside (extrapolated) and off-centre
        for (Double overTemp : new Double[] {1e-9, null}) {
            PartFixture p = PartFixture.ideal();
            p.input = InputType.CMOS;
            p.temperature = new Range(-40, 125);
            p.ib = new Spread(null, 1e-12, overTemp);
            p.ios = Spread.NONE;
            Part part = p.build();
            for (double[] pts : new double[][] {{-40, 85}, {0, 50}, {30, 60}, {-40, 25}}) {
                Stage s = cmosStage(twoTemperature(0, pts[0], pts[1]));
                PartValues v = PartValues.of(part, s);
                double cold = v.ibAt(pts[0]);
                double hot = v.ibAt(pts[1]);
                double worst = 0;
                for (int i = 0; i <= 125_000; i++) {
                    double t = -40 + i * 0.001;
                    worst = Math.max(
                            worst, Math.abs(v.ibAt(t) - (cold + (hot - cold) * (t - pts[0]) / (pts[1] - pts[0]))));
                }
                double closedForm = BiasTerm.afterTwoTemperature(s, v, CalibrationLine.of(s, s.trim())) / 1.5e9;
                assertEquals(worst, closedForm, 1e-7 * worst, overTemp + " at " + pts[0] + ", " + pts[1]);
            }
        }
    }

    @Test
    void aCmosCurrentKnownOnlyOverTemperatureHasNoCurveToCredit() {
        // CMOS, IB given only as 1 nA over the rated range (IOS = IB): the engine holds it flat at 1 nA, so a
        // curve would "deviate" by nothing and the calibration would seem to remove it all. Its 25 °C value and
        // shape are unknown, so each reading is bounded alone, either sign: at the cold point IB(T) - IB(cold) up
        // to 1 + 1 nA, at 25 °C 1 + 0.48 x 1 + 0.52 x 1 = 2 nA; the same for IOS. Follower through 1 MΩ:
        // 1 MΩ x 2 nA + 1 MΩ x 2 nA / 2 = 3 mV [Calc]
        StageFixture f = StageFixture.follower().temps(-40, 85).limitV(1);
        f.rs = 1e6;
        f.trim = new Trim(true, Trim.Method.TWO_TEMPERATURE, 0, 0);
        PartFixture p = PartFixture.ideal();
        p.input = InputType.CMOS;
        p.temperature = new Range(-40, 125);
        p.ib = new Spread(null, null, 1e-9);
        p.ios = Spread.NONE;
        Budget b = BudgetCalculator.compute(f.build(), p.build());
        assertEquals(3e-3 + b.term("noise").outputV(), b.trimmed().worstCaseV(), 1e-12);
    }

    @Test
    void theMonteCarloSamplesTheCurvatureWhereItPeaks() {
        // IB given without a typical is held at its 25 °C maximum in every unit (YieldModel), so every unit's
        // IB part alone is 1 GΩ x 40.2862 pA = 40.2862 mV, at T* = 53.56 °C, between the calibration points:
        // a simulation looking only at the range ends (where the line meets the curve) would see nothing.
        Stage s = cmosStage(new Trim(true, Trim.Method.TWO_TEMPERATURE, 0, 0));
        PartValues v = PartValues.of(cmosPart(), s);
        List<TermResult> terms =
                BudgetCalculator.TERMS.stream().map(t -> t.evaluate(s, v)).toList();
        double fixed = BudgetCalculator.fixedInYield(s, terms, true, false);
        double largest = new TwoTemperatureYield(s, v, fixed, CalibrationLine.of(s, s.trim())).largestError(5000);
        assertTrue(largest >= 40.2862e-3 + fixed, "largest " + largest);
        assertTrue(largest
                <= BudgetCalculator.trimmed(s, cmosPart(), Trim.Method.TWO_TEMPERATURE)
                                .worstCaseV()
                        * (1 + 1e-12));
    }

    private static List<Stage> demoStages() throws Exception {
        try (Stream<Path> files = Files.list(Path.of("demo-catalog/stages"))) {
            return files.filter(p -> p.toString().endsWith(".yaml"))
                    .sorted()
                    .map(f -> {
                        try {
                            return StageLoader.load(f);
                        } catch (Exception e) {
                            throw new IllegalStateException(e);
                        }
                    })
                    .toList();
        }
    }

    private static Stage withTrim(Stage s, Trim t) {
        return s.toBuilder().trim(t).build();
    }

    @Test
    void noSimulatedUnitExceedsTheTwoTemperatureWorstCase() throws Exception {
        // the definition of a bound, over every demo part in every demo stage, calibrated at the range ends and
        // at 0 and 50 °C (extrapolated), with the stage's resolution
        Catalog c = CatalogLoader.load(Path.of("demo-catalog"), false);
        int checked = 0;
        for (Stage demo : demoStages()) {
            double res = demo.trim() == null ? 0 : demo.trim().resolution();
            for (Trim t : List.of(twoTemperature(res, Double.NaN, Double.NaN), twoTemperature(res, 0, 50))) {
                Stage s = withTrim(demo, t);
                for (Part p : c.parts()) {
                    PartValues v = PartValues.of(p, s);
                    List<TermResult> terms = BudgetCalculator.TERMS.stream()
                            .map(x -> x.evaluate(s, v))
                            .toList();
                    double bound = BudgetCalculator.trimmed(s, p, Trim.Method.TWO_TEMPERATURE)
                            .worstCaseV();
                    double fixed = BudgetCalculator.fixedInYield(s, terms, true, false);
                    double largest = new TwoTemperatureYield(s, v, fixed, CalibrationLine.of(s, t)).largestError(3000);
                    assertTrue(
                            largest <= bound * (1 + 1e-12),
                            p.id() + " in " + demo.where() + ", " + t + ": " + largest + " > " + bound);
                    checked++;
                }
            }
        }
        assertTrue(checked >= 30, "too few cases: " + checked);
    }

    @Test
    void withTheLimitAtTheTrimmedWorstCaseEverySampledUnitPasses() {
        // limit set to the trimmed worst case, sampling forced (no bound given to skip it): every unit passes
        Stage wide = cmosStage(new Trim(true, Trim.Method.TWO_TEMPERATURE, 0, 0));
        double bound = BudgetCalculator.trimmed(wide, cmosPart(), Trim.Method.TWO_TEMPERATURE)
                .worstCaseV();
        StageFixture f = StageFixture.follower().temps(-40, 85).limitV(bound);
        f.rs = 1e9;
        f.trim = wide.trim();
        f.trials = 5000;
        Stage s = f.build();
        PartValues v = PartValues.of(cmosPart(), s);
        List<TermResult> terms =
                BudgetCalculator.TERMS.stream().map(t -> t.evaluate(s, v)).toList();
        YieldResult y = new TwoTemperatureYield(
                        s, v, BudgetCalculator.fixedInYield(s, terms, true, false), CalibrationLine.of(s, s.trim()))
                .run(Double.NaN, Double.POSITIVE_INFINITY);
        assertEquals("sampled", y.decided());
        assertEquals(1.0, y.value(), 0.0);
        // and a limit 1 % under it fails the few units whose IOS sits within 3 % of its bound with the IB part's
        // sign (IOS ~ N(0, bound/3) truncated at its bound): the samples reach the bound's neighbourhood
        f.limit = dev.ampsieve.stage.Limit.output(0.99 * bound);
        Stage tight = f.build();
        YieldResult t = new TwoTemperatureYield(
                        tight,
                        v,
                        BudgetCalculator.fixedInYield(tight, terms, true, false),
                        CalibrationLine.of(tight, tight.trim()))
                .run(Double.NaN, Double.POSITIVE_INFINITY);
        assertTrue(t.value() < 1.0, "yield " + t.value());
    }
}
