package dev.ampsieve.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.ampsieve.report.ProblemText;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The stage keys of the operating point: load-resistance and sample-rate, read, written back, and refused with place and fix. */
class OperatingPointStageKeysTest {

    private static final Path NAME = Path.of("s.yaml");

    private static Stage stage(String yaml) throws InputException {
        return StageLoader.parse(yaml, NAME);
    }

    private static String problem(String yaml) {
        InputException e = assertThrows(InputException.class, () -> stage(yaml));
        List<String> all = e.problems().stream().map(ProblemText::line).toList();
        assertEquals(1, all.size(), () -> "expected one problem, got " + all);
        return all.get(0);
    }

    @Test
    void bothAreOffByDefault() throws InputException {
        Stage s = stage("gain: 10\nlimit: 1 mV\n");
        assertNull(s.loadResistance());
        assertNull(s.sampleRate());
    }

    @Test
    void bothAreReadInSiUnits() throws InputException {
        Stage s = stage("gain: 10\nlimit: 1 mV\nload-resistance: 2 kohm\nsample-rate: 30 kHz\n");
        assertEquals(2000.0, s.loadResistance(), 0.0);
        assertEquals(30e3, s.sampleRate(), 0.0);
    }

    @Test
    void theWriterKeepsThemAndLeavesThemOutWhenAbsent() throws InputException {
        Stage s = stage("gain: 10\nlimit: 1 mV\nload-resistance: 600 ohm\nsample-rate: 48 kHz\n");
        String text = StageWriter.toYaml(s);
        Stage back = stage(text);
        assertEquals(600.0, back.loadResistance(), 0.0);
        assertEquals(48e3, back.sampleRate(), 0.0);
        String plain = StageWriter.toYaml(stage("gain: 10\nlimit: 1 mV\n"));
        assertEquals(-1, plain.indexOf("\nload-resistance:"), plain);
        assertEquals(-1, plain.indexOf("\nsample-rate:"), plain);
    }

    @Test
    void aZeroLoadIsRefused() {
        assertEquals(
                "s.yaml:3:18: load-resistance: must be more than 0; write a resistance such as '2 kohm'",
                problem("gain: 10\nlimit: 1 mV\nload-resistance: 0 ohm\n"));
    }

    @Test
    void aLoadBelowAnOhmIsAShort() {
        assertEquals(
                "s.yaml:3:18: load-resistance: 500 mΩ is below 1.00 Ω, a short for an op amp's output; write the"
                        + " resistance the output drives, such as '2 kohm'; leave the key out for no load",
                problem("gain: 10\nlimit: 1 mV\nload-resistance: 0.5 ohm\n"));
    }

    @Test
    void aLoadInVoltsNamesTheUnit() {
        assertEquals(
                "s.yaml:3:18: load-resistance: '2 V' is a voltage but a resistance belongs here; write a resistance"
                        + " such as '2 kohm'",
                problem("gain: 10\nlimit: 1 mV\nload-resistance: 2 V\n"));
    }

    @Test
    void aSampleRateBeyondAnyConverterIsRefused() {
        assertEquals(
                "s.yaml:3:14: sample-rate: 20.0 GHz is above 10.0 GHz, faster than any converter samples; check the"
                        + " prefix (Hz, kHz, MHz); write the converter's sample rate, such as '30 kHz'",
                problem("gain: 10\nlimit: 1 mV\nsample-rate: 20 GHz\n"));
    }

    @Test
    void aZeroSampleRateIsRefused() {
        assertEquals(
                "s.yaml:3:14: sample-rate: must be more than 0; write a frequency such as '30 kHz'",
                problem("gain: 10\nlimit: 1 mV\nsample-rate: 0 Hz\n"));
    }
}
