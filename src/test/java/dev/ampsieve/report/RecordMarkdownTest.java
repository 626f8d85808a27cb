package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.record.DecisionRecord;
import dev.ampsieve.record.RecordFacts;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The Markdown record: the same content in tables, and catalog strings that cannot break them. */
class RecordMarkdownTest {

    /** Cells of a table row, split at the pipes a backslash does not escape. */
    static List<String> cells(String row) {
        List<String> out = new java.util.ArrayList<>();
        StringBuilder c = new StringBuilder();
        for (int i = 1; i < row.length(); i++) {
            char ch = row.charAt(i);
            if (ch == '\\' && i + 1 < row.length()) {
                c.append(ch).append(row.charAt(++i));
            } else if (ch == '|') {
                out.add(c.toString().strip());
                c.setLength(0);
            } else {
                c.append(ch);
            }
        }
        return out;
    }

    @Test
    void sameContentAsTables() throws Exception {
        DecisionRecord d = RecordFixtures.bridge();
        String md = RecordReport.markdown(d);
        // hand-worked as in RecordHtmlTest: 6 mV at the output, 6 mV / 96.61 = 62.1 µV at the bridge
        assertTrue(md.contains("| limit | 6.00 mV at the output (62.1 µV at the input) |"));
        for (String id : List.of("zd-chop-01", "zd-az-06", "zd-chop-03")) {
            assertTrue(md.contains("## Part " + id), id);
        }
        assertTrue(md.contains("| verdict | fits |"));
        // zd-chop-01: 97.61 × 5 µV = 488 µV of initial offset (by hand); the ten terms each a row of every part
        assertTrue(md.contains("| initial offset | 488 µV |"));
        assertEquals(
                3, md.lines().filter(l -> l.startsWith("| initial offset |")).count());
        assertTrue(md.contains(Caution.TEXT));
        RecordFacts f = RecordReport.read(md, Path.of("r.md"));
        assertEquals(
                d.facts().parts().stream().map(p -> p.entry()).toList(),
                f.parts().stream().map(p -> p.entry()).toList());
        assertEquals("zd-chop-01", f.cheapestFit().id());
    }

    @Test
    void hostileStringsStayInTheirCell(@TempDir Path dir) throws Exception {
        String md = RecordReport.markdown(RecordFixtures.evil(dir));
        assertFalse(md.contains("<script"), "no tag a Markdown renderer would pass through");
        assertFalse(md.contains("\u001b"));
        String notes =
                md.lines().filter(l -> l.startsWith("| notes |")).findFirst().orElseThrow();
        // two cells: the pipe inside the notes is escaped, the line feed and ESC shown as \n and \x1b
        List<String> c = cells(notes);
        assertEquals(2, c.size(), notes);
        assertEquals("a \\| b\\\\x1b\\[31m red\\\\nnext =cmd &lt;/script&gt; --&gt; x", c.get(1));
        assertTrue(md.contains("## Part evil-01: &lt;script&gt;alert(1)&lt;/script&gt;"));
        // the comment holding the block is not ended by the --> in the notes
        RecordFacts f = RecordReport.read(md, Path.of("evil.md"));
        assertEquals(
                RecordFixtures.EVIL_NOTES, f.parts().get(0).entry().fields().get("notes"));
    }
}
