package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.record.DecisionRecord;
import dev.ampsieve.record.RecordFacts;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.select.Elements;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The HTML record of the demo bridge stage, parsed as a browser would. */
class RecordHtmlTest {

    static DecisionRecord record;
    static String html;
    static Document doc;

    @BeforeAll
    static void render() throws Exception {
        record = RecordFixtures.bridge();
        html = RecordReport.html(record);
        doc = Jsoup.parse(html);
    }

    /** The ten error terms of a budget (TermResult's keys; README "Error terms"). */
    /** The part's ten terms and the four of its operating point; the bridge stage names no board-level source. */
    static final Set<String> TERMS = Set.of(
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
            "chopping-ripple");

    private static String row(Element table, String name) {
        for (Element tr : table.select("tr")) {
            Elements td = tr.select("td");
            if (td.size() >= 2 && td.get(0).text().equals(name)) {
                return td.get(1).text();
            }
        }
        return null;
    }

    @Test
    void stageValuesAndAssumptions() {
        Element stage = doc.getElementById("stage").nextElementSibling();
        // noise gain 1 + r2/(r1 + rs) = 1 + 499k/(4990 + 175) = 97.61; signal gain 499k/5165 = 96.61 (by hand)
        assertEquals("97.61", row(stage, "noise gain"));
        assertEquals("96.61", row(stage, "signal gain"));
        // limit: 6 mV at the output (stage file); 6 mV / 96.61 = 62.1 µV at the bridge (by hand)
        assertEquals("6.00 mV at the output (62.1 µV at the input)", row(stage, "limit"));
        assertEquals("-40 °C to 85 °C (largest distance from 25 °C: 65 °C)", row(stage, "temperatures"));
        // trim: one-point, 0.60 per unit, allowed (stage file; demo-catalog/README.md)
        assertTrue(row(stage, "trim").startsWith("allowed, method one-point, cost 0.60 per unit"), row(stage, "trim"));
        assertEquals("3 (a datasheet maximum read as this many standard deviations)", row(stage, "max-to-sigma"));
        assertTrue(doc.text().contains(Caution.TEXT));
        assertTrue(doc.select("pre").text().contains("limit: 6 mV"), "the stage as a stage file");
    }

    @Test
    void shortlistEachPartsTermsAndVerdict() {
        // the three cheapest parts that fit, as 'ampsieve rank --stage demo-catalog/stages/bridge-amp.yaml' lists them
        assertEquals(
                List.of("zd-chop-01", "zd-az-06", "zd-chop-03"),
                record.facts().parts().stream().map(p -> p.id()).toList());
        for (String id : List.of("zd-chop-01", "zd-az-06", "zd-chop-03")) {
            Element h = doc.getElementById("part-" + id);
            assertTrue(h != null, id);
            Element info = h.nextElementSibling();
            assertEquals("fits", row(info, "verdict"), id);
            assertEquals("invented demo data", row(info, "source"), id);
            assertTrue(
                    row(info, "catalog file").matches(".*demo-catalog/zero-drift/[a-z-]+\\.yaml:\\d+"),
                    row(info, "catalog file"));
            assertTrue(row(info, "entry SHA-256").matches("[0-9a-f]{64}"));
            // the part's own chart: one bar per term, each of the fourteen terms once
            Element svg = chartAfter(h);
            Elements bars = svg.select("rect.term");
            assertEquals(14, bars.size(), id);
            assertEquals(TERMS, bars.stream().map(b -> b.attr("data-term")).collect(Collectors.toSet()), id);
        }
        // zd-chop-01: 97.61 × 5 µV (vos.max in zero-drift/chopper.yaml) = 488 µV of initial offset (by hand)
        Element budget = doc.getElementById("part-zd-chop-01").parent().select("table").stream()
                .filter(t -> t.text().contains("how (operands)"))
                .findFirst()
                .orElseThrow();
        assertEquals(
                "488 µV",
                budget.select("tr:has(td:containsOwn(initial offset)) td")
                        .get(1)
                        .text());
        assertTrue(budget.text().contains("NG x vos 5.00 µV"), "the operands of the term");
    }

    private static Element chartAfter(Element heading) {
        for (Element e = heading.nextElementSibling(); e != null; e = e.nextElementSibling()) {
            if (e.tagName().equals("svg")) {
                return e;
            }
        }
        throw new AssertionError("no chart after " + heading.text());
    }

