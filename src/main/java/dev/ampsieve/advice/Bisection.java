package dev.ampsieve.advice;

import java.util.function.DoublePredicate;

/**
 * Finds where a part stops fitting as one stage quantity moves, by bisection. Assumes the
 * answer changes once over the interval (more gain, more source resistance, a wider
 * temperature range never make an error smaller); the result is always a value that was
 * actually tried and fitted.
 */
final class Bisection {
    private Bisection() {}

    /** Relative width at which to stop: far finer than the 3 digits reported. */
    static final double REL_TOL = 1e-4;

    static final int MAX_STEPS = 40;

    /** The largest x in [fitting, failing] that fits; {@code fits(fitting)} must hold, {@code fits(failing)} not. */
    static double largest(DoublePredicate fits, double fitting, double failing) {
        double lo = fitting;
        double hi = failing;
        for (int i = 0; i < MAX_STEPS && Math.abs(hi - lo) > REL_TOL * Math.max(Math.abs(hi), Math.abs(lo)); i++) {
            double mid = 0.5 * (lo + hi);
            if (fits.test(mid)) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** The smallest x in [failing, fitting] that fits. */
    static double smallest(DoublePredicate fits, double failing, double fitting) {
        return largest(fits, fitting, failing);
    }
}
