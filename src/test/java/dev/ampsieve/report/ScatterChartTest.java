package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.report.ScatterChart.Point;
import java.util.List;
import org.junit.jupiter.api.Test;

class ScatterChartTest {

    private static final List<Point> THREE = List.of(
            new Point("P-1", 1e-3, 1.5, "fits"),
            new Point("P-2", 10e-3, 0.5, "no-fit"),
            new Point("P-3", 0.1e-3, 4.2, "fits"));

    @Test
    void lettersOnALogErrorAxisWithTheLimitAcross() {
        // errors 10 mV .. 100 uV over 7 rows: two decades, a third of a decade per row.
        // 1 mV lies one decade down: row 3; the 2 mV limit: log10(5)/2*6 = 2.1 -> row 2.
        // 25 plot columns: cost 0.50 at column 0, 4.20 at 24, 1.50 at round(1/3.7*24) = 6.
        List<String> lines = ScatterChart.render(THREE, 2e-3, "USD", 7, new OutputStyle(40, true, false));
        assertEquals(
                List.of(
                        "10.0 mV ┤b",
                        "        │",
                        "2.00 mV ┼───────────────────────── limit",
                        "        │      a",
                        "        │",
                        "        │",
                        " 100 µV ┤                        c",
                        "        └─────────────────────────",
                        "         0.50                 4.20 USD",
                        "  a  P-1  1.00 mV  1.50 USD  fits",
                        "  b  P-2  10.0 mV  0.50 USD  no-fit",
                        "  c  P-3   100 µV  4.20 USD  fits"),
                lines);
    }

    @Test
    void asciiFallbackAndTwoPartsInOneCell() {
        List<Point> four = new java.util.ArrayList<>(THREE);
        four.add(new Point("P-4", 0.1e-3, 4.2, "fits"));
        List<String> lines = ScatterChart.render(four, 2e-3, "USD", 5, new OutputStyle(40, false, false));
        assertEquals(
                List.of(
                        "10.0 mV +b",
                        "2.00 mV +------------------------- limit",
                        "        |      a",
                        "        |",
                        " 100 uV +                        *",
                        "        +-------------------------",
                        "         0.50                 4.20 USD",
                        "  a  P-1  1.00 mV  1.50 USD  fits",
                        "  b  P-2  10.0 mV  0.50 USD  no-fit",
                        "  c  P-3   100 uV  4.20 USD  fits",
                        "  d  P-4   100 uV  4.20 USD  fits"),
                lines);
    }

    @Test
    void fitsAreGreenAndMissesRedWhenColourIsOn() {
        List<String> lines = ScatterChart.render(THREE, 2e-3, "USD", 7, new OutputStyle(40, true, true));
        assertTrue(lines.get(0).contains(Ansi.RED + "b" + Ansi.RESET), lines.get(0));
        assertTrue(lines.get(3).contains(Ansi.GREEN + "a" + Ansi.RESET), lines.get(3));
    }

    @Test
    void theLimitIsNeverAnEdge() {
        // a single point at the limit: the axis opens a factor of 1.5 each way (1.5 mV .. 667 uV over 5 rows),
        // the limit lands on the middle row, and so does the point, which is exactly at it
        List<String> lines = ScatterChart.render(
                List.of(new Point("P-9", 1e-3, 2, "fits")), 1e-3, "EUR", 5, new OutputStyle(40, false, false));
        assertEquals("1.50 mV +", lines.get(0));
        assertEquals("1.00 mV +------------a------------ limit", lines.get(2));
        assertEquals(" 667 uV +", lines.get(4));
    }

    @Test
    void aPartJustUnderTheLimitIsDrawnUnderTheLine() {
        // 0.98 mV and 1.02 mV both round to the 1 mV limit row; each is moved to its own side of it
        List<String> lines = ScatterChart.render(
                List.of(new Point("P-1", 0.98e-3, 1, "fits"), new Point("P-2", 1.02e-3, 3, "no-fit")),
                1e-3,
                "EUR",
                5,
                new OutputStyle(40, false, false));
        assertEquals("1.00 mV +------------------------- limit", lines.get(2));
        assertEquals("        |                        b", lines.get(1));
        assertEquals("        |a", lines.get(3));
    }
}
