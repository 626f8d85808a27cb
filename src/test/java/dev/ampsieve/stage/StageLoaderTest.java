package dev.ampsieve.stage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Range;
import dev.ampsieve.report.ProblemText;
import dev.ampsieve.testing.Networks;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class StageLoaderTest {

    private static final Path NAME = Path.of("s.yaml");

    private static Stage stage(String yaml) throws InputException {
        return StageLoader.parse(yaml, NAME);
    }

    /** Every problem line the loader reports for {@code yaml}. */
    private static List<String> problems(String yaml) {
        InputException e = assertThrows(InputException.class, () -> stage(yaml));
        return e.problems().stream().map(ProblemText::line).toList();
    }

    /** Exactly one problem, returned. */
    private static String problem(String yaml) {
        List<String> all = problems(yaml);
        assertEquals(1, all.size(), () -> "expected one problem, got " + all);
        return all.get(0);
    }

    @Nested
    class Defaults {

        @Test
        void minimalStageTakesTheDocumentedDefaults() throws InputException {
            Stage s = stage("gain: 100\nlimit: 1 mV\n");
            assertEquals(Topology.NON_INVERTING, s.topology());
            assertEquals(10e3, s.rf(), 0.0);
            assertEquals(10e3 / 99, Networks.rg(s), 0.0);
            assertEquals(0.0, s.sourceResistance(), 0.0);
            assertEquals(0.0, Networks.rp(s), 0.0);
            assertEquals(0.0, s.tMin(), 0.0);
            assertEquals(70.0, s.tMax(), 0.0);
            assertNull(s.supplyVoltage());
            assertEquals(0.0, s.supplyVariation(), 0.0);
            assertEquals(0.0, s.commonModeSwing(), 0.0); // no full scale given
            assertNull(s.commonModeRange());
            assertNull(s.outputRange());
            assertEquals(0.1, s.bandLow(), 0.0);
            assertEquals(10.0, s.bandHigh(), 0.0);
            assertNull(s.fullScaleOutput());
            assertEquals(0.0, s.ratioTolerance(), 0.0);
            assertEquals(0.0, s.ratioTempco(), 0.0);
            assertEquals(0.0, s.serviceLife(), 0.0);
            assertEquals(Limit.output(1e-3), s.limit());
            assertEquals(Criterion.WORST_CASE, s.criterion());
            assertEquals(3.0, s.maxToSigma(), 0.0);
            assertEquals(20_000, s.trials());
            assertEquals(StageKeys.DEFAULT_SEED, s.seed());
            assertEquals(Trim.NONE, s.trim());
            assertEquals(1000, s.quantity());
            assertNull(s.maxPrice());
            assertEquals(false, s.acCoupled());
            assertEquals(NAME, s.where().file());
        }

        @Test
        void commonModeSwingDefaultsFollowTheTopology() throws InputException {
            // non-inverting: the inputs follow the full-scale input, 2.5 V / 100
            assertEquals(
                    0.025,
                    stage("gain: 100\nfull-scale-output: 2.5 V\nlimit: 1 mV\n").commonModeSwing(),
                    1e-15);
            // inverting: the inputs sit at the reference (virtual ground)
            assertEquals(
                    0.0,
                    stage("topology: inverting\ngain: 10\nfull-scale-output: 2.5 V\nlimit: 1 mV\n")
                            .commonModeSwing(),
                    0.0);
            // follower: the input carries the whole output
            assertEquals(
                    4.0,
                    stage("topology: follower\nfull-scale-output: 4 V\nlimit: 1 mV\n")
                            .commonModeSwing(),
                    0.0);
            // written out, it wins
            assertEquals(
                    0.15,
                    stage("gain: 100\nfull-scale-output: 2.5 V\ncommon-mode-swing: 150 mV\nlimit: 1 mV\n")
                            .commonModeSwing(),
                    1e-15);
        }

        @Test
        void followerHasNoGainResistorAndNoFeedbackResistorByDefault() throws InputException {
            Stage s = stage("topology: follower\nlimit: 1 mV\n");
            assertEquals(0.0, s.rf(), 0.0);
            assertEquals(Double.POSITIVE_INFINITY, Networks.rg(s), 0.0);
            assertEquals(1.0, s.noiseGain(), 0.0);
            assertEquals(1.0, s.signalGain(), 0.0);
        }

        @Test
        void trimBlockAllowsTrimmingUnlessItSaysOtherwise() throws InputException {
            assertEquals(
                    new Trim(true, Trim.Method.TWO_POINT, 1e-3, 0.5),
                    stage("gain: 10\nlimit: 1 mV\ntrim:\n  method: two-point\n  resolution: 1 mV\n  cost: 0.50\n")
                            .trim());
            assertEquals(
                    new Trim(false, Trim.Method.ONE_POINT, 0, 0),
                    stage("gain: 10\nlimit: 1 mV\ntrim:\n  allowed: false\n").trim());
            assertEquals(
                    new Trim(true, Trim.Method.ONE_POINT, 0, 0),
                    stage("gain: 10\nlimit: 1 mV\ntrim: true\n").trim());
        }

        @Test
        void everyKeyOfTheTableIsReadByTheLoader() throws InputException {
            // one value per key from StageKeys' own examples; alternatives left out
            java.util.Map<String, String> answers = new java.util.LinkedHashMap<>();
            for (StageKeys.Key k : StageKeys.ORDERED) {
                if (!k.path().startsWith("limit.")
                        && !k.path().equals("rg")
                        && !k.path().startsWith("source-resistance.")
                        && StageKeys.appliesTo(k, Topology.NON_INVERTING)) {
                    answers.put(k.path(), k.example());
                }
            }
            Stage s = StageLoader.parse(StageWriter.toYaml(answers), NAME);
            assertEquals(Criterion.yield(0.999).kind(), s.criterion().kind());
            assertEquals(-40.0, s.tMin(), 0.0);
            assertEquals(10 * 365.25 * 86400, s.serviceLife(), 1e-6);
            assertEquals(new Range(0.1, 4.9), s.outputRange());
        }

        @Test
        void orderedKeysStartWithGainTemperatureAndLimit() {
            assertEquals(
                    List.of("gain", "temperature.min", "temperature.max", "limit"),
                    StageKeys.paths().subList(0, 4));
            for (StageKeys.Key k : StageKeys.ORDERED) {
                assertTrue(
                        !k.why().isBlank()
                                && !k.defaultText().isBlank()
                                && !k.example().isBlank(),
                        k.path());
            }
        }
    }

    @Nested
    class DerivedValues {

        // reference-checks.md §2 (Franco4 ch. 1 and 5, SS7 ch. 2 [from memory]; values [Calc]), exact

        @Test
        void nonInvertingRf99kRg1kHasGainAndNoiseGain100() throws InputException {
            Stage s = stage("rf: 99 kohm\nrg: 1 kohm\nlimit: 1 mV\n");
            assertEquals(100.0, s.signalGain(), 0.0);
            assertEquals(100.0, s.noiseGain(), 0.0);
        }

        @Test
        void invertingRf99kRg1kHasGainMinus99AndNoiseGain100() throws InputException {
            Stage s = stage("topology: inverting\nrf: 99 kohm\nrg: 1 kohm\nlimit: 1 mV\n");
            assertEquals(-99.0, s.signalGain(), 0.0);
            assertEquals(100.0, s.noiseGain(), 0.0);
        }

        @Test
        void parallelOf100kAnd1kIs990point099() throws InputException {
            // Rp = Rf || Rg, reference-checks.md §2: 990.099 ohm, tolerance half a unit of the last digit
            assertEquals(
                    990.099, stage("rf: 100 kohm\nrg: 1 kohm\nlimit: 1 mV\n").rMinus(), 0.0005);
        }

        @Test
        void gainWithRfDerivesRg() throws InputException {
            Stage ni = stage("gain: 100\nrf: 99 kohm\nlimit: 1 mV\n");
            assertEquals(1000.0, Networks.rg(ni), 1e-12); // rg = rf/(gain - 1)
            assertEquals(100.0, ni.signalGain(), 1e-12);
            Stage inv = stage("topology: inverting\ngain: -99\nrf: 99 kohm\nlimit: 1 mV\n");
            assertEquals(1000.0, Networks.rg(inv), 1e-12); // inverting: gain is the ratio rf/rg, sign ignored
            assertEquals(-99.0, inv.signalGain(), 1e-12);
            assertEquals(
                    inv,
                    stage("topology: inverting\ngain: 99\nrf: 99 kohm\nlimit: 1 mV\n")
                            .withWhere(inv.where()));
            Stage withRg = stage("gain: 101\nrg: 1 kohm\nlimit: 1 mV\n");
            assertEquals(100e3, withRg.rf(), 1e-9);
        }

        @Test
        void invertingSourceResistanceAddsToRg() throws InputException {
            Stage s = stage("topology: inverting\ngain: 10\nrf: 100 kohm\nsource-resistance: 10 kohm\nlimit: 1 mV\n");
            assertEquals(10e3, Networks.rg(s), 1e-9);
            assertEquals(-5.0, s.signalGain(), 1e-12); // -100k / (10k + 10k)
            assertEquals(6.0, s.noiseGain(), 1e-12);
        }

        @Test
        void gainInDecibels() throws InputException {
            // 20 log10(100) = 40 dB (reference-checks.md §4)
            assertEquals(100.0, stage("gain: 40 dB\nlimit: 1 mV\n").noiseGain(), 1e-12);
        }

        @Test
        void temperatureInKelvinAndServiceLifeInYearsOrHours() throws InputException {
            Stage s = stage("gain: 10\nlimit: 1 mV\ntemperature: {min: 233.15 K, max: 85 C}\nservice-life: 1 y\n");
            assertEquals(-40.0, s.tMin(), 1e-9);
            assertEquals(65.0, s.deltaT(), 1e-9); // |-40 - 25| is the larger distance
            assertEquals(8766 * 3600.0, s.serviceLife(), 0.0); // Julian year, as Units documents
            assertEquals(
                    1000 * 3600.0,
                    stage("gain: 10\nlimit: 1 mV\nservice-life: 1000 h\n").serviceLife(),
                    0.0);
        }
    }

    @Nested
    class LimitForms {

        @Test
        void lsbIsReferenceOver2ToTheBits() throws InputException {
            // reference-checks.md §9: 16 bits, 2.5 V -> 38.1470 uV; half -> 19.0735 uV; 12 bits 4.096 V -> 1.000000 mV
            Stage one = stage("gain: 10\nlimit: {lsb: 1, bits: 16, reference: 2.5 V}\n");
            assertEquals(new Limit(Limit.Kind.LSB, 1.0, 16, 2.5), one.limit());
            assertEquals(38.1470e-6, one.limitVolts(), 0.00005e-6);
            assertEquals(
                    19.0735e-6,
                    stage("gain: 10\nlimit: {lsb: 0.5, bits: 16, reference: 2.5 V}\n")
                            .limitVolts(),
                    0.00005e-6);
            assertEquals(
                    1.000000e-3,
                    stage("gain: 10\nlimit: {lsb: 1, bits: 12, reference: 4.096 V}\n")
                            .limitVolts(),
                    0.0000005e-3);
        }

        @Test
        void inputReferredLimitIsMultipliedByTheSignalGain() throws InputException {
            // an input-referred limit is at the signal source (error-model.md): times |signal gain|.
            // non-inverting 1 + 99k/1k = 100: 10 uV x 100 = 1 mV
            Stage s = stage("rf: 99 kohm\nrg: 1 kohm\nlimit:\n  input: 10 uV\n");
            assertEquals(Limit.Kind.INPUT, s.limit().kind());
            assertEquals(1e-3, s.limitVolts(), 1e-15);
            // re-derived: inverting 99k/1k has signal gain -99 (noise gain 100): 10 uV x 99 = 0.99 mV
            Stage inv = stage("topology: inverting\nrf: 99 kohm\nrg: 1 kohm\nlimit:\n  input: 10 uV\n");
            assertEquals(0.99e-3, inv.limitVolts(), 1e-15);
        }

        @Test
        void percentOfFullScale() throws InputException {
            Stage s = stage("gain: 10\nfull-scale-output: 2.5 V\nlimit: {percent-of-full-scale: 0.1 %}\n");
            assertEquals(2.5e-3, s.limitVolts(), 1e-15);
            // the key says percent, so a bare number is read as percent
            assertEquals(
                    s.limit(),
                    stage("gain: 10\nfull-scale-output: 2.5 V\nlimit: {percent-of-full-scale: 0.1}\n")
                            .limit());
        }

        @Test
        void criterionForms() throws InputException {
            assertEquals(
                    Criterion.RSS,
                    stage("gain: 10\nlimit: 1 mV\ncriterion: rss\n").criterion());
            Criterion y =
                    stage("gain: 10\nlimit: 1 mV\ncriterion: yield 99.9 %\n").criterion();
            assertEquals(Criterion.Kind.YIELD, y.kind());
            assertEquals(0.999, y.yieldTarget(), 1e-15);
            assertEquals(
                    0.95,
                    stage("gain: 10\nlimit: 1 mV\ncriterion: yield 95%\n")
                            .criterion()
                            .yieldTarget(),
                    1e-15);
        }
    }

    @Nested
    class SingleAnswers {

        @Test
        void aGoodAnswerHasNoProblem() {
            assertEquals(List.of(), StageLoader.checkAnswer("temperature.min", "-40 C"));
            assertEquals(List.of(), StageLoader.checkAnswer("topology", "follower"));
            assertEquals(List.of(), StageLoader.checkAnswer("limit.bits", "16"));
            assertEquals(List.of(), StageLoader.checkAnswer("limit.percent-of-full-scale", "0.1"));
        }

        @Test
        void aBadAnswerGetsItsProblemWithoutLocation() {
            // the example is rf's own (StageKeys), not the dimension's
            assertEquals(
                    List.of(
                            "rf: '10 mV' is a voltage but a resistance belongs here; write a resistance such as '100 kohm'"),
                    StageLoader.checkAnswer("rf", "10 mV").stream()
                            .map(ProblemText::line)
                            .toList());
            assertEquals(
                    List.of("trials: 50 is outside 100..10000000; write a whole number from 100 to 10000000"),
                    StageLoader.checkAnswer("trials", "50").stream()
                            .map(ProblemText::line)
                            .toList());
            assertEquals(
                    List.of("gain: a non-inverting stage cannot have gain 0.5 (below 1); "
                            + "write a gain of 1 or more, or use 'topology: inverting'"),
                    StageLoader.checkAnswer("gain", "0.5").stream()
                            .map(ProblemText::line)
                            .toList());
            assertEquals(1, StageLoader.checkAnswer("criterion", "yield 100 %").size());
            assertEquals(1, StageLoader.checkAnswer("limit", "5 mV\nrf: 1 V").size()); // one value, never two keys
        }

        @Test
        void unknownKeyIsAProgrammingError() {
            assertThrows(IllegalArgumentException.class, () -> StageLoader.checkAnswer("gian", "100"));
        }
    }

    @Nested
    class DemoStages {

        private static final Path DIR = Path.of("demo-catalog/stages");

        @Test
        void everyDemoStageLoadsAndReadsBackFromItsWrittenForm() throws Exception {
            List<Path> files;
            try (var list = java.nio.file.Files.list(DIR)) {
                files = list.filter(p -> p.toString().endsWith(".yaml"))
                        .sorted()
                        .toList();
            }
            // photodiode.yaml: the transimpedance demo stage; relay-scanner.yaml: the board-level one
            assertEquals(
                    List.of(
                            DIR.resolve("adc-driver.yaml"),
                            DIR.resolve("bridge-amp.yaml"),
                            DIR.resolve("photodiode.yaml"),
                            DIR.resolve("relay-scanner.yaml"),
                            DIR.resolve("thermocouple.yaml")),
                    files);
            for (Path f : files) {
                Stage s = StageLoader.load(f); // throws with every problem listed if one is wrong
                assertEquals(f, s.where().file());
                Stage back = StageLoader.parse(StageWriter.toYaml(s), NAME);
                assertEquals(s.withWhere(null), back.withWhere(null), f.toString());
            }
        }

        @Test
        void demoLimitsConvertToOutputVolts() throws InputException {
            // ADC driver: 2 LSB of 16 bits at 4.096 V = 2 x 62.5 uV (reference-checks.md §9 convention LSB = V/2^N)
            Stage adc = StageLoader.load(DIR.resolve("adc-driver.yaml"));
            assertEquals(Topology.FOLLOWER, adc.topology());
            assertEquals(125e-6, adc.limitVolts(), 1e-18);
            // thermocouple: 40 uV at the input x noise gain 200 = 8 mV at the output
            Stage tc = StageLoader.load(DIR.resolve("thermocouple.yaml"));
            assertEquals(Limit.Kind.INPUT, tc.limit().kind());
            assertEquals(200.0, tc.noiseGain(), 1e-12);
            assertEquals(8e-3, tc.limitVolts(), 1e-15);
            // bridge: a difference stage, r1 = r3 = 4.99 k, r2 = r4 = 499 k, 175 ohm legs; the limit 6 mV at the output
            Stage bridge = StageLoader.load(DIR.resolve("bridge-amp.yaml"));
            assertEquals(new Difference(4.99e3, 499e3, 4.99e3, 499e3, 175, 175), bridge.network());
            assertEquals(6e-3, bridge.limitVolts(), 1e-15);
            assertEquals(Criterion.Kind.YIELD, bridge.criterion().kind());
        }
    }

    @Nested
    class Validation {

        @Test
        void unknownKeyGetsAGuess() {
            assertEquals(
                    "s.yaml:1:1: gian: unknown key; did you mean 'gain'?",
                    problem("gian: 100\nrf: 10 kohm\nrg: 1 kohm\nlimit: 1 mV\n"));
            assertEquals(
                    "s.yaml:4:3: temperature.mx: unknown key; did you mean 'max'?",
                    problem("gain: 10\nlimit: 1 mV\ntemperature:\n  mx: 85 C\n"));
        }

        @Test
        void wrongUnitNamesBothDimensions() {
            assertEquals(
                    "s.yaml:2:5: rf: '10 mV' is a voltage but a resistance belongs here; write a resistance such as '100 kohm'",
                    problem("gain: 10\nrf: 10 mV\nlimit: 1 mV\n"));
            assertEquals(
                    "s.yaml:3:9: band.high: '10 kohm' is a resistance but a frequency belongs here; "
                            + "write a frequency such as '1 kHz'", // band.high's own example (StageKeys)
                    problem("gain: 10\nband:\n  high: 10 kohm\nlimit: 1 mV\n"));
        }

        @Test
        void missingLimitSaysHowToWriteOne() {
            String p = problem("gain: 10\n");
            assertTrue(p.startsWith("s.yaml:1:1: limit: required field is missing"), p);
            assertTrue(p.contains("; add 'limit: 1 mV' (at the output), or 'limit: {input: 10 uV}'"), p);
        }

        @Test
        void nonInvertingGainBelowOne() {
            assertEquals(
                    "s.yaml:1:7: gain: a non-inverting stage cannot have gain 0.5 (below 1); "
                            + "write a gain of 1 or more, or use 'topology: inverting'",
                    problem("gain: 0.5\nlimit: 1 mV\n"));
            assertEquals(
                    "s.yaml:1:7: gain: a non-inverting stage cannot have gain -10 (below 1); "
                            + "write the magnitude with 'topology: inverting'",
                    problem("gain: -10\nlimit: 1 mV\n"));
            assertEquals(
                    "s.yaml:1:7: gain: gain 1 needs no gain resistor (rg would be infinite); write 'topology: follower'",
                    problem("gain: 1\nlimit: 1 mV\n"));
        }

        @Test
        void gainTogetherWithRfAndRgConflicts() {
            assertEquals(
                    "s.yaml:1:7: gain: 'gain', 'rf' and 'rg' are all given and may disagree; "
                            + "give 'gain' with 'rf' (or with 'rg'), or give 'rf' and 'rg' without 'gain'",
                    problem("gain: 100\nrf: 99 kohm\nrg: 1 kohm\nlimit: 1 mV\n"));
        }

        @Test
        void missingGain() {
            assertEquals(
                    "s.yaml:1:5: gain: the gain is not given; add 'gain: 100', or give both 'rf' and 'rg'",
                    problem("rf: 10 kohm\nlimit: 1 mV\n"));
            assertEquals(
                    "s.yaml:1:1: gain: the gain is not given; add 'gain: 100' (with 'rf', default 10 kohm), or 'rf' and 'rg'",
                    problem("limit: 1 mV\n"));
        }

        @Test
        void followerTakesNoGainResistor() {
            assertEquals(
                    "s.yaml:2:5: rg: a follower has no gain resistor; remove 'rg', or write 'topology: non-inverting'",
                    problem("topology: follower\nrg: 1 kohm\nlimit: 1 mV\n"));
            assertEquals(
                    "s.yaml:2:7: gain: a follower has gain 1, not 10; remove 'gain', or write 'topology: non-inverting'",
                    problem("topology: follower\ngain: 10\nlimit: 1 mV\n"));
        }

        @Test
        void unknownTopologyGetsAGuess() {
            assertEquals(
                    "s.yaml:1:11: topology: 'non-invert' is not one of non-inverting | inverting | follower | difference | transimpedance; "
                            + "did you mean 'non-inverting'?",
                    problem("topology: non-invert\ngain: 10\nlimit: 1 mV\n"));
        }

        @Test
        void temperatureMinAboveMax() {
            assertEquals(
                    "s.yaml:4:8: temperature: min 85 °C is above max -40 °C; swap the two values",
                    problem("gain: 10\nlimit: 1 mV\ntemperature:\n  min: 85 C\n  max: -40 C\n"));
            assertEquals(
                    "s.yaml:3:20: temperature.min: '-300 C' is below absolute zero (-273.15 °C); write the temperature in °C, such as '-40 C'",
                    problem("gain: 10\nlimit: 1 mV\ntemperature: {min: -300 C}\n"));
        }

        @Test
        void bandMustStartAboveZeroAndBelowItsTop() {
            assertEquals(
                    "s.yaml:3:13: band: low 10.0 Hz is not below high 1.00 Hz; make 'low' smaller than 'high'",
                    problem("gain: 10\nlimit: 1 mV\nband: {low: 10 Hz, high: 1 Hz}\n"));
            assertEquals(
                    "s.yaml:3:13: band: low 10.0 Hz is not below high 10.0 Hz; make 'low' smaller than 'high'",
                    problem("gain: 10\nlimit: 1 mV\nband: {low: 10 Hz, high: 10 Hz}\n"));
            String zero = problem("gain: 10\nlimit: 1 mV\nband: {low: 0 Hz}\n");
            assertTrue(zero.startsWith("s.yaml:3:13: band.low: the band must start above 0 Hz"), zero);
            assertTrue(zero.contains("; write 'low: 0.1 Hz'"), zero);
        }

        @Test
        void filterOrderIsNoneOrOneToEight() throws InputException {
            assertEquals(null, stage("gain: 10\nlimit: 1 mV\n").filterOrder()); // not stated: counted as no filter
            assertEquals(Stage.NO_FILTER, stage("gain: 10\nlimit: 1 mV\n").noiseFilterOrder());
            assertEquals(
                    Stage.NO_FILTER,
                    stage("gain: 10\nlimit: 1 mV\nband: {filter-order: none}\n").filterOrder());
            assertEquals(
                    4,
                    stage("gain: 10\nlimit: 1 mV\nband: {high: 1 kHz, filter-order: 4}\n")
                            .filterOrder());
            String nine = problem("gain: 10\nlimit: 1 mV\nband: {filter-order: 9}\n");
            assertEquals(
                    "s.yaml:3:22: band.filter-order: '9' is not a filter order; write 'none' when no filter after the "
                            + "amplifier limits the band, or the filter's order, 1 to 8 (an RC is 1)",
                    nine);
            String word = problem("gain: 10\nlimit: 1 mV\nband:\n  filter-order: rc\n");
            assertTrue(word.startsWith("s.yaml:4:17: band.filter-order: 'rc' is not a filter order;"), word);
        }

        @Test
        void percentLimitNeedsFullScale() {
            assertEquals(
                    "s.yaml:2:32: limit.percent-of-full-scale: a share of full scale needs the full-scale output; "
                            + "add 'full-scale-output: 2.5 V', or give the limit in volts",
                    problem("gain: 10\nlimit: {percent-of-full-scale: 0.1 %}\n"));
            assertEquals(
                    "s.yaml:3:32: limit.percent-of-full-scale: 150 % is outside (0, 100] %; write a percentage such as '0.1 %'",
                    problem("gain: 10\nfull-scale-output: 1 V\nlimit: {percent-of-full-scale: 150 %}\n"));
        }

        @Test
        void limitInOneFormOnlyAndComplete() {
            assertEquals(
                    "s.yaml:2:8: limit: more than one form of limit given (input, percent-of-full-scale); keep one of them",
                    problem("gain: 10\nlimit: {input: 1 uV, percent-of-full-scale: 1 %}\nfull-scale-output: 1 V\n"));
            assertEquals(
                    "s.yaml:2:8: limit.bits: missing: an LSB limit needs lsb, bits and reference; add 'bits: 16'",
                    problem("gain: 10\nlimit: {lsb: 0.5, reference: 2.5 V}\n"));
            assertEquals(
                    "s.yaml:2:8: limit: must be more than 0; write a voltage such as '1 mV'",
                    problem("gain: 10\nlimit: 0 V\n"));
            assertEquals(
                    "s.yaml:2:39: limit.bits: 40 is outside 1..32; write a whole number from 1 to 32",
                    problem("gain: 10\nlimit: {lsb: 1, reference: 1 V, bits: 40}\n"));
        }

        @Test
        void yieldTargetOutsideZeroToHundredPercent() {
            String fix = "; write a target above 0 % and below 100 %, such as 'yield 99.9 %'";
            assertEquals(
                    "s.yaml:3:12: criterion: yield target 100 % is outside (0, 100) %" + fix,
                    problem("gain: 10\nlimit: 1 mV\ncriterion: yield 100 %\n"));
            assertEquals(
                    "s.yaml:3:12: criterion: yield target 0 % is outside (0, 100) %" + fix,
                    problem("gain: 10\nlimit: 1 mV\ncriterion: yield 0 %\n"));
            assertEquals(
                    "s.yaml:3:12: criterion: yield target 99.9 is outside (0, 100) %" + fix,
                    problem("gain: 10\nlimit: 1 mV\ncriterion: yield 99.9\n"));
            assertEquals(
                    "s.yaml:3:12: criterion: 'worstcase' is not one of worst-case | rss | yield P %; did you mean 'worst-case'?",
                    problem("gain: 10\nlimit: 1 mV\ncriterion: worstcase\n"));
        }

        @Test
        void trialsOutOfRange() {
            assertEquals(
                    "s.yaml:3:9: trials: 99 is outside 100..10000000; write a whole number from 100 to 10000000",
                    problem("gain: 10\nlimit: 1 mV\ntrials: 99\n"));
            assertEquals(
                    "s.yaml:3:9: trials: 10000001 is outside 100..10000000; write a whole number from 100 to 10000000",
                    problem("gain: 10\nlimit: 1 mV\ntrials: 10_000_001\n"));
        }

        @Test
        void negativeResistances() {
            assertEquals(
                    "s.yaml:3:20: source-resistance: must not be negative; write a resistance of 0 or more, such as '350 ohm'",
                    problem("gain: 10\nlimit: 1 mV\nsource-resistance: -1 kohm\n"));
            assertEquals(
                    "s.yaml:3:5: rf: must not be negative; write a resistance of 0 or more, such as '100 kohm'",
                    problem("gain: 10\nlimit: 1 mV\nrf: -10 kohm\n"));
        }

        @Test
        void blockWrittenAsOneValue() {
            assertEquals(
                    "s.yaml:3:9: supply: expected a block of 'key: value' lines, found a single value; "
                            + "write 'supply:' with 'voltage: 5 V', 'variation: 0.25 V' indented below it",
                    problem("gain: 10\nlimit: 1 mV\nsupply: 5 V\n"));
        }

        @Test
        void outputRangeWithinTheRailsAndOrdered() {
            assertEquals(
                    "s.yaml:4:31: output-range: an output cannot go beyond the supply rails (0 to 5.00 V); "
                            + "write volts above the negative rail, within the supply",
                    problem("gain: 10\nlimit: 1 mV\nsupply: {voltage: 5 V}\noutput-range: {min: 1 V, max: 6 V}\n"));
            assertEquals(
                    "s.yaml:3:26: common-mode-range: min 3.00 V is above max 1.00 V; swap the two values",
                    problem("gain: 10\nlimit: 1 mV\ncommon-mode-range: {min: 3 V, max: 1 V}\n"));
            assertEquals(
                    "s.yaml:3:20: common-mode-range.max: required in this block (both ends of the range); "
                            + "add 'max: 4 V' (volts above the negative rail)",
                    problem("gain: 10\nlimit: 1 mV\ncommon-mode-range: {min: 3 V}\n"));
        }

        @Test
        void emptyOrNonMappingFile() {
            assertEquals(
                    "s.yaml:1:1: the stage file is empty; write at least 'gain: 100' and 'limit: 1 mV'", problem(""));
            assertEquals(
                    "s.yaml:1:1: a stage file must be 'key: value' lines, found a list; "
                            + "write at least 'gain: 100' and 'limit: 1 mV', one per line",
                    problem("- gain\n- limit\n"));
        }

        @Test
        void allProblemsAreReportedTogetherInFileOrder() {
            List<String> all = problems("trials: 5\ngain: 0.2\ntemperature: {min: 10 C, max: 0 C}\nrf: 3 V\n");
            assertEquals(5, all.size(), all::toString);
            assertTrue(all.get(0).startsWith("s.yaml:1:1: limit: required field is missing"), all::toString);
            assertTrue(all.get(1).startsWith("s.yaml:1:9: trials: 5 is outside 100..10000000"), all::toString);
            assertTrue(
                    all.get(2).startsWith("s.yaml:2:7: gain: a non-inverting stage cannot have gain 0.2"),
                    all::toString);
            assertTrue(all.get(3).startsWith("s.yaml:3:20: temperature: min 10 °C is above max 0 °C"), all::toString);
            assertTrue(
                    all.get(4).startsWith("s.yaml:4:5: rf: '3 V' is a voltage but a resistance belongs here"),
                    all::toString);
        }
    }
}
