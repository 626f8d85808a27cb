package dev.ampsieve.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.report.ProblemText;
import dev.ampsieve.stage.StageKeys;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The example an error suggests fits the field; a stage file in the catalog folder is one line, not a dozen errors. */
class CatalogExamplesTest {

    @TempDir
    Path dir;

    private static final String PART = """
            id: ex-amp
            architecture: standard
            input: cmos
            vos: {max: 1 mV}
            gbw: 2 MHz
            supply: {min: 2.7 V, max: 5.5 V}
            temperature: {min: -40 C, max: 125 C}
            price: {unit: 0.60, quantity: 1000}
            noise: {en: 20 nV/rtHz}
            """;

    private List<Problem> errors(String text) throws IOException, InputException {
        Files.writeString(dir.resolve("p.yaml"), text);
        return CatalogLoader.load(dir, false).problems().stream()
                .filter(Problem::isError)
                .toList();
    }

    @Test
    void aSupplyWithoutUnitGetsAVoltageExampleInVolts() throws Exception {
        List<Problem> e = errors(PART.replace("min: 2.7 V", "min: 2.7"));
        assertEquals(1, e.size(), e.toString());
        assertEquals("supply.min", e.get(0).field());
        assertEquals("write a voltage with its unit, such as '2.7 V'", ProblemText.fix(e.get(0)));
    }

    @Test
    void anOffsetKeepsTheMicrovoltExample() throws Exception {
        List<Problem> e = errors(PART.replace("vos: {max: 1 mV}", "vos: {max: 1 mA}"));
        assertEquals("write a voltage such as '2.5 uV'", ProblemText.fix(e.get(0)));
    }

    @Test
    void everyQuantityHasAnExampleThatReadsBackInItsOwnDimension() throws Exception {
        for (String path : CatalogKeys.QUANTITIES.keySet()) {
            String ex = CatalogKeys.example(path);
            // parses without error in the field's dimension, and is not zero
            double v = dev.ampsieve.units.Units.parse(ex, CatalogKeys.dimension(path));
            assertTrue(v != 0, path + ": " + ex);
        }
        assertEquals("2.7 V", CatalogKeys.example("parts[3].supply.min"));
    }

    @Test
    void stageKeysTheLoaderLooksForAreStageKeysAndNoPartKeys() {
        for (String k : CatalogLoader.STAGE_KEYS) {
            assertTrue(StageKeys.topLevel().contains(k), k);
            assertTrue(!CatalogKeys.PART_KEYS.contains(k), k);
        }
    }

    @Test
    void aStageFileBesideThePartsIsSkippedWithOneWarning() throws Exception {
        Files.writeString(dir.resolve("amp.yaml"), PART);
        Path stage = Files.writeString(dir.resolve("stage.yaml"), "topology: inverting\ngain: 10\nlimit: 1 mV\n");
        Catalog c = CatalogLoader.load(dir, false);
        assertEquals(1, c.parts().size());
        List<Problem> about =
                c.problems().stream().filter(p -> p.file().equals(stage)).toList();
        assertEquals(1, about.size(), about.toString());
        assertEquals(
                stage + ":1:1: warning: looks like a stage file (it has topology, gain, limit and no id); skipped;"
                        + " move it to a 'stages' folder (which the catalog does not read) and pass it with --stage",
                about.get(0).toString());
        // a part that lacks its id but has part keys is still a part with a missing id, not a stage
        Files.writeString(stage, PART.replace("id: ex-amp\n", ""));
        assertTrue(CatalogLoader.load(dir, false).problems().stream()
                .anyMatch(
                        p -> p.file().equals(stage) && p.isError() && p.field().equals("id")));
    }

    @Test
    void anOffsetAbove1VAndACmrrAbove200DbAreErrors() throws Exception {
        // CatalogKeys.BOUNDS (GUIDE.md section 9): no op amp has either, so the part is refused
        List<Problem> vos = errors(PART.replace("vos: {max: 1 mV}", "vos: {max: 1.5 V}"));
        assertEquals(1, vos.size(), vos.toString());
        assertEquals("vos.max", vos.get(0).field());
        List<Problem> cmrr = errors(PART + "cmrr: {min: 210 dB}\n");
        assertEquals(1, cmrr.size(), cmrr.toString());
        assertEquals("cmrr.min", cmrr.get(0).field());
        // just inside: 0.9 V and 190 dB load, with warnings only
        assertEquals(
                List.of(), errors(PART.replace("vos: {max: 1 mV}", "vos: {max: 0.9 V}") + "cmrr: {min: 190 dB}\n"));
    }
}
