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
 * that still holds the target there is the undecided outcome.
 *
 * <p>Looks with a target come after {@link #EARLY_LOOKS} units (100, 200, 500), then every
 * {@link #BLOCK}: a part far from its target (a yield of a few per cent against 99.9 %) is
 * decided from 100 units instead of 1000, while a part near it is looked at as often as before.
 * The early looks add almost nothing to the chance of a wrong stop: at z = 3.29 a pass needs at
 * least z² p / (1 - p) units (about 1070 for a 99 % target), so a look at 500 units or fewer can
 * only stop a part that fails. Without a target the run is blocks of {@link #BLOCK} and no look.
 * Block sizes depend only on the units done and whether there is a target, so for a given seed
 * the stopping point, and thus the result, is reproducible.
 *
 * <p>{@link Run} is the same rule one block at a time, for a caller that runs two estimates on
 * the same simulated units ({@code budget.YieldModel}: before and after a trim).
 *
 * <p>Before each block the run checks whether its thread was interrupted (Ctrl-C in the shell)
 * and then stops with {@link Cancelled}: one block takes well under a millisecond.
 */
public final class SequentialYield {
    private SequentialYield() {}

    /** The largest block, and the spacing of the looks after the early ones. */
    public static final int BLOCK = 1000;

    /** Units after which the first looks come, under a target, before one look per {@link #BLOCK}. */
    static final int[] EARLY_LOOKS = {100, 200, 500};

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
        Run r = new Run(maxTrials, target);
        for (int size = r.nextSize(); size > 0; size = r.nextSize()) {
            r.add(block.passes(size));
        }
        return r.estimate();
    }

    /**
     * One estimate under the rule above, advanced a block at a time: {@link #nextSize()} says how
     * many units the next block holds (0 once decided), {@link #add} takes how many of them passed.
     */
    public static final class Run {
        private final int maxTrials;
        private final double target;
        private long passes;
        private long trials;
        private int pending;
        private Estimate result;

        public Run(int maxTrials, double target) {
            this.maxTrials = maxTrials;
            this.target = target;
        }

        /**
         * Units in the next block, 0 when the estimate is decided.
         *
         * @throws Cancelled when the thread is interrupted
         */
        public int nextSize() {
            if (result != null) {
                return 0;
            }
            Cancelled.check();
            long look = (trials / BLOCK + 1) * BLOCK; // the next multiple of BLOCK
            if (!Double.isNaN(target)) {
                for (int early : EARLY_LOOKS) {
                    if (trials < early) {
                        look = early;
                        break;
                    }
                }
            }
            pending = (int) Math.min(look - trials, maxTrials - trials);
            return pending;
        }

        /** Takes the passes of the block {@link #nextSize()} announced. */
        public void add(int p) {
            if (pending <= 0 || result != null) {
                throw new IllegalStateException("no block announced");
            }
            if (p < 0 || p > pending) {
                throw new IllegalStateException("block returned " + p + " passes of " + pending);
            }
            passes += p;
            trials += pending;
            pending = 0;
            if (trials >= maxTrials) {
                Wilson.Interval w = Wilson.interval95(passes, trials);
                result = new Estimate(passes, trials, w.low(), w.high(), false);
            } else if (!Double.isNaN(target)) {
                Wilson.Interval strict = Wilson.interval(passes, trials, INTERIM_Z);
                if (strict.low() >= target || strict.high() < target) {
                    Wilson.Interval w = Wilson.interval95(passes, trials);
                    result = new Estimate(passes, trials, w.low(), w.high(), true);
                }
            }
        }

        /** Whether the estimate is decided (no further block). */
        public boolean done() {
            return result != null;
        }

        /** The decided estimate. */
        public Estimate estimate() {
            if (result == null) {
                throw new IllegalStateException("not decided yet");
            }
            return result;
        }
    }
}
