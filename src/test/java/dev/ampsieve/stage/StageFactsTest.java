package dev.ampsieve.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Quantity;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * A number the stage loader refuses or questions comes back as a fact (kind and values with their
 * dimensions), not as words; report.ProblemText words it (checked there and by the message tests).
 */
class StageFactsTest {

    private static final Path NAME = Path.of("s.yaml");

    private static Problem only(String yaml) {
        InputException e = assertThrows(InputException.class, () -> StageLoader.parse(yaml, NAME));
        assertEquals(1, e.problems().size(), e.problems().toString());
        Problem p = e.problems().get(0);
        assertEquals("", p.message(), "a fact has no words of its own");
        return p;
    }

    @Test
    void aVariationAsLargeAsTheSupplyCarriesBothAndTheSuggestion() {
        Problem p = only("gain: 10\nlimit: 1 mV\nsupply: {voltage: 5 V, variation: 7 V}\n");
        assertEquals("supply.variation", p.field());
        // the suggestion is 5 % of the supply: 0.05 x 5 V = 0.25 V (by hand)
        assertEquals(new StageFact.SupplyVariation(7.0, 5.0, 0.25), p.fact());
    }

    @Test
    void aResistorAboveATeraohmIsBeyondItsBoundWithTheKeysExample() {
        Problem p = only("gain: 10\nlimit: 1 mV\nrf: 5 Tohm\n");
        StageFact.Beyond b = assertInstanceOf(StageFact.Beyond.class, p.fact());
        assertEquals(StageFact.Bound.RESISTOR, b.bound());
        assertEquals(new Quantity(5e12, Dimension.RESISTANCE), b.value());
        assertEquals(new Quantity(StageLoader.MAX_RESISTANCE, Dimension.RESISTANCE), b.limit());
        assertEquals(StageKeys.get("rf").example(), b.example());
    }

    @Test
    void minAboveMaxIsAnOrderFactInTheBlocksDimension() {
        Problem p = only("gain: 10\nlimit: 1 mV\ntemperature: {min: 90 C, max: 20 C}\n");
        assertEquals("temperature", p.field());
        assertEquals(
                new StageFact.Order(
                        StageFact.Ends.MIN_MAX,
                        new Quantity(90, Dimension.TEMPERATURE),
                        new Quantity(20, Dimension.TEMPERATURE)),
                p.fact());
    }

    @Test
    void anInputLimitTooLargeKeepsTheWrittenFormAndTheOutputValue() {
        // 200 V at the input of a gain-10 stage is 2 kV at the output (by hand), above the 1 kV bound
        Problem p = only("gain: 10\nlimit: {input: 200 V}\n");
        assertEquals(
                new StageFact.LimitTooLarge(new Quantity(200, Dimension.VOLTAGE), false, 2000.0, StageLoader.MAX_LIMIT),
                p.fact());
    }

    @Test
    void calibrationPointsFromTheRangeAreMarked() {
        Problem p = only("gain: 10\nlimit: 1 mV\ntemperature: {min: -40 C, max: 85 C}\n"
                + "trim: {method: two-temperature, cold: 90 C}\n");
        assertEquals("trim.cold", p.field());
        assertEquals(new StageFact.CalibrationOrder(90, false, 85, true), p.fact());
    }

    @Test
    void tooFewTrialsIsAWarningWithTheTrialsNeeded() throws InputException {
        List<Problem> w = StageLoader.parseWithWarnings(
                        "gain: 10\nlimit: 1 mV\ncriterion: yield 99.99 %\ntrials: 1000\n", NAME)
                .warnings();
        assertEquals(1, w.size(), w.toString());
        StageFact.TooFewTrials t =
                assertInstanceOf(StageFact.TooFewTrials.class, w.get(0).fact());
        assertEquals(1000, t.trials());
        assertEquals(0.9999, t.target(), 1e-15);
        // all of n = 1000 pass: Wilson's lower end n/(n + z²), z = 1.959964 (normal 0.975 quantile, [from memory]),
        // z² = 3.841459: 1000/1003.841459 = 0.996173
        assertEquals(0.996173, t.lowerEnd(), 1e-6);
        // n >= p z²/(1 - p) = 0.9999 x 3.841459 / 0.0001 = 38410.75, so 38411 trials
        assertEquals(38411, t.needed());
        assertEquals(StageKeys.MAX_TRIALS, t.most());
    }
}
