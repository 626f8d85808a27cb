package dev.ampsieve.catalog;

import static dev.ampsieve.catalog.CatalogFixtures.FULL;
import static dev.ampsieve.catalog.CatalogFixtures.about;
import static dev.ampsieve.catalog.CatalogFixtures.assertAt;
import static dev.ampsieve.catalog.CatalogFixtures.lineOf;
import static dev.ampsieve.catalog.CatalogFixtures.with;
import static dev.ampsieve.catalog.CatalogFixtures.write;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.report.ProblemText;
import dev.ampsieve.yaml.Problem;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The operating-point catalog keys: read in SI units, and each bad value named with its place, field and fix. */
class OperatingPointKeysTest {

    @TempDir
    Path dir;

    private Catalog load(String text) throws Exception {
        write(dir, "part.yaml", text);
        return CatalogLoader.load(dir, false);
    }

    private Path file() {
        return dir.resolve("part.yaml");
    }

    @Test
    void theFourKeysAreReadInSiUnits() throws Exception {
        // CatalogFixtures.FULL: test-conditions 30 V / 15 V, crossover 1.2 V below V+ with a 40 uV step, 160 C/W, 3 uV
        // ripple
        Part p = load(FULL).parts().get(0);
        assertEquals(new TestConditions(30.0, 15.0), p.testConditions());
        assertEquals(1.2, p.inputCrossover().fromPositiveRail(), 0.0);
        assertEquals(40e-6, p.inputCrossover().offsetStep(), 1e-18);
        assertEquals(160.0, p.thetaJa(), 0.0);
        assertEquals(3e-6, p.choppingRipple(), 1e-18);
    }

    @Test
    void thetaJaInKelvinPerWattIsTheSameNumber() throws Exception {
        // a kelvin and a degree Celsius are the same size: 150 K/W = 150 °C/W (SI Brochure, 9th ed. [from memory])
        Part p = load(with(FULL, "theta-ja: 160 C/W", "theta-ja: 150 K/W"))
                .parts()
                .get(0);
        assertEquals(150.0, p.thetaJa(), 0.0);
    }

    @Test
    void testConditionsMayGiveOnlyTheSupply() throws Exception {
        Part p = load(with(FULL, "  common-mode: 15 V\n", "")).parts().get(0);
        assertEquals(30.0, p.testConditions().supply(), 0.0);
        assertNull(p.testConditions().commonMode());
    }

    @Test
    void aThermalResistanceInVoltsIsRefusedWithAnExample() throws Exception {
        String text = with(FULL, "theta-ja: 160 C/W", "theta-ja: 160 V");
        Problem p = about(load(text).problems(), "theta-ja");
        assertTrue(p.isError());
        assertAt(p, file(), lineOf(text, "theta-ja:"), 11);
        assertEquals("'160 V' is a voltage but a thermal resistance belongs here", ProblemText.message(p));
        assertEquals("write a thermal resistance such as '150 C/W'", ProblemText.fix(p));
    }

    @Test
    void aCommonModeAboveTheTestSupplyIsRefused() throws Exception {
        String text = with(FULL, "  common-mode: 15 V", "  common-mode: 45 V");
        Catalog c = load(text);
        Problem p = about(c.problems(), "test-conditions.common-mode");
        assertTrue(p.isError());
        assertAt(p, file(), lineOf(text, "common-mode: 45 V"), 16);
        assertEquals("common-mode (45.0 V) is above supply (30.0 V)", ProblemText.message(p));
        assertTrue(
                ProblemText.fix(p).startsWith("the common mode is measured above the negative rail"),
                ProblemText.fix(p));
        assertEquals(List.of(), c.parts());
    }

    @Test
    void aCrossoverWithoutItsStepNamesTheMissingKey() throws Exception {
        String text = with(FULL, "  offset-step: 40 uV\n", "");
        Problem p = about(load(text).problems(), "input-crossover.offset-step");
        assertTrue(p.isError(), p.toString());
        // at the section's first key, below 'input-crossover:'
        assertAt(p, file(), lineOf(text, "input-crossover:") + 1, 3);
        assertEquals("required field is missing", ProblemText.message(p));
        assertEquals("add 'offset-step: 50 uV'", ProblemText.fix(p));
    }

    @Test
    void aNegativeStepOrRippleIsRefusedAsASign() throws Exception {
        String text = with(
                with(FULL, "  offset-step: 40 uV", "  offset-step: -40 uV"),
                "chopping-ripple: 3 uV",
                "chopping-ripple: -3 uV");
        Catalog c = load(text);
        Problem step = about(c.problems(), "input-crossover.offset-step");
        assertEquals("-40.0 µV is negative, which is impossible here", ProblemText.message(step));
        assertAt(step, file(), lineOf(text, "offset-step: -40 uV"), 16);
        Problem ripple = about(c.problems(), "chopping-ripple");
        assertEquals("-3.00 µV is negative, which is impossible here", ProblemText.message(ripple));
        assertEquals("write the magnitude without a sign: the value is read as a ± limit", ProblemText.fix(ripple));
    }

    @Test
    void aZeroThermalResistanceIsRefused() throws Exception {
        String text = with(FULL, "theta-ja: 160 C/W", "theta-ja: 0 C/W");
        Problem p = about(load(text).problems(), "theta-ja");
        assertEquals("0 °C/W must be above zero", ProblemText.message(p));
        assertTrue(
                ProblemText.fix(p).startsWith("write the package's junction-to-ambient thermal resistance"),
                ProblemText.fix(p));
    }

    @Test
    void anUnusualThermalResistanceLoadsWithAWarning() throws Exception {
        // 600 C/W: above the 500 C/W warning bound (a bare die in still air), below the 5000 C/W error bound
        Catalog c = load(with(FULL, "theta-ja: 160 C/W", "theta-ja: 600 C/W"));
        assertEquals(1, c.parts().size());
        Problem p = about(c.problems(), "theta-ja");
        assertEquals(Problem.Severity.WARNING, p.severity());
        assertEquals("600 °C/W is above 500 °C/W, implausible for an op amp", ProblemText.message(p));
    }
}
