package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.report.BarChart.Bar;
import java.util.List;
import org.junit.jupiter.api.Test;

class BarChartTest {

    private static final List<Bar> TERMS =
            List.of(new Bar("offset", 1e-3), new Bar("drift", 0.5e-3), new Bar("noise", 40e-6));

    @Test
    void unicodeBarsUseEighthsAndMarkTheLimit() {
        // 40 columns: label 10 + value 7 + share 4 + 3 gaps + 1 limit column leaves 15 bar cells.
        // offset 1 mV of 2 mV: 7.5 cells = 7 full + 4/8; drift 0.5 mV: 3.75 = 3 + 6/8;
        // noise 40 uV: 0.3 cells = 2.4 eighths, rounded to 2/8; worst case 1.54 mV: 11.55 cells = 11 + 4/8.
        List<String> lines =
                BarChart.render(TERMS, List.of(new Bar("worst case", 1.54e-3)), 2e-3, new OutputStyle(40, true, false));
        assertEquals(
                List.of(
                        "offset     ███████▌       │ 1.00 mV 50 %",
                        "drift      ███▊           │  500 µV 25 %",
                        "noise      ▎              │ 40.0 µV  2 %",
                        "           ───────────────┼",
                        "worst case ███████████▌   │ 1.54 mV 77 %",
                        "            limit 2.00 mV ▲"),
                lines);
        lines.forEach(l -> assertTrue(l.length() <= 40, l));
    }

    @Test
    void asciiScalesToTheLargestBarWhenOverTheLimit() {
        // the 3.5 mV total sets full scale (14 cells); the 2 mV limit sits at round(2/3.5*14) = 8
        List<String> lines = BarChart.render(
                List.of(new Bar("offset", 1e-3), new Bar("drift", 2.5e-3)),
                List.of(new Bar("worst case", 3.5e-3)),
                2e-3,
                new OutputStyle(40, false, false));
        assertEquals(
                List.of(
                        "offset     ####    |       1.00 mV  50 %",
                        "drift      ##########      2.50 mV 125 %",
                        "           --------+------",
                        "worst case ##############  3.50 mV 175 %",
                        "                   ^ limit 2.00 mV"),
                lines);
        lines.forEach(l -> assertTrue(l.chars().allMatch(c -> c < 128), l));
    }

    @Test
    void coloursOnlyWrapTheBars() {
        List<String> lines =
                BarChart.render(List.of(new Bar("drift", 2.5e-3)), List.of(), 2e-3, new OutputStyle(40, false, true));
        assertTrue(lines.get(0).contains(Ansi.RED + "#"), lines.get(0));
        String plain = lines.get(0).replaceAll("\u001b\\[[0-9;]*m", "");
        assertEquals(
                BarChart.render(List.of(new Bar("drift", 2.5e-3)), List.of(), 2e-3, new OutputStyle(40, false, false))
                        .get(0),
                plain);
    }

    @Test
    void unknownValueIsDrawnEmptyAndSaysSo() {
        List<String> lines = BarChart.render(
                List.of(new Bar("aging", Double.NaN)), List.of(), 1e-3, new OutputStyle(40, false, false));
        assertTrue(lines.get(0).startsWith("aging ") && lines.get(0).endsWith("n/a"), lines.get(0));
    }

    @Test
    void refusesALimitThatIsNotPositive() {
        assertThrows(IllegalArgumentException.class, () -> BarChart.render(TERMS, List.of(), 0, OutputStyle.PLAIN));
    }

    @Test
    void asciiSpellsUnitSymbolsInPlainLetters() {
        List<String> lines =
                BarChart.render(List.of(new Bar("noise", 40e-6)), List.of(), 1e-3, new OutputStyle(40, false, false));
        assertTrue(lines.get(0).endsWith("40.0 uV 4 %"), lines.get(0));
        assertEquals("100 ohm at 25 C", Glyphs.ascii("100 Ω at 25 °C"));
    }
}
