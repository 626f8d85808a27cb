package dev.ampsieve.stats;

import java.util.Arrays;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.descriptive.moment.Mean;
import org.apache.commons.math3.stat.descriptive.moment.StandardDeviation;

/**
 * A normal distribution fitted to a sample (a measured lot): the mean, the sample standard
 * deviation s (n - 1 in the denominator), the two-sided confidence interval of sigma, and the
 * Anderson-Darling test of normality with both parameters estimated from the sample.
 *
 * <p>Confidence interval of sigma (chi-square, for a normal population; e.g. NIST/SEMATECH
 * e-Handbook of Statistical Methods, "confidence interval for the standard deviation"):
 * <pre>
 *   sqrt((n-1) s^2 / chi2(1 - a/2; n-1))  ..  sqrt((n-1) s^2 / chi2(a/2; n-1))
 * </pre>
 * with chi2(p; n-1) the p-quantile of the chi-square distribution with n - 1 degrees of freedom
 * (commons-math3 {@link ChiSquaredDistribution}).
 *
 * <p>Goodness of fit: Anderson-Darling, case 3 of D'Agostino and Stephens, <i>Goodness-of-Fit
 * Techniques</i> (Marcel Dekker, 1986): mean and variance estimated from the sample.
 * With z_i = Phi((x_(i) - mean)/s) in increasing order,
 * <pre>
 *   A^2 = -n - (1/n) sum_{i=1..n} (2i - 1) [ln z_i + ln(1 - z_{n+1-i})]
 *   A*  = A^2 (1 + 0.75/n + 2.25/n^2)
 * </pre>
 * and the p-value from A* by their four exponential pieces ({@link #pValue}); the
 * same reference's critical values of A* are 0.631 (10 %), 0.752 (5 %), 0.873 (2.5 %) and 1.035
 * (1 %). Kolmogorov-Smirnov (commons-math3) is not used: its p-value assumes the parameters are
 * known, and with them estimated from the same sample it accepts far too often. The p-value is
 * NaN below {@link #MIN_FOR_TEST} units or when every unit has the same value.
 *
 * @param n         units
 * @param mean      sample mean
 * @param sigma     sample standard deviation s
 * @param sigmaLow  lower end of the confidence interval of sigma
 * @param sigmaHigh upper end (the figure a Monte Carlo should use: a small lot never flatters)
 * @param aStar     modified Anderson-Darling statistic A*; NaN when not computed
 * @param pValue    its p-value; NaN when not computed
 */
public record NormalFit(
        int n, double mean, double sigma, double sigmaLow, double sigmaHigh, double aStar, double pValue) {

    /** Confidence of the interval of sigma. */
    public static final double CONFIDENCE = 0.95;

    /** Below this significance the fit is called poor. */
    public static final double POOR_FIT = 0.05;

    /** Fewest units for the Anderson-Darling p-value (D'Agostino & Stephens give case 3 from n = 8). */
    public static final int MIN_FOR_TEST = 8;

    /** The name of the goodness-of-fit test, for reports and JSON. */
    public static final String TEST = "anderson-darling";

    /** Fits {@code x} (at least 2 values, all finite). */
    public static NormalFit of(double[] x) {
        int n = x.length;
        if (n < 2) {
            throw new IllegalArgumentException("a fit needs 2 values, got " + n);
        }
        double mean = new Mean().evaluate(x);
        double s = new StandardDeviation(true).evaluate(x);
        double[] ci = sigmaInterval(s, n, CONFIDENCE);
        double a = Double.NaN;
        double p = Double.NaN;
        if (n >= MIN_FOR_TEST && s > 0) {
            a = andersonDarling(x, mean, s) * (1 + 0.75 / n + 2.25 / ((double) n * n));
            p = pValue(a);
        }
        return new NormalFit(n, mean, s, ci[0], ci[1], a, p);
    }

    /** Whether the test ran and rejects normality at {@link #POOR_FIT}. */
    public boolean poor() {
        return pValue < POOR_FIT;
    }

    /** {low, high}: the chi-square confidence interval of sigma from sample standard deviation {@code s} of {@code n} values. */
    public static double[] sigmaInterval(double s, int n, double confidence) {
        double alpha = 1 - confidence;
        ChiSquaredDistribution chi = new ChiSquaredDistribution(null, n - 1);
        double ss = (n - 1) * s * s;
        return new double[] {
            Math.sqrt(ss / chi.inverseCumulativeProbability(1 - alpha / 2)),
            Math.sqrt(ss / chi.inverseCumulativeProbability(alpha / 2))
        };
    }

    /** The plain statistic A^2 of {@code x} against N(mean, sd). */
    static double andersonDarling(double[] x, double mean, double sd) {
        double[] y = x.clone();
        Arrays.sort(y);
        int n = y.length;
        NormalDistribution phi =
                new NormalDistribution(null, 0, 1, NormalDistribution.DEFAULT_INVERSE_ABSOLUTE_ACCURACY);
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double lo = Math.log(phi.cumulativeProbability((y[i] - mean) / sd));
            // ln(1 - Phi(z)) as ln Phi(-z): exact in the upper tail, where 1 - Phi rounds to 0
            double hi = Math.log(phi.cumulativeProbability(-(y[n - 1 - i] - mean) / sd));
            sum += (2.0 * (i + 1) - 1) * (lo + hi);
        }
        return -n - sum / n;
    }

    /** p-value of the modified statistic A* (case 3), D'Agostino and Stephens 1986. */
    public static double pValue(double aStar) {
        double a = aStar;
        double p;
        if (a >= 0.6) {
            p = Math.exp(1.2937 - 5.709 * a + 0.0186 * a * a);
        } else if (a >= 0.34) {
            p = Math.exp(0.9177 - 4.279 * a - 1.38 * a * a);
        } else if (a >= 0.2) {
            p = 1 - Math.exp(-8.318 + 42.796 * a - 59.938 * a * a);
        } else {
            p = 1 - Math.exp(-13.436 + 101.14 * a - 223.73 * a * a);
        }
        return Math.max(0.0, Math.min(1.0, p));
    }
}
