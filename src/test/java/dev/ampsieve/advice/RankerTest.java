package dev.ampsieve.advice;

import static dev.ampsieve.testing.Budgets.budget;
import static dev.ampsieve.testing.PartBuilder.part;
import static dev.ampsieve.testing.StageBuilder.stage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.ConstraintFact;
import dev.ampsieve.budget.ConstraintKind;
import dev.ampsieve.budget.ConstraintResult;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.report.ConstraintText;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.testing.Budgets;
import dev.ampsieve.units.Dimension;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Ranking and stage advice on budgets built by hand. The stage limit is 1 mV at the output
 * (worst-case criterion) unless a test says otherwise; costs are worked in the comments.
 */
class RankerTest {

    private static final Part PREC = part("PREC").price(3.00).build();
    private static final Part CHEAP = part("CHEAP").price(1.00).build();

    /** Ranks parts whose budgets the test fixed in advance. */
    private static Ranking rank(Stage s, Map<Part, Budget> budgets) {
        Map<String, Budget> byId = new LinkedHashMap<>();
        budgets.forEach((p, b) -> byId.put(p.id(), b));
        return Ranker.rank(s, new ArrayList<>(budgets.keySet()), (st, p) -> byId.get(p.id()));
    }

    private static Map<Part, Budget> precAndCheap(Stage s, Verdict cheapVerdict) {
        Map<Part, Budget> m = new LinkedHashMap<>();
        // PREC: 0.2 mV + 0.3 mV = 0.5 mV worst-case, within 1 mV as it is
        m.put(PREC, budget(s, PREC, 0.2e-3, 0.3e-3, 0.31e-3, Verdict.FITS));
        // CHEAP: 1.5 mV + 0.4 mV = 1.9 mV as it is; 0.41 mV after the trim
        m.put(CHEAP, budget(s, CHEAP, 1.5e-3, 0.4e-3, 0.41e-3, cheapVerdict));
        return m;
    }

    @Test
    void trimIsWarrantedWhenCheaperPartPlusTrimCostsLess() {
        Stage s = stage().trim(true, 10e-6, 0.50).quantity(1000).build();
        Ranking r = rank(s, precAndCheap(s, Verdict.FITS_AFTER_TRIM));
        // CHEAP 1.00 + trim 0.50 = 1.50 per unit against PREC 3.00: saves 1.50 per unit, 1500.00 over 1000
        TrimAdvice t = r.advice().trim();
        assertEquals(TrimAdvice.Status.WARRANTED, t.status());
        assertEquals("CHEAP", t.withTrim().id());
        assertEquals("PREC", t.asIs().id());
        assertEquals(1.50, t.withTrim().effectiveCost(), 1e-12);
        assertEquals(1.50, t.savingPerUnit(), 1e-12);
        assertEquals(1500.0, t.savingTotal(), 1e-9);
        assertEquals("CHEAP", r.advice().pick().id());
        assertEquals("PREC", r.advice().cheapestAsIs().id());
        assertEquals(
                List.of("CHEAP", "PREC"),
                r.candidates().stream().map(Candidate::id).toList());
        // margins: CHEAP after the trim (1 - 0.41) = 59 %, PREC (1 - 0.5) = 50 %
        assertEquals(0.59, r.candidates().get(0).margin(), 1e-12);
        // the part's own price, before the trim: 1.00
        assertEquals(1.00, Candidate.price(t.withTrim().part(), s.quantity()), 1e-12);
        assertTrue(t.withTrim().trimmed());
        assertEquals(3.00, t.asIs().effectiveCost(), 1e-12);
        // one currency: no remark on mixed currencies
        assertEquals(List.of(), r.advice().currencies());
    }

    @Test
    void trimDoesNotPayWhenItCostsMoreThanThePriceGap() {
        Stage s = stage().trim(true, 10e-6, 2.50).build();
        Ranking r = rank(s, precAndCheap(s, Verdict.FITS_AFTER_TRIM));
        // CHEAP 1.00 + 2.50 = 3.50 against PREC 3.00: the trim costs 0.50 more per unit
        TrimAdvice t = r.advice().trim();
        assertEquals(TrimAdvice.Status.NOT_WARRANTED, t.status());
        assertEquals(-0.50, t.savingPerUnit(), 1e-12);
        assertEquals("PREC", r.advice().pick().id());
    }

