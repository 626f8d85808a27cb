package dev.ampsieve.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.report.ProblemText;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The stage keys of a two-temperature calibration: trim.method two-temperature, trim.cold, trim.hot. */
class TwoTemperatureTrimKeysTest {

    private static final Path NAME = Path.of("s.yaml");
    private static final String HEAD = "gain: 10\nlimit: 1 mV\ntemperature:\n  min: -40 C\n  max: 85 C\ntrim:\n";

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
    void theTwoTemperaturesAreReadAndDefaultToTheRangeEnds() throws InputException {
        Stage s = stage(HEAD + "  method: two-temperature\n  cold: 0 C\n  hot: 50 C\n  resolution: 1 mV\n");
        assertEquals(new Trim(true, Trim.Method.TWO_TEMPERATURE, 1e-3, 0, 0, 50), s.trim());
        Stage d = stage(HEAD + "  method: two-temperature\n");
        assertTrue(Double.isNaN(d.trim().cold()) && Double.isNaN(d.trim().hot()), d.trim()::toString);
        assertEquals(-40.0, d.trim().coldIn(d), 0.0);
        assertEquals(85.0, d.trim().hotIn(d), 0.0);
        Stage one = stage(HEAD + "  method: two-temperature\n  hot: 60 C\n");
        assertEquals(-40.0, one.trim().coldIn(one), 0.0);
        assertEquals(60.0, one.trim().hotIn(one), 0.0);
    }

    @Test
    void aMisspeltMethodIsNamedWithTheChoices() {
        String p = problem(HEAD + "  method: two-temp\n");
        assertTrue(p.startsWith("s.yaml:7:11: trim.method: "), p);
        assertTrue(p.contains("two-temperature"), p);
    }

    @Test
    void coldMustBeBelowHot() {
        assertEquals(
                "s.yaml:9:8: trim.hot: the two calibration temperatures must differ, cold below hot; they are "
                        + "50 °C and 0 °C; write 'trim.cold' below 'trim.hot', such as 'cold: -40 C' and 'hot: 85 C'",
                problem(HEAD + "  method: two-temperature\n  cold: 50 C\n  hot: 0 C\n"));
        // one given, the other the range end: hot 85 °C is not above cold 85 °C
        assertEquals(
                "s.yaml:8:9: trim.cold: the two calibration temperatures must differ, cold below hot; they are "
                        + "85 °C and 85 °C (temperature.max); write 'trim.cold' below 'trim.hot', such as 'cold: -40 C' and 'hot: 85 C'",
                problem(HEAD + "  method: two-temperature\n  cold: 85 C\n"));
    }

    @Test
    void aRangeOfOneTemperatureNeedsTheTwoPointsGiven() {
        String p = problem(
                "gain: 10\nlimit: 1 mV\ntemperature:\n  min: 25 C\n  max: 25 C\ntrim:\n  method: two-temperature\n");
        assertEquals(
                "s.yaml:7:11: trim.method: the two calibration temperatures must differ, cold below hot; they are "
                        + "25 °C (temperature.min) and 25 °C (temperature.max); give 'trim.cold' and 'trim.hot', such as '-40 C' and '85 C'",
                p);
    }

    @Test
    void calibrationTemperaturesBelongToTheTwoTemperatureMethod() {
        assertEquals(
                "s.yaml:8:9: trim.cold: a calibration temperature belongs to method two-temperature, but the method "
                        + "is one-point; write 'method: two-temperature', or remove 'trim.cold'",
                problem(HEAD + "  method: one-point\n  cold: 0 C\n"));
    }

    @Test
    void aCalibrationTemperatureNoCircuitSeesIsRefused() {
        String p = problem(HEAD + "  method: two-temperature\n  hot: 900 C\n");
        assertTrue(p.startsWith("s.yaml:8:8: trim.hot: 900 °C is outside "), p);
        assertTrue(p.endsWith("write the calibration temperature in °C, such as '85 C'"), p);
    }

    @Test
    void theWriterKeepsTheTwoTemperatures() throws InputException {
        Stage s = stage(HEAD + "  method: two-temperature\n  cold: 0 C\n  hot: 50 C\n");
        Stage back = stage(StageWriter.toYaml(StageWriter.answers(s)));
        assertEquals(s.trim(), back.trim());
        // absent temperatures stay absent (they follow the range when it changes)
        Stage d = stage(HEAD + "  method: two-temperature\n");
        assertTrue(!StageWriter.answers(d).containsKey("trim.cold"));
    }
}
