package dev.ampsieve.stats;

/**
 * Runs a yield estimate block by block and stops as soon as the answer is known: once the
 * 95 % Wilson interval lies wholly at or above the target (meets it) or wholly below it
 * (cannot meet it), further units would not change the verdict. Blocks are fixed in size,
 * so for a given seed the stopping point, and thus the result, is reproducible.
 */
public final class SequentialYield {
    private SequentialYield() {
    }

    /** Block size between interval checks. */
    public static final int BLOCK = 1000;

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
     */
    public static Estimate run(int maxTrials, double target, Block block) {
        long passes = 0;
        long trials = 0;
        while (trials < maxTrials) {
            int size = (int) Math.min(BLOCK, maxTrials - trials);
            int p = block.passes(size);
            if (p < 0 || p > size) {
                throw new IllegalStateException("block returned " + p + " passes of " + size);
            }
            passes += p;
            trials += size;
            if (!Double.isNaN(target) && trials < maxTrials) {
                Wilson.Interval w = Wilson.interval95(passes, trials);
                if (w.low() >= target || w.high() < target) {
                    return new Estimate(passes, trials, w.low(), w.high(), true);
                }
            }
        }
        Wilson.Interval w = Wilson.interval95(passes, trials);
        return new Estimate(passes, trials, w.low(), w.high(), false);
    }
}