    @Test
    void trimIsRequiredWhenOnlyATrimmedPartFits() {
        Stage s = stage().trim(true, 10e-6, 0.50).build();
        Map<Part, Budget> m = new LinkedHashMap<>();
        m.put(CHEAP, budget(s, CHEAP, 1.5e-3, 0.4e-3, 0.41e-3, Verdict.FITS_AFTER_TRIM));
        Ranking r = rank(s, m);
        assertEquals(TrimAdvice.Status.REQUIRED, r.advice().trim().status());
        assertNull(r.advice().cheapestAsIs());
        // the pick is the trimmed part: 1.00 + 0.50
        assertEquals("CHEAP", r.advice().pick().id());
        assertTrue(r.advice().pick().trimmed());
        assertEquals(1.50, r.advice().pick().effectiveCost(), 1e-12);
    }

    @Test
    void trimNotAllowedButWouldPayIsSaid() {
        Stage s = stage().trim(false, 10e-6, 0.50).build();
        Ranking r = rank(s, precAndCheap(s, Verdict.NO_FIT));
        // CHEAP's after-trim total 0.41 mV is within 1 mV: 1.00 + 0.50 = 1.50 against PREC 3.00
        TrimAdvice t = r.advice().trim();
        assertEquals(TrimAdvice.Status.WOULD_PAY_IF_ALLOWED, t.status());
        assertEquals("CHEAP", t.withTrim().id());
        assertEquals(1.50, t.savingPerUnit(), 1e-12);
        assertEquals("PREC", r.advice().pick().id());
    }

    private static Part chopper(double price) {
        return part("CHOP")
                .architecture(Architecture.CHOPPER)
                .input(InputType.CMOS)
                .price(price)
                .ib(null, 300e-12)
                .noise(20e-9, null, 150e-15, null)
                .fchop(20e3)
                .build();
    }

    @Test
    void zeroDriftWarrantedWhenOnlyAChopperFits() {
        Stage s = stage().bandHigh(10).build();
        Part chop = chopper(2.20);
        Part std = part("STD").price(1.00).build();
        Map<Part, Budget> m = new LinkedHashMap<>();
        m.put(chop, budget(s, chop, 0.5e-3, 0.2e-3, 0.2e-3, Verdict.FITS));
        m.put(std, budget(s, std, 1.0e-3, 0.9e-3, 0.9e-3, Verdict.NO_FIT));
        ZeroDriftAdvice z = rank(s, m).advice().zeroDrift();
        assertEquals(ZeroDriftAdvice.Status.ONLY_OPTION, z.status());
        assertTrue(z.warranted());
        assertEquals("CHOP", z.selfCorrecting().id());
        assertEquals(1, z.fittingCount());
        assertEquals(3, z.caveats().size(), z.caveats().toString());
        // 20 kHz against a 10 Hz band edge: 2000 times, well clear
        Caveat.Chopping chopping = (Caveat.Chopping) z.caveats().get(2);
        assertEquals(20e3, chopping.frequency(), 0);
        assertEquals(10.0, chopping.bandHigh(), 0);
        assertEquals(2000.0, chopping.ratio(), 1e-9);
        assertEquals(Caveat.Position.CLEAR, chopping.position());
        // the catalog's 300 pA; the hand-made budget has no bias term, so no temperature and no output figure
        Caveat.Bias bias = (Caveat.Bias) z.caveats().get(0);
        assertEquals(300e-12, bias.ib(), 1e-24);
        assertTrue(Double.isNaN(bias.worstAtC()) && Double.isNaN(bias.ibAtWorst()) && Double.isNaN(bias.outputV()));
        assertEquals(1e-3, bias.limitV(), 1e-18);
        // 150 fA/√Hz through the larger input resistance: Rs 0 at +, Rf || Rg = 99 k x 1 k / 100 k = 990 Ω at -
        Caveat.CurrentNoise noise = (Caveat.CurrentNoise) z.caveats().get(1);
        assertEquals(150e-15, noise.in(), 1e-27);
        assertEquals(990.0, noise.r(), 1e-9);
        assertEquals(20e-9, noise.en(), 1e-21);
    }

