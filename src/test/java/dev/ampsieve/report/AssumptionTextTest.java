package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.ampsieve.budget.Assumption;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.CatalogKeys;
import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import org.junit.jupiter.api.Test;

/** The words of the budget's assumptions: written here, once, from the facts. */
class AssumptionTextTest {

    @Test
    void aTypicalOnlyFigureSaysItsFactorAndLimit() {
        // 3 x 50 µV = 150 µV (by hand)
        assertEquals(
                "vos: no guaranteed maximum; 3 x typical = 150 µV is used as the limit (max-to-sigma),"
                        + " the typical value as one sigma",
                AssumptionText.sentence(new Assumption.TypicalAsLimit("vos", 50e-6, 3.0, 150e-6)));
    }

    @Test
    void anEstimateByInputKindSaysTheKindAndWhatToEnter() {
        assertEquals(
                "ib: not given; estimated as 500 nA at 25 °C for a bipolar input (common practice, conservative):"
                        + " enter the datasheet maximum",
                AssumptionText.sentence(new Assumption.ByInputKind("ib", 500e-9, InputType.BIPOLAR, false)));
        assertEquals(
                "common-mode: the part gives no input common mode headroom; 1.50 V from each rail is assumed",
                AssumptionText.sentence(new Assumption.Headroom(CatalogKeys.INPUT_HEADROOM, "common-mode", 1.5)));
    }

    @Test
    void theChoppingFrequencyIsAboveOrNotFarBelowTheBand() {
        assertEquals(
                "chopper: band edge 20.0 kHz is above the chopping frequency 10.0 kHz (keep fH under a tenth of it):"
                        + " expect ripple and intermodulation in band",
                AssumptionText.sentence(new Assumption.ChoppingNearBand(Architecture.CHOPPER, 20e3, 10e3)));
        assertTrue(AssumptionText.sentence(new Assumption.ChoppingNearBand(Architecture.AUTO_ZERO, 2e3, 10e3))
                .startsWith("auto-zero: band edge 2.00 kHz is not far below the chopping frequency 10.0 kHz"));
        assertEquals(
                "sample-rate: the chopping frequency 100 kHz, sampled at 96.0 kHz aliases to 4.00 kHz, inside the band"
                        + " (up to 5.00 kHz): filter it out before the converter, or choose a sample rate whose"
                        + " multiples keep away from it",
                AssumptionText.sentence(new Assumption.ChoppingAlias(1, 100e3, 96e3, 4e3, 5e3)));
    }

    @Test
    void jsonCarriesTheSentenceAndTheFact() throws Exception {
        // 100 µV offset, no drift figure: drift estimated as 100 µV / 298.15 K = 335.40 nV/°C (by hand)
        StageFixture s = StageFixture.follower().limitV(1);
        PartFixture p = PartFixture.ideal().vos(null, 100e-6, null);
        p.drift = Spread.NONE;
        Budget b = BudgetCalculator.compute(s.build(), p.build());
        JsonNode j = new ObjectMapper().readTree(BudgetJson.render(b, "stage.yaml"));
        assertEquals(j.get("warnings").size(), j.get("assumptions").size());
        JsonNode drift = null;
        for (JsonNode a : j.get("assumptions")) {
            if (a.get("field").asText().equals("vos-drift")) {
                drift = a;
            }
        }
        assertTrue(drift != null, j.get("assumptions").toString());
        assertEquals("drift-from-offset", drift.get("rule").asText());
        assertEquals(335.40e-9, drift.get("value").asDouble(), 0.01e-9);
        assertEquals(100e-6, drift.get("vos").asDouble(), 0.0);
        assertEquals("bipolar", drift.get("input").asText());
    }
}
