package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.testing.Flat;
import org.junit.jupiter.api.Test;

/** The budget names a two-temperature calibration and its two temperatures, in words and in JSON. */
class TwoTemperatureReportTest {

    @Test
    void theMethodAndItsTemperaturesAreNamed() throws Exception {
        // follower, -40..85 °C, calibrated at 0 and 50 °C with a 10 µV resolution; ideal part with vos 100 µV and
        // drift 1 µV/°C: the line removes both and leaves the resolution extrapolated to -40 °C,
        // (1.8 + 0.8) x 10 µV = 26 µV (TwoTemperatureTrimTest)
        StageFixture s = StageFixture.follower().temps(-40, 85).limitV(1e-3);
        s.trim = new Trim(true, Trim.Method.TWO_TEMPERATURE, 10e-6, 0, 0, 50);
        Budget b = BudgetCalculator.compute(
                s.build(),
                PartFixture.ideal().vos(null, 100e-6, null).drift(null, 1e-6).build());
        JsonNode tr = new ObjectMapper().readTree(BudgetJson.render(b, null)).get("trimmed");
        assertEquals("two-temperature", tr.get("method").asText());
        assertEquals(26e-6, tr.get("worstCaseV").asDouble(), 1e-15);
        String t = Flat.of(BudgetText.render(b, null));
        assertTrue(t.contains("two-temperature at 0 °C and 50 °C, resolution 10.0 µV: worst-case 26.0 µV (2.6 %)"), t);
        assertTrue(t.contains("one-point at 25 °C"), t);
    }
}
