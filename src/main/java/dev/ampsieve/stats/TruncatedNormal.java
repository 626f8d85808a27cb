package dev.ampsieve.stats;

import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * Draws from a normal distribution N(mean, sigma) truncated to [lo, hi], filling primitive
 * arrays so a Monte Carlo loop allocates nothing per unit.
 *
 * <p>Method: plain rejection from the untruncated normal while the kept probability mass is
 * at least one half (the usual case, limits at 2 to 6 sigma: fewer than two draws per
 * sample); otherwise inversion, x = mean + sigma * Φ⁻¹(Φ(a) + u (Φ(b) - Φ(a))), using the
 * commons-math3 normal quantile. Both give exact samples of the truncated law.
 * An infinite bound means no truncation on that side; sigma = 0 returns the mean clamped
 * to the bounds.
 */
public final class TruncatedNormal {

    private static final NormalDistribution STD = new NormalDistribution(null, 0.0, 1.0);

    private final double mean;
    private final double sigma;
    private final double lo;
    private final double hi;
    private final boolean rejection;
    private final double pLo;
    private final double pHi;

    public TruncatedNormal(double mean, double sigma, double lo, double hi) {
        if (!(sigma >= 0) || !(lo <= hi) || Double.isNaN(mean)) {
            throw new IllegalArgumentException(
                    "need sigma >= 0 and lo <= hi: " + mean + ", " + sigma + ", [" + lo + ", " + hi + "]");
        }
        this.mean = mean;
        this.sigma = sigma;
        this.lo = lo;
        this.hi = hi;
        if (sigma == 0) {
            this.pLo = 0;
            this.pHi = 1;
            this.rejection = true;
        } else if ((lo - mean) / sigma <= -1 && (hi - mean) / sigma >= 1) {
            // at least mean +/- 1 sigma kept: mass >= 0.6827 > 0.5, rejection, no need of the normal's CDF (the
            // usual case, bounds at 2 to 6 sigma; the CDF costs more than a part's whole set-up)
            this.pLo = Double.NaN;
            this.pHi = Double.NaN;
            this.rejection = true;
        } else {
            this.pLo = lo == Double.NEGATIVE_INFINITY ? 0.0 : STD.cumulativeProbability((lo - mean) / sigma);
            this.pHi = hi == Double.POSITIVE_INFINITY ? 1.0 : STD.cumulativeProbability((hi - mean) / sigma);
            this.rejection = pHi - pLo >= 0.5;
        }
    }

    /** An untruncated normal. */
    public static TruncatedNormal untruncated(double mean, double sigma) {
        return new TruncatedNormal(mean, sigma, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
    }

    /** Symmetric truncation at mean +/- {@code k} sigma. */
    public static TruncatedNormal atSigmas(double mean, double sigma, double k) {
        return new TruncatedNormal(mean, sigma, mean - k * sigma, mean + k * sigma);
    }

    /** Fills {@code out[0..n)} with independent draws. */
    public void fill(UnitStream rng, double[] out, int n) {
        if (sigma == 0) {
            double v = Math.max(lo, Math.min(hi, mean));
            for (int i = 0; i < n; i++) {
                out[i] = v;
            }
            return;
        }
        if (rejection) {
            for (int i = 0; i < n; i++) {
                double x;
                do {
                    x = mean + sigma * rng.gaussian();
                } while (x < lo || x > hi);
                out[i] = x;
            }
        } else {
            double width = pHi - pLo;
            for (int i = 0; i < n; i++) {
                double p = pLo + rng.uniform() * width;
                double x = mean + sigma * STD.inverseCumulativeProbability(p);
                // the quantile function may round a hair outside the bounds
                out[i] = Math.max(lo, Math.min(hi, x));
            }
        }
    }

    public double mean() {
        return mean;
    }

    public double sigma() {
        return sigma;
    }

    public double lo() {
        return lo;
    }

    public double hi() {
        return hi;
    }
}
