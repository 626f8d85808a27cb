package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import dev.ampsieve.advice.Candidate;
import dev.ampsieve.advice.Ranker;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Text, JSON and CSV of {@code rank} show the same figures for every part of every demo stage:
 * the verdict, effective cost, worst-case, RSS, yield shown, margin and largest term. The text
 * is compared after rounding the JSON figure to the digits the text prints; the CSV (6 significant
 * digits) to the JSON within that precision.
 */
class RankFormatsAgreeTest {

    private static Catalog catalog;

    @BeforeAll
    static void load() throws Exception {
        catalog = CatalogLoader.load(Path.of("demo-catalog"), false);
    }

    static Stream<Path> stages() throws IOException {
        try (Stream<Path> s = Files.list(Path.of("demo-catalog/stages"))) {
            return s.filter(p -> p.toString().endsWith(".yaml")).sorted().toList().stream();
        }
    }

    @Test
    void everyDemoStageIsCompared() throws IOException {
        // demo-catalog/stages holds five stages (adc-driver, bridge-amp, photodiode, relay-scanner, thermocouple)
        assertEquals(5, stages().count());
    }

    @ParameterizedTest
    @MethodSource("stages")
    void textJsonAndCsvAgreeOnEveryFigure(Path file) throws Exception {
        Stage stage = StageLoader.load(file);
        Ranking r = Ranker.rank(stage, catalog.parts(), BudgetCalculator::compute);
        int top = r.candidates().size();
        String label = file.getFileName().toString();
        String text = RankReport.text(r, label, null, top, 400, false);
        JsonNode json = JsonSupport.MAPPER.readTree(RankReport.json(r, label, null, top, false));
        String csv = RankReport.csv(r, label, null, top, false);

        List<String[]> textRows = textRows(text);
        List<Map<String, String>> csvRows = csvRows(csv);
        JsonNode cands = json.get("candidates");
        assertEquals(r.candidates().size(), textRows.size(), text);
        assertEquals(r.candidates().size(), cands.size());
        // one CSV data row per candidate, then one per rejected part: the '#' lines are not data
        assertEquals(r.candidates().size() + r.rejected().size(), csvRows.size());

        // the comment lines say what the text's stage lines say
        List<String> head = text.lines().limit(2).toList();
        List<String> comments = csv.lines().filter(l -> l.startsWith("#")).toList();
        assertEquals("# stage: " + head.get(0).substring("Stage ".length()), comments.get(0));
        assertEquals("# limit: " + head.get(1).substring("Limit ".length()), comments.get(1));
        assertEquals("# " + Caution.TEXT, comments.get(2));

        boolean byYield = stage.criterion().kind() == Criterion.Kind.YIELD;
        int trimmedRows = 0;
        for (int i = 0; i < top; i++) {
            Candidate c = r.candidates().get(i);
            String[] t = textRows.get(i);
            JsonNode j = cands.get(i);
            Map<String, String> v = csvRows.get(i);
            String id = c.id();
            String where = file.getFileName() + " " + id;
            assertEquals(id, t[1], where);
            assertEquals(id, j.get("part").asText(), where);
            assertEquals(id, v.get("part"), where);
            assertEquals(Integer.toString(i + 1), v.get("rank"), where);

            // verdict: the text's short word (README "rank"), '*' when it rests on an estimate
            String key = j.get("verdict").asText();
            assertEquals(key, v.get("verdict"), where);
            boolean estimate = j.get("restsOnEstimate").asBoolean();
            assertEquals(Boolean.toString(estimate), v.get("rests_on_estimate"), where);
            String word = switch (key) {
                case "fits" -> "fits";
                case "fits-after-trim" -> "+trim";
                case "undecided" -> "undecided";
                case "no-fit" -> "no";
                default -> throw new AssertionError(where + ": verdict " + key);
            };
            assertEquals(word + (estimate ? "*" : ""), t[2], where);

            boolean trimmed = j.get("trimmed").asBoolean();
            assertEquals(Boolean.toString(trimmed), v.get("trimmed"), where);

            double cost = num(j, "effectiveCost");
            assertClose(cost, v.get("effective_cost"), where + " cost");
            assertEquals(Figures.money(cost), t[3], where + " cost");

            // worst-case and RSS as ranked: after the trim exactly for the rows ranked with it
            double wc = num(j, "rankedWorstCaseV");
            double rss = num(j, "rankedRssV");
            assertEquals(num(j, trimmed ? "trimmedWorstCaseV" : "worstCaseV"), wc, 0.0, where);
            assertEquals(num(j, trimmed ? "trimmedRssV" : "rssV"), rss, 0.0, where);
            assertClose(wc, v.get("ranked_worst_case_v"), where + " worst-case");
            assertClose(rss, v.get("ranked_rss_v"), where + " RSS");
            assertEquals(Figures.volts(wc), t[4], where + " worst-case");
            assertEquals(Figures.volts(rss), t[5], where + " RSS");
            assertClose(num(j, "worstCaseV"), v.get("untrimmed_worst_case_v"), where);
            assertClose(num(j, "rssV"), v.get("untrimmed_rss_v"), where);
            assertClose(num(j, "trimmedWorstCaseV"), v.get("trimmed_worst_case_v"), where);
            assertClose(num(j, "trimmedRssV"), v.get("trimmed_rss_v"), where);

            // the judged error is the worst-case sum under a worst-case criterion, the RSS total otherwise
            double err = num(j, "errorV");
            assertEquals(stage.criterion().kind() == Criterion.Kind.WORST_CASE ? wc : rss, err, 0.0, where);
            assertClose(err, v.get("error_v"), where + " error");

            // the yield shown: the trimmed one on a row ranked with the trim (the old CSV gave the untrimmed)
            JsonNode ry = j.get("rankedYield");
            // a yield criterion always has one; under the others a part may carry a yield too (then it is shown)
            assertTrue(!byYield || !ry.isNull(), where);
            if (ry.isNull()) {
                assertEquals("", v.get("ranked_yield"), where);
                assertEquals(Figures.NONE, t[6], where);
            } else {
                JsonNode expect = trimmed ? j.get("trimmedYield") : j.get("yield");
                assertNotNull(expect, where);
                assertEquals(expect.get("value").asDouble(), ry.get("value").asDouble(), 0.0, where);
                assertClose(ry.get("value").asDouble(), v.get("ranked_yield"), where + " yield");
                assertClose(ry.get("low").asDouble(), v.get("ranked_yield_low"), where + " yield low");
                assertEquals(Figures.yield(ry.get("value").asDouble()), t[6], where + " yield");
            }
            JsonNode uy = j.get("yield");
            if (uy.isNull()) {
                assertEquals("", v.get("untrimmed_yield"), where);
            } else {
                assertClose(uy.get("value").asDouble(), v.get("untrimmed_yield"), where + " untrimmed yield");
            }
            trimmedRows += trimmed ? 1 : 0;

            double margin = num(j, "margin");
            assertClose(margin, v.get("margin"), where + " margin");
            assertEquals(byYield ? Figures.yieldMargin(margin) : Figures.percent(margin), t[7], where + " margin");

            // largest term: the same key in JSON and CSV; the text names its label, † after a trim
            String term = j.get("limitingTerm").isNull()
                    ? null
                    : j.get("limitingTerm").asText();
            assertEquals(term == null ? "" : term, v.get("limiting_term"), where);
            if (term == null) {
                assertEquals(Figures.NONE, t[8], where);
            } else {
                String shown = c.budget().term(term).label();
                assertTrue(t[8].startsWith(shown), where + ": " + t[8] + " against " + shown);
                assertEquals(trimmed, t[8].endsWith(" †"), where + ": " + t[8]);
            }

            List<String> est = new ArrayList<>();
            j.get("estimatedTerms").forEach(e -> est.add(e.asText()));
            assertEquals(String.join(";", est), v.get("estimated_terms"), where);
            List<String> nc = new ArrayList<>();
            j.get("notCounted")
                    .forEach(e -> nc.add(
                            e.get("term").asText() + ":" + e.get("reason").asText()));
            assertEquals(String.join(";", nc), v.get("not_counted"), where);
        }
        for (int k = 0; k < r.rejected().size(); k++) {
            Map<String, String> v = csvRows.get(top + k);
            assertEquals(r.rejected().get(k).id(), v.get("part"));
            assertEquals("rejected", v.get("verdict"));
        }
        if (label.equals("bridge-amp.yaml")) {
            // the bridge stage ranks prec-bip-05 with its trim (see demo-catalog/README.md): the case that disagreed
            assertTrue(trimmedRows > 0, "no +trim row on the bridge stage");
        }
    }

