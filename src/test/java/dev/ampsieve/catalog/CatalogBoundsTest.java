package dev.ampsieve.catalog;

import static dev.ampsieve.catalog.CatalogFixtures.FULL;
import static dev.ampsieve.catalog.CatalogFixtures.assertAt;
import static dev.ampsieve.catalog.CatalogFixtures.write;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.ampsieve.report.ProblemText;
import dev.ampsieve.testing.DemoCatalog;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Values no op amp has are refused at load time, each with its place, field and fix. */
class CatalogBoundsTest {

    @TempDir
    Path dir;

    /**
     * {@link CatalogFixtures#FULL} with the value of {@code path} ({@code vos.max}, {@code gbw})
     * replaced; returns the text and where the new value starts.
     */
    private static Object[] replaced(String path, String value) {
        String[] lines = FULL.split("\n", -1);
        int dot = path.indexOf('.');
        String section = dot < 0 ? null : path.substring(0, dot);
        String key = dot < 0 ? path : path.substring(dot + 1);
        boolean inSection = section == null;
        for (int i = 0; i < lines.length; i++) {
            if (section != null && lines[i].equals(section + ":")) {
                inSection = true;
                continue;
            }
            String prefix = section == null ? key + ": " : "  " + key + ": ";
            if (inSection && lines[i].startsWith(prefix)) {
                lines[i] = prefix + value;
                return new Object[] {String.join("\n", lines), i + 1, prefix.length() + 1};
            }
            if (section != null && inSection && !lines[i].startsWith(" ")) {
                break;
            }
        }
        fail("no " + path + " in the fixture");
        return null;
    }

    private Catalog load(String text) throws InputException {
        write(dir, "part.yaml", text);
        return CatalogLoader.load(dir, false);
    }

    /** The one problem about {@code field} that says "impossible". */
    private static Problem impossible(List<Problem> problems, String field) {
        List<Problem> hits = problems.stream()
                .filter(p -> p.field().equals(field) && ProblemText.message(p).contains("impossible for"))
                .toList();
        assertEquals(
                1,
                hits.size(),
                String.join("\n", problems.stream().map(ProblemText::line).toList()));
        return hits.get(0);
    }

    private static final Pattern LIMIT = Pattern.compile(" is (above|below) (.+)$");

