package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.stage.StageLoader;
import org.junit.jupiter.api.Test;

/** The JSON fields of a transimpedance budget: DC noise gain and the signal gain in ohms. */
class TransimpedanceJsonTest {

    @Test
    void noiseGainAndSignalGainOhms() throws Exception {
        PartFixture f = PartFixture.ideal();
        f.cin = 5e-12;
        var s = StageLoader.parse("""
                topology: transimpedance
                rf: 10 Mohm
                cf: 1 pF
                source-resistance: 40 Mohm
                source-capacitance: 20 pF
                limit: {input-current: 100 pA}
                """, null);
        JsonNode j = new ObjectMapper().readTree(BudgetJson.render(BudgetCalculator.compute(s, f.build()), "s.yaml"));
        // by hand: NG = 1 + 10 Mohm / 40 Mohm = 1.25; signal gain -Rf = -10 Mohm (V/A)
        assertEquals(1.25, j.get("noiseGain").asDouble(), 1e-15);
        assertEquals(-10e6, j.get("signalGainOhms").asDouble(), 1e-6);
        assertEquals("transimpedance", j.get("topology").asText());
        // each term at the source is a current: output volts over 10 Mohm, named inputA, and no inputV
        for (JsonNode t : j.get("terms")) {
            assertFalse(t.has("inputV"), t.toString());
            assertEquals(
                    t.get("outputV").asDouble() / 10e6,
                    t.get("inputA").asDouble(),
                    1e-30 + t.get("outputV").asDouble() * 1e-22);
        }

        JsonNode plain = new ObjectMapper()
                .readTree(BudgetJson.render(
                        BudgetCalculator.compute(StageLoader.parse("gain: 10\nlimit: 1 mV\n", null), f.build()),
                        "s.yaml"));
        assertFalse(plain.has("signalGainOhms"));
        assertFalse(plain.get("terms").get(0).has("inputA"));
    }
}
