package dev.ampsieve.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.ampsieve.report.ProblemText;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The difference stage's keys: r1..r4, gain with r2 (or r1), the per-leg source resistance, the
 * common-mode swing's default at the source, and the error for each combination that cannot be
 * built. Expected resistor values are worked by hand from the keys (r1 = r2/gain; r3, r4 default to
 * r1, r2), the gains from a = r2/(r1 + Rs-) (Franco, 4th ed., §2.2 [from memory]).
 */
class DifferenceStageKeysTest {

    private static final Path NAME = Path.of("s.yaml");

    private static Difference network(String yaml) throws InputException {
        Stage s = StageLoader.parse(yaml, NAME);
        assertEquals(Topology.DIFFERENCE, s.topology());
        return assertInstanceOf(Difference.class, s.network());
    }

    private static String problem(String yaml) {
        InputException e = assertThrows(InputException.class, () -> StageLoader.parse(yaml, NAME));
        List<String> all = e.problems().stream().map(ProblemText::line).toList();
        assertEquals(1, all.size(), () -> "expected one problem, got " + all);
        return all.get(0);
    }

    @Test
    void gainWithR2GivesR1AndTheMatchedPair() throws InputException {
        // r1 = 100 k / 20 = 5 k; r3, r4 = r1, r2
        Difference d = network("topology: difference\ngain: 20\nr2: 100 kohm\nlimit: 1 mV\n");
        assertEquals(5e3, d.r1(), 1e-9);
        assertEquals(100e3, d.r2(), 0.0);
        assertEquals(5e3, d.r3(), 1e-9);
        assertEquals(100e3, d.r4(), 0.0);
        assertEquals(0.0, d.rsMinus(), 0.0);
        assertEquals(0.0, d.rsPlus(), 0.0);
    }

    @Test
    void gainAloneTakesTheDefaultR2() throws InputException {
        // r2 defaults to 10 kohm (StageKeys.DEFAULT_RF, the loader's message says so): r1 = 10 k / 10 = 1 k
        Difference d = network("topology: difference\ngain: 10\nlimit: 1 mV\n");
        assertEquals(10e3, d.r2(), 0.0);
        assertEquals(1e3, d.r1(), 1e-9);
    }

    @Test
    void r1AndR2SetTheGainAndR3R4DefaultToThem() throws InputException {
        Stage s = StageLoader.parse("topology: difference\nr1: 2 kohm\nr2: 50 kohm\nlimit: 1 mV\n", NAME);
        Difference d = (Difference) s.network();
        assertEquals(2e3, d.r3(), 0.0);
        assertEquals(50e3, d.r4(), 0.0);
        // G = R2/R1 = 25 with matched pairs; NG = 1 + 25 = 26
        assertEquals(25.0, s.signalGain(), 1e-12);
        assertEquals(26.0, s.noiseGain(), 1e-12);
    }

    @Test
    void r3AndR4GivenAreKept() throws InputException {
        Difference d =
                network("topology: difference\nr1: 1 kohm\nr2: 10 kohm\nr3: 1.001 kohm\nr4: 10 kohm\nlimit: 1 mV\n");
        assertEquals(1.001e3, d.r3(), 1e-9);
        assertEquals(10e3, d.r4(), 0.0);
    }

    @Test
    void oneSourceResistanceIsBothLegsAndTheMappingGivesEachLeg() throws InputException {
        Difference both =
                network("topology: difference\nr1: 10 kohm\nr2: 100 kohm\nsource-resistance: 175 ohm\nlimit: 1 mV\n");
        assertEquals(175.0, both.rsMinus(), 0.0);
        assertEquals(175.0, both.rsPlus(), 0.0);
        Difference legs = network(
                "topology: difference\nr1: 10 kohm\nr2: 100 kohm\nsource-resistance: {minus: 100 ohm, plus: 250 ohm}\n"
                        + "limit: 1 mV\n");
        assertEquals(100.0, legs.rsMinus(), 0.0);
        assertEquals(250.0, legs.rsPlus(), 0.0);
        // the legs add to r1 and r3: a = 100 k/10.1 k = 9.900990, b = 100 k/10.25 k = 9.756098
        assertEquals(9.900990099, legs.a(), 1e-9);
        assertEquals(9.756097561, legs.b(), 1e-9);
    }

