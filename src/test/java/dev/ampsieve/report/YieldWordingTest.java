package dev.ampsieve.report;

import static dev.ampsieve.testing.PartBuilder.part;
import static dev.ampsieve.testing.StageBuilder.stage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.advice.Comparison;
import dev.ampsieve.advice.Sufficiency;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.Trimmed;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Stage;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Yield figures in the advice: a rounded yield or lower bound must never read higher than the
 * simulation found, and a part judged by a yield target is explained by its yield, not by an
 * error total that is within the limit.
 */
class YieldWordingTest {

    /** Limit 1 mV, yield 99.9 %, one-point trim allowed; one offset term of 0.6 mV (RSS 0.6 mV). */
    private static Budget budget(Stage s, Part p, YieldResult y, YieldResult afterTrim, Verdict v) {
        TermResult t = new TermResult(
                "offset", "initial offset", 0.6e-3, 0.6e-5, 25, false, dev.ampsieve.budget.TermWorking.plain("test"));
        return new Budget(
                p,
                s,
                s.noiseGain(),
                List.of(t),
                0.6e-3,
                0.6e-3,
                0,
                s.limitVolts(),
                y,
                new Trimmed(0.5e-3, 0.5e-3, afterTrim),
                v,
                "offset",
                List.of(),
                List.of());
    }

    private static Stage stage999() {
        return stage().criterion(Criterion.yield(0.999)).trim(true, 0, 0.5).build();
    }

    @Test
    void aYieldJustUnder100PercentIsNotPrintedAs100() {
        // 99.993 % observed, 95 % lower end 99.962 %: one decimal would print both as 100.0 %
        Budget b = budget(
                stage999(),
                part("A").build(),
                new YieldResult(0.99993, 0.99962, 0.99998, 13000, "sampled"),
                null,
                Verdict.FITS);
        String answer = AdviceText.answer(Sufficiency.of(b));
        assertTrue(answer.contains("yield 99.99 % (95 % interval from 99.96 %, target 99.9 %)"), answer);
        assertFalse(answer.contains("100.0 %"), answer);
    }

    @Test
    void aPartThatMissesTheYieldTargetIsExplainedByItsYield() {
        // after the trim: 99.93 % observed, lower end 99.883 % < 99.9 %: no fit although its RSS
        // (0.5 mV) is half the limit; the reason given must be the yield
        Stage s = stage999();
        Budget a = budget(s, part("A").price(3.0).build(), new YieldResult(1, 1, 1, 0, "all-pass"), null, Verdict.FITS);
        Budget b = budget(
                s,
                part("B").price(1.0).build(),
                new YieldResult(0.8, 0.78, 0.82, 1000, "sampled"),
                new YieldResult(0.9993, 0.99883, 0.99958, 20000, "sampled"),
                Verdict.NO_FIT);
        Comparison c = Comparison.of(a, b);
        assertEquals("A", c.preferred());
        assertTrue(
                AdviceText.conclusion(c)
                        .contains(
                                "B does not (yield after the trim 99.93 % (95 % interval from 99.88 %; target 99.9 %)"),
                AdviceText.conclusion(c));
    }
}
