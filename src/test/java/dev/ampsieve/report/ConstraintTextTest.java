package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.budget.ConstraintFact;
import dev.ampsieve.budget.ConstraintKind;
import dev.ampsieve.budget.ConstraintResult;
import dev.ampsieve.units.Dimension;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The one wording of a hard constraint's facts. */
class ConstraintTextTest {

    @Test
    void aRatedRangeShortAtBothEnds() {
        // needs 4.9 .. 5.1 V (5 V +/- 0.1 V) against a 5.0 .. 5.05 V rating: 0.1 V short below, 0.05 V above
        ConstraintResult c = new ConstraintResult(
                ConstraintKind.SUPPLY,
                false,
                new ConstraintFact.Span(4.9, 5.1, 5.0, 5.05, Dimension.VOLTAGE, 0.1, 0.05, null));
        assertEquals(
                "needs supply 4.90 V to 5.10 V; part rated 5.00 V to 5.05 V; short by 100 mV at the low end;"
                        + " short by 50.0 mV at the high end",
                ConstraintText.detail(c));
    }

    @Test
    void aReachableRangeWithAssumedHeadroom() {
        // 5 V supply, 1.5 V assumed from each rail: reachable 1.5 .. 3.5 V; needs 2.0 .. 3.0 V, met
        ConstraintResult c = new ConstraintResult(
                ConstraintKind.COMMON_MODE,
                true,
                new ConstraintFact.Span(
                        2.0,
                        3.0,
                        1.5,
                        3.5,
                        Dimension.VOLTAGE,
                        0,
                        0,
                        new ConstraintFact.HeadroomFacts(5.0, 1.5, 1.5, true, 0, Double.NaN)));
        assertEquals(
                "needs input common mode 2.00 V to 3.00 V; part reachable 1.50 V to 3.50 V"
                        + " (headroom assumed, not in the catalog)",
                ConstraintText.detail(c));
    }

    @Test
    void aPriceOverTheCeilingAndTheRejectionLines() {
        // 3.10 EUR against a 2.00 EUR ceiling: 1.10 EUR over
        ConstraintResult price =
                new ConstraintResult(ConstraintKind.PRICE, false, new ConstraintFact.Price(2.0, 3.1, "EUR", 1.1));
        assertEquals("ceiling 2.00 EUR; part 3.10 EUR; over by 1.10 EUR", ConstraintText.detail(price));
        ConstraintResult slew = new ConstraintResult(
                ConstraintKind.SLEW, true, new ConstraintFact.NotChecked(ConstraintFact.Missing.CATALOG_SLEW));
        assertEquals("not checked: no slew rate in the catalog", ConstraintText.detail(slew));
        assertEquals(
                "price: ceiling 2.00 EUR; part 3.10 EUR; over by 1.10 EUR; also slew",
                ConstraintText.shortReason(List.of(price, slew)));
    }
}
