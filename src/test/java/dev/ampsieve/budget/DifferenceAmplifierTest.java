package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.MinTyp;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Range;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.report.ConstraintText;
import dev.ampsieve.stage.Board;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Difference;
import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.NonInverting;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The difference amplifier's common-mode error, its pins' common-mode range and what a trim
 * leaves, worked by hand. Circuit relations: Franco, <i>Design with Operational Amplifiers</i>,
 * 4th ed., §2.2; Kitchin &amp; Counts, <i>A Designer's Guide to Instrumentation Amplifiers</i>,
 * 3rd ed., ch. 1 [both from memory]: with V+ = V- = Vcm at the source,
 * Vout = Vcm [(1 + a) b/(1 + b) - a], a = R2/(R1 + Rs-), b = R4/(R3 + Rs+).
 */
class DifferenceAmplifierTest {

    /** R1 = R3 = 10 k, R2 = R4 = 100 k (G = 10), no source resistance; 1 V full scale; 0.1 % per pair. */
    private static Stage stage(
            double swing, Range cmRange, Double supply, double tol, double tc, double tMin, double tMax, Trim trim) {
        return new Stage(
                new Difference(10e3, 100e3, 10e3, 100e3, 0, 0),
                tMin,
                tMax,
                supply,
                0,
                swing,
                cmRange,
                null,
                0.1,
                10,
                1,
                1.0,
                tol,
                tc,
                0,
                Limit.output(10e-3),
                Criterion.WORST_CASE,
                3,
                2000,
                2000,
                1,
                trim,
                1000,
                null,
                false,
                null,
                null,
                Board.NONE,
                null);
    }

    /** An otherwise ideal part with a CMRR of {@code db}. */
    private static Part partWithCmrr(double db) {
        PartFixture p = PartFixture.ideal();
        p.testConditions =
                new dev.ampsieve.catalog.TestConditions(5.0, 2.5); // the stages' own: no operating-point move
        p.cmrr = new MinTyp(db, null);
        return p.build();
    }

    // ------------------------------------------------------------------ resistor-limited rejection

    /**
     * Common-mode gain from the four resistors themselves, by the superposition above (written here,
     * not taken from the network): Vout/Vcm = (1 + R2/R1) R4/(R3 + R4) - R2/R1.
     */
    private static double fourResistorGain(double r1, double r2, double r3, double r4) {
        return (1 + r2 / r1) * r4 / (r3 + r4) - r2 / r1;
    }

    /**
     * First-order resistor-limited rejection (1 + G)/(4ε) with each of four resistors within ±ε
     * (Kitchin &amp; Counts ch. 1 [from memory]; per pair: (1 + G)/(2e) with e = 2ε), against the
     * exact worst case over all 16 sign patterns and against the engine's exact
     * {@link Difference#worstCommonModeGain} at per-pair e = 2ε.
     *
     * <p>Bound worked by hand (matched design, a = b = G): the worst pattern is R1, R4 low and R2,
     * R3 high, giving a' = G(1+ε)/(1-ε), b' = G(1-ε)/(1+ε) and |Acm| = 4εG / [(1-ε)(1+G - ε(G-1))].
     * Against the first-order 4εG/(1+G) the ratio is 1/(1 - 2Gε/(1+G) + ε²(G-1)/(1+G)), between 1
     * and 1/(1-2ε) for G &gt;= 1, so the difference in common-mode gain is at most
     * 4εG/(1+G) x 2ε/(1-2ε) &lt; 8ε²/(1-2ε): second order. The engine's per-pair form
     * 2Ge/(1+G - Ge) at e = 2ε has the same ratio 1/(1 - 2Gε/(1+G)) and the same bound.
     */
    @ParameterizedTest(name = "G {0}, each resistor ±{1}")
    @CsvSource({"1, 1e-4", "1, 1e-2", "10, 1e-3", "10, 5e-4", "100, 1e-3", "100, 1e-2", "1000, 1e-4", "1000, 1e-3"})
    void firstOrderRejectionAgreesWithTheExactFourResistorWorstCase(double g, double eps) {
        double r1 = 1e3;
        double r2 = g * r1;
        double exact = 0;
        for (int signs = 0; signs < 16; signs++) {
            double[] k = new double[4];
            for (int i = 0; i < 4; i++) {
                k[i] = 1 + ((signs >> i & 1) == 1 ? eps : -eps);
            }
            exact = Math.max(exact, Math.abs(fourResistorGain(r1 * k[0], r2 * k[1], r1 * k[2], r2 * k[3])));
        }
        double firstOrder = 4 * eps * g / (1 + g); // 1/CMRR with CMRR = (1 + G)/(4ε) in single-resistor terms
        double bound = 8 * eps * eps / (1 - 2 * eps);
        assertTrue(
                exact >= firstOrder,
                "the exact worst case is not below the first-order one: " + exact + " " + firstOrder);
        assertEquals(firstOrder, exact, bound, "16 sign patterns");
        // the closed form of the worst pattern, worked above; 1e-8 relative: at G 1000, ε 1e-4 the superposition
        // subtracts two numbers near 1000 to leave 4e-4, so its round-off is about 1e-16 x 1000/4e-4 = 2.5e-10 relative
        assertEquals(4 * eps * g / ((1 - eps) * (1 + g - eps * (g - 1))), exact, 1e-8 * exact, "worst pattern");
        Difference d = new Difference(r1, r2, r1, r2, 0, 0);
        double engine = d.worstCommonModeGain(2 * eps); // per pair 2ε: the (1 + G)/(2e) reading
        assertEquals(firstOrder, engine, bound, "engine, per-pair 2ε");
        // per pair exactly (1+ε)/(1-ε) - 1 = 2ε/(1-ε) covers every four-resistor pattern
        assertTrue(
                d.worstCommonModeGain(2 * eps / (1 - eps)) >= exact * (1 - 1e-12),
                "per-pair bound covers the four resistors");
    }

