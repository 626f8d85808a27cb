package dev.ampsieve.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/** Infinite, not-a-number and far-out values print without failing and without rows of digits. */
class UnitsExtremesTest {

    // worked by hand: beyond the f..T prefixes (1e-15 .. below 1e15) three significant digits in
    // scientific notation; ∞ for an infinite value; "n/a" for not a number
    @ParameterizedTest(name = "{0} {1} -> {2}")
    @CsvSource(
            delimiter = '|',
            value = {
                "1e300      | VOLTAGE         | 1.00e+300 V",
                "-1e300     | VOLTAGE         | -1.00e+300 V",
                "Infinity   | VOLTAGE         | ∞ V",
                "-Infinity  | VOLTAGE         | -∞ V",
                "NaN        | VOLTAGE         | n/a",
                "1e-30      | VOLTAGE         | 1.00e-30 V",
                "1e-15      | VOLTAGE         | 1.00 fV",
                "999e12     | VOLTAGE         | 999 TV",
                // 999.96 T rounds to 1000 T, past the last prefix
                "999.96e12  | VOLTAGE         | 1.00e+15 V",
                "1e191      | VOLTAGE_DENSITY | 1.00e+191 V/√Hz",
                "Infinity   | RESISTANCE      | ∞ Ω",
                "Infinity   | SLEW_RATE       | ∞ V/µs",
                // 1e300 V/s = 1e294 V/µs
                "1e300      | SLEW_RATE       | 1.00e+294 V/µs",
                "1e300      | DECIBEL         | 1e+300 dB",
                "Infinity   | DECIBEL         | ∞ dB",
                "1e300      | TEMPERATURE     | 1e+300 °C",
                "Infinity   | TEMPERATURE     | ∞ °C",
                // a ratio of 1e300 is 1e302 %; 1e-30 is 1e-24 ppm
                "1e300      | RATIO           | 1e+302 %",
                "1e-30      | RATIO           | 1e-24 ppm",
                "Infinity   | RATIO           | ∞ %",
                "1e300      | NUMBER          | 1e+300",
                "-Infinity  | NUMBER          | -∞",
                "1e-30      | NUMBER          | 1e-30",
                // 3.15576e307 s is 1e300 Julian years of 365.25 days (years print without trailing zeros, as "10 y")
                "3.15576e307 | TIME           | 1e+300 y",
                "Infinity   | TIME            | ∞ s"
            })
    void printsFarOutValues(double si, Dimension d, String expected) {
        assertEquals(expected, Units.format(si, d));
    }

    @ParameterizedTest
    @ValueSource(doubles = {1e300, 1e-30, 4.56e20, -7.89e-25})
    void scientificNotationReadsBack(double v) throws UnitException {
        String text = Units.format(v, Dimension.VOLTAGE);
        // three significant digits: within half a unit of the third digit
        assertEquals(v, Units.parse(text, Dimension.VOLTAGE), Math.abs(v) * 0.005, text);
    }

    @ParameterizedTest
    @CsvSource(
            delimiter = '|',
            value = {
                "1e400 V   | '1e400 V' is out of range: beyond the largest number (about 1.8e308 in SI units)",
                "1e308 kV  | '1e308 kV' is out of range: beyond the largest number (about 1.8e308 in SI units)",
                "1e-400 V  | '1e-400 V' is out of range: below the smallest number (about 1e-308 in SI units)"
            })
    void numbersPastTheDoubleRangeAreRefusedWithTheFix(String text, String problem) {
        UnitException e = assertThrows(UnitException.class, () -> Units.parse(text, Dimension.VOLTAGE));
        assertEquals(problem, e.problem());
        assertEquals(
                text.startsWith("1e-")
                        ? "check the exponent and the prefix; write 0 if you mean zero"
                        : "check the exponent and the prefix; write a voltage such as '2.5 uV'",
                e.fix());
    }

    @ParameterizedTest
    @ValueSource(strings = {"0 V", "0e5 V", "0.000 V", "-0 V"})
    void zeroWrittenAsZeroIsStillZero(String text) throws UnitException {
        assertEquals(0.0, Math.abs(Units.parse(text, Dimension.VOLTAGE)), 0.0);
    }
}
