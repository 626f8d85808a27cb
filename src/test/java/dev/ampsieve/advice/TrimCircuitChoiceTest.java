package dev.ampsieve.advice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.budget.InjectionGainTerm;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.stage.TrimCircuit;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The trim circuits a stage allows, sized and judged for one part. */
class TrimCircuitChoiceTest {

    private static final Path DEMO = Path.of("demo-catalog");

    private static Part demoPart(String id) throws Exception {
        Catalog c = CatalogLoader.load(DEMO, false);
        return c.parts().stream().filter(p -> p.id().equals(id)).findFirst().orElseThrow();
    }

    private static TrimCircuitChoice.Option option(TrimCircuitChoice c, TrimCircuit.Kind k) {
        return c.options().stream().filter(o -> o.kind() == k).findFirst().orElseThrow();
    }

    @Test
    void bridgeStageKeepsTheStoredCorrection() throws Exception {
        Stage s = StageLoader.load(DEMO.resolve("stages/bridge-amp.yaml"));
        TrimCircuitChoice c = TrimCircuitChoice.of(s, demoPart("prec-bip-05"));
        assertTrue(c.trimNeeded());
        assertEquals(TrimCircuit.Kind.STORED, c.cheapest());
        assertEquals(
                TrimCircuitChoice.Outcome.FITS,
                option(c, TrimCircuit.Kind.STORED).outcome());
        assertEquals(
                TrimCircuitChoice.Outcome.RANGE_SHORT,
                option(c, TrimCircuit.Kind.NULL_PINS).outcome());
        TrimCircuitChoice.Option inj = option(c, TrimCircuit.Kind.INJECTION);
        assertEquals(TrimCircuitChoice.Outcome.CIRCUIT_TERMS, inj.outcome());
        // Rinj capped at 10 Mohm (about 117 Mohm would give 1.5 x the offset from 2.5 V into rf = 499 kohm)
        assertEquals(10e6, inj.sized().injectionResistance());
        // by hand: dNG = 499k / 10M = 0.0499; the pins' share of the common mode r4/(r3 + 175 + r4)
        // = 499/504.165 = 0.98976; 0.15 V swing: 0.0499 x 0.98976 x 0.15 V = 7.408 mV unbalanced
        assertEquals(InjectionGainTerm.KEY, inj.largestCircuitTerm().key());
        assertEquals(7.408e-3, inj.largestCircuitTerm().working().value("commonMode"), 0.001e-3);
        // costs: part at 2000 plus the 0.60 trim, plus the circuit's parts and hand work (stage defaults,
        // common practice): null pins 0.40 + 0.75; injection 0.60 + 0.40 + 0.01 + 0.75; DAC 0.90 + 0.01
        double base = option(c, TrimCircuit.Kind.STORED).effectiveCost();
        assertEquals(base + 1.15, option(c, TrimCircuit.Kind.NULL_PINS).effectiveCost(), 1e-9);
        assertEquals(base + 1.76, inj.effectiveCost(), 1e-9);
        assertEquals(base + 0.91, option(c, TrimCircuit.Kind.DAC).effectiveCost(), 1e-9);
    }

    @Test
    void thermocoupleStageFitsWithEveryInjectingCircuit() throws Exception {
        Stage s = StageLoader.load(DEMO.resolve("stages/thermocouple.yaml"));
        TrimCircuitChoice c = TrimCircuitChoice.of(s, demoPart("prec-bip-05"));
        assertEquals(TrimCircuit.Kind.STORED, c.cheapest());
        assertTrue(option(c, TrimCircuit.Kind.INJECTION).fits());
        assertTrue(option(c, TrimCircuit.Kind.DAC).fits());
        assertFalse(option(c, TrimCircuit.Kind.NULL_PINS).fits());
        // the DAC is set by the test program: cheaper than a trimmer set by hand
        assertTrue(option(c, TrimCircuit.Kind.DAC).effectiveCost()
                < option(c, TrimCircuit.Kind.INJECTION).effectiveCost());
    }

    @Test
    void theRankingComparesTheCircuitsForThePartTheTrimAdviceIsAbout() throws Exception {
        // bridge stage: prec-bip-05 fits with the one-point trim (TrimAdvice names it), so the circuits are
        // compared for it; the stored correction stays the cheapest that fits (see the test above)
        Stage s = StageLoader.load(DEMO.resolve("stages/bridge-amp.yaml"));
        Catalog cat = CatalogLoader.load(DEMO, false);
        Ranking r = Ranker.rank(s, cat.parts(), dev.ampsieve.budget.BudgetCalculator::compute);
        TrimCircuitChoice c = r.advice().trimCircuits();
        assertEquals("prec-bip-05", r.advice().trim().withTrim().id());
        assertEquals("prec-bip-05", c.part().id());
        assertEquals(TrimCircuit.Kind.STORED, c.cheapest());
        assertEquals(4, c.options().size()); // the four circuits bridge-amp.yaml lists
        // a stage that names one circuit gets no comparison
        Stage one = s.toBuilder()
                .trim(new dev.ampsieve.stage.Trim(
                        true,
                        s.trim().method(),
                        s.trim().resolution(),
                        s.trim().cost(),
                        s.trim().cold(),
                        s.trim().hot(),
                        s.trim().circuit(),
                        java.util.List.of(TrimCircuit.Kind.STORED)))
                .build();
        assertEquals(
                null,
                Ranker.rank(one, cat.parts(), dev.ampsieve.budget.BudgetCalculator::compute)
                        .advice()
                        .trimCircuits());
    }

    @Test
    void nullPinDriftDefeatsTheNullOverAWideRange() {
        // inverting, NG 11, a part with null pins and vos 2 mV; -40..85 °C: the cold end is 65 °C from 25 °C
        StageFixture f = StageFixture.inverting(10e3, 1e3).temps(-40, 85).limitV(2e-3);
        TrimCircuit pins = TrimCircuit.defaults(TrimCircuit.Kind.NULL_PINS);
        f.trim = new Trim(
                true,
                Trim.Method.ONE_POINT,
                0,
                0.2,
                Double.NaN,
                Double.NaN,
                pins,
                List.of(TrimCircuit.Kind.STORED, TrimCircuit.Kind.NULL_PINS));
        PartFixture p = PartFixture.ideal().vos(null, 2e-3, null);
        p.nullPins = true;
        TrimCircuitChoice c = TrimCircuitChoice.of(f.build(), p.build());
        TrimCircuitChoice.Option n = option(c, TrimCircuit.Kind.NULL_PINS);
        assertEquals(TrimCircuitChoice.Outcome.CIRCUIT_TERMS, n.outcome());
        // 2 mV nulled: (1/298.15 K + 100 ppm) x 2 mV = 6.908 uV/°C at the pins, x 11 x 65 °C = 4.939 mV at the output
        assertEquals(4.939e-3, n.circuitV(), 0.001e-3);
        assertEquals(TrimCircuit.Kind.STORED, c.cheapest());
    }
}
