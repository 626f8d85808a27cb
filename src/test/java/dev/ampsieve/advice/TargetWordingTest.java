package dev.ampsieve.advice;

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
}
