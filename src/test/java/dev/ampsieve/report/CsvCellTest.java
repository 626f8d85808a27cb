package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Text fields of {@code rank --csv}. Formula defusing follows the OWASP "CSV Injection" page
 * [from memory]: a field starting with =, +, -, @, tab or carriage return gets a leading ' and
 * is quoted; quoting itself is RFC 4180 section 2 (a field with a comma, quote or line break is
 * quoted, a quote doubled). Expected cells written by hand.
 */
class CsvCellTest {

    @Test
    void plainTextAndNumbersStayAsTheyAre() {
        assertEquals("USD", RankReport.csv("USD"));
        assertEquals("zd-chop-01", RankReport.csv("zd-chop-01"));
        assertEquals("-1.5e-6", RankReport.csv("-1.5e-6"));
        assertEquals("+3", RankReport.csv("+3"));
        assertEquals("-.5", RankReport.csv("-.5"));
        assertEquals("", RankReport.csv(null));
    }

    @Test
    void formulaStartsAreDefusedAndQuoted() {
        assertEquals("\"'=HYPERLINK(\"\"http://x\"\",\"\"y\"\")\"", RankReport.csv("=HYPERLINK(\"http://x\",\"y\")"));
        assertEquals("\"'@SUM(A1:A9)\"", RankReport.csv("@SUM(A1:A9)"));
        assertEquals("\"'+1+cmd\"", RankReport.csv("+1+cmd"));
        assertEquals("\"'-x\"", RankReport.csv("-x"));
        // a number with something after it is no longer a number
        assertEquals("\"'-1.5e-6+A1\"", RankReport.csv("-1.5e-6+A1"));
        // tab and carriage return: defused, and shown as \t, \r rather than sent raw
        assertEquals("\"'\\t=1+2\"", RankReport.csv("\t=1+2"));
        assertEquals("\"'\\r=1+2\"", RankReport.csv("\r=1+2"));
    }

    @Test
    void rfc4180QuotingForCommasQuotesAndLineBreaks() {
        assertEquals("\"a, b\"", RankReport.csv("a, b"));
        assertEquals("\"say \"\"hi\"\"\"", RankReport.csv("say \"hi\""));
        // a line break from data is shown as \n (it must not start a new row); the field needs no quotes then
        assertEquals("one\\ntwo", RankReport.csv("one\ntwo"));
    }

    @Test
    void controlCharactersAreShownNotSent() {
        assertEquals("EUR\\x1b[2J", RankReport.csv("EUR" + (char) 0x1b + "[2J"));
    }
}
