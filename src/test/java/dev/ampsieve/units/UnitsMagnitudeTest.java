package dev.ampsieve.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Finite numbers near the ends of a double are refused when read. Found by the stage property
 * test: "tolerance: 1e308" was read as 1e308 (a ratio) and printing it as 1e310 % in the error
 * message threw NumberFormatException ("Infinite or NaN") out of the loader.
 */
class UnitsMagnitudeTest {

    @ParameterizedTest(name = "{0} as {1}")
    @CsvSource(delimiter = '|', value = {
        "1e308       | RATIO      | '1e308' is out of range (above 1e100 in SI units)",
        "1e307       | NUMBER     | '1e307' is out of range (above 1e100 in SI units)",
        "1e92 GV     | VOLTAGE    | '1e92 GV' is out of range (above 1e100 in SI units)",
        "-1e200 C    | TEMPERATURE| '-1e200 C' is out of range (above 1e100 in SI units)",
        "4.9e-324    | RATIO      | '4.9e-324' is out of range (below 1e-100 in SI units)",
        "1e-90 fA    | CURRENT    | '1e-90 fA' is out of range (below 1e-100 in SI units)"})
    void refusedWithTheRangeNamed(String text, Dimension d, String message) {
        UnitException e = assertThrows(UnitException.class, () -> Units.parse(text, d));
        assertEquals(message, e.problem());
    }

    @ParameterizedTest(name = "{0} as {1}")
    @CsvSource(delimiter = '|', value = {
        // the ends themselves are still read: 1e91 GV = 1e91 * 1e9 V = 1e100 V; 1e-85 fA = 1e-85 * 1e-15 A = 1e-100 A
        "1e91 GV  | VOLTAGE | 1e100",
        "1e-85 fA | CURRENT | 1e-100",
        "0        | RATIO   | 0",
        "-0       | NUMBER  | 0"})
    void theEndsAndZeroAreRead(String text, Dimension d, double expected) throws UnitException {
        assertEquals(expected, Units.parse(text, d), Math.abs(expected) * 1e-12);
    }
}
