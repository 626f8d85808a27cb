package dev.ampsieve.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.report.CriterionText;
import dev.ampsieve.report.ProblemText;
import dev.ampsieve.stats.Wilson;
import dev.ampsieve.testing.Networks;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Stage values no circuit has are refused, each as file:line:col: field: problem; fix. */
class StageLimitsTest {

    private static final Path NAME = Path.of("s.yaml");

    private static List<String> problems(String yaml) {
        InputException e = assertThrows(InputException.class, () -> StageLoader.parse(yaml, NAME));
        return e.problems().stream().map(ProblemText::line).toList();
    }

    private static String problem(String yaml) {
        List<String> all = problems(yaml);
        assertEquals(1, all.size(), () -> "expected one problem, got " + all);
        return all.get(0);
    }

    // Every expected line worked by hand: the value as written, printed with three significant
    // digits and an SI prefix, against the limit named in the README's stage section.
    @ParameterizedTest(name = "{0}")
    @CsvSource(
            delimiter = '|',
            quoteCharacter = '"',
            value = {
                // a gain of 1e300: 1e300 > 1e6
                "gain: 1e300\\nlimit: 1 mV | s.yaml:1:7: gain: gain 1e+300 is above 1000000, more than any op amp can hold (the best"
                        + " have about 1e8 of open-loop gain, which would leave under 40 dB of loop gain); split the gain over two"
                        + " stages, or check the value (40 dB is a gain of 100)",
                // 140 dB = 10^(140/20) = 1e7
                "gain: 140 dB\\nlimit: 1 mV | s.yaml:1:7: gain: gain 10000000 is above 1000000, more than any op amp can hold (the"
                        + " best have about 1e8 of open-loop gain, which would leave under 40 dB of loop gain); split the gain over"
                        + " two stages, or check the value (40 dB is a gain of 100)",
                // 7000 dB overflows to an infinite gain
                "gain: 7000 dB\\nlimit: 1 mV | s.yaml:1:7: gain: gain ∞ is above 1000000, more than any op amp can hold (the"
                        + " best have about 1e8 of open-loop gain, which would leave under 40 dB of loop gain); split the gain over"
                        + " two stages, or check the value (40 dB is a gain of 100)",
                // 10 Mohm / 1 ohm = 1e7
                "rf: 10 Mohm\\nrg: 1 ohm\\nlimit: 1 mV | s.yaml:2:5: rg: rf/rg = 10000000 is a gain above 1000000, more than any"
                        + " op amp can hold; check the prefixes of rf and rg (kohm, Mohm)",
                "gain: 10\\nrf: 1e300 ohm\\nlimit: 1 mV | s.yaml:2:5: rf: 1.00e+300 Ω is above 1.00 TΩ, where board leakage"
                        + " decides the value; check the prefix (kohm, Mohm); write the resistor, such as '100 kohm'",
                "gain: 10\\nsource-resistance: 2 Tohm\\nlimit: 1 mV | s.yaml:2:20: source-resistance: 2.00 TΩ is above 1.00 TΩ,"
                        + " where board leakage decides the value; check the prefix (kohm, Mohm); write the resistor, such as '350 ohm'",
                "gain: 10\\nbalance-resistance: 5e12 ohm\\nlimit: 1 mV | s.yaml:2:21: balance-resistance: 5.00 TΩ is above 1.00 TΩ,"
                        + " where board leakage decides the value; check the prefix (kohm, Mohm); write the resistor, such as '1 kohm'",
                // 5 % of 5 V is 250 mV
                "gain: 10\\nlimit: 1 mV\\nsupply:\\n  voltage: 5 V\\n  variation: 5 V | s.yaml:5:14: supply.variation: a variation"
                        + " of 5.00 V on a 5.00 V supply would take it to 0 V or below; write the peak change, well below the"
                        + " supply, such as '250 mV' (5 %)",
                "gain: 10\\nlimit: 1 mV\\nsupply:\\n  voltage: 1e308 V | s.yaml:4:12: supply.voltage: 1.00e+308 V is above 2.00 kV,"
                        + " more than any op amp's supply; check the prefix (mV, V, kV); write for example '5 V'",
                "gain: 10\\nlimit: 1 mV\\nfull-scale-output: 3 kV | s.yaml:3:20: full-scale-output: 3.00 kV is above 2.00 kV,"
                        + " more than any op amp's supply; check the prefix (mV, V, kV); write for example '2.5 V'",
                "gain: 10\\nlimit: 1 mV\\ntemperature:\\n  min: -250 C | s.yaml:4:8: temperature.min: -250 °C is outside -200 °C"
                        + " to 500 °C, an ambient no circuit sees; write the ambient range in °C, such as '-40 C'",
                "gain: 10\\nlimit: 1 mV\\ntemperature:\\n  max: 800 C | s.yaml:4:8: temperature.max: 800 °C is outside -200 °C"
                        + " to 500 °C, an ambient no circuit sees; write the ambient range in °C, such as '85 C'",
                // 200 y is above 100 y
                "gain: 10\\nlimit: 1 mV\\nservice-life: 200 y | s.yaml:3:15: service-life: 200 y is above 100 y, longer than any"
                        + " circuit is kept in service; write the operating time in hours or years, such as '10 y'",
                "gain: 10\\nlimit: 1 mV\\nband:\\n  high: 20 GHz | s.yaml:4:9: band.high: 20.0 GHz is above 10.0 GHz, beyond the"
                        + " fastest op amp's gain-bandwidth; check the prefix (Hz, kHz, MHz); write the top signal frequency, such as '1 kHz'",
                "gain: 10\\nlimit: 1.5 kV | s.yaml:2:8: limit: a limit of 1.50 kV is above 1.00 kV at the output, no error limit"
                        + " at all; check the prefix: write the largest error allowed, such as '1 mV'",
                // 20 V at the input times a noise gain of 100 is 2 kV at the output
                "gain: 100\\nlimit:\\n  input: 20 V | s.yaml:3:3: limit: a limit of 20.0 V (2.00 kV at the output) is above 1.00 kV"
                        + " at the output, no error limit at all; check the prefix: write the largest error allowed, such as '1 mV'",
                "gain: 10\\nlimit: 1e-15 V | s.yaml:2:8: limit: a limit of 1.00 fV at the output is below 1.00 pV, far below the"
                        + " noise of any resistor; check the prefix: write the largest error allowed, such as '1 uV'",
                "gain: 10\\nlimit: 1 mV\\nresistor-ratio:\\n  tempco: 5 %/C | s.yaml:4:11: resistor-ratio.tempco: 50000 ppm/°C is"
                        + " above 10000 ppm/°C, more than any resistor pair drifts; write the ratio tracking in ppm/C, such as '10 ppm/C'",
                "gain: 10\\nlimit: 1 mV\\nmax-price: 1e300 | s.yaml:3:12: max-price: 1e+300 is above 10000000, more than any"
                        + " amplifier costs; write the amount per unit, for example '5.00'",
                "gain: 10\\nlimit: 1 mV\\ntrim:\\n  cost: 2e7 | s.yaml:4:9: trim.cost: 20000000 is above 10000000, more than any"
                        + " amplifier costs; write the amount per unit, for example '0.60'",
                "gain: 10\\nlimit: 1 mV\\ntrials: 20000000 | s.yaml:3:9: trials: 20000000 is outside 100..10000000; write a whole"
                        + " number from 100 to 10000000",
                "gain: 10\\nlimit: 1 mV\\ncriterion: yield 99.99999999 % | s.yaml:3:12: criterion: yield target 99.99999999 % is"
                        + " above 99.9999 %, closer to 100 % than 10000000 simulated units (the most allowed) can show; write at"
                        + " most 'yield 99.9999 %'; for an error no unit may exceed, write 'worst-case'"
            })
    void aValueNoCircuitHasIsRefusedWithItsPlace(String yaml, String expected) {
        assertEquals(expected, problem(yaml.replace("\\n", "\n")));
    }

