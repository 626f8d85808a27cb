package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class WrapTest {

    @Test
    void prose_folds_at_word_boundaries_under_its_bullet() {
        String in = "  - bias current up to 400 pA at 25 °C gives 82.5 µV at the output here";
        assertEquals(
                "  - bias current up to 400 pA at\n" + "    25 °C gives 82.5 µV at the\n" + "    output here",
                Wrap.prose(in, 34));
    }

    @Test
    void a_label_column_keeps_its_value_folded_under_itself() {
        String in = "Yield      88.4 % (95 % interval 86.3 % to 90.2 %, 1000 units)";
        assertEquals(
                "Yield      88.4 % (95 % interval\n" + "           86.3 % to 90.2 %, 1000\n" + "           units)",
                Wrap.prose(in, 34));
    }

    @Test
    void table_rows_and_short_lines_are_left_alone() {
        String row = "1  zd-chop-01  fits  2.30  806 µV  544 µV  100 %  60 %  initial offset";
        assertEquals(row, Wrap.prose(row, 30));
        assertEquals("short line\n\nnext", Wrap.prose("short line\n\nnext", 30));
    }

    @Test
    void a_word_longer_than_the_width_stands_on_its_own_line() {
        assertEquals(
                "see\n/a/very/long/path/to/a/stage.yaml\nnow",
                Wrap.prose("see /a/very/long/path/to/a/stage.yaml now", 20));
    }

    @Test
    void a_unit_stays_on_its_number() {
        // cut at 46 columns the line would end in "(2182.4" with "%)" alone on the next
        String in = "           two-point: worst-case 140 mV, RSS 131 mV (2182.4 %)";
        assertEquals(
                "           two-point: worst-case 140 mV, RSS\n" + "           131 mV (2182.4 %)", Wrap.prose(in, 46));
        assertEquals("drift up to\n3.84 µV/°C here", Wrap.prose("drift up to 3.84 µV/°C here", 20));
        // temperatures typed in ASCII, as the shell's questions write them
        assertEquals("the distance from\n25 C; the part", Wrap.prose("the distance from 25 C; the part", 20));
        // words after a number that are not units still fold as before
        assertEquals("spread over 1000000\nunits here", Wrap.prose("spread over 1000000 units here", 20));
    }
}
