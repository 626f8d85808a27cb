package dev.ampsieve.report;

import static dev.ampsieve.testing.PartBuilder.part;
import static dev.ampsieve.testing.StageBuilder.stage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.ampsieve.advice.Comparison;
import dev.ampsieve.advice.Ranker;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.advice.Sufficiency;
import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.testing.LinearEngine;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Renderings of a ranking made with the small linear model of {@link LinearEngine}:
 * NG 100, 0..70 °C (dT 45), limit 1 mV at the output, one-point trim allowed at 0.40.
 */
class RankReportTest {

    private final Stage stage = stage().trim(true, 10e-6, 0.40).supply(5.0).build();
    // GOOD: 100*2 uV + 100*0.1 uV/°C*45 = 0.2 + 0.45 = 0.65 mV: fits, 2.00
    private final Part good =
            part("GOOD").price(2.00).vos(null, 2e-6).drift(null, 0.1e-6).build();
    // TRIMMED: 100*20 uV + 0.45 mV = 2.45 mV; after the trim 0.45 + 0.01 = 0.46 mV: fits after trim, 0.50 + 0.40
    private final Part trimmed =
            part("TRIMMED").price(0.50).vos(null, 20e-6).drift(null, 0.1e-6).build();
    // CHOP: 100*5 uV + 100*0.02 uV/°C*45 = 0.5 + 0.09 = 0.59 mV: fits, 3.00
    private final Part chop = part("CHOP")
            .price(3.00)
            .architecture(Architecture.CHOPPER)
            .vos(null, 5e-6)
            .drift(null, 0.02e-6)
            .fchop(10e3)
            .build();
    // HIGHV: rated 10..36 V, fails the 5 V supply
    private final Part highv = part("HIGHV").price(0.20).supply(10, 36).build();

    private Ranking ranking() {
        return Ranker.rank(stage, List.of(good, trimmed, chop, highv), new LinearEngine());
    }

    @Test
    void textListsCandidatesFrontRejectedAdviceAndEndsWithTheCaution() {
        String text = RankReport.text(ranking(), "s.yaml", null, 15);
        List<String> lines = text.lines().toList();
        assertEquals("Stage s.yaml: non-inverting, noise gain 100, 0 °C to 70 °C", lines.get(0));
        assertEquals("Limit 1.00 mV at the output (10.0 µV at the input), worst-case, quantity 1000", lines.get(1));
        int header = lines.indexOf(
                lines.stream().filter(l -> l.startsWith("#  part")).findFirst().orElseThrow());
        // TRIMMED 0.50 + 0.40 = 0.90 first, then GOOD 2.00, then CHOP 3.00
        assertTrue(lines.get(header + 1).matches("1  TRIMMED\\s+\\+trim\\s+0\\.90\\s+460 µV.*"), lines.get(header + 1));
        assertTrue(lines.get(header + 2).matches("2  GOOD\\s+fits\\s+2\\.00\\s+650 µV.*"), lines.get(header + 2));
        assertTrue(lines.get(header + 3).matches("3  CHOP\\s+fits\\s+3\\.00\\s+590 µV.*"), lines.get(header + 3));
        // 5 V against a 10 .. 36 V rating: 10 - 5 = 5 V short at the low end
        assertTrue(
                text.lines()
                        .anyMatch(l -> l.startsWith("HIGHV  supply: needs supply 5.00 V; part rated 10.0 V to 36.0 V;"
                                + " short by 5.00 V at the low end")),
                text);
        assertTrue(text.contains("A one-point trim is warranted: TRIMMED"), text);
        assertTrue(dev.ampsieve.testing.Flat.of(text).endsWith(Caution.TEXT));
        for (String l : lines) {
            if (!l.equals(Caution.TEXT) && !l.startsWith("  ")) {
                assertTrue(l.length() <= 100, l);
            }
        }
    }

