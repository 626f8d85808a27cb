package dev.ampsieve.advice;

import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.stats.Wilson;

/**
 * A part whose yield the sampling left undecided (its 95 % interval holds the target after the
 * units simulated) and what would settle it.
 *
 * @param candidate     the best-ranked undecided part
 * @param yield         the run that left it open (after the trim when {@code trimmed})
 * @param trimmed       the open run is the one after the stage's trim
 * @param target        the stage's yield target
 * @param cap           the stage's max-trials
 * @param unitsToSettle units after which, at the yield seen, the interval would no longer hold
 *                      the target ({@link #unitsToSettle(double, double)}); {@link Long#MAX_VALUE}
 *                      when the yield seen is the target itself
 * @param trimAllowed   the stage already allows a trim
 */
public record Unsettled(
        Candidate candidate,
        YieldResult yield,
        boolean trimmed,
        double target,
        int cap,
        long unitsToSettle,
        boolean trimAllowed) {

    /**
     * Units n at which the 95 % interval around a yield p stops holding the target t: its
     * half-width z·sqrt(p(1-p)/n) (the normal approximation, which the Wilson interval approaches
     * for large n: Brown, Cai and DasGupta, Statistical Science 16 (2001) 101 [from memory]) equals
     * |p - t|, so n = z²·p(1-p)/(p-t)².
     */
    public static long unitsToSettle(double p, double t) {
        double d = p - t;
        if (d == 0) {
            return Long.MAX_VALUE;
        }
        double n = Math.ceil(Wilson.Z95 * Wilson.Z95 * p * (1 - p) / (d * d));
        return n >= Long.MAX_VALUE ? Long.MAX_VALUE : (long) n;
    }
}
