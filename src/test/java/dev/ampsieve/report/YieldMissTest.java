package dev.ampsieve.report;

import static dev.ampsieve.testing.PartBuilder.part;
import static dev.ampsieve.testing.StageBuilder.stage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.testing.Budgets;
import java.util.List;
import org.junit.jupiter.api.Test;

class YieldMissTest {

    private static Budget withYield(Stage s, Verdict v, YieldResult y) {
        Part p = part("amp-1").build();
        Budget b = Budgets.budget(s, p, 0.5e-3, 0.2e-3, 0.2e-3, v);
        return new Budget(
                p,
                s,
                b.noiseGain(),
                b.terms(),
                b.worstCaseV(),
                b.rssV(),
                0,
                b.limitV(),
                y,
                b.trimmed(),
                v,
                b.limitingTerm(),
                List.of(),
                List.of());
    }

    @Test
    void aSeenYieldAtTheTargetWithALowIntervalIsExplained() {
        Stage s = stage().criterion(Criterion.yield(0.999)).build();
        // 9986 of 10000 seen (99.86 %) against 99.9 %: below; 9993 of 10000 (99.93 %): at it, but the
        // Wilson lower end is 0.99856 (Wilson 1927, z = 1.96), under the target
        Budget b = withYield(s, Verdict.NO_FIT, new YieldResult(0.9993, 0.99856, 0.99966, 10000, "sampled"));
        assertEquals(
                "the yield as it is is 99.930 %, but the lower end of its 95 % interval, 99.856 %, is below the"
                        + " 99.900 % target: the sample cannot show the target is met (more trials may settle it)",
                BudgetText.yieldMiss(b));
        assertNull(BudgetText.yieldMiss(
                withYield(s, Verdict.NO_FIT, new YieldResult(0.9986, 0.9979, 0.9991, 10000, "sampled"))));
        assertNull(
                BudgetText.yieldMiss(withYield(s, Verdict.FITS, new YieldResult(0.9999, 0.9994, 1, 10000, "sampled"))));
        assertNull(BudgetText.yieldMiss(withYield(
                stage().build(), Verdict.NO_FIT, new YieldResult(0.9993, 0.99856, 0.99966, 10000, "sampled"))));
    }
}
