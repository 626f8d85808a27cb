package dev.ampsieve.shell;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** The shorthands a person types at a prompt, turned into stage-file answers. */
class AnswersTest {

    @Test
    void temperatureRangesInTheUsualSpellings() throws AnswerException {
        assertEquals(
                Map.of("temperature.min", "-40 C", "temperature.max", "85 C"),
                Answers.interpret("temperature", "-40..85 C", Map.of()).put());
        assertEquals(
                Map.of("temperature.min", "-40 C", "temperature.max", "125 C"),
                Answers.interpret("temperature", "-40 C to 125 C", Map.of()).put());
        assertEquals(
                Map.of("temperature.min", "0 C", "temperature.max", "70 C"),
                Answers.interpret("temperature", "0..70", Map.of()).put());
        assertEquals(
                Map.of("temperature.min", "233.15 K", "temperature.max", "358.15 K"),
                Answers.interpret("temperature", "233.15..358.15 K", Map.of()).put());
        AnswerException e = assertThrows(AnswerException.class, () -> Answers.interpret("temperature", "85", Map.of()));
        assertTrue(e.line().contains("not a range"), e.line());
    }

    @Test
    void rangesAndTheSupplyInOneAnswer() throws Exception {
        assertEquals(
                Map.of("output-range.min", "0.1 V", "output-range.max", "2.4 V"),
                Answers.interpret("output-range", "0.1..2.4 V", Map.of()).put());
        assertEquals(
                Map.of("common-mode-range.min", "1 V", "common-mode-range.max", "2 V"),
                Answers.interpret("common-mode-range", "1..2", Map.of()).put());
        assertEquals(
                Map.of("band.low", "0.1 Hz", "band.high", "10 Hz"),
                Answers.interpret("band", "0.1..10 Hz", Map.of()).put());
        // "1..10 kHz": a bare end takes the other end's unit, prefix and all
        assertEquals(
                Map.of("band.low", "1 kHz", "band.high", "10 kHz"),
                Answers.interpret("band", "1..10 kHz", Map.of()).put());
        assertEquals(
                Map.of("band.low", "0.1 Hz", "band.high", "1kHz"),
                Answers.interpret("band", "0.1 Hz..1k", Map.of()).put());
        for (String typed : List.of("5 V ± 0.25 V", "5 V +- 0.25 V", "5 +/- 0.25 V", "5V±0.25V")) {
            Map<String, String> put =
                    Answers.interpret("supply", typed, Map.of()).put();
            assertEquals(
                    5.0,
                    dev.ampsieve.units.Units.parse(put.get("supply.voltage"), dev.ampsieve.units.Dimension.VOLTAGE),
                    typed);
            assertEquals(
                    0.25,
                    dev.ampsieve.units.Units.parse(put.get("supply.variation"), dev.ampsieve.units.Dimension.VOLTAGE),
                    1e-15,
                    typed);
        }
        assertEquals(
                Map.of("supply.voltage", "12 V"),
                Answers.interpret("supply", "12", Map.of()).put());
        assertEquals(
                Map.of("supply.voltage", "5 V", "supply.variation", "0.25 V"),
                Answers.interpret("supply.voltage", "5 V ± 0.25 V", Map.of()).put());
        assertThrows(AnswerException.class, () -> Answers.interpret("supply", "5 V ±", Map.of()));
        assertThrows(AnswerException.class, () -> Answers.interpret("output-range", "2.4 V", Map.of()));
    }

