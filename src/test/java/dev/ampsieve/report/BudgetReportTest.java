package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class BudgetReportTest {

    private static Budget sample() {
        StageFixture s = StageFixture.nonInverting(99e3, 1e3).limitV(20e-3);
        s.supply = 10.0;
        s.fullScale = 5.0;
        PartFixture p = PartFixture.ideal().vos(null, 100e-6, null);
        p.drift = Spread.NONE; // estimated, so a warning and a mark appear
        p.ib = new Spread(null, 5e-9, null);
        p.ios = new Spread(null, 1e-9, null);
        return BudgetCalculator.compute(s.build(), p.build());
    }

    @Test
    void jsonHasTheDocumentedKeys() throws Exception {
        Budget b = sample();
        JsonNode j = new ObjectMapper().readTree(BudgetJson.render(b, "stage.yaml"));
        for (String k : List.of(
                "part",
                "noiseGain",
                "terms",
                "worstCaseV",
                "rssV",
                "noiseRmsV",
                "limitV",
                "yield",
                "trimmed",
                "verdict",
                "limitingTerm",
                "constraints",
                "warnings",
                "caution")) {
            assertTrue(j.has(k), "missing key " + k);
        }
        assertEquals("test-amp", j.get("part").asText());
        assertEquals(100.0, j.get("noiseGain").asDouble(), 0.0);
        List<String> keys = new ArrayList<>();
        j.get("terms").forEach(t -> keys.add(t.get("key").asText()));
        assertEquals(
                List.of(
                                "offset",
                                "drift",
                                "bias",
                                "cmrr",
                                "psrr",
                                "open-loop-gain",
                                "bandwidth",
                                "resistors",
                                "aging",
                                "noise",
                                "operating-point",
                                "input-crossover",
                                "self-heating",
                                "chopping-ripple")
                        .stream()
                        .sorted()
                        .toList(),
                keys.stream().sorted().toList());
        // each term says where it comes from: the part's own figures, or where the part runs
        java.util.Map<String, String> kinds = new java.util.HashMap<>();
        j.get("terms")
                .forEach(t -> kinds.put(t.get("key").asText(), t.get("kind").asText()));
        assertEquals("part", kinds.get("offset"));
        assertEquals("part", kinds.get("noise"));
        for (String k : List.of("operating-point", "input-crossover", "self-heating", "chopping-ripple")) {
            assertEquals("operating-point", kinds.get(k), k);
        }
        JsonNode offset = j.get("terms").get(0);
        assertEquals("offset", offset.get("key").asText()); // largest first
        assertEquals(10e-3, offset.get("outputV").asDouble(), 1e-15);
        assertEquals(100e-6, offset.get("inputV").asDouble(), 1e-15);
        for (String k : List.of("value", "low", "high", "trials")) {
            assertTrue(j.get("yield").has(k), "yield." + k);
        }
        assertTrue(j.get("trimmed").has("worstCaseV") && j.get("trimmed").has("rssV"));
        assertEquals(b.worstCaseV(), j.get("worstCaseV").asDouble(), 0.0);
        assertEquals(b.verdict().key(), j.get("verdict").asText());
        JsonNode c = j.get("constraints").get(0);
        assertTrue(c.has("name") && c.has("ok") && c.has("detail"));
        assertEquals(Caution.TEXT, j.get("caution").asText());
        assertTrue(j.get("warnings").get(0).asText().contains("vos-drift"));
        // no NaN in JSON: temperature-independent terms write null
        java.util.Map<String, JsonNode> byKey = new java.util.HashMap<>();
        j.get("terms").forEach(t -> byKey.put(t.get("key").asText(), t));
        assertTrue(byKey.get("cmrr").get("worstAtC").isNull(), byKey.get("cmrr").toString());
        assertTrue(byKey.get("psrr").get("worstAtC").isNull(), byKey.get("psrr").toString());
        // the initial offset is the 25 °C figure: worst at 25 °C, a number
        assertEquals(25.0, byKey.get("offset").get("worstAtC").asDouble(), 0.0);
    }

    @Test
    void textListsTermsByShareAndEndsWithTheCaution() {
        Budget b = sample();
        String t = BudgetText.render(b, "stage.yaml");
        assertTrue(t.startsWith("Part       test-amp"));
        assertTrue(t.contains("noise gain 100"));
        assertTrue(t.contains("initial offset"));
        assertTrue(t.contains("50.0 %"), "10 mV of a 20 mV limit");
        assertTrue(t.contains("offset drift*"), "estimated mark");
        assertTrue(t.indexOf("initial offset") < t.indexOf("offset drift"));
        assertTrue(t.contains("Verdict    " + b.verdict().key()));
        assertTrue(dev.ampsieve.testing.Flat.of(t).endsWith(Caution.TEXT));
        assertFalse(t.contains("NaN"));
    }

    @Test
    void yieldCriterionWithTrimShowsTheTrimmedYield() throws Exception {
        // typical-only offset 1 mV: one sigma, truncated at 3 sigma; a 2 mV limit passes
        // P(|Z| <= 2) / P(|Z| <= 3) = 0.957 < 99.9 % untrimmed (A&S table 26.1 [from memory]); a trim removes it all
        StageFixture s = StageFixture.follower().limitV(2e-3);
        s.criterion = dev.ampsieve.stage.Criterion.yield(0.999);
        s.trim = new dev.ampsieve.stage.Trim(true, dev.ampsieve.stage.Trim.Method.ONE_POINT, 0, 1);
        Budget b = BudgetCalculator.compute(
                s.build(), PartFixture.ideal().vos(1e-3, null, null).build());
        assertEquals("fits-after-trim", b.verdict().key());
        // decided from the catalog's limits, not from every unit there could be: said so
        assertTrue(
                dev.ampsieve.testing.Flat.of(BudgetText.render(b, null))
                        .contains("yield after the one-point trim: 100 % (decided without sampling:"
                                + " even the largest error the catalog's limits allow is within the limit"),
                BudgetText.render(b, null));
        JsonNode ty = new ObjectMapper()
                .readTree(BudgetJson.render(b, null))
                .get("trimmed")
                .get("yield");
        assertEquals("all-pass", ty.get("decided").asText());
        assertEquals(1.0, ty.get("low").asDouble(), 0.0);
    }

    @Test
    void anEarlyStopBelowTheTargetIsSaidAsSuch() {
        // a typical-only offset of 1 mV (one sigma, untruncated) against a 1 mV limit passes about
        // 68 % of units (P(|Z| <= 1) = 0.6827, reference-checks §7): far below a 99.9 % target, so the
        // run stops after the first block with the interval wholly under the target
        StageFixture s = StageFixture.follower().limitV(1e-3);
        s.criterion = dev.ampsieve.stage.Criterion.yield(0.999);
        Budget b = BudgetCalculator.compute(
                s.build(), PartFixture.ideal().vos(1e-3, null, null).build());
        assertTrue(b.yield().high() < 0.999);
        String t = BudgetText.render(b, null);
        assertTrue(
                dev.ampsieve.testing.Flat.of(t).contains("stopped once the interval lay wholly below the target"), t);
        assertFalse(t.contains("cleared the target"));
    }

    @Test
    void everyLineFitsTheWidthAndTheVerdictNamesTheTermAsTheTableDoes() {
        // a long stage path, a trim with its resolution and a failing constraint: the lines that ran
        // past 100 columns (trim notes, constraint details) before
        StageFixture s = StageFixture.nonInverting(99e3, 1e3).limitV(6e-3);
        s.supply = 5.0;
        s.fullScale = 2.0;
        s.tMin = -40;
        s.tMax = 85;
        s.trim = new dev.ampsieve.stage.Trim(true, dev.ampsieve.stage.Trim.Method.ONE_POINT, 500e-6, 0.5);
        PartFixture p = PartFixture.ideal().vos(null, 150e-6, null);
        p.temperature = new dev.ampsieve.catalog.Range(0, 70);
        Budget b = BudgetCalculator.compute(s.build(), p.build());
        for (int width : new int[] {100, 80}) {
            String t = BudgetText.render(b, "/some/rather/long/folder/of/stage/files/bridge-amp.yaml", width);
            for (String line : t.split("\n")) {
                assertTrue(line.codePointCount(0, line.length()) <= width, width + " columns: " + line);
            }
            assertTrue(dev.ampsieve.testing.Flat.of(t).contains("FAIL temperature"), t);
            assertTrue(dev.ampsieve.testing.Flat.of(t).contains("; the stage's trim"), t);
        }
        assertEquals("offset", b.limitingTerm());
        assertTrue(BudgetText.render(b, null).contains("(largest term: initial offset)"));
    }

    @org.junit.jupiter.api.Test
    void aShareOfTheLimitNeverTouchesTheFigureBeforeIt() {
        // 998 mV against 6 mV: 16633.3 % printed "16633.3 %" filled the 9-character column and left one space
        // before it ("10.3 mV 16633.3 %"); from 1000 % the decimal goes, from 100,000 % a power of ten is used
        org.junit.jupiter.api.Assertions.assertEquals("122.0 %", BudgetText.percentCell(122.015));
        org.junit.jupiter.api.Assertions.assertEquals("999.9 %", BudgetText.percentCell(999.94));
        org.junit.jupiter.api.Assertions.assertEquals("1000 %", BudgetText.percentCell(999.96));
        org.junit.jupiter.api.Assertions.assertEquals("16633 %", BudgetText.percentCell(16633.3));
        org.junit.jupiter.api.Assertions.assertEquals("99999 %", BudgetText.percentCell(99999.4));
        // 1.66e6 % = 1.7 x 10^6: one decimal of the mantissa; 9.96e5 rounds to 1.0e6, not "10.0e5"
        org.junit.jupiter.api.Assertions.assertEquals("1.7e6 %", BudgetText.percentCell(1.66e6));
        org.junit.jupiter.api.Assertions.assertEquals("1.0e6 %", BudgetText.percentCell(9.96e5));
        for (double p : new double[] {0, 5.5, 999.94, 12345.6, 99999.4, 1.234e7, 9.99e9}) {
            org.junit.jupiter.api.Assertions.assertTrue(
                    BudgetText.percentCell(p).length() <= 8, p + "");
        }
    }
}
