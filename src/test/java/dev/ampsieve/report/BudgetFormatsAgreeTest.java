package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import dev.ampsieve.advice.Comparison;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Text, JSON and CSV of {@code budget} and of {@code compare} show the same figures, for every part
 * of the demo catalog in every demo stage (compare: each part against the next in catalog order).
 * A text figure is read back with the unit parser and must lie within half a unit of its last
 * printed digit of the JSON figure; a CSV figure (6 significant digits) within 1e-5 of it.
 */
class BudgetFormatsAgreeTest {

    private static Catalog catalog;

    @BeforeAll
    static void load() throws Exception {
        catalog = CatalogLoader.load(Path.of("demo-catalog"), false);
    }

    static Stream<Path> stages() throws Exception {
        return RankFormatsAgreeTest.stages();
    }

    @ParameterizedTest
    @MethodSource("stages")
    void budgetTextJsonAndCsvAgreeForEveryPart(Path file) throws Exception {
        Stage stage = StageLoader.load(file);
        String label = file.getFileName().toString();
        for (Part p : catalog.parts()) {
            Budget b = BudgetCalculator.compute(stage, p);
            String where = label + " " + p.id();
            String text = BudgetText.render(b, List.of(), label, 400);
            JsonNode json = JsonSupport.MAPPER.readTree(BudgetJson.render(b, label));
            List<Map<String, String>> csv = RankFormatsAgreeTest.csvRows(BudgetCsv.render(b, label));

            Map<String, String[]> textTerms = textTerms(text);
            Map<String, Map<String, String>> csvByKey = new HashMap<>();
            csv.forEach(r -> csvByKey.put(r.get("section") + "/" + r.get("key"), r));
            JsonNode terms = json.get("terms");
            assertEquals(terms.size(), textTerms.size(), where + "\n" + text);
            for (JsonNode t : terms) {
                String key = t.get("key").asText();
                String w = where + " " + key;
                double out = t.get("outputV").asDouble();
                String[] row = textTerms.get(t.get("label").asText());
                assertNotNull(row, w + ": no text row for " + t.get("label").asText() + "\n" + text);
                assertPrinted(out, row[1], Dimension.VOLTAGE, w + " output");
                if (t.hasNonNull("shareOfLimit")) {
                    // "122.0 %": one decimal of a percentage
                    assertTrue(
                            row.length == 5 && row[3].endsWith(" %"), w + ": " + String.join("|", row) + "\n" + text);
                    // "122.0 %", "16633 %", "1.2e6 %": within half the last printed digit
                    String cell = row[3].replace(" %", "").strip();
                    double pct = Double.parseDouble(cell);
                    double half = cell.contains("e")
                            ? 0.05 * Math.pow(10, Integer.parseInt(cell.substring(cell.indexOf('e') + 1)))
                            : cell.contains(".") ? 0.05 : 0.5;
                    assertEquals(100 * t.get("shareOfLimit").asDouble(), pct, half + 1e-9, w + " share");
                }
                assertEquals(t.get("estimated").asBoolean(), row[0].endsWith("*"), w + " estimated mark");
                Map<String, String> c = csvByKey.get("term/" + key);
                assertNotNull(c, w + " CSV row");
                assertClose(out, c.get("output_v"), w + " CSV output");
                assertEquals(t.get("kind").asText(), c.get("kind"), w);
                assertEquals(t.get("estimated").asText(), c.get("estimated"), w);
                assertEquals(t.get("counted").asText(), c.get("counted"), w);
                String inKey = t.has("inputA") ? "inputA" : "inputV";
                assertClose(t.get(inKey).asDouble(), c.get("input"), w + " CSV input");
                assertEquals(inKey.equals("inputA") ? "A" : "V", c.get("input_unit"), w);
            }
            // totals
            String[][] totals = {
                {"worstCaseV", "worst-case sum", "worst-case"},
                {"rssV", "root-sum-square", "rss"},
                {"noiseRmsV", "noise rms", "noise-rms"},
                {"noisePeakToPeakV", "noise peak-to-peak", "noise-peak-to-peak"}
            };
            for (String[] tot : totals) {
                double v = json.get(tot[0]).asDouble();
                String line = text.lines()
                        .filter(l -> l.startsWith(tot[1] + " "))
                        .findFirst()
                        .orElseThrow(() -> new AssertionError(where + ": no " + tot[1] + "\n" + text));
                String[] cells = line.strip().split("\\s{2,}");
                assertPrinted(v, cells[1], Dimension.VOLTAGE, where + " " + tot[1]);
                assertClose(v, csvByKey.get("total/" + tot[2]).get("output_v"), where + " CSV " + tot[1]);
            }
            // the stage's trim: JSON "trimmed" against the CSV row of that method
            JsonNode tr = json.get("trimmed");
            String method = b.stage().trim() == null
                    ? "one-point"
                    : b.stage().trim().method().key();
            assertClose(
                    tr.get("worstCaseV").asDouble(),
                    csvByKey.get("trimmed/" + method + ".worst-case").get("output_v"),
                    where + " trimmed");
            assertClose(
                    tr.get("rssV").asDouble(),
                    csvByKey.get("trimmed/" + method + ".rss").get("output_v"),
                    where);
            // yield: the text's "Yield      0.200 % (...": the JSON value within the printed digits
            double y = json.get("yield").get("value").asDouble();
            assertClose(y, csvByKey.get("yield/as-is").get("yield"), where + " CSV yield");
            String yl = text.lines()
                    .filter(l -> l.startsWith("Yield "))
                    .findFirst()
                    .orElseThrow()
                    .substring("Yield".length())
                    .strip();
            if (!yl.startsWith("-") && !yl.startsWith("not")) {
                String pct = yl.substring(0, yl.indexOf('%')).strip();
                int decimals = pct.contains(".") ? pct.length() - pct.indexOf('.') - 1 : 0;
                assertEquals(100 * y, Double.parseDouble(pct), Math.pow(10, -decimals) + 1e-9, where + " yield");
            }
            // verdict
            String verdict = b.constraintsMet() ? json.get("verdict").asText() : "rejected";
            assertEquals(verdict, csv.get(csv.size() - 1).get("key"), where);
            if (b.constraintsMet()) {
                assertTrue(
                        text.lines().anyMatch(l -> l.startsWith("Verdict    " + verdict)), where + " verdict\n" + text);
            }
        }
    }

