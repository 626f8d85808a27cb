package dev.ampsieve.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class WilsonTest {

    @Test
    void z95IsTheNormalQuantile() {
        // commons-math3 NormalDistribution: Φ⁻¹(0.975)
        assertEquals(new NormalDistribution().inverseCumulativeProbability(0.975), Wilson.Z95, 1e-12);
    }

    /** Wilson, JASA 22 (1927); values of reference-checks.md §7 (match scipy binomtest(...).proportion_ci("wilson")), tol 1e-6. */
    @ParameterizedTest
    @CsvSource({
        "990, 1000, 0.981691, 0.994559",
        "1000, 1000, 0.996173, 1",
        "95, 100, 0.888250, 0.978456",
        "50, 100, 0.403832, 0.596168",
        "0, 100, 0, 0.036993"
    })
    void matchesPublishedValues(long k, long n, double low, double high) {
        Wilson.Interval w = Wilson.interval95(k, n);
        assertEquals(low, w.low(), 1e-6, "lower, Wilson 1927 / reference-checks §7");
        assertEquals(high, w.high(), 1e-6, "upper, Wilson 1927 / reference-checks §7");
    }

    @Test
    void noTrialsMeansNothingIsKnown() {
        Wilson.Interval w = Wilson.interval95(0, 0);
        assertEquals(0.0, w.low());
        assertEquals(1.0, w.high());
    }
}
