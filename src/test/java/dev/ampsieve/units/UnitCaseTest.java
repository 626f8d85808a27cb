package dev.ampsieve.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The case rule (README "Your catalog"): SI prefixes are case-sensitive (SI Brochure, 9th ed.,
 * table 7: m milli, M mega), with K read as kilo since no prefix K exists; unit symbols after the
 * prefix are read case-blind where only one reading exists.
 */
class UnitCaseTest {

    @ParameterizedTest(name = "{0} = {2}")
    @CsvSource({
        "10uv,      VOLTAGE,     10e-6",
        "1.5 MHZ,   FREQUENCY,   1.5e6",
        "1.5 mhz,   FREQUENCY,   1.5e-3", // m is milli, whatever case the unit has
        "10 KOHM,   RESISTANCE,  10e3",
        "10 kohm,   RESISTANCE,  10e3",
        "10 Kohm,   RESISTANCE,  10e3",
        "10 mv,     VOLTAGE,     10e-3",
        "10 MV,     VOLTAGE,     10e6", // mega: the plausibility bounds refuse it in any op amp field
        "110 DB,    DECIBEL,     110",
        "3 nA,      CURRENT,     3e-9",
        "3 na,      CURRENT,     3e-9",
        "12 nV/RTHZ, VOLTAGE_DENSITY, 12e-9",
        "0.5 v/us,  SLEW_RATE,   0.5e6",
        "25 PPM/C,  RATIO_DRIFT, 25e-6",
        "25 c,      TEMPERATURE, 25",
        "300 K,     TEMPERATURE, 26.85", // kelvin stays kelvin in a temperature field: 300 - 273.15
    })
    void readsCaseBlindSymbolsAfterACaseSensitivePrefix(String text, Dimension d, double expected)
            throws UnitException {
        assertEquals(expected, Units.parse(text, d), Math.abs(expected) * 1e-12);
    }

    @Test
    void aPrefixInTheWrongCaseIsRefusedWithTheSpellingThatExists() {
        UnitException u = assertThrows(UnitException.class, () -> Units.parse("10 UV", Dimension.VOLTAGE));
        assertEquals("'U' in '10 UV' is not an SI prefix", u.problem());
        assertEquals("write '10 uV' (prefixes are case-sensitive: m milli, M mega, k kilo, u micro)", u.fix());
        // N is not a prefix and NA not a unit: the fix gives 3 nA
        UnitException n = assertThrows(UnitException.class, () -> Units.parse("3 NA", Dimension.CURRENT));
        assertEquals("write '3 nA' (prefixes are case-sensitive: m milli, M mega, k kilo, u micro)", n.fix());
        // g is not a prefix; G is
        UnitException g = assertThrows(UnitException.class, () -> Units.parse("1 gHz", Dimension.FREQUENCY));
        assertEquals("write '1 GHz' (prefixes are case-sensitive: m milli, M mega, k kilo, u micro)", g.fix());
    }

    @Test
    void symbolsThatMeanSomethingElseStayRefused() {
        // S is the siemens and H the henry: not read as s (second) or h (hour)
        assertThrows(UnitException.class, () -> Units.parse("10 S", Dimension.TIME));
        assertThrows(UnitException.class, () -> Units.parse("1000 H", Dimension.TIME));
    }

    @Test
    void theExampleInAnErrorIsTheFieldsOwn() {
        UnitException e = assertThrows(UnitException.class, () -> Units.parse("5", Dimension.VOLTAGE, "5 V"));
        assertEquals("write a voltage with its unit, such as '5 V'", e.fix());
        UnitException wrong = assertThrows(UnitException.class, () -> Units.parse("5 mA", Dimension.VOLTAGE, "5 V"));
        assertEquals("write a voltage such as '5 V'", wrong.fix());
    }
}
