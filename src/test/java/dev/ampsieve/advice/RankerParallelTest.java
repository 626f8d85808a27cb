package dev.ampsieve.advice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Price;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stats.Cancelled;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.atomic.AtomicInteger;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;

/** Budgets computed on several threads: the same numbers as one part at a time, in the same order. */
class RankerParallelTest {

    @AfterEach
    void clearInterrupt() {
        Thread.interrupted();
    }

    /** Follower, limit 2 mV, typical-only offsets from 0.7 to 1.4 mV (bound 3 typ above 2 mV): each part's yield is sampled. */
    private static Stage stage() {
        StageFixture s = StageFixture.follower().limitV(2e-3);
        NormalDistribution n = new NormalDistribution(0, 1);
        // the yield of the 1 mV part, P(|Z| <= 2) / P(|Z| <= 3) (typ as sigma, truncated at 3 sigma)
        s.criterion = Criterion.yield((n.probability(-2, 2)) / n.probability(-3, 3));
        s.trials = 2000;
        s.maxTrials = 4000;
        return s.build();
    }

    private static List<Part> parts(int count) {
        List<Part> parts = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            PartFixture p = PartFixture.ideal().vos(0.7e-3 + 0.7e-3 * i / (count - 1), null, null);
            p.id = String.format("P%02d", i);
            p.price = new Price(1.0 + i % 7, 1, "USD");
            parts.add(p.build());
        }
        return parts;
    }

    @Test
    void theSameBudgetsAsOnePartAtATimeInReverse() {
        Stage s = stage();
        List<Part> parts = parts(3 * Ranker.PARALLEL_FROM);
        List<Budget> together = Ranker.budgetAll(s, parts, BudgetCalculator::compute);
        // the second method: each part alone, last part first, on this thread
        List<Part> reversed = new ArrayList<>(parts);
        Collections.reverse(reversed);
        List<YieldResult> alone = new ArrayList<>();
        for (Part p : reversed) {
            alone.add(BudgetCalculator.compute(s, p).yield());
        }
        Collections.reverse(alone);
        assertEquals(
                parts.stream().map(Part::id).toList(),
                together.stream().map(b -> b.part().id()).toList());
        assertEquals(alone, together.stream().map(Budget::yield).toList());
        // sampled, not decided by the bounds: the comparison says something about the streams
        assertTrue(alone.stream().allMatch(y -> y.decided().equals("sampled")), alone.toString());
    }

    @Test
    void anInterruptOfTheCallingThreadStopsEveryThread() throws Exception {
        Stage s = stage();
        List<Part> parts = parts(4 * Ranker.PARALLEL_FROM);
        AtomicInteger budgeted = new AtomicInteger();
        CountDownLatch started = new CountDownLatch(1);
        Thread caller = Thread.currentThread();
        Thread ctrlC = new Thread(() -> {
            try {
                started.await();
            } catch (InterruptedException e) {
                return;
            }
            caller.interrupt();
        });
        ctrlC.start();
        assertThrows(
                Cancelled.class,
                () -> Ranker.budgetAll(s, parts, (st, p) -> {
                    budgeted.incrementAndGet();
                    started.countDown();
                    // a part that takes a while, as a long Monte Carlo does: it stops at an interrupt
                    for (long t = System.nanoTime(); System.nanoTime() - t < 50_000_000L; ) {
                        Cancelled.check();
                        Thread.onSpinWait();
                    }
                    return BudgetCalculator.compute(st, p);
                }));
        ctrlC.join();
        assertTrue(Thread.interrupted(), "the status stays set for the caller"); // and is cleared here
        int seen = budgeted.get();
        Thread.sleep(200); // helpers interrupted within their part: none starts another
        assertTrue(budgeted.get() - seen <= Runtime.getRuntime().availableProcessors(), "helpers went on");
        assertTrue(budgeted.get() < parts.size(), "stopped before the end: " + budgeted.get());
    }
}
