package dev.ampsieve.shell;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.stage.Topology;
import dev.ampsieve.testing.Flat;
import dev.ampsieve.testing.Networks;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Scripted sessions through JLine's dumb terminal: answers in, printed text and the resulting stage out. */
class GuidedEntryTest {

    @TempDir
    Path dir;

    @Test
    void threeAnswersThenDoneMakeTheCurrentStage() throws Exception {
        Path file = dir.resolve("bridge.yaml");
        String printed =
                Sessions.run("ask", "", "100", "-40..85 C", "1 mV", "5 V", "12 V", "0.6 V", "done", "save " + file);

        // topology, 6 first questions and 14 more (Questions.order); the 2 ranges join once a supply is given
        assertTrue(printed.contains("[2/23] gain"), printed);
        assertTrue(printed.contains("[8/25] output-range"), printed);
        assertTrue(printed.contains("gain [required] >"), printed);
        assertTrue(printed.contains("temperature [0..70 C] >"), printed);
        assertTrue(printed.contains("output-range [mid-supply +/- full-scale-output] >"), printed);
        // the derived values: non-inverting gain 100 is noise gain 1 + rf/rg = 100 (Stage.noiseGain)
        assertTrue(printed.matches("(?s).*noise gain\\s+100\\s.*"), printed);
        assertTrue(printed.matches("(?s).*limit at the output\\s+1\\.00 mV.*"), printed);
        assertTrue(printed.matches("(?s).*limit at the input\\s+10\\.0 µV.*"), printed);
        assertTrue(printed.contains("Saved " + file), printed);

        Stage s = StageLoader.load(file);
        assertEquals(Topology.NON_INVERTING, s.topology());
        assertEquals(100.0, s.noiseGain(), 1e-12);
        assertEquals(-40.0, s.tMin());
        assertEquals(85.0, s.tMax());
        assertEquals(Limit.Kind.OUTPUT, s.limit().kind());
        assertEquals(1e-3, s.limitVolts(), 1e-15);
        assertEquals(5.0, s.fullScaleOutput());
        assertEquals(12.0, s.supplyVoltage());
        assertEquals(0.6, s.supplyVariation(), 1e-15);
    }

    @Test
    void aSupplyBringsTheRangeQuestionsAndEachTakesARangeInOneAnswer() throws Exception {
        Path file = dir.resolve("single.yaml");
        String printed = Sessions.run(
                "ask",
                "",
                "100",
                "",
                "1 mV",
                "2 V",
                "5 V ± 0.25 V",
                "",
                "0.1..4.9 V",
                "0.5..2.5",
                "",
                "",
                "",
                "0.1 Hz..1k",
                "done",
                "save " + file);
        assertTrue(printed.contains("supply.variation [0.25 V] >"), printed); // the ± answer gave it
        assertTrue(Flat.of(printed).contains("On a single supply the signal rarely sits at mid-supply"), printed);
        Stage s = StageLoader.load(file);
        assertEquals(5.0, s.supplyVoltage());
        assertEquals(0.25, s.supplyVariation(), 1e-15);
        assertEquals(0.1, s.outputRange().min(), 1e-15);
        assertEquals(4.9, s.outputRange().max(), 1e-15);
        assertEquals(0.5, s.commonModeRange().min(), 1e-15); // bare numbers read in volts
        assertEquals(2.5, s.commonModeRange().max(), 1e-15);
        assertEquals(0.1, s.bandLow(), 1e-15); // band: one range, after topology, rf, source and balance resistance
        assertEquals(1e3, s.bandHigh(), 1e-12);
    }

    @Test
    void aBadAnswerIsAskedAgainWithTheReason() throws Exception {
        Path file = dir.resolve("s.yaml");
        String printed = Sessions.run(
                "ask",
                "",
                "abc",
                "40 dB",
                "85..-40",
                "-40 to 125",
                "2 V/us",
                "10 uV input",
                "",
                "",
                "",
                "done",
                "save " + file);

        String flat = Flat.of(printed);
        assertTrue(
                flat.contains("not usable: 'abc' is not a gain; write a plain number such as '100', or decibels"),
                printed);
        assertTrue(flat.contains("(gain: every input error reaches the output multiplied by the noise gain"), printed);
        assertTrue(printed.contains("not usable: min 85 °C is above max -40 °C; swap the two values"), printed);
        assertTrue(printed.contains("not usable: '2 V/us' is a slew rate but a voltage belongs here"), printed);

        Stage s = StageLoader.load(file);
        assertEquals(100.0, s.noiseGain(), 1e-9); // 40 dB = 100 in voltage
        assertEquals(125.0, s.tMax());
        assertEquals(Limit.Kind.INPUT, s.limit().kind());
        assertEquals(10e-6 * 100, s.limitVolts(), 1e-15); // an input-referred limit times the noise gain
    }

    @Test
    void questionMarkExplainsAndEnterKeepsTheDefault() throws Exception {
        Path file = dir.resolve("s.yaml");
        String printed =
                Sessions.run("ask", "", "10", "?", "", "0.1 %", "2.5 V", "", "", "", "1 kohm", "done", "save " + file);

        assertTrue(printed.contains("for example: -40..85 C"), printed);
        assertTrue(printed.contains("default: 0..70 C"), printed);
        // a share of full scale needs the full-scale output: asked right away
        assertTrue(
                printed.contains(
                        "full-scale-output [none (open-loop gain, bandwidth and resistor terms not counted)] >"),
                printed);

        Stage s = StageLoader.load(file);
        assertEquals(0.0, s.tMin());
        assertEquals(70.0, s.tMax());
        assertEquals(2.5e-3, s.limitVolts(), 1e-15); // 0.1 % of 2.5 V
        assertEquals(Topology.NON_INVERTING, s.topology()); // Enter kept it
        assertEquals(1e3, s.rf()); // the answer after topology
        assertEquals(1e3 / 9, Networks.rg(s), 1e-9);
    }