    @Test
    void theLimitInEachForm() throws AnswerException {
        Answers.Change c = Answers.interpret("limit", "1 mV", Map.of("limit.input", "5 uV"));
        assertEquals(Map.of("limit", "1 mV"), c.put());
        assertTrue(c.remove().contains("limit.input"));
        assertEquals(
                Map.of("limit.input", "10 uV"),
                Answers.interpret("limit", "10 uV input", Map.of()).put());
        assertEquals(
                Map.of("limit.input", "10 uV"),
                Answers.interpret("limit", "input 10 uV", Map.of()).put());
        assertEquals(
                Map.of("limit.percent-of-full-scale", "0.1 %"),
                Answers.interpret("limit", "0.1 % of full scale", Map.of()).put());
        assertEquals(
                Map.of("limit.lsb", "0.5", "limit.bits", "16", "limit.reference", "2.5 V"),
                Answers.interpret("limit", "0.5 lsb 16 bits 2.5 V", Map.of()).put());
        assertThrows(AnswerException.class, () -> Answers.interpret("limit", "0.5 lsb", Map.of()));
        // one block form replaces the scalar, and the three LSB keys stay together
        Answers.Change bits = Answers.interpret("limit.bits", "12", Map.of("limit", "1 mV", "limit.lsb", "1"));
        assertEquals(
                Set.of("limit", "limit.input", "limit.input-current", "limit.percent-of-full-scale"), bits.remove());
        // a transimpedance stage's input is a current: "input" there means limit.input-current
        assertEquals(
                Map.of("limit.input-current", "100 pA"),
                Answers.interpret("limit", "100 pA input", Map.of("topology", "transimpedance"))
                        .put());
    }

    @Test
    void aNewTopologyDropsTheAnswersThatMeanNothingInIt() throws AnswerException {
        Answers.Change c =
                Answers.interpret("topology", "trans", Map.of("gain", "100", "rf", "1 Mohm", "limit.input", "1 uV"));
        assertEquals(Map.of("topology", "transimpedance"), c.put());
        assertEquals(Set.of("gain", "limit.input"), c.remove()); // rf stays: it is the transimpedance
        Answers.Change d =
                Answers.interpret("topology", "difference", Map.of("gain", "10", "rf", "100 kohm", "rg", "10 kohm"));
        assertEquals(Set.of("rf", "rg"), d.remove()); // the gain stays: r2/r1
        assertTrue(d.note().contains("rf, rg dropped"), d.note());
    }

    @Test
    void oneLegOfTheSourceKeepsTheOtherAtTheCommonValue() throws AnswerException {
        Answers.Change c =
                Answers.interpret("source-resistance.minus", "350 ohm", Map.of("source-resistance", "300 ohm"));
        assertEquals(Map.of("source-resistance.minus", "350 ohm", "source-resistance.plus", "300 ohm"), c.put());
        assertEquals(Set.of("source-resistance"), c.remove());
        // no common value yet: the other leg keeps the default, 0 ohm
        assertEquals(
                Map.of("source-resistance.plus", "120 ohm", "source-resistance.minus", "0 ohm"),
                Answers.interpret("source-resistance.plus", "120 ohm", Map.of()).put());
        // the other leg already given: only this one changes
        assertEquals(
                Map.of("source-resistance.plus", "120 ohm"),
                Answers.interpret("source-resistance.plus", "120 ohm", Map.of("source-resistance.minus", "350 ohm"))
                        .put());
        Answers.Change back = Answers.interpret(
                "source-resistance",
                "1 kohm",
                Map.of("source-resistance.minus", "350 ohm", "source-resistance.plus", "300 ohm"));
        assertEquals(Set.of("source-resistance.minus", "source-resistance.plus"), back.remove());
    }

    @Test
    void wordsYesNoAndPrefixes() throws AnswerException {
        assertEquals(
                "true", Answers.interpret("trim.allowed", "yes", Map.of()).put().get("trim.allowed"));
        assertEquals(
                "false", Answers.interpret("ac-coupled", "N", Map.of()).put().get("ac-coupled"));
        assertEquals(
                "inverting",
                Answers.interpret("topology", "inv", Map.of()).put().get("topology"));
        // "two" alone would fit two-point and two-temperature; a longer prefix settles it
        assertEquals(
                "two-point",
                Answers.interpret("trim.method", "two-p", Map.of()).put().get("trim.method"));
        assertEquals(
                "two-temperature",
                Answers.interpret("trim.method", "two-t", Map.of()).put().get("trim.method"));
        AnswerException e =
                assertThrows(AnswerException.class, () -> Answers.interpret("topology", "bridge", Map.of()));
        assertTrue(e.line().contains("non-inverting, inverting, follower"), e.line());
    }

    @Test
    void keysAreCheckedWithASuggestion() throws AnswerException {
        assertEquals("temperature", Answers.id("Temperature"));
        AnswerException e = assertThrows(AnswerException.class, () -> Answers.id("sorce-resistance"));
        assertTrue(e.line().contains("did you mean 'source-resistance'"), e.line());
    }
}
