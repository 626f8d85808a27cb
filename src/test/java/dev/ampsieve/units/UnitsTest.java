package dev.ampsieve.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

class UnitsTest {

    /** Relative comparison: parsing multiplies by powers of ten, which binary floating point rounds. */
    private static void assertClose(double expected, double actual, String what) {
        double tol = Math.abs(expected) * 1e-12;
        assertEquals(expected, actual, tol, what);
    }

    private static double parse(String text, Dimension d) {
        try {
            return Units.parse(text, d);
        } catch (UnitException e) {
            throw new AssertionError("'" + text + "' did not parse: " + e.getMessage(), e);
        }
    }

    /**
     * Every spelling issue 2 asks for, with its value in SI units worked out by hand from the
     * prefix factors (SI Brochure, BIPM, 9th ed., 2019, table 7) and, for h and d, table 8
     * (non-SI units accepted for use with the SI: 1 h = 3600 s, 1 d = 86 400 s). The year is
     * the Julian year of 365.25 d (IAU definition) [from memory].
     */
    static Stream<Arguments> examples() {
        return Stream.of(
                Arguments.of("2.5 uV", Dimension.VOLTAGE, 2.5e-6),
                Arguments.of("2.5µV", Dimension.VOLTAGE, 2.5e-6),
                Arguments.of("0.6 uV/C", Dimension.VOLTAGE_DRIFT, 0.6e-6),
                Arguments.of("0.6 µV/°C", Dimension.VOLTAGE_DRIFT, 0.6e-6),
                Arguments.of("12 nV/rtHz", Dimension.VOLTAGE_DENSITY, 12e-9),
                Arguments.of("12 nV/√Hz", Dimension.VOLTAGE_DENSITY, 12e-9),
                Arguments.of("12 nV/sqrt(Hz)", Dimension.VOLTAGE_DENSITY, 12e-9),
                Arguments.of("3 fA/rtHz", Dimension.CURRENT_DENSITY, 3e-15),
                Arguments.of("110 dB", Dimension.DECIBEL, 110.0),
                Arguments.of("1.5 MHz", Dimension.FREQUENCY, 1.5e6),
                Arguments.of("0.5 V/us", Dimension.SLEW_RATE, 0.5 / 1e-6),
                Arguments.of("10 kohm", Dimension.RESISTANCE, 10e3),
                Arguments.of("10k", Dimension.RESISTANCE, 10e3),
                Arguments.of("10 kΩ", Dimension.RESISTANCE, 10e3), // U+03A9 GREEK CAPITAL LETTER OMEGA
                Arguments.of("10 k\u2126", Dimension.RESISTANCE, 10e3), // U+2126 OHM SIGN
                Arguments.of("350 ohm", Dimension.RESISTANCE, 350.0),
                Arguments.of("-40 C", Dimension.TEMPERATURE, -40.0),
                Arguments.of("-40 °C", Dimension.TEMPERATURE, -40.0),
                Arguments.of("0.1 %", Dimension.RATIO, 0.1e-2),
                Arguments.of("25 ppm/C", Dimension.RATIO_DRIFT, 25e-6),
                Arguments.of("1000 h", Dimension.TIME, 1000 * 3600.0),
                Arguments.of("10 y", Dimension.TIME, 10 * 365.25 * 86400.0));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("examples")
    void parsesTheSpellingsDatasheetsUse(String text, Dimension d, double expected) {
        assertClose(expected, parse(text, d), text);
    }

    /**
     * SI prefixes: SI Brochure (BIPM, 9th ed., 2019), table 7, "SI prefixes": femto f 10^-15,
     * pico p 10^-12, nano n 10^-9, micro µ 10^-6, milli m 10^-3, kilo k 10^3, mega M 10^6,
     * giga G 10^9, tera T 10^12. "u" stands in for µ where it cannot be typed.
     */
    @ParameterizedTest(name = "{0} = 1e{1}")
    @CsvSource({"f, -15", "p, -12", "n, -9", "µ, -6", "u, -6", "m, -3", "k, 3", "M, 6", "G, 9", "T, 12"})
    void siPrefixesFollowTheBrochure(String prefix, int exponent) {
        double factor = Math.pow(10, exponent);
        assertClose(factor, parse("1 " + prefix + "V", Dimension.VOLTAGE), prefix + "V");
        assertClose(factor, parse("1 " + prefix + "Hz", Dimension.FREQUENCY), prefix + "Hz");
        assertClose(3 * factor, parse("3 " + prefix + "A", Dimension.CURRENT), prefix + "A");
    }

    @Test
    void prefixesAreCaseSensitiveAsInTheBrochure() {
        // SI Brochure, 9th ed., table 7: m is milli, M is mega
        assertClose(1e-3, parse("1 mV", Dimension.VOLTAGE), "mV");
        assertClose(1e6, parse("1 MV", Dimension.VOLTAGE), "MV");
        assertClose(1e-3, parse("1 mHz", Dimension.FREQUENCY), "mHz");
        assertClose(1e6, parse("1 MHz", Dimension.FREQUENCY), "MHz");
    }

    @Test
    void greekMuAndMicroSignAreTheSamePrefix() {
        // U+00B5 MICRO SIGN and U+03BC GREEK SMALL LETTER MU both reach users' files
        assertClose(2.5e-6, parse("2.5 \u00b5V", Dimension.VOLTAGE), "micro sign");
        assertClose(2.5e-6, parse("2.5 \u03bcV", Dimension.VOLTAGE), "greek mu");
    }

    @Test
    void kelvinIsConvertedToCelsius() {
        // SI Brochure, 9th ed., 2.3.1: t/°C = T/K - 273.15
        assertClose(26.85, parse("300 K", Dimension.TEMPERATURE), "300 K");
        assertClose(0.6e-6, parse("0.6 uV/K", Dimension.VOLTAGE_DRIFT), "a step of 1 K equals a step of 1 °C");
    }

    @Test
    void belowAbsoluteZeroIsRefused() {
        UnitException e = assertThrows(UnitException.class, () -> Units.parse("-300 C", Dimension.TEMPERATURE));
        assertTrue(e.problem().contains("below absolute zero"), e.getMessage());
    }

    @Test
    void aWrongDimensionNamesBoth() {
        UnitException e = assertThrows(UnitException.class, () -> Units.parse("2 mV", Dimension.CURRENT));
        assertEquals("'2 mV' is a voltage but a current belongs here", e.problem());
        assertTrue(e.fix().contains("2 nA"), e.fix());

        UnitException drift = assertThrows(UnitException.class, () -> Units.parse("0.6 uV", Dimension.VOLTAGE_DRIFT));
        assertEquals("'0.6 uV' is a voltage but a voltage drift belongs here", drift.problem());
    }

    @Test
    void aMissingUnitIsAnErrorWhereAUnitMatters() {
        UnitException e = assertThrows(UnitException.class, () -> Units.parse("5", Dimension.VOLTAGE));
        assertEquals("'5' has no unit", e.problem());
        // decibels and plain numbers need none
        assertClose(110, parse("110", Dimension.DECIBEL), "110");
        assertClose(1.2, parse("1.2", Dimension.NUMBER), "1.2");
    }

    @ParameterizedTest
    @CsvSource(
            delimiter = '|',
            value = {
                ".nan | not a finite number",
                "NaN V | not a finite number",
                ".inf | not a finite number",
                "-Infinity V | not a finite number",
                "1e999 V | out of range"
            })
    void nanAndInfinityAreRefused(String text, String expected) {
        UnitException e = assertThrows(UnitException.class, () -> Units.parse(text, Dimension.VOLTAGE));
        assertTrue(e.problem().contains(expected), e.problem());
    }

    @Test
    void unknownUnitsAndTextAreRefusedWithAnExample() {
        UnitException unit = assertThrows(UnitException.class, () -> Units.parse("2 furlongs", Dimension.FREQUENCY));
        assertTrue(unit.problem().contains("'furlongs'"), unit.problem());
        assertTrue(unit.fix().contains("1.5 MHz"), unit.fix());
        UnitException text = assertThrows(UnitException.class, () -> Units.parse("about 2 MHz", Dimension.FREQUENCY));
        assertTrue(text.problem().contains("does not start with a number"), text.problem());
        assertThrows(UnitException.class, () -> Units.parse("  ", Dimension.FREQUENCY));
    }

    @Test
    void aPrefixOnAUnitThatTakesNoneIsRefused() {
        // "mdB" or "kC" are typos, not quantities
        assertThrows(UnitException.class, () -> Units.parse("3 mdB", Dimension.DECIBEL));
        assertThrows(UnitException.class, () -> Units.parse("3 kC", Dimension.TEMPERATURE));
    }

    // ------------------------------------------------------------------ printing

    @ParameterizedTest(name = "{0} {1} -> {2}")
    @CsvSource(
            delimiter = '|',
            value = {
                "2.5e-6   | VOLTAGE         | 2.50 µV",
                "-2.5e-6  | VOLTAGE         | -2.50 µV",
                "999.96   | VOLTAGE         | 1.00 kV",
                "999.4    | VOLTAGE         | 999 V",
                "0.0099996| CURRENT         | 10.0 mA",
                "12e-9    | VOLTAGE_DENSITY | 12.0 nV/√Hz",
                "3e-15    | CURRENT_DENSITY | 3.00 fA/√Hz",
                "1.5e6    | FREQUENCY       | 1.50 MHz",
                "10e3     | RESISTANCE      | 10.0 kΩ",
                "0.6e-6   | VOLTAGE_DRIFT   | 600 nV/°C",
                "5e5      | SLEW_RATE       | 0.500 V/µs",
                "1.2e9    | SLEW_RATE       | 1200 V/µs",
                "62.83    | SLEW_RATE       | 62.8 V/s",
                "110      | DECIBEL         | 110 dB",
                "-40      | TEMPERATURE     | -40 °C",
                "0.001    | RATIO           | 0.1 %",
                "25e-6    | RATIO_DRIFT     | 25 ppm/°C",
                "3.6e6    | TIME            | 1000 h",
                "0        | VOLTAGE         | 0 V"
            })
    void printsWithEngineeringPrefixesAndThreeSignificantDigits(double si, Dimension d, String expected) {
        assertEquals(expected, Units.format(si, d));
    }

    @Test
    void printedValuesReadBackWithinTheirRounding() {
        double[] values = {2.5e-6, 47.3e-9, 0.123, 8.76e3, 1.005e6};
        for (double v : values) {
            String text = Units.format(v, Dimension.VOLTAGE);
            double back = parse(text, Dimension.VOLTAGE);
            // three significant digits: at most half a unit in the third digit, 0.5 %
            assertEquals(v, back, Math.abs(v) * 0.005, text);
        }
    }

    @Test
    void openLoopGainAsARatioGetsItsDecibelFigureInTheFix() {
        // 20 log10(1000 V/mV = 1e6 V/V) = 120 dB; 20 log10(1.5e6) = 123.52 dB, rounded down to 123.5
        UnitException e = assertThrows(UnitException.class, () -> Units.parse("1000 V/mV", Dimension.DECIBEL));
        assertEquals("'1000 V/mV' is a gain ratio; this field takes decibels", e.problem());
        assertEquals("write '120 dB' (20 log10 of 1000000 V/V)", e.fix());
        UnitException u = assertThrows(UnitException.class, () -> Units.parse("1.5 V/uV", Dimension.DECIBEL));
        assertEquals("write '123.5 dB' (20 log10 of 1500000 V/V)", u.fix());
    }
}
