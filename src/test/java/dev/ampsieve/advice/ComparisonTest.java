package dev.ampsieve.advice;

import static dev.ampsieve.testing.Budgets.budget;
import static dev.ampsieve.testing.PartBuilder.part;
import static dev.ampsieve.testing.StageBuilder.stage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

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

/** Limit 1 mV at the output, worst-case criterion, quantity 1000. */
class ComparisonTest {

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
        // A: 0.2 + 0.3 = 0.5 mV worst-case of 1 mV, margin 50 %; B: 1.9 mV, 90 % over
        assertEquals(0.5, c.a().margin(), 1e-12);
        assertEquals(-0.9, c.b().margin(), 1e-12);
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
        // B is judged after the trim (1.2 mV, still over); its limiting term is the untrimmed budget's
        assertEquals("A", c.preferred());
        assertTrue(c.b().trimmed());
        assertEquals(1.2e-3, c.b().errorV(), 1e-15);
        assertEquals("offset", c.b().budget().limitingTerm());
    }

    @Test
    void bothFittingTheCheaperWinsWithTheSavingOverTheQuantity() {
        Budget ba = budget(s, a, 0.2e-3, 0.3e-3, 0.31e-3, Verdict.FITS);
        Budget bb = budget(s, b, 0.4e-3, 0.4e-3, 0.4e-3, Verdict.FITS);
        Comparison c = Comparison.of(ba, bb);
        // 3.00 - 1.00 = 2.00 per unit; margins 20 % (B) and 50 % (A): the cheaper fitting part wins
        assertEquals("B", c.preferred());
        assertEquals(2.00, c.a().effectiveCost() - c.b().effectiveCost(), 1e-12);
        assertEquals(0.2, c.b().margin(), 1e-12);
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
    }

    @Test
    void sufficiencyAnswersYesOrNoFirst() {
        Sufficiency yes = Sufficiency.of(budget(s, b, 0.4e-3, 0.4e-3, 0.4e-3, Verdict.FITS));
        assertTrue(yes.yes());
        assertEquals(Sufficiency.Outcome.YES, yes.outcome());
        assertEquals(0.8e-3, yes.untrimmedErrorV(), 1e-15); // 0.4 + 0.4 mV
        assertEquals(0.2, yes.margin(), 1e-12);

        Sufficiency trim = Sufficiency.of(budget(s, b, 1.5e-3, 0.4e-3, 0.41e-3, Verdict.FITS_AFTER_TRIM));
        assertFalse(trim.yes());
        assertEquals(Sufficiency.Outcome.NEEDS_TRIM, trim.outcome());
        assertEquals(1.9e-3, trim.untrimmedErrorV(), 1e-15);
        assertEquals(0.41e-3, trim.afterTrimV(), 1e-15);

        Sufficiency over = Sufficiency.of(budget(s, b, 0.9e-3, 0.3e-3, 0.3e-3, Verdict.NO_FIT));
        assertEquals(Sufficiency.Outcome.NO, over.outcome());
        assertEquals(-0.2, over.margin(), 1e-12); // 1.2 mV against 1 mV

        // a 5 V supply against a part rated 9 V to 36 V: 4 V short at the low end
        Sufficiency rejected = Sufficiency.of(Budgets.rejected(
                s,
                b,
                new ConstraintResult(
                        ConstraintKind.SUPPLY,
                        false,
                        new ConstraintFact.Span(5, 5, 9, 36, Dimension.VOLTAGE, 4, 0, null))));
        assertEquals(Sufficiency.Outcome.FAILS_CONSTRAINT, rejected.outcome());
        assertEquals(java.util.List.of("supply"), rejected.rejected().failed());
    }
}
