package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class TargetWordingTest {

    @Test
    void aTargetBelowHundredPercentNeverReadsAsHundred() {
        // with one decimal 99.99 % and 99.9999 % would both print "100.0 %"
        assertEquals("99.99 %", Phrases.percentFine(0.9999));
        assertEquals("99.9999 %", Phrases.percentFine(0.999999));
        assertEquals("99.9 %", Phrases.percentFine(0.999));
    }

    @Test
    void aYieldMarginIsPointsOfYieldRoundedDown() {
        // one point of yield (0.01) prints "+1.00 %"; 0.0123456 points down to "+1.23 %", never up
        assertEquals("+1.00 %", Phrases.yieldMargin(0.01));
        assertEquals("+1.23 %", Phrases.yieldMargin(0.0123456));
        assertEquals("-0.13 %", Phrases.yieldMargin(-0.0012001));
    }
}
