package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.testing.DemoCatalog;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A shared catalog with one absurd figure: `check` names it, and `rank` and `budget` go on with
 * the rest of the catalog instead of stopping with an internal error.
 */
class AbsurdValuesCliTest {

    @TempDir
    Path tmp;

    /** An invented part, valid but for its noise density of 1e200 nV/rtHz (line 12, value at column 7). */
    private static final String LOUD = """
            id: loud-amp
            architecture: standard
            input: bipolar
            vos: {typ: "10 uV", max: "50 uV"}
            vos-drift: {typ: "0.2 uV/C", max: "1 uV/C"}
            gbw: "5 MHz"
            supply: {min: "4 V", max: "36 V"}
            temperature: {min: "-40 C", max: "125 C"}
            price: {unit: 2.00, quantity: 1000, currency: USD}
            input-headroom: {low: "1 V", high: "1 V"}
            noise:
              en: "1e200 nV/rtHz"
            """;

    private Path catalog() throws Exception {
        Path c = DemoCatalog.copyTo(tmp);
        Files.writeString(c.resolve("loud.yaml"), LOUD);
        return c;
    }

    @Test
    void checkNamesThePlaceFieldAndFix() throws Exception {
        Path c = catalog();
        CliRun r = CliRun.of("--catalog", c.toString(), "check");
        assertEquals(ExitCode.FINDINGS.code(), r.code(), r.toString());
        // 1e200 nV = 1e191 V; the limit is 1 mV/rtHz
        assertTrue(
                r.out()
                        .contains(c.resolve("loud.yaml") + ":12:7: noise.en: 1.00e+191 V/√Hz is above 1.00 mV/√Hz,"
                                + " impossible for an op amp (the quietest inputs reach a few tenths of a nV/√Hz; a mV/√Hz is no"
                                + " amplifier's noise); check the unit prefix (p, n, u, m, k, M) and the datasheet column; the largest"
                                + " size accepted here is 1.00 mV/√Hz"),
                r.toString());
        // the demo catalog's own 53 warnings (README), and this one error
        assertTrue(r.out().contains("19 file(s), 48 part(s), 1 error(s), 53 warning(s)"), r.toString());
    }

    @Test
    void rankGoesOnWithoutThePart() throws Exception {
        Path c = catalog();
        CliRun r = CliRun.of(
                "--catalog",
                c.toString(),
                "rank",
                "--stage",
                c.resolve("stages/bridge-amp.yaml").toString());
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        assertFalse(r.err().contains("internal error"), r.toString());
        assertTrue(r.err().contains("1 catalog error(s); parts of files with errors are left out"), r.toString());
        assertTrue(r.out().contains("Candidates (28 budgeted"), r.toString());
        assertFalse(r.out().contains("loud-amp"), r.toString());
    }
}