    @Test
    void beyondTopTheRejectedAreCountedByConstraintAndTheFirstTopListed() {
        // three more parts rejected: LOWV rated 1..4 V (fails the 5 V supply), HOT rated 0..50 °C (fails 0..70 °C),
        // BOTH rated 10..36 V and 0..50 °C (fails both): 3 supply failures (HIGHV, LOWV, BOTH), 2 temperature
        Part lowv = part("LOWV").price(0.20).supply(1, 4).build();
        Part hot = part("HOT").price(0.20).temperature(0, 50).build();
        Part both = part("BOTH").price(0.20).supply(10, 36).temperature(0, 50).build();
        Ranking r = Ranker.rank(stage, List.of(good, highv, lowv, hot, both), new LinearEngine());
        assertEquals(4, r.rejected().size());
        String text = RankReport.text(r, "s.yaml", null, 2);
        assertTrue(
                text.contains("4 parts, first 2 shown (--top N for more); failing supply 3, temperature 2 (a part may"
                        + " fail several)"),
                text);
        List<String> ids = r.rejected().stream().map(x -> x.id()).toList();
        assertTrue(text.lines().anyMatch(l -> l.startsWith(ids.get(1) + "  ")), text);
        assertTrue(text.lines().noneMatch(l -> l.startsWith(ids.get(2) + "  ")), text);
        // at --top 4 or more every rejected part is listed and no count line is written
        String all = RankReport.text(r, "s.yaml", null, 4);
        assertTrue(all.lines().anyMatch(l -> l.startsWith(ids.get(3) + "  ")), all);
        assertTrue(!all.contains("first 4 shown"), all);
    }

    @Test
    void jsonHasTheDocumentedKeys() throws Exception {
        JsonNode j = new ObjectMapper().readTree(RankReport.json(ranking(), "s.yaml", "q", 2));
        assertEquals(2, j.get("candidates").size()); // --top 2
        JsonNode first = j.get("candidates").get(0);
        for (String key : List.of("part", "verdict", "effectiveCost", "worstCaseV", "rssV", "yield", "limitingTerm")) {
            assertTrue(first.has(key), key);
        }
        assertEquals("TRIMMED", first.get("part").asText());
        assertEquals("fits-after-trim", first.get("verdict").asText());
        assertEquals(0.90, first.get("effectiveCost").asDouble(), 1e-12);
        assertEquals(2.45e-3, first.get("worstCaseV").asDouble(), 1e-12);
        assertEquals("offset", first.get("limitingTerm").asText());
        assertEquals("HIGHV", j.get("rejected").get(0).get("part").asText());
        assertTrue(j.get("rejected").get(0).get("reason").asText().startsWith("supply: "));
        // TRIMMED (0.90, 0.46 mV) is cheaper and better than both GOOD and CHOP: alone on the front
        assertEquals(1, j.get("pareto").size());
        assertEquals("TRIMMED", j.get("pareto").get(0).asText());
        assertEquals("warranted", j.get("advice").get("trim").get("status").asText());
        // GOOD 2.00 - (0.50 + 0.40) = 1.10 per unit
        assertEquals(1.10, j.get("advice").get("trim").get("savingPerUnit").asDouble(), 1e-12);
        assertEquals(
                "not-warranted", j.get("advice").get("zeroDrift").get("status").asText());
        assertTrue(j.get("advice").get("noFit").isNull());
        assertEquals(Caution.TEXT, j.get("caution").asText());
    }

    @Test
    void csvHasTheStageAndCautionFirstThenOneRowPerPart() {
        // the layout changed: stage, limit and caution now lead as '#' comment lines (issue 11), the
        // estimate flag sits after the verdict and the figures as ranked have columns of their own
        List<String> lines = RankReport.csv(ranking(), 15).lines().toList();
        assertTrue(lines.get(0).startsWith("# stage: "), lines.get(0));
        assertTrue(lines.get(1).startsWith("# limit: "), lines.get(1));
        assertEquals("# " + Caution.TEXT, lines.get(2));
        assertTrue(lines.get(3)
                .startsWith("rank,part,verdict,rests_on_estimate,effective_cost,currency,trimmed,error_v,"
                        + "margin,ranked_worst_case_v,"));
        assertEquals(3 + 1 + 3 + 1, lines.size());
        assertTrue(
                lines.get(4).startsWith("1,TRIMMED,fits-after-trim,false,0.900000,USD,true,0.000460000,"),
                lines.get(4));
        assertTrue(lines.get(7).startsWith(",HIGHV,rejected,,0.200000,USD,"), lines.get(7));
    }