    @Test
    void whenSeveralZeroDriftPartsFitTheAdviceDoesNotSayOnlyOneDoes() {
        Stage s = stage().bandHigh(10).build();
        Part chop = chopper(2.20);
        Part az = part("AZ")
                .architecture(Architecture.AUTO_ZERO)
                .input(InputType.CMOS)
                .price(3.10)
                .fchop(20e3)
                .build();
        Part std = part("STD").price(1.00).build();
        Map<Part, Budget> m = new LinkedHashMap<>();
        m.put(chop, budget(s, chop, 0.5e-3, 0.2e-3, 0.2e-3, Verdict.FITS));
        m.put(az, budget(s, az, 0.4e-3, 0.2e-3, 0.2e-3, Verdict.FITS));
        m.put(std, budget(s, std, 1.0e-3, 0.9e-3, 0.9e-3, Verdict.NO_FIT));
        Advice a = rank(s, m).advice();
        assertEquals(ZeroDriftAdvice.Status.ONLY_OPTION, a.zeroDrift().status());
        // two zero-drift parts fit; the cheapest is CHOP at 2.20
        assertEquals(2, a.zeroDrift().fittingCount());
        assertEquals("CHOP", a.zeroDrift().selfCorrecting().id());
        assertEquals(Architecture.CHOPPER, a.zeroDrift().selfCorrecting().part().architecture());
        assertEquals(2.20, a.zeroDrift().selfCorrecting().effectiveCost(), 1e-12);
        // a single one is counted as one
        m.remove(az);
        ZeroDriftAdvice one = rank(s, m).advice().zeroDrift();
        assertEquals(ZeroDriftAdvice.Status.ONLY_OPTION, one.status());
        assertEquals(1, one.fittingCount());
        assertEquals("CHOP", one.selfCorrecting().id());
    }

    @Test
    void anEmptyCatalogGetsNoTrimVerdict() {
        Stage s = stage().trim(true, 10e-6, 0.50).build();
        Advice a = rank(s, new LinkedHashMap<>()).advice();
        // nothing ranked and nothing rejected: nothing to rank, and so no trim verdict to give
        assertTrue(a.nothingToRank());
        assertTrue(!a.anyRanked());
        assertNull(a.pick());
        // the trim finding is "no help" (nothing fits, trimmed or not); report does not word it with no part at all
        assertEquals(TrimAdvice.Status.NO_HELP, a.trim().status());
        assertNull(a.trim().withTrim());
    }

    @Test
    void zeroDriftWarrantedWhenItFitsCheaper() {
        Stage s = stage().quantity(500).build();
        Part chop = chopper(1.20);
        Part std = part("STD").price(2.00).build();
        Map<Part, Budget> m = new LinkedHashMap<>();
        m.put(chop, budget(s, chop, 0.05e-3, 0.01e-3, 0.01e-3, Verdict.FITS));
        m.put(std, budget(s, std, 0.4e-3, 0.4e-3, 0.4e-3, Verdict.FITS));
        ZeroDriftAdvice z = rank(s, m).advice().zeroDrift();
        // 2.00 - 1.20 = 0.80 per unit; 400.00 over 500 units
        assertEquals(ZeroDriftAdvice.Status.CHEAPER, z.status());
        assertEquals(0.80, z.savingPerUnit(), 1e-12);
        assertEquals(400.0, z.savingTotal(), 1e-9);
        assertEquals("STD", z.standard().id());
    }

    @Test
    void zeroDriftNotWarrantedWhenAStandardPartFitsForLess() {
        Stage s = stage().build();
        Part chop = chopper(2.20);
        Part std = part("STD").price(1.00).build();
        Map<Part, Budget> m = new LinkedHashMap<>();
        m.put(chop, budget(s, chop, 0.05e-3, 0.01e-3, 0.01e-3, Verdict.FITS));
        m.put(std, budget(s, std, 0.4e-3, 0.4e-3, 0.4e-3, Verdict.FITS));
        Ranking r = rank(s, m);
        ZeroDriftAdvice z = r.advice().zeroDrift();
        assertEquals(ZeroDriftAdvice.Status.NOT_WARRANTED, z.status());
        // 1.00 - 2.20 = -1.20: the standard part is 1.20 cheaper
        assertEquals(-1.20, z.savingPerUnit(), 1e-12);
        assertEquals("STD", z.standard().id());
        assertEquals(1.00, z.standard().effectiveCost(), 1e-12);
        assertEquals("CHOP", z.selfCorrecting().id());
        assertTrue(!z.warranted());
    }

