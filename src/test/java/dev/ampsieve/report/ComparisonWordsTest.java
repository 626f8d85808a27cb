package dev.ampsieve.report;

import static dev.ampsieve.testing.Budgets.budget;
import static dev.ampsieve.testing.PartBuilder.part;
import static dev.ampsieve.testing.StageBuilder.stage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.advice.Comparison;
import dev.ampsieve.advice.Sufficiency;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.ConstraintFact;
import dev.ampsieve.budget.ConstraintKind;
import dev.ampsieve.budget.ConstraintResult;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.testing.Budgets;
import dev.ampsieve.units.Dimension;
import org.junit.jupiter.api.Test;

/**
 * The words of a comparison's conclusion and of the "does it suffice" answer ({@link AdviceText}); the
 * numbers behind them are tested in {@code advice.ComparisonTest}. Limit 1 mV at the output, worst-case
 * criterion, quantity 1000.
 */
class ComparisonWordsTest {

    private final Stage s = stage().trim(true, 10e-6, 0.50).build();
    private final Part a = part("A").price(3.00).build();
    private final Part b = part("B").price(1.00).build();

    @Test
    void fittingPartBeatsOneThatDoesNotAndTermsAreComparedOneByOne() {
        Stage s = stage().build(); // no trim
        Budget ba = budget(s, a, 0.2e-3, 0.3e-3, 0.31e-3, Verdict.FITS);
        Budget bb = budget(s, b, 1.5e-3, 0.4e-3, 1.2e-3, Verdict.NO_FIT);
        Comparison c = Comparison.of(ba, bb);
        assertEquals("A", c.preferred());
        assertEquals(
                "A fits (margin 50 %) and B does not (worst-case 1.90 mV against 1.00 mV, limited by initial"
                        + " offset (1.50 mV)): A.",
                AdviceText.conclusion(c));
        Comparison.TermDelta offset = c.terms().stream()
                .filter(t -> t.key().equals("offset"))
                .findFirst()
                .orElseThrow();
        // 0.2 mV against 1.5 mV: A better by 1.3 mV, 7.5 times
        assertEquals(Comparison.Side.A, offset.better());
        assertEquals(1.3e-3, offset.differenceV(), 1e-15);
        assertEquals(7.5, offset.ratio(), 1e-12);
    }

    @Test
    void aPartThatMissesEvenAfterTheTrimIsJudgedAfterIt() {
        Comparison c = Comparison.of(
                budget(s, a, 0.2e-3, 0.3e-3, 0.31e-3, Verdict.FITS),
                budget(s, b, 1.5e-3, 0.4e-3, 1.2e-3, Verdict.NO_FIT));
        // the limiting term belongs to the untrimmed budget, so it is named as such
        assertEquals(
                "A fits (margin 50 %) and B does not (worst-case after the trim 1.20 mV against 1.00 mV, largest"
                        + " term before the trim initial offset (1.50 mV)): A.",
                AdviceText.conclusion(c));
    }

    @Test
    void bothFittingTheCheaperWinsWithTheSavingOverTheQuantity() {
        Budget ba = budget(s, a, 0.2e-3, 0.3e-3, 0.31e-3, Verdict.FITS);
        Budget bb = budget(s, b, 0.4e-3, 0.4e-3, 0.4e-3, Verdict.FITS);
        Comparison c = Comparison.of(ba, bb);
        // 3.00 - 1.00 = 2.00 per unit, 2000.00 over 1000 units; margins 20 % (B) and 50 % (A)
        assertEquals(
                "Both fit; B costs 2.00 USD less per unit (2000.00 USD over 1000 units), margin 20 % against"
                        + " 50 %: B.",
                AdviceText.conclusion(c));
    }

    @Test
    void equalTermsAreMarkedEqual() {
        Comparison.TermDelta d = Comparison.delta("noise", "noise", 1e-6, 1e-6);
        assertEquals(Comparison.Side.EQUAL, d.better());
        assertEquals(1.0, d.ratio());
    }

    @Test
    void identicalBudgetsPreferNeither() {
        Part a2 = part("A2").price(3.00).build();
        Comparison c = Comparison.of(
                budget(s, a, 0.2e-3, 0.3e-3, 0.3e-3, Verdict.FITS),
                budget(s, a2, 0.2e-3, 0.3e-3, 0.3e-3, Verdict.FITS));
        assertNull(c.preferred());
        assertTrue(
                AdviceText.conclusion(c).startsWith("Both fit at the same cost with the same margin"),
                AdviceText.conclusion(c));
    }

    @Test
    void sufficiencyAnswersYesOrNoFirst() {
        Sufficiency yes = Sufficiency.of(budget(s, b, 0.4e-3, 0.4e-3, 0.4e-3, Verdict.FITS));
        assertTrue(yes.yes());
        assertEquals(
                "yes: B meets the limit untrimmed; worst-case 800 µV against 1.00 mV (margin 20 %).",
                AdviceText.answer(yes));

        Sufficiency trim = Sufficiency.of(budget(s, b, 1.5e-3, 0.4e-3, 0.41e-3, Verdict.FITS_AFTER_TRIM));
        assertFalse(trim.yes());
        assertEquals(
                "no: B needs the trim; untrimmed worst-case 1.90 mV against 1.00 mV, limited by initial offset"
                        + " (1.50 mV); after the trim 410 µV.",
                AdviceText.answer(trim));

        Sufficiency over = Sufficiency.of(budget(s, b, 0.9e-3, 0.3e-3, 0.3e-3, Verdict.NO_FIT));
        assertEquals(
                "no: B does not meet the limit untrimmed; worst-case 1.20 mV against 1.00 mV (20 % over), limited by"
                        + " initial offset (900 µV).",
                AdviceText.answer(over));

        // a 5 V supply against a part rated 9 V to 36 V: 4 V short at the low end
        Sufficiency rejected = Sufficiency.of(Budgets.rejected(
                s,
                b,
                new ConstraintResult(
                        ConstraintKind.SUPPLY,
                        false,
                        new ConstraintFact.Span(5, 5, 9, 36, Dimension.VOLTAGE, 4, 0, null))));
        assertEquals("no: B fails a hard constraint: supply", AdviceText.answer(rejected));
    }
}