    @Test
    void compareAndSufficesRenderings() throws Exception {
        LinearEngine e = new LinearEngine();
        Comparison c = Comparison.of(e.compute(stage, good), e.compute(stage, chop));
        String text = CompareReport.text(c, "s.yaml");
        // initial offset: GOOD 200 µV against CHOP 500 µV, 2.5 times
        assertTrue(
                text.lines()
                        .anyMatch(l ->
                                l.matches("initial offset\\s+200 µV\\s+500 µV\\s+GOOD\\s+300 µV \\(2\\.5 times\\)")),
                text);
        assertTrue(text.contains("Both fit; GOOD costs 1.00 USD less per unit (1000.00 USD over 1000 units)"), text);
        assertTrue(dev.ampsieve.testing.Flat.of(text).endsWith(Caution.TEXT));
        JsonNode j = new ObjectMapper().readTree(CompareReport.json(c, "s.yaml"));
        assertEquals("GOOD", j.get("preferred").asText());
        assertEquals(Caution.TEXT, j.get("caution").asText());

        Sufficiency s = Sufficiency.of(e.compute(stage, trimmed));
        String st = SufficesReport.text(s, "s.yaml");
        assertTrue(st.startsWith("no: TRIMMED needs the trim; untrimmed worst-case 2.45 mV against 1.00 mV"), st);
        assertTrue(dev.ampsieve.testing.Flat.of(st).endsWith(Caution.TEXT));
        JsonNode sj = new ObjectMapper().readTree(SufficesReport.json(s, "s.yaml"));
        assertEquals("no", sj.get("answer").asText());
        assertEquals(Caution.TEXT, sj.get("caution").asText());
    }

    @Test
    void aRowWhoseVerdictRestsOnAnEstimateIsMarkedAndTheAdviceSaysSo() throws Exception {
        // real engine; follower fed through 10 k at 25 °C, limit 10 mV. FULL has every figure; NOIB lacks ib and
        // ios, so its bias term is the bipolar estimate 10 k x 500 nA x 1.5 = 7.5 mV (budget/Assumed): it fits,
        // but on an estimate, and being cheaper it is the pick
        dev.ampsieve.fixtures.StageFixture sf =
                dev.ampsieve.fixtures.StageFixture.follower().limitV(10e-3).temps(25, 25);
        sf.rs = 10e3;
        Stage s = sf.build();
        dev.ampsieve.fixtures.PartFixture full = dev.ampsieve.fixtures.PartFixture.ideal();
        full.id = "full";
        full.price = new dev.ampsieve.catalog.Price(2.0, 1, "USD");
        dev.ampsieve.fixtures.PartFixture noib = dev.ampsieve.fixtures.PartFixture.ideal();
        noib.id = "noib";
        noib.ib = dev.ampsieve.catalog.Spread.NONE;
        noib.ios = dev.ampsieve.catalog.Spread.NONE;
        Ranking r = Ranker.rank(s, List.of(full.build(), noib.build()), dev.ampsieve.budget.BudgetCalculator::compute);
        String text = RankReport.text(r, "s.yaml", null, 15);
        assertTrue(text.lines().anyMatch(l -> l.matches("1  noib\\s+fits\\*\\s+.*")), text);
        assertTrue(text.lines().anyMatch(l -> l.matches("2  full\\s+fits\\s+.*")), text);
        assertTrue(text.contains("* after the verdict: it rests on an estimated or typical-only figure"), text);
        assertTrue(
                dev.ampsieve.testing.Flat.of(text)
                        .contains(
                                "Pick noib: 1.00 USD per unit, fits as it is; worst-case 7.50 mV of 10.0 mV (margin 25 %); resting on"
                                        + " estimated or typical-only figures for bias current."),
                text);
        JsonNode j = new ObjectMapper().readTree(RankReport.json(r, "s.yaml", null, 15));
        JsonNode first = j.get("candidates").get(0);
        assertEquals("noib", first.get("part").asText());
        assertTrue(first.get("restsOnEstimate").asBoolean());
        assertEquals("bias", first.get("estimatedTerms").get(0).asText());
        assertTrue(!j.get("candidates").get(1).get("restsOnEstimate").asBoolean());
    }
}