    @Test
    void chopperCloseToTheBandIsFlagged() {
        Stage s = stage().bandHigh(500).build();
        Part chop = part("CHOP").architecture(Architecture.AUTO_ZERO).fchop(2e3).build();
        Candidate c = Candidate.of(budget(s, chop, 0.1e-3, 0.1e-3, 0.1e-3, Verdict.FITS));
        List<Caveat> facts = Advisor.caveats(s, c);
        // 2 kHz / 500 Hz = 4, under the common-practice clearance of 10
        Caveat.Chopping chopping = facts.stream()
                .filter(Caveat.Chopping.class::isInstance)
                .map(Caveat.Chopping.class::cast)
                .findFirst()
                .orElseThrow();
        assertEquals(4.0, chopping.ratio(), 1e-12);
        assertEquals(Caveat.Position.NEAR, chopping.position());
        assertEquals(2e3, chopping.frequency(), 0);
        assertEquals(500.0, chopping.bandHigh(), 0);
        // no bias current in the catalog
        Caveat.Bias bias = facts.stream()
                .filter(Caveat.Bias.class::isInstance)
                .map(Caveat.Bias.class::cast)
                .findFirst()
                .orElseThrow();
        assertNull(bias.ib());
    }

    @Test
    void aCheaperFittingPartAddedChangesThePick() {
        Stage s = stage().build();
        Part a = part("A").price(2.00).build();
        Part b = part("B").price(3.00).build();
        Map<Part, Budget> m = new LinkedHashMap<>();
        m.put(a, budget(s, a, 0.3e-3, 0.3e-3, 0.3e-3, Verdict.FITS));
        m.put(b, budget(s, b, 0.1e-3, 0.1e-3, 0.1e-3, Verdict.FITS));
        assertEquals("A", rank(s, m).advice().pick().id());
        // a cheaper part that does not fit leaves the pick alone
        Part nofit = part("NOFIT").price(0.50).build();
        m.put(nofit, budget(s, nofit, 0.9e-3, 0.9e-3, 0.9e-3, Verdict.NO_FIT));
        assertEquals("A", rank(s, m).advice().pick().id());
        // a cheaper part that fits takes it
        Part c = part("C").price(1.50).build();
        m.put(c, budget(s, c, 0.4e-3, 0.4e-3, 0.4e-3, Verdict.FITS));
        Ranking r = rank(s, m);
        assertEquals("C", r.advice().pick().id());
        assertEquals(
                List.of("C", "A", "B", "NOFIT"),
                r.candidates().stream().map(Candidate::id).toList());
    }

    @Test
    void equalCostsSortByMarginAndNoFitsByCloseness() {
        Stage s = stage().build();
        Part a = part("A").price(1.00).build();
        Part b = part("B").price(1.00).build();
        Part far = part("FAR").price(0.10).build();
        Part near = part("NEAR").price(5.00).build();
        Map<Part, Budget> m = new LinkedHashMap<>();
        m.put(a, budget(s, a, 0.4e-3, 0.4e-3, 0.4e-3, Verdict.FITS)); // margin 20 %
        m.put(b, budget(s, b, 0.2e-3, 0.2e-3, 0.2e-3, Verdict.FITS)); // margin 60 %
        m.put(far, budget(s, far, 2e-3, 1e-3, 1e-3, Verdict.NO_FIT)); // 200 % over
        m.put(near, budget(s, near, 0.6e-3, 0.5e-3, 0.5e-3, Verdict.NO_FIT)); // 10 % over
        assertEquals(
                List.of("B", "A", "NEAR", "FAR"),
                rank(s, m).candidates().stream().map(Candidate::id).toList());
    }

