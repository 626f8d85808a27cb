package dev.ampsieve.advice;

import static dev.ampsieve.testing.Budgets.budget;
import static dev.ampsieve.testing.PartBuilder.part;
import static dev.ampsieve.testing.StageBuilder.stage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stats.Cancelled;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;

/** The ranking checks for an interrupt before budgeting each part. */
class RankerCancellationTest {

    @AfterEach
    void clearInterrupt() {
        Thread.interrupted();
    }

    @Test
    void anInterruptStopsTheRankingBeforeTheNextPart() {
        Stage s = stage().build();
        List<Part> parts = new ArrayList<>();
        for (int i = 1; i <= 5; i++) {
            parts.add(part("P" + i).price(1.00).build());
        }
        List<String> budgeted = new ArrayList<>();
        assertThrows(
                Cancelled.class,
                () -> Ranker.rank(s, parts, (st, p) -> {
                    budgeted.add(p.id());
                    if (budgeted.size() == 2) {
                        Thread.currentThread().interrupt(); // Ctrl-C while the second part is budgeted
                    }
                    return budget(st, p, 0.1e-3, 0.1e-3, 0.1e-3, Verdict.FITS);
                }));
        assertEquals(List.of("P1", "P2"), budgeted);
    }
}
