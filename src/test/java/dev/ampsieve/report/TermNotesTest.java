package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.TermRemark;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.TermWorking;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.units.Dimension;
import org.junit.jupiter.api.Test;

/** The words of the term notes, rendered from each term's operands (issue 11: the terms return facts). */
class TermNotesTest {

    private static TermResult term(String key, TermWorking w) {
        return new TermResult(key, key, 0, 0, Double.NaN, false, w);
    }

    @Test
    void aTypicalOnlyRejectionIsSaidSo() {
        TermResult t = term(
                "cmrr",
                TermWorking.of("cmrr")
                        .put("dVcm", 0.1, Dimension.VOLTAGE)
                        .put("CMRR", 100, Dimension.DECIBEL)
                        .remark(TermRemark.TYPICAL_LESS_MAX_TO_SIGMA)
                        .build());
        assertEquals(
                "dVcm 100 mV, CMRR 100 dB (typical less 20 log10(max-to-sigma): no guaranteed minimum)",
                TermNotes.of(t));
    }

    @Test
    void aDifferenceStageNamesBothParts() {
        // the operands of DifferenceAmplifierTest's hand-worked case: 1.819836 mV from the resistors, 100 µV from the
        // amplifier, share 100/110; levels read to four digits, the rest to three
        TermResult t = term(
                "cmrr",
                TermWorking.of("cmrr-difference")
                        .put("dVcm", 1.0, Dimension.VOLTAGE)
                        .put("resistors", 1.819836e-3, Dimension.VOLTAGE)
                        .put("tol", 1e-3, Dimension.RATIO)
                        .put("tc", 0, Dimension.RATIO_DRIFT)
                        .put("dT", 0, Dimension.NUMBER)
                        .put("amplifier", 100e-6, Dimension.VOLTAGE)
                        .put("pinShare", 100.0 / 110, Dimension.NUMBER)
                        .put("CMRR", 100, Dimension.DECIBEL)
                        .build());
        assertEquals(
                "dVcm 1.00 V at the source; resistors 1.82 mV (each pair within tol 0.1 % + tc 0 ppm/°C x 0 °C);"
                        + " amplifier 100 µV (pins at 0.9091 x dVcm, CMRR 100 dB)",
                TermNotes.of(t));
    }

    @Test
    void aCappedDriftThroughTheWholeBudget() {
        // TermRulesTest's case: NG 10, drift 2 µV/°C over dT 45 °C (-20..70), capped by vos over temperature 150 µV
        StageFixture s = StageFixture.nonInverting(9e3, 1e3).limitV(1).temps(-20, 70);
        PartFixture p = PartFixture.ideal().vos(null, 100e-6, 150e-6).drift(null, 2e-6);
        Budget b = BudgetCalculator.compute(s.build(), p.build());
        assertEquals(
                "NG x drift 2.00 µV/°C x 45 °C; capped: offset + drift <= NG x vos over temperature 150 µV",
                TermNotes.of(b.term("drift")));
        assertEquals("NG x vos 100 µV", TermNotes.of(b.term("offset")));
    }

    @Test
    void theJsonCarriesTheNoteWithItsFormulaAndOperands() throws Exception {
        // follower, vos 100 µV: NG 1
        StageFixture s = StageFixture.follower().limitV(1);
        PartFixture p = PartFixture.ideal().vos(null, 100e-6, null);
        JsonNode terms = new ObjectMapper()
                .readTree(BudgetJson.render(BudgetCalculator.compute(s.build(), p.build()), "s.yaml"))
                .get("terms");
        JsonNode offset = null;
        for (JsonNode t : terms) {
            if (t.get("key").asText().equals("offset")) {
                offset = t;
            }
        }
        assertEquals("NG x vos 100 µV", offset.get("note").asText());
        assertEquals("offset", offset.get("formula").asText());
        assertEquals("NG", offset.get("operands").get(0).get("name").asText());
        assertEquals(1.0, offset.get("operands").get(0).get("value").asDouble(), 0.0);
        assertEquals("vos", offset.get("operands").get(1).get("name").asText());
        assertEquals(100e-6, offset.get("operands").get(1).get("value").asDouble(), 0.0);
        assertEquals("V", offset.get("operands").get(1).get("unit").asText());
        // a temperature difference is held as a plain number but has its unit in JSON
        JsonNode drift = null;
        for (JsonNode t : terms) {
            if (t.get("key").asText().equals("drift")) {
                drift = t;
            }
        }
        assertEquals("dT", drift.get("operands").get(2).get("name").asText());
        assertEquals("°C", drift.get("operands").get(2).get("unit").asText());
    }

    @Test
    void aFormulaTheReportDoesNotKnowShowsItsFacts() {
        TermResult t = term(
                "x", TermWorking.of("test").put("a", 2.5, Dimension.VOLTAGE).build());
        assertEquals("test: a 2.50 V", TermNotes.of(t));
    }
}