    @Test
    void hardConstraintFailuresAreRejectedWithTheReason() {
        Stage s = stage().build();
        Part hot = part("HOT").price(0.10).build();
        Map<Part, Budget> m = precAndCheap(s, Verdict.NO_FIT);
        // 0 to 70 °C ambient against a part rated 0 to 50 °C: 20 °C short at the high end
        m.put(
                hot,
                Budgets.rejected(
                        s,
                        hot,
                        new ConstraintResult(
                                ConstraintKind.TEMPERATURE,
                                false,
                                new ConstraintFact.Span(0, 70, 0, 50, Dimension.TEMPERATURE, 0, 20, null))));
        Ranking r = rank(s, m);
        assertEquals(1, r.rejected().size());
        assertEquals(
                "temperature: needs ambient 0 °C to 70 °C; part rated 0 °C to 50 °C; short by 20 °C at the high end",
                ConstraintText.reason(r.rejected().get(0).failedConstraints()));
        assertTrue(r.candidates().stream().noneMatch(c -> c.id().equals("HOT")));
        assertTrue(!r.paretoIds().contains("HOT"));
    }

    @Test
    void paretoFrontOfThisRanking() {
        Stage s = stage().build();
        Ranking r = rank(s, precAndCheap(s, Verdict.NO_FIT));
        // PREC: 3.00, 0.5 mV; CHEAP: 1.00, 1.9 mV: neither dominates the other
        assertEquals(List.of("CHEAP", "PREC"), r.paretoIds());
    }

    @Test
    void pricesQuotedForALargerOrderThanTheBuildAreSaidToBeSo() {
        // the catalog holds one price per part, at its own order quantity (1000 here); a build of 400
        // cannot be priced from it, and smaller orders usually cost more per unit (common practice)
        Stage s = stage().trim(true, 10e-6, 0.50).quantity(400).build();
        Ranking r = rank(s, precAndCheap(s, Verdict.FITS_AFTER_TRIM));
        assertEquals(List.of(1000), r.advice().quotedQuantities());
        // a build at or above the quoted quantity needs no such remark
        Stage big = stage().trim(true, 10e-6, 0.50).quantity(1000).build();
        assertEquals(
                List.of(),
                rank(big, precAndCheap(big, Verdict.FITS_AFTER_TRIM)).advice().quotedQuantities());
    }

    @Test
    void aChoppingFrequencyInsideTheBandIsSaidToBeInside() {
        // chopping at 20 kHz with the band reaching 50 kHz: the ripple is in the band, not "near" it
        Stage s = stage().bandHigh(50e3).build();
        Part chop = chopper(2.20);
        Map<Part, Budget> m = new LinkedHashMap<>();
        m.put(chop, budget(s, chop, 0.5e-3, 0.2e-3, 0.2e-3, Verdict.FITS));
        ZeroDriftAdvice z = rank(s, m).advice().zeroDrift();
        Caveat.Chopping chopping = z.caveats().stream()
                .filter(Caveat.Chopping.class::isInstance)
                .map(Caveat.Chopping.class::cast)
                .findFirst()
                .orElseThrow();
        // 20 kHz / 50 kHz = 0.4: at or below the band edge
        assertEquals(0.4, chopping.ratio(), 1e-15);
        assertEquals(Caveat.Position.INSIDE, chopping.position());
    }

    @Test
    void theChopperBiasCaveatGivesTheCurrentTheBudgetUsesAtTemperature() {
        // CMOS input, 300 pA at 25 °C and no over-temperature figure: the budget doubles it every 10 °C
        // (common practice) to 300 pA x 2^4.5 = 6.79 nA at 70 °C; a caveat quoting only 300 pA beside
        // the output error that 6.79 nA causes would not add up. Full scale 1.25 V peak: the output needs
        // 2.5 V +/- 1.25 V, inside the part's 1 V headroom on 5 V (the builder's 2.5 V peak would need 0..5 V)
        Stage s = stage().limitV(1.0).fullScale(1.25).build();
        Part chop = chopper(2.20);
        Ranking r = Ranker.rank(s, List.of(chop), dev.ampsieve.budget.BudgetCalculator::compute);
        Caveat.Bias bias = r.advice().zeroDrift().caveats().stream()
                .filter(Caveat.Bias.class::isInstance)
                .map(Caveat.Bias.class::cast)
                .findFirst()
                .orElseThrow();
        assertEquals(300e-12, bias.ib(), 1e-24);
        assertEquals(70.0, bias.worstAtC(), 0);
        // 300 pA x 2^((70 - 25) / 10) = 300 pA x 22.627 = 6.788 nA
        assertEquals(300e-12 * Math.pow(2, 4.5), bias.ibAtWorst(), 1e-21);
    }
}
