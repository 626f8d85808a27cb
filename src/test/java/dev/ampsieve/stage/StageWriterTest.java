package dev.ampsieve.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Range;
import dev.ampsieve.yaml.InputException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class StageWriterTest {

    private static final Path NAME = Path.of("w.yaml");

    private static void assertRoundTrip(Stage original) throws InputException {
        String yaml = StageWriter.toYaml(original);
        Stage back = StageLoader.parse(yaml, NAME);
        assertEquals(original.withWhere(null), back.withWhere(null), yaml);
    }

    @Test
    void filterOrderRoundTrips() throws InputException {
        for (String order : List.of("none", "1", "2", "8")) {
            Stage s = StageLoader.parse(
                    "gain: 10\nlimit: 1 mV\nband: {high: 1 kHz, filter-order: " + order + "}\n", NAME);
            assertEquals(order.equals("none") ? Stage.NO_FILTER : Integer.parseInt(order), s.filterOrder());
            assertRoundTrip(s);
            assertTrue(StageWriter.toYaml(s).contains("  filter-order: " + order + "\n"), StageWriter.toYaml(s));
        }
        // not stated stays not stated (the budget then warns), rather than being written as 'none'
        Stage unstated = StageLoader.parse("gain: 10\nlimit: 1 mV\n", NAME);
        assertRoundTrip(unstated);
        assertEquals(null, StageLoader.parse(StageWriter.toYaml(unstated), NAME).filterOrder());
    }

    @Test
    void writtenStagesReadBackEqual() throws InputException {
        assertRoundTrip(StageLoader.parse("gain: 100\nlimit: 1 mV\n", NAME));
        assertRoundTrip(StageLoader.parse("""
                topology: inverting
                gain: 7.3
                rf: 47.5 kohm
                source-resistance: 1.21 kohm
                balance-resistance: 5.6 kohm
                temperature: {min: -55 C, max: 125 C}
                supply: {voltage: 30 V, variation: 1.5 V}
                common-mode-range: {min: 14.5 V, max: 15.5 V}
                output-range: {min: 2 V, max: 28 V}
                band: {low: 0.01 Hz, high: 2.2 kHz}
                full-scale-output: 10 V
                resistor-ratio: {tolerance: 0.05 %, tempco: 2.5 ppm/C}
                service-life: 10 y
                limit: {percent-of-full-scale: 0.013 %}
                criterion: yield 99.73 %
                max-to-sigma: 4.5
                trials: 123457
                seed: -9
                trim: {allowed: true, method: two-point, resolution: 37 uV, cost: 1.25}
                quantity: 25
                max-price: 3.33
                ac-coupled: true
                """, NAME));
        assertRoundTrip(StageLoader.parse(
                "topology: follower\nrf: 100 ohm\nlimit: {lsb: 0.5, bits: 18, reference: 4.096 V}\n", NAME));
        assertRoundTrip(StageLoader.parse(
                "gain: 40 dB\nlimit: {input: 3.3 uV}\ncriterion: rss\nservice-life: 1234.5 h\n", NAME));
    }

    @Test
    void awkwardValuesReadBackExactly() throws InputException {
        // values no short decimal with a prefix reproduces: the writer falls back to plain digits
        Stage base = StageLoader.parse("gain: 10\nlimit: 1 mV\n", NAME);
        Stage odd = new Stage(
                new NonInverting(Math.PI * 1e4, Math.E * 1e2, 1.0 / 3, 2.0 / 7),
                -40.0 / 3,
                85.1,
                Math.sqrt(2) * 5,
                0.1 + 0.2,
                1.0 / 30,
                new Range(0.3, 0.7),
                null,
                1.0 / 7,
                1e5 / 3,
                3,
                2.0 / 3,
                1e-3 / 3,
                1e-6 / 7,
                1e6 / 7,
                new Limit(Limit.Kind.INPUT, 1e-6 / 3, 0, 0),
                Criterion.yield(0.999 + 1e-12),
                3.0,
                20000,
                123_457,
                1,
                base.trim(),
                1000,
                null,
                false,
                1e4 / 3,
                1e5 / 7,
                Board.NONE,
                null);
        assertRoundTrip(odd);
    }

    @Test
    void fileIsCommentedAndShowsDefaultsForKeysNotAnswered() {
        Map<String, String> answers = new LinkedHashMap<>();
        answers.put("gain", "100");
        answers.put("temperature.min", "-40 C");
        answers.put("limit", "1 mV");
        String yaml = StageWriter.toYaml(answers);
        assertTrue(yaml.contains("\ngain: 100\n"), yaml);
        assertTrue(yaml.contains("\ntemperature:\n  # "), yaml);
        assertTrue(yaml.contains("\n  min: -40 C\n"), yaml);
        assertTrue(yaml.contains("\n  # max: 85 C    # default: 70 C\n"), yaml);
        assertTrue(yaml.contains("\n# supply:\n#   "), yaml);
        assertTrue(
                yaml.contains("\n# rf: 100 kohm    # default: 10 kohm (follower: 0; transimpedance: required)\n"),
                yaml);
        // the "why" of every answered key is above it
        assertTrue(yaml.contains("# " + StageKeys.get("gain").why() + "\ngain: 100\n"), yaml);
    }

    @Test
    void answersNeedingQuotesAreQuoted() throws InputException {
        assertEquals("\"a: b # c\"", StageWriter.scalar("a: b # c"));
        assertEquals("\"- 5\"", StageWriter.scalar("- 5"));
        assertEquals("yield 99.9 %", StageWriter.scalar("yield 99.9 %"));
        Map<String, String> answers = new LinkedHashMap<>();
        answers.put("gain", "100");
        answers.put("limit", "1 mV # typed by hand");
        InputException e =
                assertThrows(InputException.class, () -> StageLoader.parse(StageWriter.toYaml(answers), NAME));
        // the whole answer reached the loader as one value, so the unit problem quotes it whole
        assertTrue(e.getMessage().contains("in '1 mV # typed by hand'"), e.getMessage());
    }

    @Test
    void unknownAnswerKeyIsAProgrammingError() {
        assertThrows(IllegalArgumentException.class, () -> StageWriter.toYaml(Map.of("gian", "100")));
        assertThrows(
                IllegalArgumentException.class,
                () -> StageWriter.toYaml(Map.of("limit", "1 mV", "limit.input", "1 uV")));
    }

    @Test
    void saveWritesANewFileAndLeavesNoTemporaryFile(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("stage.yaml");
        Stage s = StageLoader.parse("gain: 20\nlimit: 2 mV\n", NAME);
        StageWriter.save(s, file, false);
        assertEquals(s.withWhere(null), StageLoader.load(file).withWhere(null));
        assertEquals(List.of(file), list(dir));
    }

    @Test
    void saveRefusesToOverwriteWithoutTheFlag(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("mine.yaml");
        Files.writeString(file, "# my own notes\ngain: 5\nlimit: 1 mV\n");
        Stage s = StageLoader.parse("gain: 20\nlimit: 2 mV\n", NAME);
        InputException e = assertThrows(InputException.class, () -> StageWriter.save(s, file, false));
        assertEquals(
                file
                        + ": the file already exists and was left as it was; choose another file name, or ask explicitly to overwrite it",
                e.getMessage());
        assertEquals("# my own notes\ngain: 5\nlimit: 1 mV\n", Files.readString(file));
        assertEquals(List.of(file), list(dir));

        StageWriter.save(s, file, true);
        assertEquals(20.0, StageLoader.load(file).noiseGain(), 1e-12);
        assertEquals(List.of(file), list(dir));
    }

    @Test
    void saveRefusesTextThatWouldNotLoad(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("bad.yaml");
        InputException e = assertThrows(InputException.class, () -> StageWriter.save("gain: 20\n", file, false));
        assertTrue(e.getMessage().startsWith(file + ":1:1: limit: required field is missing"), e.getMessage());
        assertEquals(List.of(), list(dir));
    }

    @Test
    void saveIntoAMissingFolderFailsWithAMessage(@TempDir Path dir) {
        Path file = dir.resolve("no-such-folder").resolve("s.yaml");
        InputException e =
                assertThrows(InputException.class, () -> StageWriter.save("gain: 2\nlimit: 1 mV\n", file, false));
        assertTrue(e.getMessage().startsWith(file + ": cannot write the file ("), e.getMessage());
    }

    private static List<Path> list(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.sorted().toList();
        }
    }
}
