package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class FiguresTest {

    @Test
    void aYieldIsRoundedTowardWhatWasFound() {
        // 99.996 % of units passed: printing "100.00 %" would claim that every unit did
        assertEquals("99.99 %", Figures.yield(0.99996));
        assertEquals("99.96 %", Figures.yield(0.99962));
        assertEquals("100 %", Figures.yield(1.0));
        assertEquals("83.5 %", Figures.yield(0.835));
        assertEquals("98.9 %", Figures.yield(0.98999));
        // the upper end of an interval rounds up, so the printed interval is never narrower than found
        assertEquals("100.00 %", Figures.yieldHigh(0.99996));
        assertEquals("85.7 %", Figures.yieldHigh(0.85672));
    }
}
