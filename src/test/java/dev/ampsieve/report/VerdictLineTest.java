package dev.ampsieve.report;

import static dev.ampsieve.testing.PartBuilder.part;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.ampsieve.advice.Comparison;
import dev.ampsieve.advice.Ranker;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.advice.Sufficiency;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.testing.Flat;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * A stage that takes every default says, on the verdict line of budget, rank, suffices and
 * compare (and in their JSON), which terms no verdict counts and why.
 */
class VerdictLineTest {

    /** gain and limit only: no full scale, supply variation, common-mode swing or service life. */
    private static final String BARE = "gain: 10\nlimit: 1 mV\n";

    /** Every term the bare stage leaves out, grouped by cause, full scale first (NotCounted.Reason order). */
    private static final String LEFT_OUT = "open-loop gain, closed-loop bandwidth and resistor ratio not counted: "
            + "no full-scale-output; supply rejection not counted: no supply.variation; common-mode rejection not "
            + "counted: no common-mode-swing; long-term drift not counted: no service-life; operating point not counted: "
            + "no supply.voltage; self-heating not counted: no load-resistance";

    // FIT by hand, NG 10: offset 10 x 10 uV = 0.1 mV; drift estimated 10 uV / 298 K x 45 °C x 10 = 15 uV;
    // bias 10 kohm x 1 nA = 10 uV, ios assumed = ib: 10 kohm x 1 nA / 2 = 5 uV; noise well under 0.5 mV: fits 1 mV
    private static final Part FIT = part("FIT")
            .price(2.00)
            .vos(null, 10e-6)
            .ib(null, 1e-9)
            .noise(10e-9, 10.0, 1e-12, 100.0)
            .build();
    // CHEAP: offset alone 10 x 10 mV = 100 mV, a hundred times the limit
    private static final Part CHEAP = part("CHEAP")
            .price(0.50)
            .vos(null, 10e-3)
            .ib(null, 1e-9)
            .noise(10e-9, 10.0, 1e-12, 100.0)
            .build();
    // NOEN: as FIT but the catalog lacks its voltage noise
    private static final Part NOEN =
            part("NOEN").price(3.00).vos(null, 10e-6).ib(null, 1e-9).build();

    private static Stage stage(String yaml) throws Exception {
        return StageLoader.parse(yaml, Path.of("s.yaml"));
    }

    @Test
    void budgetTextSaysItUnderTheVerdictAndJsonListsTermAndReason() throws Exception {
        Budget b = BudgetCalculator.compute(stage(BARE), FIT);
        String text = BudgetText.render(b, "s.yaml");
        List<String> lines = text.lines().toList();
        int verdict = lines.indexOf(lines.stream()
                .filter(l -> l.startsWith("Verdict    fits"))
                .findFirst()
                .orElseThrow());
        assertTrue(lines.get(verdict + 1).startsWith("           but open-loop gain, "), text);
        assertTrue(Flat.of(text).contains("but " + LEFT_OUT), text);

        JsonNode j = new ObjectMapper().readTree(BudgetJson.render(b, "s.yaml"));
        List<String> pairs = new ArrayList<>();
        j.get("notCounted")
                .forEach(n ->
                        pairs.add(n.get("term").asText() + "/" + n.get("reason").asText()));
        // in the order of the terms (error-model.md)
        assertEquals(
                List.of(
                        "cmrr/no-common-mode-swing",
                        "psrr/no-supply-variation",
                        "open-loop-gain/no-full-scale-output",
                        "bandwidth/no-full-scale-output",
                        "resistors/no-full-scale-output",
                        "aging/no-service-life",
                        "operating-point/no-supply-voltage",
                        "self-heating/no-load-resistance"),
                pairs);
    }