    // ------------------------------------------------------------------ the CMRR term

    @Test
    void cmrrTermOfADifferenceStageAddsTheResistorsAndTheAmplifier() {
        // G = 10, 0.1 % per pair, no tempco, dVcm 1 V at the source, CMRR 100 dB.
        // resistors: a = b = 10, worst (b(1-e) - a(1+e))/(1 + b(1-e)) = 2 x 10 x 0.001 / (1 + 10 - 0.01)
        //   = 0.02/10.99 = 1.819836e-3 V/V, x 1 V = 1.819836 mV
        // amplifier: NG x share x dVcm x 10^(-100/20) = 11 x (100/110) x 1 V x 1e-5 = 100 µV
        // sum of magnitudes (signs unknown) 1.919836 mV; at the source (/G 10): 191.9836 µV
        Stage s = stage(1.0, null, 5.0, 1e-3, 0, 25, 25, Trim.NONE);
        TermResult t = new CmrrTerm().evaluate(s, PartValues.of(partWithCmrr(100), s));
        assertEquals(1.919836e-3, t.outputV(), 1e-9, "output");
        assertEquals(191.9836e-6, t.inputV(), 1e-10, "at the source");
        // the operands are the two parts worked by hand above
        assertEquals("cmrr-difference", t.working().formula());
        assertEquals(1.0, t.working().value("dVcm"), 0.0);
        assertEquals(1.819836e-3, t.working().value("resistors"), 1e-9);
        assertEquals(100e-6, t.working().value("amplifier"), 1e-12);
        assertEquals(100.0, t.working().value("CMRR"), 0.0);
    }

    @Test
    void theResistorPartGrowsWithTheRatioTempcoAndIsWorstAtTheFarEnd() {
        // -40..85 °C: dT 65 °C; e = 0.1 % + 10 ppm/°C x 65 = 0.00165; 2 x 10 x 0.00165 / (11 - 0.0165) = 0.033/10.9835
        // = 3.004507e-3, x dVcm 0.5 V = 1.502253 mV; amplifier at 120 dB: 11 x 10/11 x 0.5 x 1e-6 = 5 µV; total
        // 1.507253 mV
        Stage s = stage(0.5, null, 5.0, 1e-3, 10e-6, -40, 85, Trim.NONE);
        TermResult t = new CmrrTerm().evaluate(s, PartValues.of(partWithCmrr(120), s));
        assertEquals(1.507253e-3, t.outputV(), 1e-9);
        assertEquals(-40.0, t.worstAtC(), 0.0, "the far end from 25 °C");
    }

