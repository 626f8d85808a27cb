package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.ampsieve.advice.Comparison;
import dev.ampsieve.advice.Ranker;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.InputCrossover;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Range;
import dev.ampsieve.catalog.TestConditions;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Stage;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The operating-point terms are marked as such in budget, rank and compare, as text and as JSON. */
class OperatingPointReportTest {

    /** Gain 10, 5 V, pins at 1..4 V: the crossover 1.2 V below V+ (3.8 V) is reached. */
    private static Stage stage() {
        StageFixture f = StageFixture.nonInverting(90e3, 10e3);
        f.supply = 5.0;
        f.cmRange = new Range(1.0, 4.0);
        return f.limitV(1e-3).build();
    }

    /** An ideal rail-to-rail part with a crossover step of {@code step}, tested at the stage's own supply and common mode. */
    private static Part part(String id, double step) {
        PartFixture p = PartFixture.ideal();
        p.id = id;
        p.crossover = new InputCrossover(1.2, step);
        p.testConditions = new TestConditions(5.0, 2.5);
        return p.build();
    }

    @Test
    void budgetTextTagsTheTermAndJsonNamesItsKind() throws Exception {
        Budget b = BudgetCalculator.compute(stage(), part("xo-a", 200e-6));
        String text = BudgetText.render(b, "s.yaml");
        // NG 10 x 200 µV = 2 mV, twice the limit
        assertTrue(text.lines().anyMatch(l -> l.startsWith("input crossover (op)") && l.contains("2.00 mV")), text);
        assertTrue(text.replace("\n", " ").contains("(op) operating-point term: where the part runs"), text);
        JsonNode j = new ObjectMapper().readTree(BudgetJson.render(b, "s.yaml"));
        Map<String, String> kinds = new HashMap<>();
        j.get("terms")
                .forEach(t -> kinds.put(t.get("key").asText(), t.get("kind").asText()));
        assertEquals("operating-point", kinds.get("input-crossover"));
        assertEquals("part", kinds.get("drift"));
        assertEquals("input-crossover", j.get("limitingTerm").asText());
    }

    @Test
    void rankAndCompareMarkItToo() throws Exception {
        Stage s = stage();
        Part a = part("xo-a", 200e-6);
        Part b = part("xo-b", 20e-6);
        Ranking r = Ranker.rank(s, List.of(a, b), BudgetCalculator::compute);
        String text = RankReport.text(r, "s.yaml", null, 15);
        assertTrue(text.contains("input crossover (op)"), text);
        JsonNode j = new ObjectMapper().readTree(RankReport.json(r, "s.yaml", null, 15));
        JsonNode xa = null;
        for (JsonNode c : j.get("candidates")) {
            if (c.get("part").asText().equals("xo-a")) {
                xa = c;
            }
        }
        assertEquals("input-crossover", xa.get("limitingTerm").asText());
        assertEquals("operating-point", xa.get("limitingKind").asText());

        Comparison c = Comparison.of(BudgetCalculator.compute(s, a), BudgetCalculator.compute(s, b));
        String ct = CompareReport.text(c, "s.yaml");
        // 2.00 mV against 200 µV (NG 10 x 20 µV)
        assertTrue(
                ct.lines()
                        .anyMatch(l ->
                                l.startsWith("input crossover (op)") && l.contains("2.00 mV") && l.contains("200 µV")),
                ct);
        JsonNode cj = new ObjectMapper().readTree(CompareReport.json(c, "s.yaml"));
        for (JsonNode t : cj.get("terms")) {
            if (t.get("key").asText().equals("input-crossover")) {
                assertEquals("operating-point", t.get("kind").asText());
            }
        }
    }
}
