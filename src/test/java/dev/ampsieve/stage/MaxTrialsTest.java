package dev.ampsieve.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.ampsieve.report.ProblemText;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The stage key max-trials: its default, its floor at trials, and its round trip through the writer. */
class MaxTrialsTest {

    private static final Path NAME = Path.of("s.yaml");

    @Test
    void defaultsTo200000UnitsOrTrialsWhenThatIsMore() throws InputException {
        // 200,000: the 95 % half-width of a 99.9 % yield there is 1.96 sqrt(0.999 x 0.001 / 200000) = 0.00014 [Calc]
        assertEquals(200_000, StageLoader.parse("gain: 10\nlimit: 1 mV\n", NAME).maxTrials());
        assertEquals(
                2_000_000,
                StageLoader.parse("gain: 10\nlimit: 1 mV\ntrials: 2000000\n", NAME)
                        .maxTrials());
        assertEquals(
                50_000,
                StageLoader.parse("gain: 10\nlimit: 1 mV\nmax-trials: 50000\n", NAME)
                        .maxTrials());
    }

    @Test
    void belowTrialsIsAnErrorNamingLineColumnAndFix() {
        InputException e = assertThrows(
                InputException.class,
                () -> StageLoader.parse("gain: 10\nlimit: 1 mV\ntrials: 20000\nmax-trials: 5000\n", NAME));
        List<String> all = e.problems().stream().map(ProblemText::line).toList();
        assertEquals(
                List.of(
                        "s.yaml:4:13: max-trials: 5000 is below trials (20000); write max-trials at least 20000, or lower trials"),
                all);
    }

    @Test
    void roundTripsThroughTheWriter() throws InputException {
        Stage s = StageLoader.parse("gain: 10\nlimit: 1 mV\ncriterion: yield 99.9 %\nmax-trials: 123457\n", NAME);
        Stage back = StageLoader.parse(StageWriter.toYaml(s), NAME);
        assertEquals(123_457, back.maxTrials());
        assertEquals(s.trials(), back.trials());
    }
}
