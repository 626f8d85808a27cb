package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import dev.ampsieve.advice.Ranker;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Price;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Criterion;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The undecided verdict and the yield margin as rank and budget print them. */
class UndecidedReportTest {

    /** P(|Z| <= 2) / P(|Z| <= 3) = 0.9544997 / 0.9973002 (A&S table 26.1 [from memory]). */
    private static final double AT_TARGET = 0.9544997361036416 / 0.9973002039367398;

    private static Part part(String id, double vosTyp, double price) {
        PartFixture p = PartFixture.ideal().vos(vosTyp, null, null);
        p.id = id;
        p.price = new Price(price, 1, "USD");
        return p.build();
    }

    private static Ranking ranking() {
        // follower, limit 2 mV, typical-only offsets (sigma = typ, truncated at 3 typ): 0.5 mV passes every unit,
        // 1 mV gives exactly the target, 2 mV gives 0.684
        StageFixture s = StageFixture.follower().limitV(2e-3);
        s.criterion = Criterion.yield(AT_TARGET);
        s.trials = 2000;
        s.maxTrials = 20_000;
        return Ranker.rank(
                s.build(),
                List.of(part("p-low", 2e-3, 0.5), part("p-mid", 1e-3, 1.0), part("p-top", 0.5e-3, 3.0)),
                BudgetCalculator::compute);
    }

    @Test
    void textMarksTheUndecidedRowAndPrintsTheYieldMargin() {
        String text = RankReport.text(ranking(), "s.yaml", null, 10);
        String mid = text.lines().filter(l -> l.contains("p-mid")).findFirst().orElseThrow();
        assertTrue(mid.contains(" undecided"), mid);
        // p-top: every unit within 1.5 mV, yield 100 % without sampling: margin 1 - 0.957083 = +4.29 points (rounded
        // down)
        String top = text.lines().filter(l -> l.contains("p-top")).findFirst().orElseThrow();
        assertTrue(top.contains("+4.29 %"), top);
        assertTrue(text.contains("margin: lower end of the yield's 95 % interval minus the target"), text);
        assertTrue(text.contains("p-mid is undecided: after 20000 simulated units"), text);
    }

    @Test
    void csvAndJsonCarryTheVerdictAndTheYieldMargin() throws Exception {
        Ranking r = ranking();
        // data rows follow the '#' comment lines and the header row
        List<String> rows =
                RankReport.csv(r, 10).lines().filter(l -> !l.startsWith("#")).toList();
        assertTrue(rows.get(2).startsWith("2,p-mid,undecided,"), rows.get(2));
        JsonNode j = JsonSupport.MAPPER.readTree(RankReport.json(r, "s.yaml", null, 10));
        assertEquals("undecided", j.get("candidates").get(1).get("verdict").asText());
        assertEquals(1 - AT_TARGET, j.get("candidates").get(0).get("margin").asDouble(), 1e-12);
        assertEquals(
                "p-mid",
                j.get("advice").get("undecided").get("part").get("part").asText());
        assertEquals(20_000, j.get("advice").get("undecided").get("maxTrials").asInt());
    }

    @Test
    void budgetPrintsTheYieldAtEachMaxToSigmaOnOneLineAndInJson() throws Exception {
        // limit 2.5 mV: k = 2 truncates at 2 mV, so every unit passes (100.00 %, interval 100.00..100.00)
        StageFixture s = StageFixture.follower().limitV(2.5e-3);
        Budget b = BudgetCalculator.compute(s.build(), part("p-mid", 1e-3, 1.0));
        var by = BudgetCalculator.yieldBySigma(b);
        String text = BudgetText.render(b, by, "s.yaml", 100);
        String line =
                text.lines().filter(l -> l.startsWith("Max-to-σ")).findFirst().orElseThrow();
        assertTrue(line.startsWith("Max-to-σ   2: 100.00 % (100.00..100.00), 3 (stage): "), line);
        assertTrue(line.contains(", 4: "), line);
        JsonNode j = JsonSupport.MAPPER.readTree(BudgetJson.render(b, by, "s.yaml"));
        assertEquals(3, j.get("yieldBySigma").size());
        assertEquals(4.0, j.get("yieldBySigma").get(2).get("maxToSigma").asDouble(), 0.0);
        assertEquals(1.0, j.get("yieldBySigma").get(0).get("yield").asDouble(), 0.0);
    }
}