    @Test
    void theLimitsThemselvesAreAccepted() throws InputException {
        Stage s = StageLoader.parse(
                "gain: 1000000\nrf: 1 Tohm\nlimit: 1 kV\nsupply:\n  voltage: 2 kV\n  variation: 1 V\n"
                        + "temperature:\n  min: -200 C\n  max: 500 C\nservice-life: 100 y\nband:\n  high: 10 GHz\n"
                        + "criterion: yield 99.9999 %\n",
                NAME);
        assertEquals(1e12 / 999_999, Networks.rg(s), 1e-3); // rg = rf / (gain - 1)
        assertEquals(0.999999, s.criterion().yieldTarget(), 1e-15);
    }

    @Test
    void theHighestYieldTargetPrintsAsItself() throws InputException {
        // 99.9999 % with four significant digits would round to "100 %"
        Stage s = StageLoader.parse("gain: 10\nlimit: 1 mV\ncriterion: yield 99.9999 %\n", NAME);
        assertEquals("yield 99.9999 %", CriterionText.of(s.criterion()));
        assertEquals("yield 99.9 %", CriterionText.of(Criterion.yield(0.999)));
    }

    @Test
    void theHighestYieldTargetCanBeShownWithinTheTrialCap() {
        // Wilson 95 % lower bound with every unit passing is n / (n + z^2) (Wilson 1927):
        // 1e7 / (1e7 + 1.96^2) = 0.99999962, above 0.999999; the default 20000 units reach only 0.99981
        double low =
                Wilson.interval95(StageKeys.MAX_TRIALS, StageKeys.MAX_TRIALS).low();
        assertEquals(0.99999962, low, 1e-8);
        assertTrue(low >= StageLoader.MAX_YIELD_TARGET);
    }
}
