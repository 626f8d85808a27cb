package dev.ampsieve.shell;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.testing.DemoCatalog;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The shell as a whole on the demo catalog: the current stage reaching commands, files, errors, keys. */
class ShellSessionTest {

    @TempDir
    static Path shared;

    static Path catalog;

    @TempDir
    Path dir;

    @BeforeAll
    static void copyDemo() throws IOException {
        catalog = DemoCatalog.copyTo(shared);
    }

    static String session(String... lines) {
        return Sessions.run(List.of("--catalog", catalog.toString()), null, Map.of(), lines);
    }

    @Test
    void commandsThatTakeAStageGetTheCurrentOne() {
        String printed = session(
                "set gain 100",
                "set temperature -40..85 C",
                "set limit 1 mV",
                "rank --top 3",
                "bars zd-chop-01",
                "scatter --top 4");
        // rank's header names the stage it was given: the shell's own, not a file of the user's
        assertTrue(printed.contains("Stage (current stage): non-inverting, noise gain 100, -40 °C to 85 °C"), printed);
        assertTrue(printed.contains("Candidates ("), printed);
        assertTrue(
                dev.ampsieve.testing.Flat.of(printed)
                        .contains("zd-chop-01 in (current stage): error at the output, term by term"),
                printed);
        // no filter is named, so zd-chop-01's noise runs to the closed-loop bandwidth and its worst case (2.00 mV) is
        // over the 1 mV limit: the worst case is the chart's full scale, the limit's mark falls at half of it, and its
        // label has room on the right (BarChart)
        assertTrue(printed.contains("▲ limit 1.00 mV"), printed);
        assertFalse(printed.contains("limit 1.00 mV ▲"), printed);
        assertTrue(
                dev.ampsieve.testing.Flat.of(printed)
                        .contains(
                                "(current stage): worst-case error at the output (log scale) against effective unit cost"),
                printed);
        assertFalse(printed.contains("ampsieve-shell-"), printed);
    }

    @Test
    void aFormatOptionLastsOneCommandOnly() {
        // the same command objects serve every line: --json or --csv on one line must not stick to the next
        String printed = session(
                "load " + catalog.resolve("stages/bridge-amp.yaml"),
                "rank --top 1 --json",
                "rank --top 1",
                "budget zd-chop-01 --csv",
                "budget zd-chop-01",
                "compare zd-chop-01 prec-bip-05 --csv",
                "compare zd-chop-01 prec-bip-05",
                "rank --top 1 --json --csv");
        // the bridge's gain is set by r1..r4 (96.61 = R2/R1 loaded by the bridge: demo-catalog/stages/bridge-amp.yaml)
        assertTrue(dev.ampsieve.testing.Flat.of(printed).contains(": difference, gain 96.6"), printed);
        assertFalse(printed.contains("gain null"), printed);
        // one JSON ranking, one text ranking; one CSV budget, one text budget; one CSV comparison, one text one
        assertEquals(1, count(printed, "\"candidates\" : ["), printed);
        assertEquals(1, count(printed, "Candidates ("), printed);
        assertEquals(1, count(printed, "section,key,label,kind,output_v,"), printed);
        assertEquals(1, count(printed, "input = output / |signal gain|"), printed);
        assertEquals(1, count(printed, "section,key,label,kind,a,b,"), printed);
        assertEquals(1, count(printed, "output error  "), printed);
        assertTrue(printed.contains("--json and --csv: give one of them, not both"), printed);
    }

    private static int count(String s, String what) {
        int n = 0;
        for (int i = s.indexOf(what); i >= 0; i = s.indexOf(what, i + 1)) {
            n++;
        }
        return n;
    }

    @Test
    void theStageIsNamedBeforeTheBudgetIsFoldedSoItsHeaderStaysOneLine() {
        // the temporary file's long path used to be folded first and swapped for the short name
        // after, leaving "Stage      (current stage): inverting, noise gain" broken after "gain"
        String printed = session(
                "set gain 100",
                "set topology inverting",
                "set source-resistance 1 kohm",
                "set limit 1 mV input",
                "budget zd-az-06");
        assertTrue(
                printed.contains("Stage      (current stage): inverting, noise gain 10.09, signal gain -9.091\n"),
                printed);
    }

