package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class TextTableTest {

    @Test
    void flexibleColumnShrinksToTheWidthWithAnEllipsis() {
        TextTable t = new TextTable().left("id").flex("title").right("price").row("a-1", "x".repeat(200), "1.00");
        List<String> lines = t.lines(40);
        // 40 = 3 (id) + 2 + 28 (title) + 2 + 5 (price)
        assertEquals(List.of("id   title" + " ".repeat(23) + "  price", "a-1  " + "x".repeat(27) + "…   1.00"), lines);
        lines.forEach(l -> assertTrue(l.length() <= 40, l));
    }

    @Test
    void wrappedCellsContinueUnderTheirColumnAndKeepUnitsOnTheirNumbers() {
        TextTable t = new TextTable()
                .left("part")
                .flex("reason")
                .wrapFlex()
                .row("p", "supply: needs 4.75 V to 5.25 V; short by 150 mV at the low end");
        List<String> lines = t.lines(30);
        assertEquals(
                List.of(
                        "part  reason",
                        "p     supply: needs 4.75 V to",
                        "      5.25 V; short by 150 mV",
                        "      at the low end"),
                lines);
    }

    @Test
    void rightAlignedColumnsLineUp() {
        List<String> lines = new TextTable()
                .left("x")
                .right("value")
                .row("a", "1")
                .row("b", "100")
                .lines(100);
        assertEquals(List.of("x  value", "a      1", "b    100"), lines);
    }
}
