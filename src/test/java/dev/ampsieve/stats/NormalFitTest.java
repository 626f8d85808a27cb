package dev.ampsieve.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

/** The normal fit of a measured lot: chi-square interval of sigma, Anderson-Darling case 3. */
class NormalFitTest {

    @Test
    void sigmaIntervalAgainstTheChiSquareTable() {
        // Worked by hand from a printed chi-square table (upper-tail form; values [from memory], the
        // common 3-decimal table): 9 degrees of freedom, 2.700 (2.5 %) and 19.023 (97.5 %);
        // n = 10, s = 1: low = sqrt(9 / 19.023) = 0.68783, high = sqrt(9 / 2.700) = 1.82574
        double[] ci = NormalFit.sigmaInterval(1.0, 10, 0.95);
        assertEquals(Math.sqrt(9 / 19.023), ci[0], 1e-4);
        assertEquals(Math.sqrt(9 / 2.700), ci[1], 1e-3); // 2.700 is rounded to 4 digits: 1e-3 covers it
        // 29 degrees of freedom (a lot of 30): 16.047 and 45.722 [from memory], s = 2 µV
        double[] lot = NormalFit.sigmaInterval(2e-6, 30, 0.95);
        assertEquals(2e-6 * Math.sqrt(29 / 45.722), lot[0], 1e-10); // 1.5928 µV
        assertEquals(2e-6 * Math.sqrt(29 / 16.047), lot[1], 1e-10); // 2.6887 µV: 1.34 x s
    }

    @Test
    void sigmaIntervalEndsHaveTheirChiSquareTailProbabilities() {
        // read back the other way through commons-math3's ChiSquaredDistribution CDF: (n-1)s²/σ² at each
        // end of the interval has lower-tail probability 0.975 (at σ low) and 0.025 (at σ high)
        for (int n : new int[] {3, 8, 30, 200}) {
            double s = 3.7;
            double[] ci = NormalFit.sigmaInterval(s, n, 0.95);
            ChiSquaredDistribution chi = new ChiSquaredDistribution(n - 1);
            assertEquals(0.975, chi.cumulativeProbability((n - 1) * s * s / (ci[0] * ci[0])), 1e-9);
            assertEquals(0.025, chi.cumulativeProbability((n - 1) * s * s / (ci[1] * ci[1])), 1e-9);
        }
    }

    @Test
    void intervalCoversTheTrueSigmaAboutNinetyFivePercentOfTheTime() {
        // 2000 lots of 30 from N(0, 1), seeded: the share of intervals holding sigma = 1 is 0.95 with a
        // binomial standard deviation sqrt(0.95 x 0.05 / 2000) = 0.0049; allow 3 of them
        NormalDistribution n = new NormalDistribution(new Well19937c(16), 0, 1);
        int hold = 0;
        int lots = 2000;
        for (int i = 0; i < lots; i++) {
            NormalFit f = NormalFit.of(n.sample(30));
            if (f.sigmaLow() <= 1 && 1 <= f.sigmaHigh()) {
                hold++;
            }
        }
        assertEquals(0.95, hold / (double) lots, 3 * 0.0049);
    }

    @Test
    void andersonDarlingStatisticAgainstNumericalIntegration() {
        // A² = n ∫0..1 (Fn(u) - u)² / (u (1 - u)) du, u = Phi((x - mean)/s), Fn the empirical CDF of the u_i
        // (the definition); integrated numerically between the sorted u_i (Gauss-Legendre, commons-math3):
        // an independent route to the computing formula the code uses
        double[] x = new NormalDistribution(new Well19937c(7), 5, 2).sample(25);
        double mean = Arrays.stream(x).average().orElseThrow();
        double s = Math.sqrt(Arrays.stream(x).map(v -> (v - mean) * (v - mean)).sum() / (x.length - 1));
        NormalDistribution phi = new NormalDistribution(0, 1);
        double[] u = Arrays.stream(x)
                .map(v -> phi.cumulativeProbability((v - mean) / s))
                .sorted()
                .toArray();
        IterativeLegendreGaussIntegrator gl = new IterativeLegendreGaussIntegrator(5, 1e-12, 1e-14);
        double integral = 0;
        double prev = 0;
        for (int i = 0; i <= u.length; i++) {
            double next = i < u.length ? u[i] : 1.0;
            double fn = i / (double) u.length;
            if (next > prev) {
                integral += gl.integrate(100_000, t -> (fn - t) * (fn - t) / (t * (1 - t)), prev, next);
            }
            prev = next;
        }
        assertEquals(x.length * integral, NormalFit.andersonDarling(x, mean, s), 1e-8);
    }

    @Test
    void pValueAtThePublishedCriticalValues() {
        // D'Agostino & Stephens 1986, case 3 (mean and variance estimated), critical values of
        // A* = A²(1 + 0.75/n + 2.25/n²) [from memory]: 0.631 (10 %), 0.752 (5 %), 0.873 (2.5 %), 1.035 (1 %);
        // the p-value formula is a fit to that table, so agreement within a few percent is what it promises
        assertEquals(0.10, NormalFit.pValue(0.631), 0.10 * 0.03);
        assertEquals(0.05, NormalFit.pValue(0.752), 0.05 * 0.03);
        assertEquals(0.025, NormalFit.pValue(0.873), 0.025 * 0.03);
        assertEquals(0.01, NormalFit.pValue(1.035), 0.01 * 0.03);
        // the published pieces nearly join: worked by hand at 0.6, exp(0.9177 - 2.5674 - 0.4968) = 0.1169 below
        // and exp(1.2937 - 3.4254 + 0.0067) = 0.1194 above (a 2 % step, the fit's own); 0.2 and 0.34 within 1 %
        assertEquals(0.1169, NormalFit.pValue(0.6 - 1e-9), 1e-4);
        assertEquals(0.1194, NormalFit.pValue(0.6), 1e-4);
        for (double a : new double[] {0.2, 0.34}) {
            assertEquals(NormalFit.pValue(a - 1e-9), NormalFit.pValue(a + 1e-9), 0.01 * NormalFit.pValue(a));
        }
    }

    @Test
    void aTwoPopulationLotIsAPoorFitAndANormalOneIsNot() {
        // 20 units near -10 µV and 20 near +10 µV (two reels mixed): far from one normal distribution
        double[] mixed = new double[40];
        for (int i = 0; i < 40; i++) {
            mixed[i] = (i < 20 ? -10e-6 : 10e-6) + (i % 20 - 9.5) * 0.1e-6;
        }
        NormalFit poor = NormalFit.of(mixed);
        assertTrue(poor.poor(), () -> "p " + poor.pValue());
        NormalFit good = NormalFit.of(new NormalDistribution(new Well19937c(3), 0, 10e-6).sample(40));
        assertFalse(good.poor(), () -> "p " + good.pValue());
    }

    @Test
    void tooFewUnitsAreNotTested() {
        NormalFit f = NormalFit.of(new double[] {1, 2, 4, 3, 5, 7, 6});
        assertTrue(Double.isNaN(f.pValue()));
        assertFalse(f.poor()); // untested is not "poor": the budget warns about it separately
        assertEquals(4.0, f.mean(), 1e-12);
        assertEquals(Math.sqrt(28.0 / 6), f.sigma(), 1e-12); // squares of -3..3 sum to 28, n - 1 = 6
    }
}
