package dev.ampsieve.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.ampsieve.report.ProblemText;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The transimpedance stage keys: what they load to (worked by hand) and each refusal with its place and fix. */
class TransimpedanceStageKeysTest {

    private static final Path NAME = Path.of("s.yaml");
    private static final String BASE = """
            topology: transimpedance
            rf: 1 Mohm
            source-resistance: 1 Gohm
            source-capacitance: 50 pF
            limit: {input-current: 1 nA}
            """;

    private static String problem(String yaml) {
        InputException e = assertThrows(InputException.class, () -> StageLoader.parse(yaml, NAME));
        List<String> all = e.problems().stream().map(ProblemText::line).toList();
        assertEquals(1, all.size(), () -> "expected one problem, got " + all);
        return all.get(0);
    }

    @Test
    void keysLoadIntoTheNetwork() throws InputException {
        Stage s = StageLoader.parse(
                BASE.replace("rf: 1 Mohm\n", "rf: 1 Mohm\ncf: 2 pF\nbalance-resistance: 1 Mohm\n"), NAME);
        Transimpedance t = (Transimpedance) s.network();
        assertEquals(1e6, t.rf(), 1e-9);
        assertEquals(2e-12, t.cf(), 1e-27);
        assertEquals(1e9, t.rsh(), 1e-3);
        assertEquals(50e-12, t.cs(), 1e-27);
        assertEquals(1e6, s.rPlus(), 1e-9);
        // by hand: NG = 1 + 1 Mohm / 1 Gohm = 1.001; signal gain -1 Mohm (V/A); R- = 1 Mohm || 1 Gohm = 999000.999 ohm
        assertEquals(1.001, s.noiseGain(), 1e-15);
        assertEquals(-1e6, s.signalGain(), 1e-9);
        assertEquals(999000.999, s.rMinus(), 1e-3);
        // the limit: 1 nA x 1 Mohm = 1 mV at the output
        assertEquals(1e-3, s.limitVolts(), 1e-18);
    }

    @Test
    void cfDefaultsToNone() throws InputException {
        assertEquals(0.0, ((Transimpedance) StageLoader.parse(BASE, NAME).network()).cf());
    }

    @Test
    void missingRf() {
        assertEquals(
                "s.yaml:1:1: rf: required for a transimpedance stage: the output is the source current times rf; add 'rf: 1 Mohm'",
                problem(BASE.replace("rf: 1 Mohm\n", "")));
    }

    @Test
    void missingShuntResistance() {
        assertEquals(
                "s.yaml:1:1: source-resistance: required for a transimpedance stage: the source's shunt resistance sets the DC"
                        + " noise gain 1 + rf/source-resistance; add 'source-resistance: 1 Gohm' (a photodiode's shunt resistance at the"
                        + " hottest temperature; a current source: a large value such as 100 Gohm)",
                problem(BASE.replace("source-resistance: 1 Gohm\n", "")));
    }

    @Test
    void missingSourceCapacitance() {
        assertEquals(
                "s.yaml:1:1: source-capacitance: required for a transimpedance stage: the source's capacitance raises the noise"
                        + " gain above its zero and decides stability; add 'source-capacitance: 50 pF' (the photodiode's junction"
                        + " capacitance at its bias, plus the wiring)",
                problem(BASE.replace("source-capacitance: 50 pF\n", "")));
    }

    @Test
    void gainIsRefused() {
        assertEquals(
                "s.yaml:3:7: gain: a transimpedance stage's gain is rf itself, in volts per ampere; remove 'gain'; write 'rf: 1 Mohm'",
                problem(BASE.replace("rf: 1 Mohm\n", "rf: 1 Mohm\ngain: 10\n")));
    }

    @Test
    void aVoltageInputLimitIsRefused() {
        assertEquals(
                "s.yaml:5:16: limit.input: a transimpedance stage's input is a current; write 'input-current: 1 nA'"
                        + " (multiplied by rf), or the limit at the output",
                problem(BASE.replace("{input-current: 1 nA}", "{input: 1 mV}")));
    }

    @Test
    void aCurrentLimitOnAVoltageStageIsRefused() {
        assertEquals(
                "s.yaml:2:24: limit.input-current: only a transimpedance stage has a current input; write 'input: 10 uV'"
                        + " (at the signal source), or 'topology: transimpedance'",
                problem("gain: 10\nlimit: {input-current: 1 nA}\n"));
    }

    @Test
    void cfOnAVoltageStageIsRefused() {
        assertEquals(
                "s.yaml:2:5: cf: 'cf' belongs to a transimpedance stage, and this one is non-inverting; remove it, or write"
                        + " 'topology: transimpedance'",
                problem("gain: 10\ncf: 2 pF\nlimit: 1 mV\n"));
    }
}