    // Each message worked by hand from the value written and the limit documented in
    // catalog-template/GUIDE.md, printed with three significant digits and an SI prefix.
    @ParameterizedTest(name = "{0}: {1}")
    @CsvSource(
            delimiter = '|',
            value = {
                "price.unit               | 20000000     | 20000000 is above 10000000",
                "supply.min               | 2.5 kV       | 2.50 kV is above 2.00 kV",
                "supply.max               | 3 kV         | 3.00 kV is above 2.00 kV",
                "supply.min               | 50 mV        | 50.0 mV is below 100 mV",
                "temperature.min          | 1100 C       | 1100 °C is above 1000 °C",
                "temperature.max          | 1200 C       | 1200 °C is above 1000 °C",
                "vos.typ                  | 1.5 V        | 1.50 V is above 1.00 V",
                "vos.max                  | 2 V          | 2.00 V is above 1.00 V",
                "vos.max-over-temp        | 5 V          | 5.00 V is above 1.00 V",
                "vos-drift.typ            | 2 mV/C       | 2.00 mV/°C is above 1.00 mV/°C",
                "vos-drift.max            | 5 mV/C       | 5.00 mV/°C is above 1.00 mV/°C",
                "ib.typ                   | -0.5 A       | -500 mA is below -100 mA",
                "ib.max                   | 1 A          | 1.00 A is above 100 mA",
                "ib.max-over-temp         | 200 mA       | 200 mA is above 100 mA",
                "ios.typ                  | 150 mA       | 150 mA is above 100 mA",
                "ios.max                  | 0.3 A        | 300 mA is above 100 mA",
                "ios.max-over-temp        | 1 A          | 1.00 A is above 100 mA",
                "cmrr.min                 | 210 dB       | 210 dB is above 200 dB",
                "cmrr.typ                 | 250 dB       | 250 dB is above 200 dB",
                "psrr.min                 | 201 dB       | 201 dB is above 200 dB",
                "psrr.typ                 | 300 dB       | 300 dB is above 200 dB",
                "aol.min                  | 220 dB       | 220 dB is above 200 dB",
                "aol.typ                  | 1000 dB      | 1000 dB is above 200 dB",
                "gbw                      | 200 GHz      | 200 GHz is above 100 GHz",
                "gbw                      | 0.5 Hz       | 500 mHz is below 1.00 Hz",
                "slew                     | 2e6 V/us     | 2000000 V/µs is above 1000000 V/µs",
                "noise.en                 | 2 mV/rtHz    | 2.00 mV/√Hz is above 1.00 mV/√Hz",
                "noise.en                 | 1e200 nV/rtHz | 1.00e+191 V/√Hz is above 1.00 mV/√Hz",
                "noise.en                 | 1 pV/rtHz    | 1.00 pV/√Hz is below 10.0 pV/√Hz",
                "noise.en-corner          | 2 GHz        | 2.00 GHz is above 1.00 GHz",
                "noise.in                 | 2 uA/rtHz    | 2.00 µA/√Hz is above 1.00 µA/√Hz",
                "noise.in-corner          | 5 GHz        | 5.00 GHz is above 1.00 GHz",
                "long-term-drift.value    | 3 V          | 3.00 V is above 1.00 V",
                "long-term-drift.per      | 200 y        | 200 y is above 100 y",
                "long-term-drift.per      | 10 s         | 10.0 s is below 1 h",
                "input-headroom.low       | 2.5 kV       | 2.50 kV is above 2.00 kV",
                "input-headroom.high      | -3 kV        | -3.00 kV is below -2.00 kV",
                "output-headroom.low      | 5 kV         | 5.00 kV is above 2.00 kV",
                "output-headroom.high     | 2.1 kV       | 2.10 kV is above 2.00 kV",
                "chopping-frequency       | 1 THz        | 1.00 THz is above 100 GHz",
                "quiescent-current        | 200 A        | 200 A is above 100 A",
                "input-capacitance        | 1 uF         | 1.00 µF is above 100 nF",
                "test-conditions.supply   | 3 kV         | 3.00 kV is above 2.00 kV",
                "test-conditions.common-mode | 2.5 kV    | 2.50 kV is above 2.00 kV",
                "input-crossover.from-positive-rail | 3 kV | 3.00 kV is above 2.00 kV",
                "input-crossover.offset-step | 2 V       | 2.00 V is above 1.00 V",
                "theta-ja                 | 6000 C/W     | 6000 °C/W is above 5000 °C/W",
                "theta-ja                 | 0.2 K/W      | 0.2 °C/W is below 0.5 °C/W",
                "chopping-ripple          | 1.5 V        | 1.50 V is above 1.00 V",
                "vos.max                  | 1e308 V      | 1.00e+308 V is above 1.00 V"
            })
    void aValueNoOpAmpHasIsAnErrorWithItsPlaceAndFix(String path, String value, String message) throws Exception {
        Object[] r = replaced(path, value);
        String text = (String) r[0];
        Catalog c = load(text);
        Problem p = impossible(c.problems(), path);
        assertTrue(p.isError(), p.toString());
        assertAt(p, dir.resolve("part.yaml"), (int) r[1], (int) r[2]);
        assertTrue(ProblemText.message(p).startsWith(message + ", impossible for "), ProblemText.message(p));
        Matcher m = LIMIT.matcher(message);
        assertTrue(m.find());
        boolean above = m.group(1).equals("above") != message.startsWith("-");
        String limit = m.group(2).startsWith("-") ? m.group(2).substring(1) : m.group(2);
        assertTrue(
                ProblemText.fix(p)
                        .startsWith("check the unit prefix (p, n, u, m, k, M) and the datasheet column; the "),
                ProblemText.fix(p));
        assertTrue(
                ProblemText.fix(p)
                        .endsWith((above ? "largest" : "smallest")
                                + (path.startsWith("temperature") ? " value" : " size") + " accepted here is " + limit),
                ProblemText.fix(p));
        assertEquals(List.of(), c.parts(), "the part is refused");
    }

    @Test
    void everyCatalogQuantityHasAnImpossibilityBound() {
        for (String path : CatalogKeys.QUANTITIES.keySet()) {
            CatalogKeys.Bounds b = CatalogKeys.BOUNDS.get(path);
            assertTrue(b != null && Double.isFinite(b.errorAbove()), "no error bound for " + path);
            assertTrue(b.warnAbove() < b.errorAbove(), path + ": the warning comes before the error");
        }
    }

    @Test
    void justInsideAnErrorBoundIsOnlyAWarning() throws Exception {
        // 1 V is the largest accepted offset; it is far above the 100 mV plausibility bound
        Catalog c = load((String) replaced("vos.max-over-temp", "1 V")[0]);
        assertEquals(1, c.parts().size());
        Problem p = c.problems().stream()
                .filter(x -> x.field().equals("vos.max-over-temp"))
                .findFirst()
                .orElseThrow();
        assertEquals("1.00 V is above 100 mV, implausible for an op amp", ProblemText.message(p));
        assertEquals(Problem.Severity.WARNING, p.severity());
    }

    @Test
    void theGuideListsEveryBound() throws IOException {
        // catalog-template/GUIDE.md keeps the limits in one table: each key must be in it with its error bound
        String guide = Files.readString(Path.of("catalog-template/GUIDE.md"));
        for (String path : CatalogKeys.QUANTITIES.keySet()) {
            assertTrue(
                    guide.lines().anyMatch(l -> l.startsWith("| `") && l.contains("`" + path + "`")),
                    "GUIDE.md has no row for " + path);
        }
    }

    @Test
    void theDemoCatalogStillLoadsWithoutErrors() throws Exception {
        // README: "On the demo catalog `check` reports 0 errors and 53 warnings" (4 about values, 49 absent figures the
        // budget estimates)
        Catalog c = CatalogLoader.load(DemoCatalog.copyTo(dir), false);
        assertEquals(0, c.problems().stream().filter(Problem::isError).count());
        assertEquals(53, c.problems().size());
        assertEquals(48, c.parts().size());
    }
}
