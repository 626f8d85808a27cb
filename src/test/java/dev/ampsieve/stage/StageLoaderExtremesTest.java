package dev.ampsieve.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.ampsieve.report.ProblemText;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** Regression cases found by {@link StageLoaderProperties}. */
class StageLoaderExtremesTest {

    /**
     * Shrunk from a mutated demo stage: a bare 1e308 as the ratio tolerance made the loader's own
     * "not a resistor tolerance" message print 1e310 %, and formatting that infinity threw
     * NumberFormatException. Units.format now prints the overflowed percentage as ∞, and the
     * problem keeps its place in the file. The loader reports the tolerance as a fact; the line is
     * the one the failure handler prints (report.ProblemText words it).
     */
    @Test
    void aToleranceOf1e308IsAProblemInTheFile() {
        String yaml = "gain: 10\nlimit: 1 mV\nresistor-ratio: {tolerance: 1e308}\n";
        InputException e = assertThrows(InputException.class, () -> StageLoader.parse(yaml, Path.of("s.yaml")));
        assertEquals(
                "s.yaml:3:29: resistor-ratio.tolerance: a ratio tolerance of ∞ % is not a resistor tolerance;"
                        + " write it with its unit, such as '0.1 %'",
                String.join("\n", ProblemText.lines(e)));
    }
}
