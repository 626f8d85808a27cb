package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.ampsieve.advice.TrimCircuitChoice;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.stage.TrimCircuit;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The words and JSON of a sized trim circuit and of the comparison. */
class TrimCircuitTextTest {

    private static Stage stage(TrimCircuit.Kind kind, List<TrimCircuit.Kind> kinds) {
        StageFixture f = StageFixture.inverting(10e3, 1e3).temps(-40, 85).limitV(2e-3);
        f.trim = new Trim(
                true, Trim.Method.ONE_POINT, 0, 0.2, Double.NaN, Double.NaN, TrimCircuit.defaults(kind), kinds);
        return f.build();
    }

    private static Part part() {
        PartFixture p = PartFixture.ideal().vos(null, 2e-3, null);
        p.nullPins = true;
        return p.build();
    }

    @Test
    void theNullPinFailureNamesTheDriftAndTheRange() {
        Stage s = stage(TrimCircuit.Kind.STORED, List.of(TrimCircuit.Kind.STORED, TrimCircuit.Kind.NULL_PINS));
        String text = TrimCircuitText.render(TrimCircuitChoice.of(s, part()), s);
        // 2 mV nulled at the pins adds (1/298.15 + 100e-6) x 2 mV = 6.91 uV/°C (hand-worked in TrimSizingTest)
        assertTrue(text.contains("null pins: nulling 2.00 mV at the pins adds 6.91 µV/°C there"), text);
        assertTrue(text.contains("which fails over -40 °C..85 °C"), text);
        assertTrue(text.contains("Cheapest that fits: stored correction"), text);
    }

    @Test
    void theComparisonAsJson() {
        Stage s = stage(TrimCircuit.Kind.STORED, List.of(TrimCircuit.Kind.STORED, TrimCircuit.Kind.NULL_PINS));
        ObjectNode o = new ObjectMapper().createObjectNode();
        TrimCircuitText.json(o, TrimCircuitChoice.of(s, part()));
        JsonNode n = o.get("trimCircuits");
        assertEquals("stored", n.get("cheapest").asText());
        JsonNode pins = n.get("options").get(1);
        assertEquals("null-pins", pins.get("kind").asText());
        assertEquals("circuit-terms", pins.get("outcome").asText());
        // 2 mV nulled: 6.908 uV/°C at the pins x NG 11 x 65 °C (-40 °C is 65 °C from 25 °C) = 4.939 mV
        assertEquals(4.939e-3, pins.get("circuitV").asDouble(), 0.001e-3);
        assertEquals("null-pin-drift", pins.get("largestCircuitTerm").asText());
    }

    @Test
    void budgetJsonCarriesTheSizedInjection() {
        Stage s = stage(TrimCircuit.Kind.INJECTION, List.of(TrimCircuit.Kind.INJECTION));
        Budget b = BudgetCalculator.compute(s, part());
        ObjectNode o = new ObjectMapper().createObjectNode();
        TrimCircuitText.json(o, b.trimmed().circuit());
        JsonNode n = o.get("trimCircuit");
        assertEquals("injection", n.get("kind").asText());
        // offset 22 mV: Rinj <= 2.5 x 10k / (1.5 x 22 mV) = 757.6 kohm -> E96 750 kohm; range 2.5 x 10k/750k
        assertEquals(750e3, n.get("injectionResistance").asDouble());
        assertEquals(33.333e-3, n.get("rangeV").asDouble(), 1e-6);
        assertEquals(66.667e-6, n.get("resolutionV").asDouble(), 1e-9); // 0.1 % x 2 x 33.333 mV
        assertEquals(11 + 10e3 / 750e3, n.get("noiseGain").asDouble(), 1e-12);
        assertTrue(n.get("addedDriftVPerC").asDouble() > 0);
    }

    @Test
    void aStoredCorrectionHasNoCircuitFields() {
        Stage s = stage(TrimCircuit.Kind.STORED, List.of(TrimCircuit.Kind.STORED));
        ObjectNode o = new ObjectMapper().createObjectNode();
        TrimCircuitText.json(o, BudgetCalculator.compute(s, part()).trimmed().circuit());
        JsonNode n = o.get("trimCircuit");
        assertEquals("stored", n.get("kind").asText());
        assertFalse(n.has("rangeV"));
        assertFalse(n.has("injectionResistance"));
        assertFalse(n.has("noiseGain"));
        assertFalse(n.has("addedDriftVPerC"));
    }
}
