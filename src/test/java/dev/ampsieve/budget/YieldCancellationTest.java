package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageKeys;
import dev.ampsieve.stats.Cancelled;
import java.time.Duration;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.Test;

/** A budget's Monte Carlo gives up when its thread is interrupted, and is unchanged otherwise. */
class YieldCancellationTest {

    /**
     * A follower whose offset is typical-only 1 mV: one sigma, truncated at max-to-sigma 3 x typ
     * (error-model.md, typical-only figures), so its worst case is 3 mV; against a 2 mV limit it
     * must be sampled.
     */
    private static Stage stage(int trials) {
        StageFixture s = StageFixture.follower().limitV(2e-3);
        s.trials = trials;
        return s.build();
    }

    private static final dev.ampsieve.catalog.Part PART =
            PartFixture.ideal().vos(1e-3, null, null).build();

    @Test
    void anInterruptedBudgetStopsWithCancelled() {
        // the most units a stage may ask for: unstopped, this takes minutes; the guard only catches a hang
        Stage s = stage(StageKeys.MAX_TRIALS);
        assertTimeoutPreemptively(Duration.ofMinutes(2), () -> {
            Thread.currentThread().interrupt();
            try {
                assertThrows(Cancelled.class, () -> BudgetCalculator.compute(s, PART));
            } finally {
                Thread.interrupted();
            }
        });
    }

    @Test
    void anInterruptFromAnotherThreadStopsARunningBudget() throws Exception {
        Stage s = stage(StageKeys.MAX_TRIALS);
        Throwable[] thrown = new Throwable[1];
        Thread worker = new Thread(
                () -> {
                    try {
                        // budgets one after another until stopped: a run can take under the 200 ms below (10
                        // million units of one normal draw each took about 0.5 s on a loaded 2-core machine), and
                        // an interrupt between two budgets stops the next one at its first block
                        while (true) {
                            BudgetCalculator.compute(s, PART);
                        }
                    } catch (Throwable t) {
                        thrown[0] = t;
                    }
                },
                "budget-under-test");
        worker.start();
        Thread.sleep(200); // let it get into the sampling; an earlier interrupt is caught just the same
        worker.interrupt();
        worker.join(Duration.ofMinutes(2).toMillis()); // a hang guard, not a speed requirement
        assertTrue(!worker.isAlive(), "the budget did not stop after the interrupt");
        assertTrue(thrown[0] instanceof Cancelled, "expected Cancelled, got " + thrown[0]);
    }

    @Test
    void withoutAnInterruptTheYieldIsAsBefore() {
        YieldResult y = BudgetCalculator.compute(stage(20000), PART).yield();
        assertEquals("sampled", y.decided());
        assertEquals(20000, y.trials());
        // the law: a unit passes when |vos| <= 2 mV, vos ~ N(0, 1 mV) truncated at 3 mV:
        // P(|Z| <= 2) / P(|Z| <= 3) = 0.9544997 / 0.9973002 = 0.9570836 (commons-math3; Abramowitz & Stegun ch. 26)
        NormalDistribution z = new NormalDistribution();
        double expected = z.probability(-2, 2) / z.probability(-3, 3);
        assertEquals(0.9570836, expected, 1e-7);
        assertTrue(
                y.low() <= expected && expected <= y.high(), expected + " not in [" + y.low() + ", " + y.high() + "]");
    }
}