    @Test
    void theDefaultCommonModeSwingIsHalfTheDifferentialFullScaleAtTheSource() throws InputException {
        // full scale 1 V at gain 100: the source's differential full scale is 10 mV; half of it, 5 mV
        Stage s = StageLoader.parse(
                "topology: difference\ngain: 100\nr2: 1 Mohm\nfull-scale-output: 1 V\nlimit: 1 mV\n", NAME);
        assertEquals(5e-3, s.commonModeSwing(), 1e-15);
    }

    // ------------------------------------------------------------------ combinations that cannot be built

    @Test
    void gainR1AndR2TogetherMayDisagree() {
        assertEquals(
                "s.yaml:2:7: gain: 'gain', 'r1' and 'r2' are all given and may disagree; give 'gain' with 'r2' (or with"
                        + " 'r1'), or 'r1' and 'r2' without 'gain'",
                problem("topology: difference\ngain: 100\nr1: 1 kohm\nr2: 100 kohm\nlimit: 1 mV\n"));
    }

    @Test
    void onlyR3IsRefused() {
        assertEquals(
                "s.yaml:3:5: r3: only one of r3 and r4 is given; give both, or neither (then r3 = r1 and r4 = r2, the matched"
                        + " design)",
                problem("topology: difference\ngain: 10\nr3: 1 kohm\nlimit: 1 mV\n"));
    }

    @Test
    void onlyR3WithoutAGainAsksForTheGainFirst() {
        assertEquals(
                "s.yaml:1:1: gain: the gain is not given; add 'gain: 10' (with 'r2', default 10 kohm), or both 'r1' and 'r2'",
                problem("topology: difference\nr3: 1 kohm\nlimit: 1 mV\n"));
    }

    @Test
    void rfNamesR2() {
        assertEquals(
                "s.yaml:3:5: rf: a difference stage has r1, r2 (inverting side) and r3, r4 (non-inverting side), not 'rf';"
                        + " write 'r2' for the feedback resistor",
                problem("topology: difference\ngain: 10\nrf: 10 kohm\nlimit: 1 mV\n"));
    }

    @Test
    void balanceResistanceHasNoPlace() {
        assertEquals(
                "s.yaml:3:21: balance-resistance: a difference stage has r1, r2 (inverting side) and r3, r4 (non-inverting"
                        + " side), not 'balance-resistance'; remove it: r4 returns the + input to the reference",
                problem("topology: difference\ngain: 10\nbalance-resistance: 1 kohm\nlimit: 1 mV\n"));
    }

    @Test
    void oneLegMissing() {
        assertEquals(
                "s.yaml:4:3: source-resistance.plus: missing: per-leg source resistances need both legs; add 'plus: 350 ohm'"
                        + " (the resistance of the leg driving r3)",
                problem("topology: difference\ngain: 10\nsource-resistance:\n  minus: 350 ohm\nlimit: 1 mV\n"));
    }

    @Test
    void perLegSourceResistanceBelongsToADifferenceStage() {
        assertEquals(
                "s.yaml:2:20: source-resistance: a source resistance per leg ({minus, plus}) belongs to a difference stage;"
                        + " write one value, such as 'source-resistance: 350 ohm'",
                problem("gain: 10\nsource-resistance: {minus: 1 kohm, plus: 1 kohm}\nlimit: 1 mV\n"));
    }

    @Test
    void r1OnANonInvertingStageNamesTheTopology() {
        assertEquals(
                "s.yaml:2:5: r1: 'r1' belongs to a difference stage, and this one is non-inverting; remove it, or write"
                        + " 'topology: difference'",
                problem("gain: 10\nr1: 1 kohm\nlimit: 1 mV\n"));
    }
}
