package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.report.ProblemText;
import dev.ampsieve.stage.Board;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.stage.StageWriter;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Thermal EMF and surface leakage: off unless named, each worked by hand, read and written back. */
class BoardLevelTermsTest {

    private static final Path NAME = Path.of("s.yaml");

    private static Stage stage(String yaml) throws InputException {
        return StageLoader.parse(yaml, NAME);
    }

    private static String error(String yaml) {
        InputException e = assertThrows(InputException.class, () -> stage(yaml));
        return ProblemText.line(e.problems().get(0));
    }

    @Test
    void offUnlessNamed() throws Exception {
        Budget b = BudgetCalculator.compute(
                stage("gain: 10\nlimit: 1 mV\n"), PartFixture.ideal().build());
        assertFalse(b.terms().stream()
                .anyMatch(t -> t.key().equals(ThermalEmfTerm.KEY) || t.key().equals(LeakageTerm.KEY)));
        assertEquals(Board.NONE, stage("gain: 10\nlimit: 1 mV\n").board());
    }

    @Test
    void thermalEmfIsJunctionsTimesSeebeckTimesGradientThroughTheNoiseGain() throws Exception {
        // two copper to Kovar junctions (about 40 µV/°C, common practice) 0.1 °C apart: 2 x 40 µV/°C x 0.1 °C = 8 µV in
        // series with the input; gain 200: 1.6 mV at the output, 8 µV at the input
        Stage s = stage("gain: 200\nlimit: 10 mV\nthermal-emf: {junctions: 2, seebeck: 40 uV/C, gradient: 0.1 C}\n");
        Budget b = BudgetCalculator.compute(s, PartFixture.ideal().build());
        TermResult t = b.term(ThermalEmfTerm.KEY);
        assertEquals(1.6e-3, t.outputV(), 1e-15);
        assertEquals(8e-6, t.inputV(), 1e-18);
        assertEquals(TermKind.BOARD, BudgetCalculator.kindOf(t.key()));
        // a static error: an AC-coupled stage counts it toward headroom only
        Stage ac = stage(
                "gain: 200\nlimit: 10 mV\nac-coupled: true\nthermal-emf: {junctions: 2, seebeck: 40 uV/C, gradient: 0.1 C}\n");
        assertFalse(BudgetCalculator.counts(ac, ThermalEmfTerm.KEY));
    }

    @Test
    void noTrimRemovesABoardLevelTerm() throws Exception {
        // an ideal part: what is left after a one-point trim is the thermal EMF (1.6 mV), the trim's 0.1 mV step and
        // the resistors' noise allowance: rf 10 kΩ || rg 50.25 Ω = 50.0 Ω from 0.1 Hz to π/2 x 10 Hz at 70 °C,
        // 3.3 x 200 x sqrt(4 x 1.380649e-23 x 343.15 K x 50.0 Ω x 15.608 Hz) = 2.538 µV
        Stage s = stage(
                "gain: 200\nlimit: 1 mV\nband: {filter-order: 1}\n"
                        + "thermal-emf: {junctions: 2, seebeck: 40 uV/C, gradient: 0.1 C}\ntrim: {method: one-point, resolution: 0.1 mV}\n");
        Budget b = BudgetCalculator.compute(s, PartFixture.ideal().build());
        assertEquals(1.702538e-3, b.trimmed().worstCaseV(), 0.000002e-3);
        assertEquals(Verdict.NO_FIT, b.verdict());
    }

    @Test
    void leakageIntoThePlusInputFlowsThroughTheSourceResistance() throws Exception {
        // 12 V across 10 GΩ: 1.2 nA into the + input; non-inverting gain 100 with a 1 MΩ source: V+ moves by
        // 1.2 nA x 1 MΩ = 1.2 mV, times the noise gain 100 = 120 mV at the output (Ohm's law, superposition)
        Stage s = stage(
                "gain: 100\nlimit: 1 V\nsource-resistance: 1 Mohm\nleakage: {resistance: 10 Gohm, voltage: 12 V}\n");
        Budget b = BudgetCalculator.compute(s, PartFixture.ideal().build());
        assertEquals(0.12, b.term(LeakageTerm.KEY).outputV(), 1e-12);
        assertEquals(Board.Input.PLUS, s.board().leakageInput());
    }

    @Test
    void leakageIntoATransimpedanceSummingNodeFlowsThroughRf() throws Exception {
        // the - input is the default for a transimpedance stage: 5 V across 100 GΩ = 50 pA, times Rf 10 MΩ = 500 µV
        Stage s = stage(
                "topology: transimpedance\nrf: 10 Mohm\ncf: 1 pF\nsource-resistance: 1 Gohm\nsource-capacitance: 10 pF\n"
                        + "limit: 10 mV\nleakage: {resistance: 100 Gohm, voltage: -5 V}\n");
        PartFixture p = PartFixture.ideal();
        p.gbw = 10e6;
        p.cin = 3e-12;
        Budget b = BudgetCalculator.compute(s, p.build());
        assertEquals(Board.Input.MINUS, s.board().leakageInput());
        assertEquals(500e-6, b.term(LeakageTerm.KEY).outputV(), 1e-15);
        assertEquals(50e-12, b.term(LeakageTerm.KEY).inputV(), 1e-24); // at the source: amperes, output / Rf
    }

    @Test
    void theStageWriterWritesThemBack() throws Exception {
        Stage s = stage("gain: 100\nlimit: 1 V\nthermal-emf: {junctions: 3, seebeck: 1.5 uV/C, gradient: 0.25 C}\n"
                + "leakage: {resistance: 47 Gohm, voltage: 15 V, input: minus}\n");
        Stage back = StageLoader.parse(StageWriter.toYaml(s), NAME);
        assertEquals(new Board(3, 1.5e-6, 0.25, 47e9, 15.0, Board.Input.MINUS), back.board());
    }

    @Test
    void anIncompleteBlockIsAnErrorWithTheFix() {
        assertEquals(
                "s.yaml:4:3: thermal-emf.gradient: missing: thermal EMF needs junctions, seebeck and gradient; add "
                        + "'gradient: 0.5 C' (the temperature difference across the junctions (a warm regulator or part beside them))",
                error("gain: 10\nlimit: 1 mV\nthermal-emf:\n  junctions: 2\n  seebeck: 3 uV/C\n"));
        assertEquals(
                "s.yaml:4:3: leakage.voltage: missing: leakage needs the resistance and the voltage across it; add "
                        + "'voltage: 12 V'",
                error("gain: 10\nlimit: 1 mV\nleakage:\n  resistance: 10 Gohm\n"));
        assertTrue(error("gain: 10\nlimit: 1 mV\nthermal-emf: {junctions: 2, seebeck: 3 mV/C, gradient: 0.5 C}\n")
                .contains("thermal-emf.seebeck: 3.00 mV/°C is above 2.00 mV/°C"));
        assertTrue(error("gain: 10\nlimit: 1 mV\nleakage: {resistance: 10 Gohm, voltage: 12 V, input: both}\n")
                .startsWith("s.yaml:3:"));
    }

    @Test
    void theyAreListedAmongTheStageKeys() {
        List<String> paths = dev.ampsieve.stage.StageKeys.paths();
        assertTrue(
                paths.containsAll(List.of(
                        "thermal-emf.junctions",
                        "thermal-emf.seebeck",
                        "thermal-emf.gradient",
                        "leakage.resistance",
                        "leakage.voltage",
                        "leakage.input")),
                paths.toString());
    }
}