    @Test
    void aLoadedStageIsNamedByItsFileUntilItChanges() {
        String stage = catalog.resolve("stages/bridge-amp.yaml").toString();
        String printed = session("load " + stage, "rank --top 2", "set quantity 10", "rank --top 2");
        // the demo bridge is a difference stage: NG = 1 + 499 k/(4.99 k + 175 ohm) = 97.61
        assertTrue(printed.contains("Stage bridge-amp.yaml: difference, noise gain 97.61"), printed);
        assertTrue(printed.contains("Stage (current stage): difference, noise gain 97.61"), printed);
    }

    @Test
    void aStageGivenOnTheLineWins() {
        String stage = catalog.resolve("stages/bridge-amp.yaml").toString();
        String printed = session("set gain 10", "set limit 1 V", "rank --top 1 --stage " + stage);
        assertTrue(printed.contains("Stage bridge-amp.yaml: difference, noise gain 97.61"), printed);
    }

    @Test
    void withoutAStageTheShellSaysHowToGetOne() {
        String printed = session("rank", "help");
        assertTrue(
                dev.ampsieve.testing.Flat.of(printed)
                        .contains("'rank' needs a stage: type 'ask' to describe one, 'load FILE', or add --stage FILE"),
                printed);
        assertTrue(printed.contains("The shell"), printed);
    }

    @Test
    void anIncompleteStageIsReportedAsTheCurrentStage() {
        String printed = session("set gain 100", "rank");
        assertTrue(printed.contains("The stage is not complete yet: required field is missing"), printed);
        // named as the user knows it, without the line and column of the YAML the shell builds in
        // memory from the answers (the user never saw that text, so its places would mislead)
        assertTrue(printed.contains("> (current stage): limit: required field is missing"), printed);
    }

    @Test
    void saveAsksBeforeReplacingAFile() throws Exception {
        Path file = dir.resolve("stage.yaml");
        Files.writeString(file, "# mine\n");
        String printed = session("set gain 100", "set limit 1 mV", "save " + file, "n");
        assertTrue(printed.contains(file + " exists. Replace it? [y/N]"), printed);
        assertTrue(printed.contains("Left " + file + " as it was."), printed);
        assertEquals("# mine\n", Files.readString(file));

        printed = session("set gain 100", "set limit 1 mV", "save " + file, "y");
        assertTrue(printed.contains("Saved " + file), printed);
        assertEquals(1e-3, StageLoader.load(file).limitVolts(), 1e-15);

        printed = session("set gain 20", "set limit 2 mV", "save --force " + file);
        assertFalse(printed.contains("Replace it?"), printed);
        assertEquals(20.0, StageLoader.load(file).noiseGain(), 1e-12);
    }

    @Test
    void loadTakesTheValuesAsWrittenAndRefusesABadFileWithItsPlace() throws Exception {
        Path good = dir.resolve("good.yaml");
        Files.writeString(
                good,
                "# a stage of ours\ngain: 40 dB\ntemperature:\n  min: -20 C\n  max: 60 C\nlimit:\n  input: 50 uV\n");
        Path bad = dir.resolve("bad.yaml");
        Files.writeString(bad, "gain: 100\nlimit: 2 parsecs\n");
        Path copy = dir.resolve("copy.yaml");
        String printed = session("load " + good, "show", "load " + bad, "show", "save " + copy);

        assertTrue(
                dev.ampsieve.testing.Flat.of(printed)
                        .contains("Loaded " + good + ": non-inverting, gain 40 dB, 50 uV input limit."),
                printed);
        assertTrue(printed.matches("(?s).*temperature\\s+-20 C\\.\\.60 C.*"), printed);
        assertTrue(printed.matches("(?s).*limit at the output\\s+5\\.00 mV.*"), printed); // 50 uV x noise gain 100
        assertTrue(printed.contains(bad + ":2:8: limit:"), printed); // file:line:col of the bad value
        Stage s = StageLoader.load(copy); // the good stage stayed current
        assertEquals(-20.0, s.tMin());
        assertEquals(5e-3, s.limitVolts(), 1e-12);
    }

    @Test
    void setChecksTheValueAndNamesTheKey() {
        String printed =
                session("set gain 100", "set limit 2 V/us", "set limt 1 mV", "set temperature 85..-40", "show");
        assertTrue(printed.contains("limit: '2 V/us' is a slew rate but a voltage belongs here"), printed);
        assertTrue(printed.contains("limt: 'limt' is not a stage key; did you mean 'limit'?"), printed);
        assertTrue(printed.contains("temperature: min 85 °C is above max -40 °C; swap the two values"), printed);
        assertTrue(printed.contains("limit: required field is missing"), printed); // nothing bad was taken
    }

