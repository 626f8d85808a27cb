package dev.ampsieve.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The stage keys of a trim circuit: trim.circuit, trim.circuits and the circuit's own keys. */
class TrimCircuitKeysTest {

    private static final Path NAME = Path.of("s.yaml");
    private static final String HEAD = "gain: 10\nlimit: 1 mV\ntrim:\n";

    private static Stage stage(String yaml) throws InputException {
        return StageLoader.parse(yaml, NAME);
    }

    private static String problem(String yaml) {
        InputException e = assertThrows(InputException.class, () -> stage(yaml));
        List<String> all =
                e.problems().stream().map(dev.ampsieve.report.ProblemText::line).toList();
        assertEquals(1, all.size(), () -> "expected one problem, got " + all);
        return all.get(0);
    }

    @Test
    void aTrimWithoutACircuitIsAStoredCorrection() throws InputException {
        Trim t = stage(HEAD + "  cost: 0.5\n").trim();
        assertEquals(TrimCircuit.STORED, t.circuit());
        assertEquals(List.of(TrimCircuit.Kind.STORED), t.circuits());
        assertEquals(0.5, t.totalCost(), 0);
    }

    @Test
    void theCircuitsKeysAreRead() throws InputException {
        Trim t = stage(HEAD
                        + "  cost: 0.5\n  circuit: injection\n  circuits: [stored, injection, dac]\n  margin: 2\n"
                        + "  node: plus\n  reference: 1.25 V\n  reference-tempco: 5 ppm/C\n  tracking: 2 ppm/C\n"
                        + "  pot-settability: 0.5 %\n  pot-resistance: 20 kohm\n  dac-bits: 10\n"
                        + "  dac-offset-drift: 3 uV/C\n  pot-cost: 0.3\n  adjust-cost: 1\n")
                .trim();
        TrimCircuit c = t.circuit();
        assertEquals(TrimCircuit.Kind.INJECTION, c.kind());
        assertEquals(List.of(TrimCircuit.Kind.STORED, TrimCircuit.Kind.INJECTION, TrimCircuit.Kind.DAC), t.circuits());
        assertEquals(2.0, c.margin(), 0);
        assertEquals(TrimCircuit.Node.PLUS, c.node());
        assertEquals(1.25, c.reference(), 1e-15);
        assertEquals(5e-6, c.referenceTempco(), 1e-18);
        assertEquals(2e-6, c.ratioTempco(), 1e-18); // tracking given: it is the ratio's tempco
        assertEquals(5e-3, c.potSettability(), 1e-15);
        assertEquals(20e3, c.potResistance(), 1e-9);
        assertEquals(10, c.dacBits());
        assertEquals(3e-6, c.dacOffsetDrift(), 1e-18);
        // the injection network's parts: reference 0.60 (default) + trimmer 0.30 + resistor 0.01 + hand work 1
        assertEquals(0.5 + 0.6 + 0.3 + 0.01 + 1, t.totalCost(), 1e-12);
    }

    @Test
    void circuitsMayBeWordsSeparatedByCommas() throws InputException {
        assertEquals(
                List.of(TrimCircuit.Kind.NULL_PINS, TrimCircuit.Kind.DAC),
                stage(HEAD + "  circuits: \"null-pins, dac\"\n").trim().circuits());
    }

    @Test
    void anUnknownCircuitIsNamedWithTheNearest() {
        String p = problem(HEAD + "  circuits: [stored, injektion]\n");
        assertTrue(
                p.startsWith("s.yaml:4:13: trim.circuits: 'injektion' is not a trim circuit (did you mean injection?)"),
                p);
    }

    @Test
    void aTrimmerCannotFollowTheTemperature() {
        assertEquals(
                "s.yaml:5:12: trim.circuit: a trimmer is set once, at one temperature; method two-temperature needs a "
                        + "correction that follows the temperature; write 'circuit: stored' or 'circuit: dac', or "
                        + "'method: one-point'",
                problem(HEAD + "  method: two-temperature\n  circuit: null-pins\n"));
    }

    @Test
    void outOfRangeValuesAreRefused() {
        assertEquals(
                "s.yaml:4:11: trim.margin: 0.5 is outside 1 to 100: the range must at least cover the offset; write a "
                        + "factor such as '1.5'",
                problem(HEAD + "  margin: 0.5\n"));
        assertTrue(problem(HEAD + "  pot-settability: 150 %\n").contains("at most 100 %"));
        assertTrue(problem(HEAD + "  reference-tempco: 2 %/C\n").contains("above 1 %/°C"));
        assertTrue(problem(HEAD + "  dac-bits: 40\n").startsWith("s.yaml:4:13: trim.dac-bits: "));
    }

    @Test
    void theWriterKeepsTheCircuit() throws InputException {
        Stage s = stage(HEAD + "  circuit: dac\n  circuits: [stored, dac]\n  dac-bits: 12\n  tracking: 3 ppm/C\n");
        Stage back = StageLoader.parse(StageWriter.toYaml(s), NAME);
        assertEquals(s.trim(), back.trim());
    }
}