    @Test
    void otherTopologiesKeepTheirFormula() {
        // non-inverting NG 100: NG x dVcm x 10^(-100/20) = 100 x 0.1 V x 1e-5 = 100 µV, the share being 1
        Stage s = stage(0.1, null, 5.0, 1e-3, 0, 25, 25, Trim.NONE).toBuilder()
                .network(new NonInverting(99e3, 1e3, 0, 0))
                .build();
        TermResult t = new CmrrTerm().evaluate(s, PartValues.of(partWithCmrr(100), s));
        assertEquals(100e-6, t.outputV(), 1e-15);
        assertEquals("cmrr", t.working().formula());
        assertEquals(0.1, t.working().value("dVcm"), 0.0);
        assertEquals(100.0, t.working().value("CMRR"), 0.0);
    }

    @Test
    void aTwoPointTrimLeavesTheCommonModeErrorWhole() {
        // the two-point calibration removes the resistor term's tolerance part (1 V x S 1 x 0.1 % = 1 mV) but not
        // the common-mode error (1.919836 mV above): it follows the common mode, which moves after the trim
        Stage s = stage(1.0, null, 5.0, 1e-3, 0, 25, 25, new Trim(true, Trim.Method.TWO_POINT, 0, 0));
        Budget b = BudgetCalculator.compute(s, partWithCmrr(100));
        assertEquals(1.919836e-3, b.term("cmrr").outputV(), 1e-9);
        assertEquals(1e-3, b.term("resistors").outputV(), 1e-12, "S 1 for a matched difference stage");
        double expected = b.worstCaseV() - b.term("resistors").outputV();
        assertEquals(expected, b.trimmed().worstCaseV(), 1e-15, "only the resistor tolerance goes");
        assertTrue(b.trimmed().worstCaseV() > 1.919836e-3 - 1e-9);
    }

    // ------------------------------------------------------------------ the pins' common mode

    @Test
    void thePinsSeeTheSourceCommonModeDividedAboutMidSupply() {
        // 5 V supply: mid 2.5 V; share R4/(R3 + R4) = 100/110 = 0.9090909
        // default: the source moves 2.5 ± 0.15 V, the pins 2.5 ± 0.15 x 0.9090909 = 2.5 ± 0.1363636 V
        Range dflt = Constraints.neededCommonMode(stage(0.15, null, 5.0, 0, 0, 25, 25, Trim.NONE));
        assertEquals(2.3636364, dflt.min(), 1e-7);
        assertEquals(2.6363636, dflt.max(), 1e-7);
        // stated at the source 0.5..4.5 V: pins 2.5 + (0.5 - 2.5) x 0.9090909 = 0.6818182 V, and 4.3181818 V
        Range stated = Constraints.neededCommonMode(stage(0.15, new Range(0.5, 4.5), 5.0, 0, 0, 25, 25, Trim.NONE));
        assertEquals(0.6818182, stated.min(), 1e-7);
        assertEquals(4.3181818, stated.max(), 1e-7);
        // a part reaching 0.7..4.3 V at its pins then misses by 18.2 mV at each end, and the detail says where it is
        // measured
        PartFixture p = PartFixture.ideal();
        p.inHead = new dev.ampsieve.catalog.Headroom(0.7, 0.7);
        List<Assumption> w = new ArrayList<>();
        ConstraintResult r =
                Constraints.commonMode(stage(0.15, new Range(0.5, 4.5), 5.0, 0, 0, 25, 25, Trim.NONE), p.build(), w);
        assertTrue(
                !r.ok() && ConstraintText.detail(r).contains("short by 18.2 mV at the low end"),
                ConstraintText.detail(r));
        assertTrue(
                ConstraintText.detail(r)
                        .contains(
                                "(at the pins: the source's common mode x 0.9091 about mid-supply, the reference taken"
                                        + " at mid-supply)"),
                ConstraintText.detail(r));
    }

    @Test
    void theOutputRangeNeedsNothingNew() {
        // the output swings about the reference (mid-supply) by the full scale: 2.5 ± 1 V, as for every topology
        Range out = Constraints.neededOutput(stage(0.15, null, 5.0, 0, 0, 25, 25, Trim.NONE));
        assertEquals(1.5, out.min(), 1e-12);
        assertEquals(3.5, out.max(), 1e-12);
    }
}