    @Test
    void aStageLabelOrQueryCannotBreakOutOfItsCommentLine() throws Exception {
        Path file = Path.of("demo-catalog/stages/bridge-amp.yaml");
        Ranking r = Ranker.rank(StageLoader.load(file), catalog.parts(), BudgetCalculator::compute);
        String csv = RankReport.csv(r, "br\u001b[2Jidge.yaml\n=cmd", "vos<1mV\n=HYPERLINK(1)", 3, false);
        List<String> lines = csv.lines().toList();
        // ESC and line feed shown as \x1b and \n (README, "control characters"): still one comment line each
        assertTrue(lines.get(0).startsWith("# stage: br\\x1b[2Jidge.yaml\\n=cmd: difference, "), lines.get(0));
        assertEquals("# query: vos<1mV\\n=HYPERLINK(1)", lines.get(2));
        assertEquals("# " + Caution.TEXT, lines.get(3));
        assertTrue(lines.get(4).startsWith("rank,part,"), lines.get(4));
        assertFalse(csv.contains("\u001b"), csv);
        // 3 candidates, then every rejected part, and nothing else read as data
        assertEquals(3 + r.rejected().size(), csvRows(csv).size());
    }

    /** JSON number, null (not applicable) as NaN. */
    private static double num(JsonNode j, String key) {
        JsonNode n = j.get(key);
        return n == null || n.isNull() ? Double.NaN : n.asDouble();
    }

