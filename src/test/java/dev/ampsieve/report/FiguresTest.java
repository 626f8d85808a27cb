package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.units.Dimension;
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
        // a yield of 0 (none passed): the upper end reads "0.0 %", never "-0.0 %" (rounding up -1e-9)
        assertEquals("0.0 %", Figures.yieldHigh(0.0));
    }

    @Test
    void infiniteAndHugeFiguresPrintWithoutLongRowsOfDigits() {
        // ∞ for an infinite figure, a dash where there is no number, scientific notation past T (1e12)
        assertEquals("∞ V", Figures.q(Double.POSITIVE_INFINITY, Dimension.VOLTAGE));
        assertEquals("-∞ V", Figures.volts(Double.NEGATIVE_INFINITY));
        assertEquals("-", Figures.q(Double.NaN, Dimension.VOLTAGE));
        assertEquals("-", Figures.volts(Double.NaN));
        assertEquals("1.00e+300 V", Figures.volts(1e300));
        assertEquals("1.00e+191 V/√Hz", Figures.q(1e191, Dimension.VOLTAGE_DENSITY));
        assertEquals("∞", Figures.money(Double.POSITIVE_INFINITY));
        assertEquals("1e+300", Figures.money(1e300));
        assertEquals("12.50", Figures.money(12.5));
        // a ratio of 1e300 is 1e302 %
        assertEquals("1e+302 %", Figures.percent(1e300));
        assertEquals("-∞ %", Figures.percent(Double.NEGATIVE_INFINITY));
        assertEquals("40 %", Figures.percent(0.4));
    }

    @Test
    void aYieldTargetJustBelowHundredPercentDoesNotReadAsHundred() {
        // 99.9999 % printed with three decimals would be "100.000 %"
        assertEquals("99.9999 %", BudgetText.pct(0.999999));
        assertEquals("99.900 %", BudgetText.pct(0.999));
        assertEquals("100.000 %", BudgetText.pct(1.0));
    }
}
