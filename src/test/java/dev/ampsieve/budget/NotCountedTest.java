package dev.ampsieve.budget;

import static dev.ampsieve.testing.PartBuilder.part;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.budget.NotCounted.Reason;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/**
 * Every stage value whose absence (or zero) makes a term vanish is named with the term, so no
 * verdict leaves a term out unsaid. Each term class was read for a stage value that zeroes it:
 * full-scale-output (terms 6, 7, 8), supply.variation (5), common-mode-swing (4),
 * resistor-ratio tolerance and tempco (8), service-life (9), ac-coupled (1, 2, 3, 9); the
 * catalog's bias current (3), GBW (7), long-term drift (9) and noise densities (10). Offset and
 * drift have none: a missing drift is estimated from the offset.
 */
class NotCountedTest {

    /** An invented part with every figure the terms need. */
    private static final Part FULL = part("NC-1")
            .gbw(1e6)
            .aging(5e-6, 1000 * 3600.0)
            .ib(null, 10e-9)
            .noise(10e-9, 10.0, 1e-12, 100.0)
            .build();

    private static Stage stage(String yaml) throws Exception {
        return StageLoader.parse(yaml, Path.of("s.yaml"));
    }

    private static Map<String, Reason> of(Stage s, Part p) {
        return NotCounted.of(s, p).stream().collect(Collectors.toMap(NotCounted::term, NotCounted::reason));
    }

    @Test
    void theFewestKeysAStageTakesLeaveOutEightTermsAndSayWhy() throws Exception {
        Stage s = stage("gain: 200\nlimit: 2 mV\n");
        Map<String, Reason> left = of(s, FULL);
        assertEquals(
                Map.of(
                        CmrrTerm.KEY,
                                Reason.NO_COMMON_MODE_SWING, // its default follows from the absent full scale: 0 V
                        PsrrTerm.KEY, Reason.NO_SUPPLY_VARIATION,
                        OpenLoopGainTerm.KEY, Reason.NO_FULL_SCALE_OUTPUT,
                        BandwidthTerm.KEY, Reason.NO_FULL_SCALE_OUTPUT,
                        ResistorTerm.KEY, Reason.NO_FULL_SCALE_OUTPUT,
                        AgingTerm.KEY, Reason.NO_SERVICE_LIFE,
                        OperatingPointTerm.KEY, Reason.NO_SUPPLY_VOLTAGE, // no supply: no operating point to compare
                        SelfHeatingTerm.KEY, Reason.NO_LOAD_RESISTANCE),
                left);
        // and each is truly 0 V in the budget: the list is what the verdict lacks
        Budget b = BudgetCalculator.compute(s, FULL);
        for (String key : left.keySet()) {
            assertEquals(0.0, b.term(key).outputV(), key);
        }
        assertEquals(NotCounted.of(s, FULL), b.notCounted());
    }

    @Test
    void aStageWithEveryValueCountsEveryTermAndEachIsAboveZero() throws Exception {
        Stage s = stage("""
                gain: 200
                limit: 20 mV
                full-scale-output: 2 V
                supply: {voltage: 10 V, variation: 0.5 V}
                resistor-ratio: {tolerance: 0.1 %}
                service-life: 10 y
                thermal-emf: {junctions: 2, seebeck: 3 uV/C, gradient: 0.5 C}
                leakage: {resistance: 10 Gohm, voltage: 12 V}
                load-resistance: 2 kohm
                """);
        Budget b = BudgetCalculator.compute(s, FULL);
        assertEquals(List.of(), b.notCounted());
        // board-level, by hand: NG 200 x 2 x 3 µV/°C x 0.5 °C = 0.6 mV; 12 V / 10 GΩ = 1.2 nA into the + input, whose
        // resistance is 0 here (no source named): 0 V, so the source's resistance is what a leakage needs to matter
        assertEquals(0.6e-3, b.term(ThermalEmfTerm.KEY).outputV(), 1e-15);
        for (TermResult t : b.terms()) {
            if (t.key().equals(LeakageTerm.KEY)
                    || t.key().equals(InputCrossoverTerm.KEY)
                    || t.key().equals(ChoppingRippleTerm.KEY)) {
                continue; // 0 V: leakage through R+ = 0 (worked above); one input pair (headroom 1.5 V), no chopping
            }
            assertTrue(t.outputV() > 0, t.key() + " is 0 V though nothing is said of it");
        }
        // by hand: NG x dVs x 10^(-60/20) = 200 x 0.5 V x 0.001 = 0.1 V, PSRR assumed 60 dB (Assumed.PSRR_DB)
        assertEquals(0.1, b.term(PsrrTerm.KEY).outputV(), 1e-12);
        // common-mode swing, non-inverting: full scale / gain = 2 V / 200 = 10 mV; x NG x 10^-3 = 2 mV
        assertEquals(2e-3, b.term(CmrrTerm.KEY).outputV(), 1e-12);
    }

