package dev.ampsieve.stats;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class TruncatedNormalTest {

    /**
     * Fraction of a N(0,1) truncated at +/- t that falls inside +/- 1:
     * P(|Z| <= 1) / P(|Z| <= t), both from commons-math3 NormalDistribution. Checks both
     * sampling methods (rejection for wide limits, inversion for narrow ones).
     */
    @ParameterizedTest
    @CsvSource({"3.0", "1.5", "0.5"})
    void fractionInsideOneSigmaMatchesTheDistribution(double t) {
        NormalDistribution nd = new NormalDistribution();
        double inner = Math.min(1.0, t / 2);
        double expected = nd.probability(-inner, inner) / nd.probability(-t, t);
        TruncatedNormal d = TruncatedNormal.atSigmas(0.0, 1.0, t);
        int n = 200_000;
        double[] x = new double[n];
        d.fill(UnitStream.of(7, "test"), x, n);
        int inside = 0;
        for (double v : x) {
            assertTrue(v >= -t && v <= t, "sample outside the truncation");
            if (Math.abs(v) <= inner) {
                inside++;
            }
        }
        Wilson.Interval w = Wilson.interval(inside, n, 3.29); // 99.9 % interval: a seeded check, not a flaky one
        assertTrue(
                w.low() <= expected && expected <= w.high(),
                "expected " + expected + " in [" + w.low() + ", " + w.high() + "]");
    }

    @Test
    void sameSeedSameSamples() {
        TruncatedNormal d = new TruncatedNormal(1.0, 2.0, -1.0, 4.0);
        double[] a = new double[100];
        double[] b = new double[100];
        d.fill(UnitStream.of(42, "p"), a, 100);
        d.fill(UnitStream.of(42, "p"), b, 100);
        assertArrayEquals(a, b);
    }
}