    @Test
    void barLimitLineSitsWhereTheScalePutsIt() {
        Element svg = chartAfter(doc.getElementById("part-zd-chop-01"));
        Element limit = svg.selectFirst("line.limit");
        // every term of zd-chop-01 is under the 6 mV limit (largest: resistor ratio 1.65 mV), so the axis
        // runs to 1.25 × 6 mV over 520 px from x = 200: the limit at 200 + 520 / 1.25 = 616 (by hand)
        assertEquals("616", limit.attr("x1"));
        assertEquals("616", limit.attr("x2"));
    }

    @Test
    void scatterHasAPointPerCandidateThePathAndTheLimit() {
        Element svg = chartAfter(doc.getElementById("ranking"));
        Element ranking = doc.getElementById("ranking").nextElementSibling().nextElementSibling();
        int rows = ranking.select("tbody tr").size();
        // 28 parts meet the hard constraints ('ampsieve rank' on the bridge stage: "28 budgeted"), each with a price
        assertEquals(28, rows);
        assertEquals(rows, svg.select("circle.candidate").size());
        long onFront = ranking.select("tbody tr").stream()
                .filter(tr -> tr.select("td").last().text().equals("yes"))
                .count();
        assertEquals(onFront, svg.select("circle.pareto").size());
        assertEquals(1, svg.select("polyline.pareto").size());
        // errors span 1.86 mV (zd-az-06) to 672 mV (fast-01), so the log axis runs 1 mV to 1 V over 300 px
        // from y = 20: the 6 mV limit at 20 + 300 × (0 - log10 0.006) / 3 = 20 + 100 × 2.2218 = 242.18 (by hand)
        Element limit = svg.selectFirst("line.limit");
        assertEquals("242.18", limit.attr("y1"));
        // a second reading: every part that fits (filled) lies under the limit (a larger y on screen)
        for (Element c : svg.select("circle.fits")) {
            assertTrue(Double.parseDouble(c.attr("cy")) > 242.18, c.attr("data-part"));
        }
    }

    @Test
    void theEmbeddedBlockReadsBackAndNothingIsFetched() throws Exception {
        Element block = doc.getElementById("ampsieve-decision-record");
        assertEquals("script", block.tagName());
        assertEquals("application/json", block.attr("type"));
        RecordFacts f = RecordReport.read(html, Path.of("r.html"));
        assertEquals(record.facts().parts().get(0).entry(), f.parts().get(0).entry());
        assertEquals("zd-chop-01", f.cheapestFit().id());
        assertEquals(RecordFixtures.BRIDGE.toString(), f.stagePath());
        // self-contained: no external script, style sheet, image or font
        assertTrue(doc.select("script[src], link, img[src], iframe, object").isEmpty());
        assertFalse(
                html.replace("http://www.w3.org/2000/svg", "").matches("(?s).*(https?:|//[a-z]).*"),
                "no address but the SVG namespace");
        // print layout: each part begins a page
        assertEquals(3, doc.select("div.page-break").size());
        assertTrue(doc.select("style").html().contains("@media print"));
    }

    @Test
    void hostileCatalogStringsShowAsText(@TempDir Path dir) throws Exception {
        DecisionRecord d = RecordFixtures.evil(dir);
        String h = RecordReport.html(d);
        Document e = Jsoup.parse(h);
        // only our own JSON block is a script; the title's script is text in the heading
        assertEquals(1, e.select("script").size());
        assertEquals("ampsieve-decision-record", e.selectFirst("script").id());
        assertEquals(
                "Part evil-01: " + RecordFixtures.EVIL_TITLE,
                e.getElementById("part-evil-01").text());
        // ESC and the line feed shown by text.Visible, never written raw
        assertFalse(h.contains("\u001b"));
        Element info = e.getElementById("part-evil-01").nextElementSibling();
        assertEquals("a | b\\x1b[31m red\\nnext =cmd </script> --> x", row(info, "notes"));
        assertEquals("=cmd|calc", row(info, "source"));
        // the block survives a </script> and a --> inside a string, and gives the notes back exactly
        RecordFacts f = RecordReport.read(h, Path.of("evil.html"));
        assertEquals(
                RecordFixtures.EVIL_NOTES, f.parts().get(0).entry().fields().get("notes"));
        assertEquals(
                RecordFixtures.EVIL_TITLE, f.parts().get(0).entry().fields().get("title"));
    }
}
