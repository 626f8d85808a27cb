package dev.ampsieve.advice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.Constraints;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.report.ConstraintText;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.testing.DemoCatalog;
import dev.ampsieve.testing.PartBuilder;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A part whose figures overflow the arithmetic (beyond what a catalog file may hold, so built
 * directly) is rejected with the terms and values that overflowed; the rest of the catalog is
 * ranked as without it.
 */
class OverflowRejectionTest {

    @TempDir
    Path dir;

    /** 1e200 nV/rtHz = 1e191 V/rtHz: its square, 1e382 V²/Hz, is past the largest double (about 1.8e308). */
    private static Part loud() {
        return PartBuilder.part("loud-amp").noise(1e191, 0.0, null, null).build();
    }

    @Test
    void anOverflowingPartIsRejectedAndTheRankingGoesOn() throws Exception {
        Path demo = DemoCatalog.copyTo(dir);
        Catalog c = CatalogLoader.load(demo, false);
        Stage stage = StageLoader.load(demo.resolve("stages/bridge-amp.yaml"));
        Ranking without = Ranker.rank(stage, c.parts(), BudgetCalculator::compute);
        List<Part> parts = new ArrayList<>(c.parts());
        parts.add(loud());
        Ranking with = Ranker.rank(stage, parts, BudgetCalculator::compute);

        Rejected r = with.rejected().stream()
                .filter(x -> x.id().equals("loud-amp"))
                .findFirst()
                .orElseThrow();
        assertEquals(List.of(Constraints.FINITE), r.failed());
        assertTrue(
                ConstraintText.reason(r.failedConstraints())
                        // the noise term's operands, unworded (issue 11: only report words a term's note)
                        .startsWith("finite: too large to compute: noise (en 1.00e+191 V/√Hz, in 1.00 pA/√Hz, rms ∞ V"),
                ConstraintText.reason(r.failedConstraints()));
        assertTrue(
                ConstraintText.reason(r.failedConstraints())
                        .endsWith("; check these catalog and stage values for a wrong prefix or exponent"),
                ConstraintText.reason(r.failedConstraints()));
        // the other 48 parts rank exactly as before
        assertEquals(
                without.candidates().stream().map(Candidate::id).toList(),
                with.candidates().stream().map(Candidate::id).toList());
        assertEquals(without.rejected().size() + 1, with.rejected().size());
        assertFalse(with.candidates().isEmpty());
    }

    @Test
    void itsBudgetSaysNoFitWithoutRunningTheMonteCarlo() throws Exception {
        Stage stage = StageLoader.parse("gain: 100\nlimit: 1 mV\ncriterion: yield 99 %\ntrim: true\n", null);
        Budget b = BudgetCalculator.compute(stage, loud());
        assertEquals(Verdict.NO_FIT, b.verdict());
        assertEquals("none-pass", b.yield().decided());
        assertEquals(Double.POSITIVE_INFINITY, b.worstCaseV());
        assertEquals("none-pass", BudgetCalculator.trimmedYield(stage, loud()).decided());
    }
}
