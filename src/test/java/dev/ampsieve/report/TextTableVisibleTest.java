package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** A cell from data cannot break the table with a line feed or drive the terminal with ESC. */
class TextTableVisibleTest {

    @Test
    void aLineFeedInACellStaysInItsRowAsAnEscape() {
        TextTable t = new TextTable().left("id").left("note");
        t.row("a\nb", "x" + (char) 0x1b + "[2J");
        // widths by hand: "a\nb" shown as 4 characters, "x\x1b[2J" as 8
        assertEquals(List.of("id    note", "a\\nb  x\\x1b[2J"), t.lines(80));
    }
}