    /** A CSV figure (6 significant digits, empty for not applicable) against the JSON one. */
    private static void assertClose(double expected, String cell, String where) {
        if (Double.isNaN(expected)) {
            assertEquals("", cell, where);
            return;
        }
        assertFalse(cell.isEmpty(), where);
        assertEquals(expected, Double.parseDouble(cell), Math.abs(expected) * 1e-5 + 1e-15, where);
    }

    /** The candidate table's rows, cells split where two or more spaces part them (cells hold single spaces). */
    static List<String[]> textRows(String text) {
        List<String> lines = text.lines().toList();
        int h = 0;
        while (!lines.get(h).matches("\\s*#\\s+part\\s+verdict\\s.*")) {
            h++;
        }
        List<String[]> rows = new ArrayList<>();
        for (String l : lines.subList(h + 1, lines.size())) {
            if (l.isBlank() || l.startsWith("verdict:")) {
                break;
            }
            rows.add(l.strip().split("\\s{2,}"));
        }
        return rows;
    }

    /** The CSV read as a spreadsheet set to skip '#' lines would read it: jackson's CSV reader with comments on. */
    static List<Map<String, String>> csvRows(String csv) throws IOException {
        CsvMapper m = new CsvMapper();
        m.enable(CsvParser.Feature.ALLOW_COMMENTS);
        List<Map<String, String>> out = new ArrayList<>();
        try (MappingIterator<Map<String, String>> it = m.readerForMapOf(String.class)
                .with(CsvSchema.emptySchema().withHeader())
                .readValues(csv)) {
            while (it.hasNext()) {
                out.add(it.next());
            }
        }
        return out;
    }
}
