package dev.ampsieve.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;

/** The Monte Carlo loop stops at the next block once its thread is interrupted, and only then. */
class CancelledTest {

    @AfterEach
    void clearInterrupt() {
        Thread.interrupted(); // never leave the test thread interrupted for the next test
    }

    @Test
    void anInterruptedThreadSimulatesNoBlockAtAll() {
        List<Integer> sizes = new ArrayList<>();
        Thread.currentThread().interrupt();
        assertThrows(
                Cancelled.class,
                () -> SequentialYield.run(10_000_000, Double.NaN, size -> {
                    sizes.add(size);
                    return size;
                }));
        assertEquals(List.of(), sizes); // checked before the first block
        assertTrue(Thread.currentThread().isInterrupted(), "the interrupt status is left for the caller");
    }

    @Test
    void anInterruptDuringARunStopsItBeforeTheNextBlock() {
        List<Integer> sizes = new ArrayList<>();
        // 10 million units are 10 000 blocks; the interrupt arrives during the third
        assertThrows(
                Cancelled.class,
                () -> SequentialYield.run(10_000_000, Double.NaN, size -> {
                    sizes.add(size);
                    if (sizes.size() == 3) {
                        Thread.currentThread().interrupt();
                    }
                    return size;
                }));
        assertEquals(List.of(1000, 1000, 1000), sizes);
    }

    @Test
    void withoutAnInterruptTheResultIsTheSameAsBefore() {
        // blocks of 1000, 1000, 1000 and 500 for 3500 units, each with exactly one failure:
        // 999 + 999 + 999 + 499 = 3496 passes (worked by hand)
        List<Integer> sizes = new ArrayList<>();
        SequentialYield.Estimate e = SequentialYield.run(3500, Double.NaN, size -> {
            sizes.add(size);
            return size - 1;
        });
        assertEquals(List.of(1000, 1000, 1000, 500), sizes);
        assertEquals(3496, e.passes());
        assertEquals(3500, e.trials());
        assertFalse(e.stoppedEarly());
        assertFalse(Thread.currentThread().isInterrupted());
    }

    @Test
    void theCheckLeavesAnUninterruptedThreadAlone() {
        Cancelled.check(); // does not throw
        Thread.currentThread().interrupt();
        Cancelled c = assertThrows(Cancelled.class, Cancelled::check);
        assertEquals("interrupted", c.getMessage());
        assertEquals(0, c.getStackTrace().length); // an expected way out, not a fault
    }
}
