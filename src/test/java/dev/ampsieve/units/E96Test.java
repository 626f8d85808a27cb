package dev.ampsieve.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;

/** E96 against IEC 60063 and its own construction rule. */
class E96Test {

    /** IEC 60063:2015 table 1, column E96, typed from the standard's table [from memory]. */
    private static final List<Integer> IEC_60063_E96 = List.of(
            100, 102, 105, 107, 110, 113, 115, 118, 121, 124, 127, 130, 133, 137, 140, 143, 147, 150, 154, 158, 162,
            165, 169, 174, 178, 182, 187, 191, 196, 200, 205, 210, 215, 221, 226, 232, 237, 243, 249, 255, 261, 267,
            274, 280, 287, 294, 301, 309, 316, 324, 332, 340, 348, 357, 365, 374, 383, 392, 402, 412, 422, 432, 442,
            453, 464, 475, 487, 499, 511, 523, 536, 549, 562, 576, 590, 604, 619, 634, 649, 665, 681, 698, 715, 732,
            750, 768, 787, 806, 825, 845, 866, 887, 909, 931, 953, 976);

    @Test
    void theSeriesIsIec60063sTable() {
        assertEquals(96, E96.MANTISSAS.size());
        assertEquals(IEC_60063_E96, E96.MANTISSAS);
    }

    @Test
    void everyValueIsTheRoundedGeometricStep() {
        // second method: IEC 60063 derives E48/E96/E192 as 10^(i/96) rounded to three figures; for E96 every
        // value follows that rule (the known exception, 919 for 920, is in E192 only) [from memory]
        for (int i = 0; i < 96; i++) {
            assertEquals(Math.round(100 * Math.pow(10, i / 96.0)), (long) E96.MANTISSAS.get(i), "index " + i);
        }
    }

    @Test
    void spotChecksInSeveralDecades() {
        assertEquals(4.99e3, E96.nearest(4.99e3)); // a series value is its own nearest
        assertEquals(4.99e3, E96.nearest(5.0e3)); // 5000/4990 = 1.0020 < 5110/5000 = 1.022
        assertEquals(4.75e3, E96.nearest(4.7e3)); // 4750/4700 = 1.0106 < 4700/4640 = 1.0129
        assertEquals(1.0e6, E96.nearest(1.0e6));
        assertEquals(2.49, E96.nearest(2.5), 1e-15); // 2.5/2.49 = 1.0040 < 2.55/2.5 = 1.02
        // 10.1 Mohm: 10.1/10.0 = 1.0100 but 10.2/10.1 = 1.0099, so 10.2 Mohm is nearer by ratio
        assertEquals(10.2e6, E96.nearest(10.1e6));
    }

    @Test
    void nearestSwitchesAtTheGeometricMean() {
        // between 4.64 kohm and 4.75 kohm: sqrt(4640 x 4750) = 4694.68 ohm (by hand)
        double gm = Math.sqrt(4640.0 * 4750.0);
        assertEquals(4694.68, gm, 0.01);
        assertEquals(4.64e3, E96.nearest(gm * (1 - 1e-9)));
        assertEquals(4.75e3, E96.nearest(gm * (1 + 1e-9)));
        // across a decade: 9.76 kohm and 10.0 kohm, sqrt(9760 x 10000) = 9879.27 ohm
        double top = Math.sqrt(9760.0 * 10000.0);
        assertEquals(9879.27, top, 0.01);
        assertEquals(9.76e3, E96.nearest(top * (1 - 1e-9)));
        assertEquals(10.0e3, E96.nearest(top * (1 + 1e-9)));
    }

    @Test
    void atMostTakesTheValueAtOrBelow() {
        assertEquals(1.50e6, E96.atMost(1.51515e6)); // 1.54 Mohm would exceed the bound
        assertEquals(4.75e3, E96.atMost(4.75e3)); // exactly a series value
        assertEquals(9.76, E96.atMost(9.99), 1e-15);
        assertEquals(976e3, E96.atMost(999.9e3));
        assertEquals(1.0e6, E96.atMost(1.0e6));
    }

    @Test
    void refusesWhatIsNoResistance() {
        assertThrows(IllegalArgumentException.class, () -> E96.nearest(0));
        assertThrows(IllegalArgumentException.class, () -> E96.atMost(Double.POSITIVE_INFINITY));
    }

    @Test
    void theTableIsTheRoundedGeometricSeriesAsTheRigReadsIt() {
        // IEC 60063: E96 = 96 values per decade, each 10^(i/96) to three digits; the table must hold
        // exactly those (a second method: the formula, not a second copy of the table)
        assertEquals(96, E96.MANTISSAS.size());
        for (int i = 0; i < 96; i++) {
            assertEquals(Math.round(100 * Math.pow(10, i / 96.0)), (long) E96.MANTISSAS.get(i), "index " + i);
        }
    }

    @Test
    void neighboursTheOffsetRigUses() {
        assertEquals(19.6e3, E96.atMost(19942.6), 1e-9); // 19.6k < 19.94k < 20.0k
        assertEquals(20.0e3, E96.atLeast(19942.6), 1e-9);
        assertEquals(5.11, E96.atLeast(5.014), 1e-12); // 4.99 < 5.014 < 5.11
        assertEquals(10.0, E96.atLeast(9.9), 1e-12); // past 9.76: the next decade's first value
        assertEquals(10e3, E96.atMost(10e3), 1e-9); // a value of the series is its own neighbour
        // nearest by ratio: 9.9949 is 0.05 % under 10.0 and 2.4 % over 9.76
        assertEquals(10.0, E96.nearest(9.9949), 1e-12);
        assertEquals(97.6, E96.nearest(97.0), 1e-12); // 97.6/97 = 1.0062 against 97/95.3 = 1.0178
    }
}