    @Test
    void aNewUserAcceptingEveryDefaultIsToldWhatNoVerdictCounts() {
        // the session: gain 200, 0..70 °C, 2 mV, Enter at full scale and supply, 'done' at the first chance
        String printed = session("ask", "", "200", "0..70", "2 mV", "", "", "", "done", "rank --top 3");
        String flat = dev.ampsieve.testing.Flat.of(printed);
        String left = "open-loop gain, closed-loop bandwidth and resistor ratio not counted: no full-scale-output; "
                + "supply rejection not counted: no supply.variation; common-mode rejection not counted: "
                + "no common-mode-swing; long-term drift not counted: no service-life; operating point not counted: "
                + "no supply.voltage; self-heating not counted: no load-resistance";
        assertTrue(
                flat.contains("without it the open-loop gain, bandwidth and resistor terms are not counted; "
                        + "the verdict will say so."),
                printed);
        assertTrue(flat.contains("without it supply rejection is not counted"), printed);
        assertTrue(flat.contains("Every verdict: " + left + "."), printed);
        assertTrue(flat.contains("Every verdict: " + left), printed); // rank, under its table
    }

    @Test
    void setTakesRangesAndTheSupplyInOneLine() throws Exception {
        Path file = shared.resolve("ranges.yaml");
        Files.deleteIfExists(file);
        String printed = session(
                "set gain 10",
                "set limit 1 mV",
                "set output-range 0.1..2.4 V",
                "set band 0.1..10 Hz",
                "set supply 5 V ± 0.25 V",
                "set common-mode-range 1..2",
                "save " + file);
        assertTrue(printed.contains("output-range = 0.1 V..2.4 V"), printed);
        assertTrue(printed.contains("supply = 5 V ± 0.25 V"), printed);
        dev.ampsieve.stage.Stage s = dev.ampsieve.stage.StageLoader.load(file);
        assertEquals(0.1, s.outputRange().min(), 1e-12);
        assertEquals(2.4, s.outputRange().max(), 1e-12);
        assertEquals(1.0, s.commonModeRange().min(), 1e-12); // a bare range is read in volts
        assertEquals(2.0, s.commonModeRange().max(), 1e-12);
        assertEquals(0.1, s.bandLow(), 1e-12);
        assertEquals(10.0, s.bandHigh(), 1e-12);
        assertEquals(5.0, s.supplyVoltage());
        assertEquals(0.25, s.supplyVariation(), 1e-12);

        Files.delete(file);
        session(
                "set gain 10",
                "set limit 1 mV",
                "set supply 12 V +- 0.6 V",
                "set supply.variation 0.3 V",
                "save " + file);
        s = dev.ampsieve.stage.StageLoader.load(file);
        assertEquals(12.0, s.supplyVoltage());
        assertEquals(0.3, s.supplyVariation(), 1e-12); // the nested key form replaces the variation alone
    }

    @Test
    void aFailurePrintsOneLineAndTheShellGoesOn() {
        String printed = session("rnak", "budget", "budget nope --stage nowhere.yaml", "show --bogus", "help");
        assertTrue(
                printed.contains("unknown command 'rnak'; did you mean 'rank'? ('help' lists the commands)"), printed);
        assertTrue(printed.contains("'budget' needs a stage"), printed);
        assertTrue(printed.contains("show: Unknown option: '--bogus' ('help show' shows its options)"), printed);
        assertFalse(printed.contains("Exception"), printed);
        assertFalse(printed.contains("\tat "), printed);
        assertTrue(printed.contains("The shell"), printed); // help still ran at the end
    }

    @Test
    void ctrlCDropsTheLineBeingTyped() {
        String printed = session("show --al\u0003", "quit");
        assertFalse(printed.contains("default: non-inverting"), printed);
        assertFalse(printed.contains("Unknown option"), printed);
    }

    @Test
    void ctrlDLeaves() {
        String printed = session("\u0004", "help");
        assertFalse(printed.contains("The shell"), printed); // help after Ctrl-D never ran
    }

