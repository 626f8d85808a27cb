package dev.ampsieve.advice;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * The rounding of a value the advice offers (a resistor, a limit, a target): to 3 significant
 * digits, toward the side that fits, so that the value as printed is the value re-checked.
 */
final class Rounding {
    private Rounding() {}

    private static final MathContext THREE = new MathContext(3, RoundingMode.HALF_UP);

    /** Rounds to 3 significant digits. */
    static double round3(double x) {
        if (x == 0 || !Double.isFinite(x)) {
            return x;
        }
        // from the shortest decimal of x (Double.toString), half up: what a 3-digit print of x shows
        return BigDecimal.valueOf(x).round(THREE).doubleValue();
    }

    /** Rounds a positive x to 3 significant digits, never up (beyond round-off of x itself). */
    static double round3Down(double x) {
        double r = round3(x);
        return r > x * (1 + 1e-12) ? r - unit3(x) : r;
    }

    /** Rounds a positive x to 3 significant digits, never down (beyond round-off of x itself). */
    static double round3Up(double x) {
        double r = round3(x);
        return r < x * (1 - 1e-12) ? r + unit3(x) : r;
    }

    /** One unit in the third significant digit of x. */
    static double unit3(double x) {
        return Math.pow(10, Math.floor(Math.log10(Math.abs(x))) - 2);
    }
}
