package dev.ampsieve.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
        // true yield 0.5 against a 0.99 target: after one block of 1000 the Wilson interval
        // (about 0.47..0.53) lies far below the target
        SequentialYield.Estimate e = SequentialYield.run(20000, 0.99, bernoulli(3, 0.5));
        assertTrue(e.stoppedEarly());
        assertEquals(SequentialYield.BLOCK, e.trials());
        assertTrue(e.high() < 0.99);
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
}