    @Test
    void quitWithAnUnsavedStageWarnsOnce() {
        String printed = session("set gain 100", "quit", "quit", "show");
        assertTrue(
                printed.contains("The current stage is not saved: 'save FILE' keeps it; 'quit' again leaves"), printed);
        assertFalse(printed.contains("Stage (typed in"), printed); // the second quit left before 'show'
    }

    @Test
    void historyIsKeptInTheGivenFile() throws IOException {
        Path history = dir.resolve("data/ampsieve/history");
        Sessions.run(
                List.of("--catalog", catalog.toString()),
                history,
                Map.of(),
                "help",
                "show",
                "ask",
                "",
                "100",
                "\u0003");
        List<String> lines = Files.readAllLines(history);
        assertTrue(lines.stream().anyMatch(l -> l.endsWith("help")), lines.toString());
        assertTrue(lines.stream().anyMatch(l -> l.endsWith("ask")), lines.toString());
        assertFalse(lines.stream().anyMatch(l -> l.endsWith("100")), lines.toString()); // answers are not history
    }

    @Test
    void theBannerSaysHowToBegin() {
        String printed = session();
        assertTrue(
                dev.ampsieve.testing.Flat.of(printed)
                        .contains("Type ask to describe your stage, help for the commands"),
                printed);
        Matcher m = Pattern.compile("Catalog \\S+: (\\d+) part\\(s\\)").matcher(printed);
        assertTrue(m.find(), printed);
        assertTrue(Integer.parseInt(m.group(1)) > 0, printed);
        assertTrue(dev.ampsieve.testing.Flat.of(printed).contains(dev.ampsieve.report.Caution.TEXT), printed);
        // 4 warnings about values, plus 49 absences the budget will estimate (noise figures, ib, ios, long-term
        // drift: counted over the demo YAML by a separate script, one per missing key, one per missing noise section)
        assertTrue(dev.ampsieve.testing.Flat.of(printed).contains("0 error(s), 53 warning(s)"), printed);
    }

    @Test
    void errorsAreFoldedToTheWidthAtWordBoundaries() throws Exception {
        Path bad = dir.resolve("bad.yaml");
        Files.writeString(bad, "gain: 100\nlimit: 2 parsecs\n");
        String printed = session("set gain 100", "set limit 2 V/us", "load " + bad, "budget zz-nothing")
                .replace("\r", "");
        for (String line : printed.split("\n")) {
            line = Sessions.withoutPrompts(line); // the dumb terminal leaves output on the prompt's line
            assertTrue(line.length() <= 80, "longer than the dumb terminal's 80 columns: " + line + "\n" + printed);
        }
        String flat = dev.ampsieve.testing.Flat.of(printed);
        // whole words on both sides of every fold: the flattened text reads as the message
        assertTrue(flat.contains("limit: '2 V/us' is a slew rate but a voltage belongs here"), printed);
        assertTrue(flat.contains("(" + Questions.why(Answers.LIMIT) + ")"), printed);
        assertTrue(flat.contains(bad + ":2:8: limit:"), printed);
    }

    @Test
    void commandsNamedAsTheCommandLineTypesThemRunInTheShellToo() {
        // messages and help name commands with the program's name, as on the command line; the shell takes that
        // form as typed, so nothing printed is rewritten for the shell
        String printed =
                session("set gain 100", "set limit 1 mV", "budget zz-nothing-like-it", "ampsieve check --quiet");
        String flat = dev.ampsieve.testing.Flat.of(printed);
        assertTrue(flat.contains("; 'ampsieve check' lists what was read"), printed);
        assertTrue(
                flat.matches("(?s).*\\d+ file\\(s\\), 48 part\\(s\\), 0 error\\(s\\).*"),
                printed); // check's own summary line
        assertEquals(
                List.of("check", "--quiet"), Shell.withoutLeadingProgramName(List.of("ampsieve", "check", "--quiet")));
        assertEquals(List.of("ampsieve"), Shell.withoutLeadingProgramName(List.of("ampsieve"))); // alone: left as typed
    }

    @Test
    void loadingATransimpedanceStageNamesItsRfNotAGain() {
        String printed = session("load demo-catalog/stages/photodiode.yaml");
        assertTrue(
                dev.ampsieve.testing.Flat.of(printed)
                        .contains(
                                "Loaded demo-catalog/stages/photodiode.yaml: transimpedance, rf 1 Mohm, 5 nA input limit."),
                printed);
        assertFalse(printed.contains("gain null"), printed);
    }
}
