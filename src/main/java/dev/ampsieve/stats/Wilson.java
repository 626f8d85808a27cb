package dev.ampsieve.stats;

/**
 * Wilson score interval for a binomial proportion (E. B. Wilson, <i>JASA</i> 22 (1927) 209;
 * recommended by Brown, Cai and DasGupta, <i>Statistical Science</i> 16 (2001) 101).
 *
 * <pre>
 *   centre     = (p + z²/2n) / (1 + z²/n)
 *   half-width = z / (1 + z²/n) * sqrt(p(1-p)/n + z²/4n²)
 * </pre>
 * Unlike the normal-approximation interval it stays inside [0, 1] and is not empty at
 * p = 0 or 1, which matters here: good parts often pass every simulated unit.
 */
public final class Wilson {
    private Wilson() {}

    /** Two-sided 95 % standard normal quantile, Φ⁻¹(0.975) (Abramowitz &amp; Stegun ch. 26). */
    public static final double Z95 = 1.959963984540054;

    /** The interval for {@code passes} out of {@code trials} at quantile {@code z}; [0, 1] for no trials. */
    public static Interval interval(long passes, long trials, double z) {
        if (trials <= 0) {
            return new Interval(0.0, 1.0);
        }
        if (passes < 0 || passes > trials) {
            throw new IllegalArgumentException("passes " + passes + " outside 0.." + trials);
        }
        double n = trials;
        double p = passes / n;
        double z2 = z * z;
        double denom = 1.0 + z2 / n;
        double centre = (p + z2 / (2 * n)) / denom;
        double half = z / denom * Math.sqrt(p * (1 - p) / n + z2 / (4 * n * n));
        // exact ends at p = 0 and p = 1 (the formula gives them up to round-off)
        double low = passes == 0 ? 0.0 : Math.max(0.0, centre - half);
        double high = passes == trials ? 1.0 : Math.min(1.0, centre + half);
        return new Interval(low, high);
    }

    /** The 95 % interval. */
    public static Interval interval95(long passes, long trials) {
        return interval(passes, trials, Z95);
    }

    /** A closed interval of proportions. */
    public record Interval(double low, double high) {}
}