    @Test
    void aStageWithEveryValueHasNothingToSay() throws Exception {
        Part aging = part("AGED")
                .price(2.00)
                .vos(null, 10e-6)
                .ib(null, 1e-9)
                .noise(10e-9, 10.0, 1e-12, 100.0)
                .aging(5e-6, 1000 * 3600.0)
                .build();
        Budget b = BudgetCalculator.compute(
                stage(BARE + "full-scale-output: 1 V\nsupply: {voltage: 10 V, variation: 0.5 V}\n"
                        + "resistor-ratio: {tolerance: 0.1 %}\nservice-life: 1 y\nload-resistance: 10 kohm\n"),
                aging);
        assertTrue(!BudgetText.render(b, "s.yaml").contains("not counted:"));
        assertEquals(
                0,
                new ObjectMapper()
                        .readTree(BudgetJson.render(b, "s.yaml"))
                        .get("notCounted")
                        .size());
    }

    @Test
    void sufficesSaysItUnderTheAnswerAndOnTheVerdictRow() throws Exception {
        Sufficiency s = Sufficiency.of(BudgetCalculator.compute(stage(BARE), FIT));
        String text = SufficesReport.text(s, "s.yaml");
        assertTrue(Flat.of(text).contains("But " + LEFT_OUT), text);
        assertTrue(Flat.of(text).contains("verdict fits; 8 terms not counted (named above)"), text);
        JsonNode j = new ObjectMapper().readTree(SufficesReport.json(s, "s.yaml"));
        assertEquals(8, j.get("notCounted").size());
    }

    @Test
    void compareSaysWhatBothVerdictsLackAndWhatOnePartsCatalogLacks() throws Exception {
        Stage st = stage(BARE);
        Comparison c = Comparison.of(BudgetCalculator.compute(st, FIT), BudgetCalculator.compute(st, NOEN));
        String flat = Flat.of(CompareReport.text(c, "s.yaml"));
        assertTrue(flat.contains("Both verdicts: " + LEFT_OUT), flat);
        // NOEN's absent noise figure is estimated (budget/Assumed) and marked *, so counted: no line of its own
        assertTrue(!flat.contains("Verdict of NOEN:"), flat);
        assertTrue(!flat.contains("Verdict of FIT:"), flat);
        JsonNode j = new ObjectMapper().readTree(CompareReport.json(c, "s.yaml"));
        assertEquals(8, j.get("b").get("notCounted").size());
        assertEquals(8, j.get("a").get("notCounted").size());
    }

    @Test
    void rankSaysItUnderTheTableAndItsFrontHoldsOnlyPartsThatFitUnlessAll() throws Exception {
        Ranking r = Ranker.rank(stage(BARE), List.of(FIT, CHEAP), BudgetCalculator::compute);
        String text = RankReport.text(r, "s.yaml", null, 15);
        assertTrue(Flat.of(text).contains("Every verdict: " + LEFT_OUT), text);
        // CHEAP (0.50, 100 mV, no fit) is cheaper than FIT (2.00): on the front of all parts, not of those that fit
        String front = text.substring(text.indexOf("Pareto front of"), text.indexOf("Advice"));
        assertTrue(Flat.of(front).contains("parts that fit; --all for every candidate"), front);
        assertTrue(front.contains("FIT") && !front.contains("CHEAP"), front);
        String all = RankReport.text(r, "s.yaml", null, 15, 100, true);
        String allFront = all.substring(all.indexOf("Pareto front of"), all.indexOf("Advice"));
        assertTrue(allFront.contains("FIT") && allFront.contains("CHEAP"), allFront);

        ObjectMapper m = new ObjectMapper();
        assertEquals(
                "[\"FIT\"]",
                m.readTree(RankReport.json(r, "s.yaml", null, 15)).get("pareto").toString());
        assertEquals(
                "[\"CHEAP\",\"FIT\"]",
                m.readTree(RankReport.json(r, "s.yaml", null, 15, true))
                        .get("pareto")
                        .toString());
        assertEquals(
                8,
                m.readTree(RankReport.json(r, "s.yaml", null, 15))
                        .get("candidates")
                        .get(0)
                        .get("notCounted")
                        .size());
    }

    @Test
    void rankWithNothingThatFitsSaysTheFrontIsEmpty() throws Exception {
        Ranking r = Ranker.rank(stage(BARE), List.of(CHEAP), BudgetCalculator::compute);
        String text = RankReport.text(r, "s.yaml", null, 15);
        assertTrue(text.contains("Pareto front: no part fits (--all shows the front of every candidate)"), text);
    }
}
