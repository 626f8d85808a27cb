package dev.ampsieve.advice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.ThermalEmfTerm;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/** When the board, not the part, limits the stage, the advice says so and finds the board change that fits. */
class BoardAdviceTest {

    private static final String STAGE = """
            gain: 100
            limit: 1 mV
            band: {low: 0.1 Hz, high: 10 Hz, filter-order: 1}
            thermal-emf: {junctions: 2, seebeck: 40 uV/C, gradient: 0.2 C}
            """;

    @Test
    void aPickLimitedByTheBoardIsToldSo() throws Exception {
        // 2 x 40 µV/°C x 0.1 °C = 8 µV at the input, 800 µV at the output: 80 % of the 1 mV limit, above the part's
        // 1 µV offset (100 µV at the output); with 1.8 µV of resistor noise the part fits
        Stage s = StageLoader.parse(STAGE.replace("0.2 C", "0.1 C"), null);
        PartFixture p = PartFixture.ideal();
        p.vos = new Spread(null, 1e-6, null);
        Ranking r = Ranker.rank(s, List.of(p.build()), BudgetCalculator::compute);
        assertEquals("test-amp", r.advice().pick().id());
        BoardLimited b = r.advice().boardLimited();
        assertNotNull(b, r.advice().toString());
        assertEquals(ThermalEmfTerm.KEY, b.term().key());
        assertEquals(800e-6, b.term().outputV(), 1e-15);
        assertEquals(1e-3, b.limitV(), 1e-18);
        assertEquals(0.8, b.term().outputV() / b.limitV(), 1e-12);
        // the lever names the stage's junctions
        assertEquals(2, b.board().junctions());
    }

    @Test
    void noFitFindsTheGradientThatFits() throws Exception {
        // 2 x 40 µV/°C x 0.2 °C = 16 µV: 1.6 mV at the output with the part's 200 µV: no fit. With the resistors'
        // noise allowance (rf 10 kΩ || rg 101 Ω = 100 Ω, π/2 x 10 Hz, 70 °C: 3.3 x 100 x 5.4 nV = 1.8 µV) the
        // gradient that fits is (1 mV - 200 µV - 1.8 µV) / (100 x 80 µV/°C) = 0.09977 °C, printed 0.0997 °C
        Stage s = StageLoader.parse(STAGE, null);
        PartFixture p = PartFixture.ideal();
        p.vos = new Spread(null, 2e-6, null);
        Ranking r = Ranker.rank(s, List.of(p.build()), BudgetCalculator::compute);
        Map<Change.Kind, Change> c =
                r.advice().noFit().changes().stream().collect(Collectors.toMap(Change::kind, x -> x));
        Change emf = c.get(Change.Kind.LESS_THERMAL_EMF);
        assertEquals(0.0997, emf.values().get("gradient"), 1e-12);
        // the EMF at the input that gradient gives: 2 x 40 µV/°C x 0.0997 °C = 7.976 µV (now 16 µV)
        assertEquals(7.976e-6, emf.values().get("thermalEmfV"), 1e-18);
    }

    @Test
    void noFitFindsTheLeakageResistanceThatFits() throws Exception {
        // 10 V across 1 GΩ = 10 nA into the + input through the 10 kΩ source, NG 100: 10 mV at the output. Fitting
        // within 1 mV less the resistors' noise allowance (R+ 10 kΩ plus R- 100 Ω at 343.15 K from 0.1 Hz to
        // π/2 x 10 Hz: 3.3 x 100 x sqrt(4kT x 10.1 kΩ x 15.608 Hz) = 3.3 x 100 x 54.66 nV = 18.04 µV) needs
        // I <= 981.96 µV / (100 x 10 kΩ) = 0.98196 nA, R >= 10 V / 0.98196 nA = 10.184 GΩ; printed to 3 digits on
        // the fitting side: 10.2 GΩ
        Stage s = StageLoader.parse(
                "gain: 100\nlimit: 1 mV\nsource-resistance: 10 kohm\n"
                        + "band: {low: 0.1 Hz, high: 10 Hz, filter-order: 1}\nleakage: {resistance: 1 Gohm, voltage: 10 V}\n",
                null);
        Ranking r = Ranker.rank(s, List.of(PartFixture.ideal().build()), BudgetCalculator::compute);
        Map<Change.Kind, Change> c =
                r.advice().noFit().changes().stream().collect(Collectors.toMap(Change::kind, x -> x));
        Change leak = c.get(Change.Kind.LESS_LEAKAGE);
        assertEquals(10.2e9, leak.values().get("leakageResistance"), 1e-5);
        // the offered resistance is the only number the change needs
        assertEquals(Set.of("leakageResistance"), leak.values().keySet());
    }
}