    @Test
    void aSupplyVariationOfZeroWrittenOutIsNamedToo() throws Exception {
        Stage s = stage("gain: 10\nlimit: 1 mV\nfull-scale-output: 1 V\nsupply: {voltage: 5 V, variation: 0 V}\n");
        assertEquals(Reason.NO_SUPPLY_VARIATION, of(s, FULL).get(PsrrTerm.KEY));
    }

    @Test
    void aCommonModeSwingOfZeroIsNamedExceptWhereTheTopologyMakesItZero() throws Exception {
        Stage non = stage("gain: 10\nlimit: 1 mV\nfull-scale-output: 1 V\ncommon-mode-swing: 0 V\n");
        assertEquals(Reason.NO_COMMON_MODE_SWING, of(non, FULL).get(CmrrTerm.KEY));
        Stage follower = stage("topology: follower\nlimit: 1 mV\nfull-scale-output: 1 V\ncommon-mode-swing: 0 V\n");
        assertEquals(Reason.NO_COMMON_MODE_SWING, of(follower, FULL).get(CmrrTerm.KEY));
        // inverting: the + input sits at the reference, so the swing is 0 V by the circuit (Franco, ch. 1)
        Stage inv = stage("topology: inverting\ngain: 10\nlimit: 1 mV\nfull-scale-output: 1 V\n");
        assertEquals(null, of(inv, FULL).get(CmrrTerm.KEY));
    }

    @Test
    void idealResistorsAreNamedButAFollowerHasNone() throws Exception {
        Stage s = stage("gain: 10\nlimit: 1 mV\nfull-scale-output: 1 V\n");
        assertEquals(Reason.NO_RESISTOR_TOLERANCE, of(s, FULL).get(ResistorTerm.KEY));
        Stage tempcoOnly = stage("gain: 10\nlimit: 1 mV\nfull-scale-output: 1 V\nresistor-ratio: {tempco: 10 ppm/C}\n");
        assertEquals(null, of(tempcoOnly, FULL).get(ResistorTerm.KEY));
        // a follower's gain does not depend on resistors (sensitivity 0, ResistorTerm)
        Stage follower = stage("topology: follower\nlimit: 1 mV\nfull-scale-output: 1 V\n");
        assertEquals(null, of(follower, FULL).get(ResistorTerm.KEY));
    }

    @Test
    void catalogGapsAndAcCouplingAreNamedWithTheirOwnReason() throws Exception {
        Stage s = stage("gain: 10\nlimit: 1 mV\nfull-scale-output: 1 V\nservice-life: 1 y\n");
        Part bare = part("NC-2").gbw(0).build();
        Map<String, Reason> left = of(s, bare);
        assertEquals(Reason.NOT_IN_CATALOG, left.get(BandwidthTerm.KEY));
        // absent long-term drift, bias current and noise are estimated (budget/Assumed), so counted, not left out
        assertEquals(null, left.get(AgingTerm.KEY));
        assertEquals(null, left.get(BiasTerm.KEY));
        assertEquals(null, left.get(NoiseTerm.KEY));
        // the bipolar estimate IB = IOS = 500 nA (common practice, Assumed): R+ = 0, R- = Rf || Rg = 1 kΩ,
        // NG 10: 10 x (|0 - 1 kΩ| x 500 nA + (0 + 1 kΩ) x 250 nA) = 10 x 750 µV = 7.5 mV, flagged estimated
        TermResult bias = BudgetCalculator.compute(s, bare).term(BiasTerm.KEY);
        assertEquals(7.5e-3, bias.outputV(), 1e-12);
        assertTrue(bias.estimated());
        assertTrue(!Reason.NOT_IN_CATALOG.ofStage());

        Stage ac = stage("gain: 10\nlimit: 1 mV\nfull-scale-output: 1 V\nac-coupled: true\n");
        Map<String, Reason> acLeft = of(ac, FULL);
        for (String key : List.of(OffsetTerm.KEY, DriftTerm.KEY, BiasTerm.KEY, AgingTerm.KEY)) {
            assertEquals(Reason.AC_COUPLED, acLeft.get(key), key);
        }
    }
}