    @Test
    void ctrlCBeforeTheLimitKeepsNothingAndNotTheShellEither() {
        String printed = Sessions.run("ask", "", "100", "-40..85 C\u0003", "show", "help");
        assertTrue(
                printed.contains("Stopped; nothing kept (a stage needs the gain and the limit); no stage yet."),
                printed);
        assertTrue(printed.contains("No current stage yet"), printed);
        assertTrue(printed.contains("The shell"), printed); // help still ran afterwards
    }

    @Test
    void ctrlCAfterTheLimitKeepsTheAnswersGiven() throws Exception {
        Path file = dir.resolve("s.yaml");
        String printed =
                Sessions.run("ask", "", "100", "-40..85 C", "10 uV input", "inv\u0003", "show", "save " + file);
        assertTrue(
                printed.contains("Stopped; kept the 3 answers given: 'show' lists them, 'ask' starts again."), printed);
        assertTrue(printed.contains("Stage (typed in, not saved)"), printed);

        Stage s = StageLoader.load(file);
        assertEquals(-40.0, s.tMin());
        assertEquals(85.0, s.tMax());
        assertEquals(Topology.NON_INVERTING, s.topology()); // "inv" was being typed, never entered
        assertEquals(10e-6 * 100, s.limitVolts(), 1e-15); // input-referred limit times noise gain 100
    }

    @Test
    void ctrlCOnAStageKeepsItsNewAnswersAndOnlyThem() throws Exception {
        Path file = dir.resolve("s.yaml");
        String printed = Sessions.run("set gain 20", "set limit 5 mV", "ask", "", "50", "\u0003", "save " + file);
        assertTrue(
                printed.contains("Stopped; kept the one answer given: 'show' lists them, 'ask' starts again."),
                printed);
        Stage s = StageLoader.load(file);
        assertEquals(50.0, s.noiseGain(), 1e-12);
        assertEquals(5e-3, s.limitVolts(), 1e-15);

        // a fresh start that never reaches the limit leaves the stage there was
        printed = Sessions.run("set gain 20", "set limit 5 mV", "ask --fresh", "", "7", "\u0003", "show");
        assertTrue(
                Flat.of(printed)
                        .contains("Stopped; nothing kept (a stage needs the gain and the limit); "
                                + "the current stage is as it was."),
                printed);
        assertTrue(printed.matches("(?s).*Stopped.*gain\\s+20\\s.*"), printed);
    }

    @Test
    void questionsReasonsAndExplanationsAreFoldedToTheWidth() {
        // the dumb terminal reports no width: 80 columns (OutputStyle)
        String printed = Sessions.run("ask", "", "100", "?", "2 parsecs", "-40..85 C", "?", "\u0003");
        String flat = printed.replace("\r", "");
        for (String line : flat.split("\n")) {
            line = Sessions.withoutPrompts(line); // the dumb terminal leaves output on the prompt's line
            assertTrue(line.length() <= 80, "longer than 80 columns: " + line + "\n" + printed);
        }
        // the temperature reason is longer than a line: it hangs under itself after the key
        String why = Questions.why(Answers.TEMPERATURE);
        assertTrue(why.length() > 80 - "[3/23] temperature  ".length(), why); // the check below means something
        assertTrue(flat.contains("[3/23] temperature  drift and FET bias currents"), printed);
        assertTrue(flat.matches("(?s).*\\n {20}\\S.*"), printed); // a continuation under the reason's first word
        assertTrue(Flat.of(flat).contains("temperature: " + why + "."), printed);
    }

    @Test
    void askingAgainStartsFromTheCurrentAnswersAndCancelKeepsThem() throws Exception {
        Path file = dir.resolve("s.yaml");
        String printed = Sessions.run(
                "set gain 20",
                "set limit 5 mV",
                "ask",
                "",
                "",
                "",
                "\u0003",
                "ask",
                "inv",
                "",
                "",
                "",
                "",
                "",
                "",
                "done",
                "save " + file);
        assertTrue(printed.contains("gain [20] >"), printed);
        assertTrue(printed.contains("limit [5 mV] >"), printed);
        assertTrue(printed.contains("Stopped; the current stage is as it was."), printed);

        Stage s = StageLoader.load(file);
        assertEquals(Topology.INVERTING, s.topology()); // "inv" is the one choice it starts
        assertEquals(-20.0, s.signalGain(), 1e-12);
        assertEquals(5e-3, s.limitVolts(), 1e-15);
    }

    @Test
    void gainOneBecomesAFollower() throws Exception {
        Path file = dir.resolve("s.yaml");
        String printed = Sessions.run("ask", "", "1", "", "1 mV", "", "", "", "done", "save " + file);
        assertTrue(printed.contains("gain 1: taken as a follower"), printed);
        assertEquals(Topology.FOLLOWER, StageLoader.load(file).topology());
    }

    @Test
    void doneIsRefusedUntilTheFullScaleAndSupplyQuestions() {
        String printed = Sessions.run("ask", "", "100", "done", "", "1 mV", "done", "", "", "", "done", "show");
        // refused at the temperature and at the full-scale output question
        assertEquals(2, printed.split("'done' comes after the supply questions", -1).length - 1, printed);
        assertTrue(printed.matches("(?s).*limit at the output\\s+1\\.00 mV.*"), printed);
        assertFalse(printed.contains("Cancelled"), printed);
    }
}
