package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import org.junit.jupiter.api.Test;

/**
 * Input-referred means at the signal source (error-model.md: "divided by the magnitude of the
 * signal gain, i.e. referred to the signal source"). An inverting stage with a source resistance
 * tells the two gains apart: Rf 100 kohm, Rg 9 kohm, Rs 1 kohm.
 * By hand: signal gain -Rf/(Rg + Rs) = -100/10 = -10; noise gain 1 + Rf/(Rg + Rs) = 11
 * (Franco 4th ed. ch. 1 [from memory]).
 */
class SourceReferredTest {

    private static Stage stage() throws Exception {
        return StageLoader.parse("""
                topology: inverting
                rf: 100 kohm
                rg: 9 kohm
                source-resistance: 1 kohm
                limit:
                  input: 10 uV
                """, null);
    }

    @Test
    void inputLimitIsTimesTheSignalGainNotTheNoiseGain() throws Exception {
        Stage s = stage();
        assertEquals(-10.0, s.signalGain(), 1e-12);
        assertEquals(11.0, s.noiseGain(), 1e-12);
        // by hand: 10 µV at the source x |-10| = 100 µV at the output (x 11 would give 110 µV)
        assertEquals(100e-6, s.limitVolts(), 1e-15);
    }

    @Test
    void inputColumnDividesByTheSignalGain() throws Exception {
        // offset 50 µV max: at the output NG x vos = 11 x 50 µV = 550 µV (Franco ch. 5);
        // at the source 550 µV / 10 = 55 µV: the offset a source-side error of 55 µV would also give
        Budget b = BudgetCalculator.compute(
                stage(), PartFixture.ideal().vos(null, 50e-6, null).build());
        assertEquals(550e-6, b.term("offset").outputV(), 1e-15);
        assertEquals(55e-6, b.term("offset").inputV(), 1e-15);
        JsonNode j = new ObjectMapper().readTree(BudgetJson.render(b, "stage.yaml"));
        JsonNode offset = null;
        for (JsonNode t : j.get("terms")) {
            if (t.get("key").asText().equals("offset")) {
                offset = t;
            }
        }
        assertEquals(55e-6, offset.get("inputV").asDouble(), 1e-15);
        String text = BudgetText.render(b, "stage.yaml");
        // the header states the convention with the factor used: |signal gain| 10
        assertTrue(text.contains("input = output / |signal gain| 10: referred to the signal source"), text);
        assertTrue(text.contains("Limit      100 µV at the output (10.0 µV at the input)"), text);
    }
}