    @ParameterizedTest
    @MethodSource("stages")
    void compareTextJsonAndCsvAgree(Path file) throws Exception {
        Stage stage = StageLoader.load(file);
        String label = file.getFileName().toString();
        List<Budget> budgets = new ArrayList<>();
        for (Part p : catalog.parts()) {
            budgets.add(BudgetCalculator.compute(stage, p));
        }
        for (int i = 0; i + 1 < budgets.size(); i++) {
            Comparison c = Comparison.of(budgets.get(i), budgets.get(i + 1));
            String where = label + " " + c.a().id() + " vs " + c.b().id();
            String text = CompareReport.text(c, label, 400);
            JsonNode json = JsonSupport.MAPPER.readTree(CompareReport.json(c, label));
            List<Map<String, String>> csv = RankFormatsAgreeTest.csvRows(CompareReport.csv(c, label));
            Map<String, String[]> rows = new HashMap<>();
            for (String l : text.lines().toList()) {
                String[] cells = l.strip().split("\\s{2,}");
                if (cells.length >= 4) {
                    rows.putIfAbsent(cells[0].replace(" (op)", "").replace(" (board)", ""), cells);
                }
            }
            JsonNode terms = json.get("terms");
            for (int k = 0; k < terms.size(); k++) {
                JsonNode t = terms.get(k);
                String w = where + " " + t.get("key").asText();
                String[] row = rows.get(t.get("label").asText());
                assertNotNull(row, w + "\n" + text);
                assertPrinted(t.get("aV").asDouble(), row[1].replace("*", ""), Dimension.VOLTAGE, w + " a");
                assertPrinted(t.get("bV").asDouble(), row[2].replace("*", ""), Dimension.VOLTAGE, w + " b");
                assertEquals(t.get("aEstimated").asBoolean(), row[1].endsWith("*"), w);
                assertEquals(t.get("bEstimated").asBoolean(), row[2].endsWith("*"), w);
                String better = t.get("better").asText();
                assertEquals(better, row[3], w + " better");
                Map<String, String> v = csv.get(k);
                assertEquals("term", v.get("section"), w);
                assertEquals(t.get("key").asText(), v.get("key"), w);
                assertClose(t.get("aV").asDouble(), v.get("a"), w);
                assertClose(t.get("bV").asDouble(), v.get("b"), w);
                assertEquals(better.equals("=") ? "equal" : better, v.get("better"), w);
            }
            Map<String, String> pref = csv.get(csv.size() - 1);
            assertEquals("preferred", pref.get("section"), where);
            assertEquals(
                    json.get("preferred").isNull()
                            ? "equal"
                            : json.get("preferred").asText(),
                    pref.get("better"));
            assertClose(
                    json.get("a").get("effectiveCost").asDouble(),
                    csv.get(csv.size() - 4).get("a"),
                    where);
            assertClose(
                    json.get("b").get("margin").asDouble(),
                    csv.get(csv.size() - 3).get("b"),
                    where);
            assertTrue(
                    CompareReport.csv(c, label)
                            .contains("# conclusion: " + json.get("conclusion").asText()),
                    where);
        }
    }

    /** {@code printed} (e.g. "7.32 mV", "0 V") read back is {@code expected} to within half its last digit. */
    static void assertPrinted(double expected, String printed, Dimension d, String where) throws Exception {
        String s = printed.strip();
        double got = Units.parse(s, d);
        String mantissa = s.replaceAll("[^0-9.].*$", "");
        int decimals = mantissa.contains(".") ? mantissa.length() - mantissa.indexOf('.') - 1 : 0;
        double scale = mantissa.isEmpty() || Double.parseDouble(mantissa) == 0 ? 0 : got / Double.parseDouble(mantissa);
        double halfDigit = 0.5 * Math.pow(10, -decimals) * Math.abs(scale);
        assertFalse(Double.isNaN(got), where);
        assertEquals(expected, got, halfDigit + Math.abs(expected) * 1e-12 + 1e-15, where + ": printed " + printed);
    }

    private static void assertClose(double expected, String cell, String where) {
        assertFalse(cell == null || cell.isEmpty(), where + ": empty cell");
        assertEquals(expected, Double.parseDouble(cell), Math.abs(expected) * 1e-5 + 1e-15, where);
    }

    /** The term table's rows by label (kind tag and '*' taken off the label): label, output, input, share, worst at. */
    private static Map<String, String[]> textTerms(String text) {
        List<String> lines = text.lines().toList();
        int h = 0;
        while (!lines.get(h).startsWith("term ")) {
            h++;
        }
        Map<String, String[]> out = new HashMap<>();
        for (String l : lines.subList(h + 1, lines.size())) {
            if (l.isBlank() || l.startsWith("* ") || l.startsWith("(")) {
                break;
            }
            String[] cells = l.strip().split("\\s{2,}");
            String name = cells[0];
            boolean star = name.endsWith("*");
            name = name.replace("*", "").replace(" (op)", "").replace(" (board)", "");
            cells[0] = name + (star ? "*" : "");
            out.put(name, cells);
        }
        return out;
    }
}
