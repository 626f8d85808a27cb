package dev.ampsieve.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.report.ProblemText;
import dev.ampsieve.stats.Wilson;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Values a stage may hold but probably does not mean: warned with place, reason and fix; the stage still loads. */
class StageWarningsTest {

    private static final Path NAME = Path.of("s.yaml");

    private static List<String> warnings(String yaml) throws InputException {
        return StageLoader.parseWithWarnings(yaml, NAME).warnings().stream()
                .map(ProblemText::line)
                .toList();
    }

    @Test
    void aSensibleStageHasNoWarning() throws InputException {
        assertEquals(List.of(), warnings("gain: 100\nlimit: 1 mV\nsupply: {voltage: 5 V}\n"));
    }

    @Test
    void aGainAbove1e5IsWarnedAndAbove1e6Refused() throws InputException {
        // 2e5 lies between the warning bound (1e5) and the error bound (1e6)
        assertEquals(
                List.of("s.yaml:1:7: warning: gain: a gain of 200000 is above 100000: even 140 dB (1e7) of open-loop"
                        + " gain leaves under 40 dB of loop gain, and the closed-loop bandwidth is GBW/200000; split the gain over"
                        + " two stages, or check the value (100 dB is a gain of 100000)"),
                warnings("gain: 200000\nlimit: 1 V\n"));
        InputException e = assertThrows(InputException.class, () -> warnings("gain: 2000000\nlimit: 1 V\n"));
        assertTrue(
                ProblemText.message(e.problems().get(0)).startsWith("gain 2000000 is above 1000000"),
                e.problems().toString());
    }

    @Test
    void aNegativeGainOnANonInvertingStageIsRefusedWithTheFix() {
        InputException e = assertThrows(InputException.class, () -> warnings("gain: -10\nlimit: 1 mV\n"));
        assertEquals(
                "s.yaml:1:7: gain: a non-inverting stage cannot have gain -10 (below 1);"
                        + " write the magnitude with 'topology: inverting'",
                ProblemText.line(e.problems().get(0)));
    }

    @Test
    void aLimitNotBelowTheSupplyConstrainsNothing() throws InputException {
        assertEquals(
                List.of("s.yaml:2:8: warning: limit: a limit of 10.0 V at the output is not below the whole supply"
                        + " of 5.00 V: no output error can reach it, so the stage constrains nothing; write the largest error"
                        + " allowed at the output, such as '1 mV' (check the prefix)"),
                warnings("gain: 10\nlimit: 10 V\nsupply: {voltage: 5 V}\n"));
        // without a supply, the full-scale output is the yardstick: 2 V of error on a 2 V signal
        assertEquals(
                List.of("s.yaml:2:8: warning: limit: a limit of 2.00 V at the output is not below the full-scale"
                        + " output of 2.00 V: an error as large as the whole signal; write the largest error allowed at the output,"
                        + " such as '1 mV' (check the prefix)"),
                warnings("gain: 10\nlimit: 2 V\nfull-scale-output: 2 V\n"));
    }

    @Test
    void tooFewTrialsForTheYieldTargetAreWarnedWithTheCountNeeded() throws InputException {
        // by hand: n >= p z^2 / (1 - p) = 0.999 * 3.841459 / 0.001 = 3837.6, so 3838 trials
        assertEquals(3838, StageLoader.trialsToConfirm(0.999));
        // second method: the Wilson interval (stats.Wilson) with every unit passing
        assertTrue(Wilson.interval95(3838, 3838).low() >= 0.999);
        assertTrue(Wilson.interval95(3837, 3837).low() < 0.999);
        assertEquals(Wilson.Z95, StageLoader.Z95);
        // 1000 trials all passing: lower end 1000 / (1000 + 3.841459) = 0.99617 -> 99.62 %
        assertEquals(
                List.of("s.yaml:4:9: warning: trials: 1000 trials cannot confirm a yield of 99.9 %: even when every"
                        + " unit passes, the 95 % interval's lower end is 99.62 %, so the verdict can only be uncertain;"
                        + " write 'trials: 3838' or more (at most 10000000)"),
                warnings("gain: 10\nlimit: 1 mV\ncriterion: yield 99.9 %\ntrials: 1000\n"));
        assertEquals(List.of(), warnings("gain: 10\nlimit: 1 mV\ncriterion: yield 99.9 %\ntrials: 3838\n"));
    }

    @Test
    void trialsAndYieldOutOfRangeAreRefused() {
        InputException few = assertThrows(InputException.class, () -> warnings("gain: 10\nlimit: 1 mV\ntrials: 10\n"));
        assertTrue(
                ProblemText.line(few.problems().get(0)).startsWith("s.yaml:3:9: trials: "),
                few.problems().toString());
        InputException target =
                assertThrows(InputException.class, () -> warnings("gain: 10\nlimit: 1 mV\ncriterion: yield 100 %\n"));
        assertTrue(
                ProblemText.line(target.problems().get(0)).contains("outside (0, 100) %"),
                target.problems().toString());
    }
}
