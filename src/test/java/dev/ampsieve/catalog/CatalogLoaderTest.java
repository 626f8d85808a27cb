package dev.ampsieve.catalog;

import static dev.ampsieve.catalog.CatalogFixtures.BASE;
import static dev.ampsieve.catalog.CatalogFixtures.FULL;
import static dev.ampsieve.catalog.CatalogFixtures.MINIMAL;
import static dev.ampsieve.catalog.CatalogFixtures.about;
import static dev.ampsieve.catalog.CatalogFixtures.asItem;
import static dev.ampsieve.catalog.CatalogFixtures.assertAt;
import static dev.ampsieve.catalog.CatalogFixtures.columnOf;
import static dev.ampsieve.catalog.CatalogFixtures.lineOf;
import static dev.ampsieve.catalog.CatalogFixtures.with;
import static dev.ampsieve.catalog.CatalogFixtures.without;
import static dev.ampsieve.catalog.CatalogFixtures.write;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.report.ProblemText;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Node;
import dev.ampsieve.yaml.Problem;
import dev.ampsieve.yaml.YamlFiles;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class CatalogLoaderTest {

    @TempDir
    Path dir;

    private Catalog load() throws InputException {
        return CatalogLoader.load(dir, false);
    }

    /** Writes one single-part file and loads the folder. */
    private Catalog loadPart(String text) throws InputException {
        write(dir, "part.yaml", text);
        return load();
    }

    private Path part() {
        return dir.resolve("part.yaml");
    }

    private static List<Problem> errors(Catalog c) {
        return c.problems().stream().filter(Problem::isError).toList();
    }

    // ------------------------------------------------------------------ what loads

    @Test
    void aValidPartLoadsWithEveryValueInSiUnits() throws Exception {
        Catalog c = loadPart(BASE);
        assertEquals(List.of(), c.problems());
        assertEquals(1, c.files());
        Part p = c.parts().get(0);
        assertEquals("test-amp-01", p.id());
        assertEquals(Architecture.STANDARD, p.architecture());
        assertEquals(InputType.BIPOLAR, p.input());
        assertEquals(0.5e-3, p.vos().typ(), 1e-15);
        assertEquals(2e-3, p.vos().max(), 1e-15);
        assertEquals(3e-3, p.vos().maxOverTemp(), 1e-15);
        assertEquals(10e-6, p.vosDrift().max(), 1e-18);
        assertEquals(200e-9, p.ib().maxOverTemp(), 1e-21);
        assertEquals(90.0, p.cmrr().min(), 0);
        assertEquals(1e6, p.gbw(), 1e-6);
        assertEquals(0.5e6, p.slew(), 1e-6);
        assertEquals(new Range(4.5, 36), p.supply());
        assertEquals(new Range(-40, 85), p.temperature());
        assertEquals(new Price(1.20, 1000, "USD"), p.price());
        assertEquals(12e-9, p.noise().en(), 1e-21);
        assertEquals(part(), p.where().file());
        assertEquals(1, p.where().line());
    }

    @Test
    void everyCatalogKeyIsReadWithItsDimension() throws Exception {
        // the fixture must use every key, so a key added to CatalogKeys without a reader fails here
        Node.Mapping top = (Node.Mapping) YamlFiles.parse(FULL, null);
        assertEquals(
                new LinkedHashSet<>(CatalogKeys.PART_KEYS),
                new LinkedHashSet<>(top.entries().keySet()));
        Catalog c = loadPart(FULL);
        assertEquals(List.of(), c.problems());
        Part p = c.parts().get(0);
        for (String path : CatalogKeys.QUANTITIES.keySet()) {
            assertNotNull(CatalogKeys.value(p, path), path);
        }
        assertEquals(150e3, CatalogKeys.value(p, "chopping-frequency"), 1e-9);
        assertEquals(1.8e-3, CatalogKeys.value(p, "quiescent-current"), 1e-15);
        assertEquals(7e-12, CatalogKeys.value(p, "input-capacitance"), 1e-24);
        assertEquals(0.3e-6, p.longTermDrift().value(), 1e-18);
        assertEquals(1000 * 3600.0, p.longTermDrift().per(), 1e-6);
        assertEquals(new Headroom(1.5, -0.1), p.inputHeadroom());
        assertEquals(0.4e-12, p.noise().in(), 1e-24);
        assertEquals(140.0, p.noise().inCorner(), 1e-12);
        assertEquals(FactoryTrim.LASER, p.factoryTrim());
        assertTrue(p.nullPins());
        assertEquals(2, p.channels());
        assertEquals(List.of("soic-8", "msop-8"), p.packages());
        assertEquals(List.of("precision", "dual"), p.tags());
        assertEquals("invented for tests", p.source());
        // the lot is only located at parse time (read when a budget needs it), relative to the part's file
        assertEquals("lots/unit-lot.csv", p.measured().file());
        assertEquals(
                p.where().file().getParent().resolve("lots/unit-lot.csv"),
                p.measured().path());
        assertEquals(null, p.measured().lot());
    }

    @Test
    void absentOptionalValuesStayUnknown() throws Exception {
        Catalog c = loadPart(MINIMAL);
        assertEquals(List.of(), errors(c));
        Part p = c.parts().get(0);
        assertTrue(p.ib().isEmpty());
        assertTrue(p.ios().isEmpty());
        assertTrue(p.vosDrift().isEmpty());
        assertTrue(p.cmrr().isEmpty());
        assertNull(p.slew());
        assertNull(p.noise().en());
        assertNull(p.longTermDrift());
        assertNull(p.inputHeadroom());
        assertNull(p.choppingFrequency());
        assertNull(p.vos().typ());
        assertEquals(FactoryTrim.NONE, p.factoryTrim());
        assertFalse(p.nullPins());
        assertEquals(1, p.channels());
        assertEquals(new Price(0.15, 1, "USD"), p.price());
    }

    @Test
    void aListFileHoldsSeveralPartsAndPathsNameTheItem() throws Exception {
        String list = "parts:\n" + asItem(BASE) + "\n" + asItem(with(MINIMAL, "gbw: 1 MHz", "gbw: 7 mV"));
        Path f = write(dir, "list.yaml", list);
        Catalog c = load();
        assertEquals(List.of("test-amp-01"), c.parts().stream().map(Part::id).toList());
        Problem p = about(c.problems(), "parts[1].gbw");
        assertAt(p, f, lineOf(list, "gbw: 7 mV"), columnOf(list, "7 mV"));
        assertEquals("'7 mV' is a voltage but a frequency belongs here", ProblemText.message(p));
        assertEquals(5, c.parts().get(0).where().column()); // "  - id" : the mapping starts after the dash
    }

    @Test
    void filesAreReadRecursivelyInSortedOrderSkippingIndexAndStages() throws Exception {
        write(dir, "z.yaml", with(MINIMAL, "id: bare-amp", "id: amp-z"));
        write(dir, "sub/b.yml", with(MINIMAL, "id: bare-amp", "id: amp-b"));
        write(dir, "a.YAML", with(MINIMAL, "id: bare-amp", "id: amp-a"));
        write(dir, ".ampsieve-index/cached.yaml", "not: a part");
        write(dir, "stages/bridge.yaml", "gain: 100");
        write(dir, "precision/stages/more.yaml", "gain: 10");
        write(dir, ".editor-backup.yaml", "junk: [");
        write(dir, "readme.txt", "not yaml: [");
        Catalog c = load();
        assertEquals(List.of(), errors(c));
        assertEquals(3, c.files());
        assertEquals(
                List.of("amp-a", "amp-b", "amp-z"),
                c.parts().stream().map(Part::id).toList());
    }

    // ------------------------------------------------------------------ one test per validation class

    @Test
    void malformedYamlIsReportedAtItsPlaceAndOtherFilesStillLoad() throws Exception {
        String bad = with(BASE, "gbw: 1 MHz", "gbw: [1 MHz");
        Path f = write(dir, "bad.yaml", bad);
        write(dir, "good.yaml", with(BASE, "id: test-amp-01", "id: good-amp"));
        Catalog c = load();
        assertEquals(List.of("good-amp"), c.parts().stream().map(Part::id).toList());
        Problem p = errors(c).get(0);
        assertEquals(1, errors(c).size(), c.problems().toString());
        assertEquals(f, p.file());
        assertTrue(ProblemText.message(p).startsWith("YAML syntax: "), ProblemText.message(p));
        // the unclosed '[' swallows the next line; the parser stops where the list cannot continue
        assertEquals(lineOf(bad, "slew:"), p.line());
    }

    @Test
    void anUnknownKeySuggestsTheNearestKnownOne() throws Exception {
        String text = with(BASE, "vos-drift:", "vos-drfit:");
        Catalog c = loadPart(text);
        Problem p = about(c.problems(), "vos-drfit");
        assertTrue(p.isError());
        assertAt(p, part(), lineOf(text, "vos-drfit:"), 1);
        assertEquals("unknown key", ProblemText.message(p));
        assertEquals("did you mean 'vos-drift'?", ProblemText.fix(p));
        assertTrue(c.parts().isEmpty());
    }

    @Test
    void anUnknownKeyInsideASectionSuggestsFromThatSection() throws Exception {
        String text = with(BASE, "  max: 2 mV", "  mx: 2 mV");
        Problem p = about(loadPart(text).problems(), "vos.mx");
        assertAt(p, part(), lineOf(text, "mx: 2 mV"), 3);
        assertEquals("did you mean 'max'?", ProblemText.fix(p));
    }

    @Test
    void aMisspeltPartsListIsSuggested() throws Exception {
        String text = "part:\n" + asItem(BASE);
        Problem p = about(loadPart(text).problems(), "part");
        assertAt(p, part(), 1, 1);
        assertEquals("did you mean 'parts'?", ProblemText.fix(p));
    }

    @ParameterizedTest
    @CsvSource(
            delimiter = '|',
            value = {
                "gbw: 1 MHz     | gbw: 2 mV          | gbw      | 2 mV          | '2 mV' is a voltage but a frequency belongs here",
                "max: 100 nA    | max: 5 mV          | ib.max   | 5 mV          | '5 mV' is a voltage but a current belongs here",
                "max: 10 uV/C   | max: 10 uV         | vos-drift.max | 10 uV    | '10 uV' is a voltage but a voltage drift belongs here",
                "en: 12 nV/rtHz | en: 12 pA/rtHz     | noise.en | 12 pA/rtHz    | '12 pA/rtHz' is a current noise density but a voltage noise density belongs here",
                "slew: 0.5 V/us | slew: 0.5 MHz      | slew     | 0.5 MHz       | '0.5 MHz' is a frequency but a slew rate belongs here",
                "min: 4.5 V     | min: 4.5           | supply.min | 4.5         | '4.5' has no unit",
                "gbw: 1 MHz     | gbw: 1 furlong     | gbw      | 1 furlong     | unit 'furlong' in '1 furlong' is not one this tool reads"
            })
    void aWrongUnitOrDimensionNamesWhatWasFoundAndWhatBelongs(
            String from, String to, String field, String value, String message) throws Exception {
        String text = with(BASE, from, to);
        Catalog c = loadPart(text);
        Problem p = about(c.problems(), field);
        assertTrue(p.isError());
        assertAt(p, part(), lineOf(text, to), columnOf(text, to) + to.indexOf(value));
        assertEquals(message, ProblemText.message(p));
        assertTrue(ProblemText.fix(p).startsWith("write "), ProblemText.fix(p));
        assertTrue(c.parts().isEmpty());
    }

    @ParameterizedTest
    @ValueSource(strings = {"id", "architecture", "input", "vos", "gbw", "supply", "temperature", "price"})
    void eachRequiredFieldIsReportedWhenMissing(String key) throws Exception {
        String text = without(BASE, key);
        Catalog c = loadPart(text);
        Problem p = about(c.problems(), key);
        assertTrue(p.isError());
        assertAt(p, part(), 1, 1); // the part itself: the key belongs in it
        assertEquals("required field is missing", ProblemText.message(p));
        assertTrue(ProblemText.fix(p).startsWith("add '" + key + ": "), ProblemText.fix(p));
        assertTrue(c.parts().isEmpty());
    }

    @ParameterizedTest
    @CsvSource(
            delimiter = '|',
            value = {"max: 36 V     | supply.max", "min: -40 C    | temperature.min", "unit: 1.20    | price.unit"})
    void aRequiredKeyInsideASectionIsReportedAtTheSection(String line, String field) throws Exception {
        String text = with(BASE, "  " + line + "\n", "");
        String section = field.substring(0, field.indexOf('.'));
        Problem p = about(loadPart(text).problems(), field);
        // a block mapping starts at its first key, on the line below "section:"
        assertAt(p, part(), lineOf(text, section + ":") + 1, 3);
        assertEquals("required field is missing", ProblemText.message(p));
    }

    @Test
    void vosNeedsTypOrMax() throws Exception {
        String text = with(with(BASE, "  typ: 0.5 mV\n", ""), "  max: 2 mV\n", "");
        Problem p = about(loadPart(text).problems(), "vos");
        assertAt(p, part(), lineOf(text, "max-over-temp: 3 mV"), 3);
        assertEquals("neither typ nor max is given", ProblemText.message(p));
        // typ alone is enough to load; the budget flags the missing guarantee
        assertEquals(1, loadPart(with(BASE, "  max: 2 mV\n", "")).parts().size());
    }

    /** {@code at}: the text of the value the message points at (the lower of the two). */
    @ParameterizedTest
    @CsvSource(
            delimiter = '|',
            value = {
                // spread: typ above max
                "typ: 0.5 mV  | typ: 2.5 mV   | vos.typ         | 2.5 mV   | typ (2.50 mV) is above max (2.00 mV)",
                "typ: 20 nA   | typ: 120 nA   | ib.typ          | 120 nA   | typ (120 nA) is above max (100 nA)",
                "typ: 20 nA   | typ: -120 nA  | ib.typ          | -120 nA  | typ (-120 nA) is above max (100 nA)",
                "typ: 2 nA    | typ: 12 nA    | ios.typ         | 12 nA    | typ (12.0 nA) is above max (10.0 nA)",
                "typ: 2 uV/C  | typ: 12 uV/C  | vos-drift.typ   | 12 uV/C  | typ (12.0 µV/°C) is above max (10.0 µV/°C)",
                // max above max over temperature
                "max-over-temp: 3 mV   | max-over-temp: 1.5 mV | vos.max | 2 mV   | max (2.00 mV) is above max-over-temp (1.50 mV)",
                "max-over-temp: 200 nA | max-over-temp: 50 nA  | ib.max  | 100 nA | max (100 nA) is above max-over-temp (50.0 nA)",
                "max-over-temp: 20 nA  | max-over-temp: 5 nA   | ios.max | 10 nA  | max (10.0 nA) is above max-over-temp (5.00 nA)",
                // guaranteed minimum above typical
                "min: 90 dB   | min: 112 dB   | cmrr.min        | 112 dB   | min (112 dB) is above typ (110 dB)",
                "min: 95 dB   | min: 116 dB   | psrr.min        | 116 dB   | min (116 dB) is above typ (115 dB)",
                "min: 100 dB  | min: 121 dB   | aol.min         | 121 dB   | min (121 dB) is above typ (120 dB)",
                // ranges
                "min: 4.5 V   | min: 40 V     | supply.min      | 40 V     | min (40.0 V) is above max (36.0 V)",
                "min: -40 C   | min: 90 C     | temperature.min | 90 C     | min (90 °C) is above max (85 °C)"
            })
    void valuesOutOfOrderAreReportedAtTheLowerOne(String from, String to, String field, String at, String message)
            throws Exception {
        String text = with(BASE, from, to);
        Catalog c = loadPart(text);
        Problem p = about(c.problems(), field);
        assertTrue(p.isError());
        String line = ": " + at; // e.g. ": 2 mV", unique in the fixture
        assertAt(p, part(), lineOf(text, line), columnOf(text, line) + 2);
        assertEquals(message, ProblemText.message(p));
        assertTrue(c.parts().isEmpty());
    }

    @Test
    void typIsCheckedAgainstMaxOverTemperatureWhenNoMaxIsGiven() throws Exception {
        String text = with(with(BASE, "  max: 2 mV\n", ""), "typ: 0.5 mV", "typ: 4 mV");
        Problem p = about(loadPart(text).problems(), "vos.typ");
        assertEquals("typ (4.00 mV) is above max-over-temp (3.00 mV)", ProblemText.message(p));
    }

    @Test
    void aMaxHundredsOfTimesTypIsAWarnedPrefixSlip() throws Exception {
        // typ 25 uV with max 75 mV: max typed in mV where the datasheet says uV (3000 x typ)
        String text = with(with(BASE, "typ: 0.5 mV", "typ: 25 uV"), "  max: 2 mV\n", "  max: 75 mV\n");
        text = with(text, "max-over-temp: 3 mV", "max-over-temp: 90 mV");
        Problem p = about(loadPart(text).problems(), "vos.max");
        assertEquals(Problem.Severity.WARNING, p.severity());
        assertEquals("max (75.0 mV) is 3000 times typ (25.0 µV)", ProblemText.message(p));
        // 20 x typ is an ordinary spread: no warning
        String ordinary = with(BASE, "typ: 0.5 mV", "typ: 0.1 mV");
        assertEquals(
                List.of(),
                loadPart(ordinary).problems().stream()
                        .filter(q -> q.field().endsWith("vos.max"))
                        .toList());
    }

    @ParameterizedTest
    @CsvSource(
            delimiter = '|',
            value = {
                "max: 2 mV      | max: -2 mV      | vos.max       | -2.00 mV is negative, which is impossible here",
                "typ: 2 uV/C    | typ: -2 uV/C    | vos-drift.typ | -2.00 µV/°C is negative, which is impossible here",
                "max: 100 nA    | max: -100 nA    | ib.max        | -100 nA is negative, which is impossible here",
                "typ: 2 nA      | typ: -2 nA      | ios.typ       | -2.00 nA is negative, which is impossible here",
                "typ: 110 dB    | typ: -110 dB    | cmrr.typ      | -110 dB is negative, which is impossible here",
                "gbw: 1 MHz     | gbw: 0 Hz       | gbw           | 0 Hz must be above zero",
                "slew: 0.5 V/us | slew: -0.5 V/us | slew          | -0.500 V/µs must be above zero",
                "en: 12 nV/rtHz | en: 0 nV/rtHz   | noise.en      | 0 V/√Hz must be above zero",
                "unit: 1.20     | unit: -1.20     | price.unit    | -1.2 is negative, which is impossible here",
                "min: 4.5 V     | min: -4.5 V     | supply.min    | -4.50 V must be above zero"
            })
    void negativeWhereImpossibleIsAnError(String from, String to, String field, String message) throws Exception {
        String text = with(BASE, from, to);
        Problem p = about(loadPart(text).problems(), field);
        assertTrue(p.isError());
        String value = to.substring(to.indexOf(':') + 2);
        assertAt(p, part(), lineOf(text, to), columnOf(text, to) + to.indexOf(value));
        assertEquals(message, ProblemText.message(p));
    }

    @Test
    void aNegativeTypicalBiasCurrentIsAllowed() throws Exception {
        // bias-cancelled and PNP-input parts: current flows out of the pin; the limits stay magnitudes
        Catalog c = loadPart(with(BASE, "typ: 20 nA", "typ: -20 nA"));
        assertEquals(List.of(), c.problems());
        assertEquals(-20e-9, c.parts().get(0).ib().typ(), 1e-21);
    }

    @ParameterizedTest
    @CsvSource(
            delimiter = '|',
            value = {
                "gbw: 1 MHz | gbw: .inf  | gbw        | .inf    | is not a finite number",
                "max: 2 mV  | max: .nan  | vos.max    | .nan    | is not a finite number",
                "unit: 1.20 | unit: .NaN | price.unit | .NaN    | is not a finite number",
                "max: 36 V  | max: 1e999 V | supply.max | 1e999 V | is out of range: beyond the largest number (about 1.8e308 in SI units)",
                "max: 36 V  | max: 1e400 V | supply.max | 1e400 V | is out of range: beyond the largest number (about 1.8e308 in SI units)",
                "max: 36 V  | max: 1e308 kV | supply.max | 1e308 kV | is out of range: beyond the largest number (about 1.8e308 in SI units)",
                "max: 2 mV  | max: 1e-400 V | vos.max  | 1e-400 V | is out of range: below the smallest number (about 1e-308 in SI units)"
            })
    void nanAndInfinityAreRefused(String from, String to, String field, String value, String message) throws Exception {
        String text = with(BASE, from, to);
        Problem p = about(loadPart(text).problems(), field);
        assertTrue(p.isError());
        assertAt(p, part(), lineOf(text, to), columnOf(text, to) + to.indexOf(value));
        assertEquals("'" + value + "' " + message, ProblemText.message(p));
        assertTrue(
                ProblemText.fix(p)
                        .startsWith(
                                value.equals("1e-400 V")
                                        ? "check the exponent and the prefix; write 0 if you mean zero"
                                        : value.startsWith("1e")
                                                ? "check the exponent and the prefix; write a voltage such as"
                                                : "write "),
                ProblemText.fix(p));
    }

    @ParameterizedTest
    @CsvSource(
            delimiter = '|',
            value = {"My_Amp 1 | my-amp-1", "-amp | amp", "amp--2 | amp-2", "AMP | amp"})
    void anIdMustBeLowercaseWordsJoinedByDashes(String id, String suggestion) throws Exception {
        String text = with(BASE, "id: test-amp-01", "id: \"" + id + "\"");
        Problem p = about(loadPart(text).problems(), "id");
        assertAt(p, part(), 1, 5);
        assertTrue(ProblemText.message(p).startsWith("'" + id + "' is not a valid id"), ProblemText.message(p));
        assertEquals("write for example '" + suggestion + "'", ProblemText.fix(p));
    }

    @Test
    void aDuplicateIdAcrossFilesNamesBothFiles() throws Exception {
        Path a = write(dir, "a.yaml", BASE);
        String second = "parts:\n" + asItem(with(MINIMAL, "id: bare-amp", "id: other-amp"))
                + asItem(with(MINIMAL, "id: bare-amp", "id: test-amp-01"));
        Path b = write(dir, "b.yaml", second);
        Catalog c = load();
        Problem p = about(c.problems(), "parts[1].id");
        assertAt(p, b, lineOf(second, "id: test-amp-01"), columnOf(second, "test-amp-01"));
        assertEquals("id 'test-amp-01' is already used at " + a + ":1", ProblemText.message(p));
        assertEquals("give each part its own id", ProblemText.fix(p));
        assertEquals(
                List.of("test-amp-01", "other-amp"),
                c.parts().stream().map(Part::id).toList());
    }

    @ParameterizedTest
    @CsvSource(
            delimiter = '|',
            value = {
                "max-over-temp: 3 mV | max-over-temp: 150 mV | vos.max-over-temp | 150 mV is above 100 mV, implausible for an op amp",
                "gbw: 1 MHz          | gbw: 20 GHz           | gbw               | 20.0 GHz is above 10.0 GHz, implausible for an op amp",
                "gbw: 1 MHz          | gbw: 50 Hz            | gbw               | 50.0 Hz is below 100 Hz, implausible for an op amp",
                "max-over-temp: 200 nA | max-over-temp: 1 mA | ib.max-over-temp  | 1.00 mA is above 100 µA, implausible for an op amp",
                "typ: 110 dB         | typ: 190 dB           | cmrr.typ          | 190 dB is above 180 dB, implausible for an op amp",
                "en: 12 nV/rtHz      | en: 2 uV/rtHz         | noise.en          | 2.00 µV/√Hz is above 1.00 µV/√Hz, implausible for an op amp",
                "unit: 1.20          | unit: 20000           | price.unit        | 20000 is above 10000, implausible for an op amp",
                "max: 36 V           | max: 1500 V           | supply.max        | 1.50 kV is above 1.00 kV, implausible for an op amp",
                "min: -40 C          | min: -150 C           | temperature.min   | -150 °C is below -100 °C, implausible for a rated range"
            })
    void implausibleMagnitudesAreWarningsAndThePartStillLoads(String from, String to, String field, String message)
            throws Exception {
        String text = with(BASE, from, to);
        Catalog c = loadPart(text);
        Problem p = about(c.problems(), field);
        assertEquals(Problem.Severity.WARNING, p.severity());
        String value = to.substring(to.indexOf(':') + 2);
        assertAt(p, part(), lineOf(text, to), columnOf(text, to) + to.indexOf(value));
        assertEquals(message, ProblemText.message(p));
        assertEquals(1, c.parts().size());
        assertEquals(List.of(), errors(c));
    }

    // ------------------------------------------------------------------ warnings on absent data

    @Test
    void aBipolarPartWithoutDriftIsWarnedThatDriftWillBeEstimated() throws Exception {
        Catalog c = loadPart(without(BASE, "vos-drift"));
        Problem p = about(c.problems(), "vos-drift");
        assertEquals(Problem.Severity.WARNING, p.severity());
        assertAt(p, part(), 1, 1);
        assertTrue(
                ProblemText.message(p).startsWith("not given: drift will be estimated from vos (VOS/T rule"),
                ProblemText.message(p));
        assertEquals(1, c.parts().size());
    }

    @Test
    void aFetInputWithoutDriftIsWarnedOnlyWhenNothingBoundsIt() throws Exception {
        String cmos = with(without(BASE, "vos-drift"), "input: bipolar", "input: cmos");
        assertEquals(List.of(), loadPart(cmos).problems()); // vos.max-over-temp bounds it
        Problem p = about(loadPart(with(cmos, "  max-over-temp: 3 mV\n", "")).problems(), "vos-drift");
        assertEquals(Problem.Severity.WARNING, p.severity());
        assertTrue(
                ProblemText.message(p)
                        .startsWith(
                                "not given, nor vos.max-over-temp: drift over temperature will be an assumed default"),
                ProblemText.message(p));
    }

    @Test
    void absenceWarningsWaitUntilThePartHasNoErrors() throws Exception {
        Catalog c = loadPart(with(without(without(BASE, "noise"), "vos-drift"), "gbw: 1 MHz", "gbw: 1 mV"));
        assertEquals(List.of("gbw"), c.problems().stream().map(Problem::field).toList());
    }

    @Test
    void aPartWithoutNoiseDataIsWarnedThatTheNoiseWillBeEstimated() throws Exception {
        Catalog c = loadPart(without(BASE, "noise"));
        Problem p = about(c.problems(), "noise");
        assertEquals(Problem.Severity.WARNING, p.severity());
        assertTrue(ProblemText.message(p).startsWith("not given: en, en-corner, in"), ProblemText.message(p));
        assertTrue(
                ProblemText.message(p).endsWith("(common practice, conservative) and marked estimated"),
                ProblemText.message(p));
        assertEquals(1, c.parts().size());
    }

    @Test
    void everyAbsentFigureTheBudgetEstimatesIsWarnedAtCheckTime() throws Exception {
        Catalog c = loadPart(without(without(without(BASE, "ib"), "ios"), "long-term-drift"));
        assertTrue(
                ProblemText.message(about(c.problems(), "ib")).startsWith("not given: bias current will be estimated"));
        assertTrue(ProblemText.message(about(c.problems(), "ios"))
                .startsWith("not given: offset current will be taken equal to ib"));
        assertTrue(ProblemText.message(about(c.problems(), "long-term-drift"))
                .startsWith("not given: aging over a stage's service life"));
    }

    @Test
    void anAbsentRejectionIsWarnedAsAssumed() throws Exception {
        Catalog c = loadPart(without(BASE, "cmrr"));
        assertEquals(
                "not given: a pessimistic 60 dB will be assumed and marked estimated",
                ProblemText.message(about(c.problems(), "cmrr")));
    }

    // ------------------------------------------------------------------ other shapes a user may write

    @Test
    void aSectionWrittenAsOneValueSaysHowToWriteIt() throws Exception {
        String text = without(BASE, "vos") + "vos: 2 mV\n";
        Problem p = about(loadPart(text).problems(), "vos");
        assertAt(p, part(), lineOf(text, "vos: 2 mV"), 6);
        assertEquals(
                "expected its keys (typ, max, max-over-temp) below it, found a single value", ProblemText.message(p));
        assertEquals("write 'vos: {max: 2 mV}'", ProblemText.fix(p));
    }

    @ParameterizedTest
    @CsvSource(
            delimiter = ';',
            value = {
                "architecture: standard; architecture: chopr; architecture; 'chopr' is not one of standard | chopper | auto-zero; chopper",
                "input: bipolar; input: bipolr; input; 'bipolr' is not one of bipolar | jfet | cmos; bipolar"
            })
    void aChoiceOutsideItsWordsSuggestsTheNearest(String from, String to, String field, String message, String near)
            throws Exception {
        String text = with(BASE, from, to);
        Problem p = about(loadPart(text).problems(), field);
        assertEquals(message, ProblemText.message(p));
        assertEquals("did you mean '" + near + "'?", ProblemText.fix(p));
        String word = to.substring(to.indexOf(':') + 2);
        assertAt(p, part(), lineOf(text, to), columnOf(text, to) + to.indexOf(word));
    }

    @Test
    void wholeNumbersAndFlagsAreChecked() throws Exception {
        String text = BASE + "channels: 0\nnull-pins: maybe\n";
        Catalog c = loadPart(text);
        assertEquals("0 is outside 1..64", ProblemText.message(about(c.problems(), "channels")));
        assertEquals("'maybe' is not true or false", ProblemText.message(about(c.problems(), "null-pins")));
        assertAt(about(c.problems(), "null-pins"), part(), lineOf(text, "null-pins"), 12);
    }

    @Test
    void fileShapesOtherThanAPartOrAListAreExplained() throws Exception {
        Path empty = write(dir, "empty.yaml", "# nothing yet\n");
        Path bare = write(dir, "bare.yaml", asItem(BASE));
        Path scalarList = write(dir, "scalar.yaml", "parts: 3\n");
        Path beside =
                write(dir, "beside.yaml", "vendor-list: q3\nparts:\n" + asItem(BASE.replace("test-amp-01", "x-1")));
        Path item = write(dir, "item.yaml", "parts:\n  - just text\n");
        Catalog c = load();
        assertEquals(List.of("x-1"), c.parts().stream().map(Part::id).toList());

        Problem p = c.problems().stream()
                .filter(x -> x.file().equals(empty))
                .findFirst()
                .orElseThrow();
        assertEquals(Problem.Severity.WARNING, p.severity());
        assertEquals("empty file, no parts", ProblemText.message(p));

        p = c.problems().stream().filter(x -> x.file().equals(bare)).findFirst().orElseThrow();
        assertEquals("the file is a bare list", ProblemText.message(p));
        assertAt(p, bare, 1, 3);

        p = c.problems().stream()
                .filter(x -> x.file().equals(scalarList))
                .findFirst()
                .orElseThrow();
        assertEquals("parts", p.field());
        assertEquals("expected a list of parts, found a single value", ProblemText.message(p));
        assertAt(p, scalarList, 1, 8);

        p = c.problems().stream()
                .filter(x -> x.file().equals(beside))
                .findFirst()
                .orElseThrow();
        assertEquals("vendor-list", p.field());
        assertAt(p, beside, 1, 1);

        p = c.problems().stream().filter(x -> x.file().equals(item)).findFirst().orElseThrow();
        assertEquals("parts[0]", p.field());
        assertTrue(ProblemText.message(p).startsWith("expected a part (id: ..."), ProblemText.message(p));
        assertAt(p, item, 2, 5);
    }

    @Test
    void mixedCurrenciesAreWarnedOnce() throws Exception {
        write(dir, "a.yaml", BASE);
        Path b = write(
                dir, "b.yaml", with(with(BASE, "id: test-amp-01", "id: euro-amp"), "currency: USD", "currency: EUR"));
        Catalog c = load();
        assertEquals(2, c.parts().size());
        Problem p = c.problems().get(0);
        assertEquals(1, c.problems().size());
        assertEquals(Problem.Severity.WARNING, p.severity());
        assertAt(p, b, 1, 1);
        assertEquals(
                "part 'euro-amp' is priced in EUR; the catalog uses USD, EUR, and prices are compared as plain numbers",
                ProblemText.message(p));
    }

    @Test
    void problemsInAFileComeTopToBottom() throws Exception {
        // found in the order: while reading (gbw), order checks (vos.typ), magnitude checks (cmrr.typ)
        String text = with(
                with(with(BASE, "gbw: 1 MHz", "gbw: 1 mV"), "typ: 0.5 mV", "typ: 5 mV"), "typ: 110 dB", "typ: 250 dB");
        Catalog c = loadPart(text);
        assertEquals(
                List.of("vos.typ", "cmrr.typ", "gbw"),
                c.problems().stream().map(Problem::field).toList());
        List<Integer> lines = c.problems().stream().map(Problem::line).toList();
        assertEquals(List.of(lineOf(text, "typ: 5 mV"), lineOf(text, "typ: 250 dB"), lineOf(text, "gbw: 1 mV")), lines);
    }

    // ------------------------------------------------------------------ bad files, strictness, the folder

    @Test
    void aBadPartDoesNotStopTheOthersButStrictFailsWithEveryProblem() throws Exception {
        String list = "parts:\n" + asItem(with(BASE, "gbw: 1 MHz", "gbw: 1 mV"))
                + asItem(with(BASE, "id: test-amp-01", "id: good-amp-1"));
        write(dir, "list.yaml", list);
        write(dir, "more/other.yaml", with(MINIMAL, "id: bare-amp", "id: good-amp-2"));
        write(dir, "zz-bomb.yaml", "a: &a [x, x]\n" + "b: [" + "*a, ".repeat(YamlFiles.MAX_ALIASES) + "*a]\n");
        Catalog c = load();
        assertEquals(
                List.of("good-amp-1", "good-amp-2"),
                c.parts().stream().map(Part::id).toList());
        assertEquals(2, errors(c).size(), c.problems().toString());
        assertEquals("parts[0].gbw", errors(c).get(0).field());
        assertTrue(
                ProblemText.message(errors(c).get(1)).startsWith("refused: more than"),
                ProblemText.message(errors(c).get(1)));
        assertTrue(c.hasErrors());

        InputException e = assertThrows(InputException.class, () -> CatalogLoader.load(dir, true));
        assertEquals(c.problems(), e.problems());
    }

    @Test
    void strictLoadingAcceptsWarnings() throws Exception {
        write(dir, "part.yaml", without(BASE, "noise"));
        Catalog c = CatalogLoader.load(dir, true);
        assertEquals(1, c.parts().size());
        assertEquals(1, c.problems().size());
    }

    @Test
    void anOverSizeFileIsAProblemOfThatFileOnly() throws Exception {
        Path big = dir.resolve("big.yaml");
        Files.write(big, new byte[(int) YamlFiles.MAX_BYTES + 10]);
        write(dir, "part.yaml", BASE);
        Catalog c = load();
        assertEquals(1, c.parts().size());
        Problem p = about(c.problems(), "");
        assertEquals(big, p.file());
        assertTrue(ProblemText.message(p).contains("over the limit"), ProblemText.message(p));
    }

    @Test
    void aDanglingLinkIsReportedNotSkipped() throws Exception {
        Path link = Files.createSymbolicLink(dir.resolve("moved.yaml"), dir.resolve("nowhere.yaml"));
        write(dir, "part.yaml", BASE);
        Catalog c = load();
        Problem p = about(c.problems(), "");
        assertEquals(link, p.file());
        assertEquals("the link's target does not exist", ProblemText.message(p));
        assertEquals(1, c.parts().size());
    }

    @Test
    void aMissingCatalogFolderSaysHowToGiveOne() {
        Path missing = dir.resolve("no-such-catalog");
        InputException e = assertThrows(InputException.class, () -> CatalogLoader.load(missing, false));
        Problem p = e.problems().get(0);
        assertEquals(missing, p.file());
        assertEquals("catalog folder not found", ProblemText.message(p));
        assertTrue(
                ProblemText.fix(p).contains("--catalog DIR")
                        && ProblemText.fix(p).contains("AMPSIEVE_CATALOG"),
                ProblemText.fix(p));
    }

    @Test
    void aFileGivenAsTheCatalogIsRefused() throws IOException {
        Path f = write(dir, "part.yaml", BASE);
        InputException e = assertThrows(InputException.class, () -> CatalogLoader.load(f, false));
        assertEquals(
                "this is a file, not a catalog folder",
                ProblemText.message(e.problems().get(0)));
        assertTrue(ProblemText.fix(e.problems().get(0)).contains("--catalog DIR"));
    }

    @Test
    void anEmptyFolderIsWarned() throws Exception {
        Catalog c = load();
        assertEquals(0, c.files());
        Problem p = c.problems().get(0);
        assertEquals(Problem.Severity.WARNING, p.severity());
        assertEquals("no catalog files (*.yaml, *.yml) below this folder", ProblemText.message(p));
    }
}
