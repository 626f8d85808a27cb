package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.stage.Trim;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The worst case is a bound (error-model.md "Combining"): no simulated unit has a larger error
 * than the worst-case total, so a part that fits by the worst case has a yield of 100 % in the
 * same report. Checked over every demo part in every demo stage, as the stage is and with the
 * limit set to each part's own worst-case total (the tightest limit it fits), before and after
 * a trim. The assertion is the definition of a bound, not a restated formula.
 */
class WorstCaseBoundsYieldTest {

    private static List<Stage> demoStages() throws Exception {
        List<Stage> out = new ArrayList<>();
        try (Stream<Path> files = Files.list(Path.of("demo-catalog/stages"))) {
            for (Path f :
                    files.filter(p -> p.toString().endsWith(".yaml")).sorted().toList()) {
                out.add(StageLoader.load(f));
            }
        }
        return out;
    }

    /** {@code s} judged by the worst case against {@code limitV} output volts. */
    private static Stage worstCase(Stage s, double limitV) {
        return s.toBuilder()
                .limit(Limit.output(limitV))
                .criterion(Criterion.WORST_CASE)
                .build();
    }

    @Test
    void aPartThatFitsByTheWorstCaseHasAFullYield() throws Exception {
        Catalog c = CatalogLoader.load(Path.of("demo-catalog"), false);
        int fits = 0;
        for (Stage demo : demoStages()) {
            for (Part p : c.parts()) {
                Budget asIs = BudgetCalculator.compute(demo, p);
                String what = p.id() + " in " + demo.where();
                if (asIs.worstCaseV() <= asIs.limitV()) {
                    assertEquals(1.0, asIs.yield().value(), 0.0, what + ": fits the limit by the worst case");
                }
                Budget tight = BudgetCalculator.compute(worstCase(demo, asIs.worstCaseV()), p);
                if (tight.verdict() == Verdict.FITS) {
                    fits++;
                    assertEquals(1.0, tight.yield().value(), 0.0, what + ": verdict fits, limit = its worst case");
                    assertEquals(1.0, tight.yield().low(), 0.0, what);
                }
            }
        }
        assertTrue(fits >= 10, "too few demo parts meet the constraints to make the check mean anything: " + fits);
    }

    @Test
    void noSimulatedUnitExceedsTheWorstCaseBeforeOrAfterATrim() throws Exception {
        Catalog c = CatalogLoader.load(Path.of("demo-catalog"), false);
        for (Stage demo : demoStages()) {
            for (Trim.Method m :
                    List.of(Trim.Method.ONE_POINT, Trim.Method.TWO_POINT)) { // two-temperature: TwoTemperatureTrimTest
                Stage s = withTrim(
                        demo,
                        new Trim(true, m, demo.trim() == null ? 0 : demo.trim().resolution(), 0));
                boolean two = m == Trim.Method.TWO_POINT;
                for (Part p : c.parts()) {
                    PartValues v = PartValues.of(p, s);
                    List<TermResult> terms = BudgetCalculator.TERMS.stream()
                            .map(t -> t.evaluate(s, v))
                            .toList();
                    Budget b = BudgetCalculator.compute(s, p);
                    String what = p.id() + " in " + demo.where() + ", " + m;
                    double untrimmed = new YieldModel(
                                    s, v, BudgetCalculator.fixedInYield(s, terms, false, false), false, false)
                            .maxError();
                    assertTrue(
                            untrimmed <= b.worstCaseV() * (1 + 1e-12),
                            what + ": " + untrimmed + " > " + b.worstCaseV());
                    double trimmed = new YieldModel(s, v, BudgetCalculator.fixedInYield(s, terms, true, two), true, two)
                            .maxError();
                    double bound = BudgetCalculator.trimmed(s, p, m).worstCaseV();
                    assertTrue(trimmed <= bound * (1 + 1e-12), what + " trimmed: " + trimmed + " > " + bound);
                }
            }
        }
    }

    private static Stage withTrim(Stage s, Trim t) {
        return s.toBuilder().trim(t).build();
    }
}
