package dev.ampsieve.stats;

/**
 * Runs a yield estimate block by block and stops early once the answer is plain: when a
 * stricter interval at an interim look lies wholly at or above the target (meets it) or wholly
 * below it (cannot meet it). Looking after every block with the reported 95 % interval itself
 * would pass a part whose true yield sits just at the target several times more often than the
 * 2.5 % one look allows (repeated significance tests); interim looks therefore use the
 * Haybittle-Peto bound {@link #INTERIM_Z} (two-sided p &lt; 0.001), and the result is always
 * reported with the 95 % Wilson interval. Only the last look, at {@code maxTrials} (the stage's
 * {@code max-trials} under a yield criterion), judges by the 95 % interval itself; an interval
 * that still holds the target there is the undecided outcome. Blocks are fixed in size, so for a
 * given seed the stopping point, and thus the result, is reproducible.
 *
 * <p>Before each block the run checks whether its thread was interrupted (Ctrl-C in the shell)
 * and then stops with {@link Cancelled}: one block takes well under a millisecond.
 */
public final class SequentialYield {
    private SequentialYield() {}

    /** Block size between interval checks. */
    public static final int BLOCK = 1000;

    /**
     * Standard normal quantile of the interim looks, Φ⁻¹(1 - 0.0005) (two-sided p = 0.001:
     * Haybittle, Br. J. Radiol. 44 (1971) 793; Peto et al., Br. J. Cancer 34 (1976) 585
     * [from memory]); the final look uses the nominal 95 % quantile.
     */
    public static final double INTERIM_Z = 3.2905267314919255;

    /** Simulates the next {@code size} units and returns how many pass. */
    @FunctionalInterface
    public interface Block {
        int passes(int size);
    }

    /** Passes out of trials, with the 95 % Wilson interval and whether it stopped early. */
    public record Estimate(long passes, long trials, double low, double high, boolean stoppedEarly) {
        public double value() {
            return trials == 0 ? Double.NaN : (double) passes / trials;
        }
    }

    /**
     * @param maxTrials units to simulate at most
     * @param target    yield target in (0, 1); NaN to always run all units
     * @param block     the simulation, called with sizes of at most {@link #BLOCK}
     * @throws Cancelled when the thread is interrupted before a block
     */
    public static Estimate run(int maxTrials, double target, Block block) {
        long passes = 0;
        long trials = 0;
        while (trials < maxTrials) {
            Cancelled.check();
            int size = (int) Math.min(BLOCK, maxTrials - trials);
            int p = block.passes(size);
            if (p < 0 || p > size) {
                throw new IllegalStateException("block returned " + p + " passes of " + size);
            }
            passes += p;
            trials += size;
            if (!Double.isNaN(target) && trials < maxTrials) {
                Wilson.Interval strict = Wilson.interval(passes, trials, INTERIM_Z);
                if (strict.low() >= target || strict.high() < target) {
                    Wilson.Interval w = Wilson.interval95(passes, trials);
                    return new Estimate(passes, trials, w.low(), w.high(), true);
                }
            }
        }
        Wilson.Interval w = Wilson.interval95(passes, trials);
        return new Estimate(passes, trials, w.low(), w.high(), false);
    }
}
