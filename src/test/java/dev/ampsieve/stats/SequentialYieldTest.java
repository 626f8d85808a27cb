package dev.ampsieve.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

class SequentialYieldTest {

    private static SequentialYield.Block bernoulli(long seed, double p) {
        Well19937c rng = new Well19937c(seed);
        return size -> {
            int k = 0;
            for (int i = 0; i < size; i++) {
                if (rng.nextDouble() < p) {
                    k++;
                }
            }
            return k;
        };
    }

    @Test
    void stopsOnceTheIntervalIsClearOfTheTarget() {
        // true yield 0.5 against a 0.99 target: at the first look, after 100 units, the interim
        // Wilson interval (z 3.29: about 0.34..0.66 for 50 of 100) lies far below the target
        SequentialYield.Estimate e = SequentialYield.run(20000, 0.99, bernoulli(3, 0.5));
        assertTrue(e.stoppedEarly());
        assertEquals(100, e.trials());
        assertTrue(e.high() < 0.99);
    }

    @Test
    void looksAfter100And200And500UnitsThenEveryThousand() {
        // every unit passes against 0.999: the interim Wilson low end with all n passing is n / (n + z^2)
        // (Wilson 1927, score interval with p = 1), at least 0.999 from n = 999 z^2 = 999 x 10.8276 = 10,817
        // [Calc]: the first look at or past it is the one after 11,000 units
        List<Integer> sizes = new ArrayList<>();
        SequentialYield.Estimate e = SequentialYield.run(100_000, 0.999, size -> {
            sizes.add(size);
            return size;
        });
        assertEquals(11_000, e.trials());
        assertEquals(List.of(100, 100, 300, 500, 1000, 1000, 1000, 1000, 1000, 1000, 1000, 1000, 1000, 1000), sizes);
        // without a target: blocks of 1000 and no look; the last block is what remains
        sizes.clear();
        SequentialYield.run(2500, Double.NaN, size -> {
            sizes.add(size);
            return size;
        });
        assertEquals(List.of(1000, 1000, 500), sizes);
    }

    @Test
    void aFarMissIsDecidedAtTheFirstLook() {
        // exactly 90 of every 100 units pass against 0.999: the interim upper end at n = 100, z = 3.2905,
        // p = 0.9 is (p + z^2/2n + z sqrt(p(1-p)/n + z^2/4n^2)) / (1 + z^2/n) = (0.9 + 0.05414 + 3.2905 x
        // sqrt(0.0009 + 0.000271)) / 1.10828 = (0.95414 + 0.11261) / 1.10828 = 0.9625 [Calc] < 0.999
        SequentialYield.Estimate e = SequentialYield.run(100_000, 0.999, size -> size - size / 10);
        assertEquals(100, e.trials());
        assertEquals(90, e.passes());
        assertTrue(e.stoppedEarly());
    }

    @Test
    void runsAllUnitsWhenTheTargetIsInsideTheInterval() {
        SequentialYield.Estimate e = SequentialYield.run(5000, 0.5, bernoulli(3, 0.5));
        assertFalse(e.stoppedEarly());
        assertEquals(5000, e.trials());
    }

    @Test
    void runsAllUnitsWithoutATarget() {
        SequentialYield.Estimate e = SequentialYield.run(3500, Double.NaN, bernoulli(3, 0.2));
        assertEquals(3500, e.trials());
        Wilson.Interval w = Wilson.interval95(e.passes(), e.trials());
        assertEquals(w.low(), e.low(), 0.0);
    }

    @Test
    void sameSeedSameStoppingPoint() {
        SequentialYield.Estimate a = SequentialYield.run(20000, 0.95, bernoulli(11, 0.97));
        SequentialYield.Estimate b = SequentialYield.run(20000, 0.95, bernoulli(11, 0.97));
        assertEquals(a, b);
    }

    @Test
    void earlyStoppingKeepsTheFalsePassRateOfOneLook() {
        // A 95 % two-sided interval's lower end lies above the true proportion in about 2.5 % of
        // samples (definition of a confidence bound; Wilson keeps close to it at these sizes:
        // Brown, Cai, DasGupta, Stat. Sci. 16 (2001)). Looking after every block with the same
        // interval and stopping at the first look that clears the target multiplies the chances
        // (repeated significance tests: Armitage, McPherson, Rowe, J. R. Stat. Soc. A 132 (1969)
        // [from memory]). True yield exactly at the target: a part that only just fails must be
        // passed no more often than one look would pass it.
        Well19937c seeds = new Well19937c(2024);
        int reps = 1500;
        int passed = 0;
        for (int r = 0; r < reps; r++) {
            SequentialYield.Estimate e = SequentialYield.run(20000, 0.99, bernoulli(seeds.nextLong(), 0.99));
            if (e.low() >= 0.99) {
                passed++;
            }
        }
        double rate = (double) passed / reps;
        // 2.5 % nominal; 4 % leaves room for the binomial spread of 1500 repetitions (sd 0.4 %)
        assertTrue(rate <= 0.04, "false-pass rate " + rate + " at the target, one look would give about 0.025");
    }

    @Test
    void interimLooksUseTheStricterHaybittlePetoBound() {
        // Haybittle, Br. J. Radiol. 44 (1971) 793; Peto et al., Br. J. Cancer 34 (1976) 585 [from memory]:
        // interim looks stop only at two-sided p < 0.001, i.e. z = 3.2905 (commons-math3 quantile)
        double z =
                new org.apache.commons.math3.distribution.NormalDistribution().inverseCumulativeProbability(1 - 0.0005);
        assertEquals(z, SequentialYield.INTERIM_Z, 1e-12);
        // 1000 of 1000 passes: 95 % Wilson low 0.99617 (reference-checks §7) clears 0.995, but the
        // interim bound at z 3.29 (low = 1/(1 + z^2/n) = 0.98929 [Calc]) does not: no stop after one block
        SequentialYield.Estimate e = SequentialYield.run(20000, 0.995, size -> size);
        assertTrue(e.trials() > SequentialYield.BLOCK, "stopped after " + e.trials());
        assertTrue(e.stoppedEarly());
        assertTrue(e.low() >= 0.995);
    }
}
