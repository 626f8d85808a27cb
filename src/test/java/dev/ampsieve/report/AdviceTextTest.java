package dev.ampsieve.report;

import static dev.ampsieve.testing.Budgets.budget;
import static dev.ampsieve.testing.PartBuilder.part;
import static dev.ampsieve.testing.StageBuilder.stage;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.advice.BudgetFunction;
import dev.ampsieve.advice.Candidate;
import dev.ampsieve.advice.Change;
import dev.ampsieve.advice.Ranker;
import dev.ampsieve.advice.Ranking;
import dev.ampsieve.advice.Sufficiency;
import dev.ampsieve.advice.Unsettled;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Price;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.stage.Topology;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.testing.AdviceFixtures;
import dev.ampsieve.testing.LinearEngine;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The advice in words ({@link AdviceText}): each kind of sentence, built through the production path
 * ({@link Ranker#rank}, {@link Sufficiency#of}) on the fixtures of the {@code advice} tests, which
 * test the numbers behind these sentences (named beside each test here); the figures in the
 * sentences are those numbers rounded for display.
 */
class AdviceTextTest {

    private static final BudgetFunction ENGINE = BudgetCalculator::compute;
    private static final Part PREC = part("PREC").price(3.00).build();
    private static final Part CHEAP = part("CHEAP").price(1.00).build();

    /** Ranks parts whose budgets the test fixed in advance (as advice.RankerTest does). */
    private static Ranking rank(Stage s, Map<Part, Budget> budgets) {
        Map<String, Budget> byId = new LinkedHashMap<>();
        budgets.forEach((p, b) -> byId.put(p.id(), b));
        return Ranker.rank(s, new ArrayList<>(budgets.keySet()), (st, p) -> byId.get(p.id()));
    }

    /** PREC 0.5 mV worst case, fits as it is at 3.00; CHEAP 1.9 mV as it is, 0.41 mV after the trim, at 1.00. */
    private static Map<Part, Budget> precAndCheap(Stage s, Verdict cheapVerdict) {
        Map<Part, Budget> m = new LinkedHashMap<>();
        m.put(PREC, budget(s, PREC, 0.2e-3, 0.3e-3, 0.31e-3, Verdict.FITS));
        m.put(CHEAP, budget(s, CHEAP, 1.5e-3, 0.4e-3, 0.41e-3, cheapVerdict));
        return m;
    }

    /** CMOS chopper: IB 300 pA, en 20 nV/√Hz, in 150 fA/√Hz, chopping at 20 kHz. */
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

    private static List<String> lines(Ranking r) {
        return AdviceText.lines(r.advice());
    }

    /** The sentence of the no-fit change of {@code kind}. */
    private static String change(Ranking r, Change.Kind kind) {
        Change c = r.advice().noFit().changes().stream()
                .filter(x -> x.kind() == kind)
                .findFirst()
                .orElseThrow(() -> new AssertionError(kind + " not offered: " + lines(r)));
        return AdviceText.change(c, r.stage());
    }

    // ------------------------------------------------------------------ the pick and the trim

    @Test
    void aWarrantedTrimWithThePickAndTheCheapestPartAsItIs() {
        // advice.RankerTest.trimIsWarrantedWhenCheaperPartPlusTrimCostsLess: 1.00 + 0.50 = 1.50 against 3.00, 1.50
        // less per unit, 1500.00 over 1000; margins (1 - 0.41) = 59 % and (1 - 0.5) = 50 %
        Stage s = stage().trim(true, 10e-6, 0.50).quantity(1000).build();
        assertEquals(
                List.of(
                        "Pick CHEAP: 1.50 USD per unit including the trim, fits after the trim; worst-case after the"
                                + " trim 410 µV of 1.00 mV (margin 59 %).",
                        "Cheapest part that fits as it is: PREC at 3.00 USD; worst-case 500 µV of 1.00 mV (margin"
                                + " 50 %).",
                        "A one-point trim is warranted: CHEAP at 1.00 USD plus the trim at 0.50 USD costs 1.50 USD per"
                                + " unit, 1.50 USD less than PREC as it is (1500.00 USD over 1000 units); worst-case after"
                                + " the trim 410 µV of 1.00 mV (margin 59 %)."),
                lines(rank(s, precAndCheap(s, Verdict.FITS_AFTER_TRIM))));
    }

    @Test
    void aTrimThatDoesNotPay() {
        // advice.RankerTest.trimDoesNotPayWhenItCostsMoreThanThePriceGap: 1.00 + 2.50 = 3.50, 0.50 more than 3.00
        Stage s = stage().trim(true, 10e-6, 2.50).build();
        assertEquals(
                List.of(
                        "Pick PREC: 3.00 USD per unit, fits as it is; worst-case 500 µV of 1.00 mV (margin 50 %).",
                        "A one-point trim does not pay: CHEAP fits after it at 3.50 USD per unit including the trim,"
                                + " 0.50 USD more than PREC as it is."),
                lines(rank(s, precAndCheap(s, Verdict.FITS_AFTER_TRIM))));
    }

    @Test
    void aRequiredTrimAndNoPartAsItIs() {
        // advice.RankerTest.trimIsRequiredWhenOnlyATrimmedPartFits
        Stage s = stage().trim(true, 10e-6, 0.50).build();
        Map<Part, Budget> m = new LinkedHashMap<>();
        m.put(CHEAP, budget(s, CHEAP, 1.5e-3, 0.4e-3, 0.41e-3, Verdict.FITS_AFTER_TRIM));
        assertEquals(
                List.of(
                        "Pick CHEAP: 1.50 USD per unit including the trim, fits after the trim; worst-case after the"
                                + " trim 410 µV of 1.00 mV (margin 59 %).",
                        "No part fits as it is.",
                        "A one-point trim is required: no part fits as it is; CHEAP fits after it at 1.50 USD per unit"
                                + " including 0.50 USD for the trim; worst-case after the trim 410 µV of 1.00 mV (margin"
                                + " 59 %)."),
                lines(rank(s, m)));
    }

    @Test
    void aTrimTheStageDoesNotAllowButThatWouldPay() {
        // advice.RankerTest.trimNotAllowedButWouldPayIsSaid: 1.50 against 3.00, 1.50 less per unit
        Stage s = stage().trim(false, 10e-6, 0.50).build();
        assertEquals(
                List.of(
                        "Pick PREC: 3.00 USD per unit, fits as it is; worst-case 500 µV of 1.00 mV (margin 50 %).",
                        "The stage allows no trim; a one-point trim would let CHEAP fit at 1.50 USD per unit (price"
                                + " 1.00 USD plus the trim: 0.50 USD), 1.50 USD less than PREC as it is (1500.00 USD over"
                                + " 1000 units); worst-case after the trim 410 µV of 1.00 mV (margin 59 %)."),
                lines(rank(s, precAndCheap(s, Verdict.NO_FIT))));
    }

    @Test
    void noTrimNeededAndNoTrimThatHelps() {
        Stage s = stage().trim(true, 10e-6, 0.50).build();
        Map<Part, Budget> fits = new LinkedHashMap<>();
        fits.put(PREC, budget(s, PREC, 0.2e-3, 0.3e-3, 0.31e-3, Verdict.FITS));
        assertEquals(
                List.of(
                        "Pick PREC: 3.00 USD per unit, fits as it is; worst-case 500 µV of 1.00 mV (margin 50 %).",
                        "No part needs the one-point trim to fit; leave it out."),
                lines(rank(s, fits)));
        // 1.2 mV after the trim against 1 mV: 20 % over; the limiting term is the untrimmed budget's 1.5 mV offset
        Map<Part, Budget> none = new LinkedHashMap<>();
        none.put(CHEAP, budget(s, CHEAP, 1.5e-3, 0.4e-3, 1.2e-3, Verdict.NO_FIT));
        assertEquals(
                List.of(
                        "Not even a trimmed part fits.",
                        "Nothing fits. Closest: CHEAP, worst-case after the trim 1.20 mV of 1.00 mV (20 % over),"
                                + " largest term before the trim initial offset (1.50 mV).",
                        "No single change of gain, source resistance, temperature range, trim or limit makes it fit."),
                lines(rank(s, none)));
    }

    @Test
    void anEmptyCatalogGetsOneLineAndNoTrimVerdict() {
        // advice.RankerTest.anEmptyCatalogGetsNoTrimVerdict: the trim finding (no help) is not worded
        Stage s = stage().trim(true, 10e-6, 0.50).build();
        assertEquals(
                List.of("No part to rank: the catalog (or the query) gave none."),
                lines(rank(s, new LinkedHashMap<>())));
    }

    @Test
    void pricesQuotedForALargerOrderAndInSeveralCurrencies() {
        // advice.RankerTest.pricesQuotedForALargerOrderThanTheBuildAreSaidToBeSo: quoted at 1000, built 400
        Stage s = stage().trim(true, 10e-6, 0.50).quantity(400).build();
        List<String> l = lines(rank(s, precAndCheap(s, Verdict.FITS_AFTER_TRIM)));
        assertEquals(
                "Prices are the catalog's, each for its stated order quantity (1000 units), not for this build of"
                        + " 400: smaller orders usually cost more per unit.",
                l.get(l.size() - 1));
        // a part priced in EUR beside the USD ones: Advice.currencies() = [EUR, USD]
        Stage one = stage().trim(true, 10e-6, 0.50).build();
        Part eur = part("EUR").price(new Price(2.0, 1000, "EUR")).build();
        Map<Part, Budget> m = precAndCheap(one, Verdict.FITS_AFTER_TRIM);
        m.put(eur, budget(one, eur, 0.2e-3, 0.3e-3, 0.31e-3, Verdict.FITS));
        List<String> c = lines(rank(one, m));
        assertEquals(
                "Prices are in different currencies (EUR, USD) and are compared as plain numbers.",
                c.get(c.size() - 1));
    }

    // ------------------------------------------------------------------ zero-drift parts and their caveats

    @Test
    void onlyZeroDriftPartsFitWithTheCaveatsOfAClearChopper() {
        // advice.RankerTest.whenSeveralZeroDriftPartsFitTheAdviceDoesNotSayOnlyOneDoes and
        // zeroDriftWarrantedWhenOnlyAChopperFits: 0.5 + 0.2 = 0.7 mV, margin 30 %; in x 990 Ω = 148.5 pV/√Hz;
        // 20 kHz / 10 Hz = 2000
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
        List<String> caveats = List.of(
                "With CHOP, check:",
                "  - bias current up to 300 pA (charge injection at the input switches, more than a plain CMOS input"
                        + " draws).",
                "  - current noise 150 fA/√Hz (raised by charge injection) through up to 990 Ω gives 149 pV/√Hz"
                        + " against its voltage noise of 20.0 nV/√Hz.",
                "  - chopping at 20.0 kHz is 2000 times the 10.0 Hz band edge: the ripple lies well above the band;"
                        + " filter it before any ADC so it cannot alias.");
        List<String> two = lines(rank(s, m));
        int at = two.indexOf("A zero-drift part is warranted: only zero-drift parts fit (2); the cheapest, CHOP"
                + " (chopper), costs 2.20 USD per unit; worst-case 700 µV of 1.00 mV (margin 30 %).");
        assertEquals(caveats, two.subList(at + 1, at + 5), two.toString());
        m.remove(az);
        List<String> one = lines(rank(s, m));
        assertEquals(
                List.of("A zero-drift part is warranted: only CHOP (chopper) fits, at 2.20 USD per unit; worst-case"
                        + " 700 µV of 1.00 mV (margin 30 %)."),
                one.stream().filter(l -> l.startsWith("A zero-drift")).toList());
    }

    @Test
    void aCheaperZeroDriftPartAndOneThatIsNotNeeded() {
        // advice.RankerTest.zeroDriftWarrantedWhenItFitsCheaper: 2.00 - 1.20 = 0.80 per unit, 400.00 over 500
        Stage q = stage().quantity(500).build();
        Part chop = chopper(1.20);
        Part std = part("STD").price(2.00).build();
        Map<Part, Budget> m = new LinkedHashMap<>();
        m.put(chop, budget(q, chop, 0.05e-3, 0.01e-3, 0.01e-3, Verdict.FITS));
        m.put(std, budget(q, std, 0.4e-3, 0.4e-3, 0.4e-3, Verdict.FITS));
        assertEquals(
                "A zero-drift part is warranted: CHOP (chopper) fits at 1.20 USD, 0.80 USD less per unit than the"
                        + " cheapest standard part STD at 2.00 USD (400.00 USD over 500 units).",
                lines(rank(q, m)).get(1));
        // advice.RankerTest.zeroDriftNotWarrantedWhenAStandardPartFitsForLess: 2.20 - 1.00 = 1.20
        Stage s = stage().build();
        Part chop2 = chopper(2.20);
        Part std1 = part("STD").price(1.00).build();
        Map<Part, Budget> n = new LinkedHashMap<>();
        n.put(chop2, budget(s, chop2, 0.05e-3, 0.01e-3, 0.01e-3, Verdict.FITS));
        n.put(std1, budget(s, std1, 0.4e-3, 0.4e-3, 0.4e-3, Verdict.FITS));
        assertEquals(
                List.of(
                        "Pick STD: 1.00 USD per unit, fits as it is; worst-case 800 µV of 1.00 mV (margin 20 %).",
                        "A zero-drift part is not needed: STD (standard) fits at 1.00 USD, 1.20 USD less than the"
                                + " cheapest zero-drift part that fits, CHOP."),
                lines(rank(s, n)));
    }

    @Test
    void caveatsOfAChopperNearTheBandWithNothingInTheCatalog() {
        // advice.RankerTest.chopperCloseToTheBandIsFlagged: 2 kHz / 500 Hz = 4; no IB and no noise in the catalog
        Stage s = stage().bandHigh(500).build();
        Part chop = part("CHOP").architecture(Architecture.AUTO_ZERO).fchop(2e3).build();
        Map<Part, Budget> m = new LinkedHashMap<>();
        m.put(chop, budget(s, chop, 0.1e-3, 0.1e-3, 0.1e-3, Verdict.FITS));
        List<String> l = lines(rank(s, m));
        assertEquals(
                List.of(
                        "  - bias current is not in the catalog: chopper and auto-zero inputs draw charge-injection"
                                + " current; take it from the datasheet.",
                        "  - current noise is not in the catalog: charge injection raises it above a plain CMOS input;"
                                + " check it against the 990 Ω at the inputs.",
                        "  - chopping at 2.00 kHz is only 4 times the 500 Hz band edge: ripple and intermodulation land"
                                + " near the band; check the datasheet's ripple and filter (common practice: keep it 10"
                                + " times above the band)."),
                l.subList(l.indexOf("With CHOP, check:") + 1, l.size()));
    }

    @Test
    void aChoppingFrequencyInsideTheBand() {
        // advice.RankerTest.aChoppingFrequencyInsideTheBandIsSaidToBeInside: 20 kHz against 50 kHz
        Stage s = stage().bandHigh(50e3).build();
        Part chop = chopper(2.20);
        Map<Part, Budget> m = new LinkedHashMap<>();
        m.put(chop, budget(s, chop, 0.5e-3, 0.2e-3, 0.2e-3, Verdict.FITS));
        List<String> l = lines(rank(s, m));
        assertEquals(
                "  - chopping at 20.0 kHz is inside the 50.0 kHz band: its ripple and intermodulation land in the"
                        + " signal; a part clocked well above the band is needed (common practice: 10 times above"
                        + " it).",
                l.get(l.size() - 1));
    }

    @Test
    void theBiasCaveatAtTemperatureWithItsOutputFigure() {
        // advice.RankerTest.theChopperBiasCaveatGivesTheCurrentTheBudgetUsesAtTemperature: 300 pA x 2^4.5 = 6.79 nA;
        // at the output 1.01 mV against a 1 V limit: 0.1 %, printed to whole percent
        Stage s = stage().limitV(1.0).fullScale(1.25).build();
        List<String> l = lines(Ranker.rank(s, List.of(chopper(2.20)), ENGINE));
        assertEquals(
                "  - bias current up to 300 pA at 25 °C, 6.79 nA at 70 °C in this budget (charge injection at the"
                        + " input switches, more than a plain CMOS input draws): 1.01 mV at the output here, 0 % of"
                        + " the limit.",
                l.get(l.indexOf("With CHOP, check:") + 1));
    }

    @Test
    void anUnknownChoppingFrequencyAndAStandardPartWithBetterResistors() {
        // advice.ActionableAdviceTest.betterResistorsAreOfferedBesideAWarrantedZeroDriftPart: 8.08e-5 = 80.8 ppm;
        // S now 0.8 mV + 247.5 µV = 1.0475 mV, 5 % over
        Stage s = stage().ratioTolerance(1e-4).build();
        Part z = part("Z")
                .architecture(Architecture.CHOPPER)
                .price(3.0)
                .vos(null, 1e-6)
                .build();
        Part std = part("S").price(1.0).vos(null, 8e-6).build();
        List<String> l = lines(Ranker.rank(s, List.of(z, std), new LinearEngine()));
        assertEquals(
                List.of(
                        "  - chopping frequency is not in the catalog: compare the datasheet's ripple frequency with the"
                                + " 10.0 Hz band edge and with any ADC sample rate.",
                        "Or a standard part with better resistors: S at 1.00 USD would fit with resistors matched to"
                                + " 80.8 ppm with 0 ppm/°C tracking or better (now 100 ppm, 0 ppm/°C) (the resistors'"
                                + " cost is not in the figures); now worst-case 1.05 mV of 1.00 mV (5 % over)."),
                l.subList(l.size() - 2, l.size()));
    }

    // ------------------------------------------------------------------ undecided, the board

    @Test
    void anUndecidedPartAndTheAnswerForIt() {
        // advice.UndecidedRankingTest checks that the seeded run leaves this part undecided; the words are checked
        // here on facts given by hand: yield 95.72 % seen, interval 95.43 % to 96.00 % after 20000 units, target
        // P(|Z| <= 2) / P(|Z| <= 3) = 0.9544997 / 0.9973002 = 0.9570837 (commons-math3; A&S ch. 26). Units to
        // settle n = z^2 p (1 - p) / (p - t)^2 = 3.841459 x 0.9572 x 0.0428 / (0.0001163)^2 = 11628815 (the
        // formula in Unsettled.unitsToSettle, worked in Python as a second method)
        StageFixture f = StageFixture.follower().limitV(2e-3);
        double target = 0.9544997361036416 / 0.9973002039367398;
        f.criterion = Criterion.yield(target);
        f.trials = 2000;
        f.maxTrials = 20_000;
        PartFixture p = PartFixture.ideal().vos(1e-3, null, null);
        p.id = "p";
        p.price = new Price(1.0, 1, "USD");
        Stage s = f.build();
        Candidate c = Ranker.rank(s, List.of(p.build()), ENGINE).candidates().get(0);
        YieldResult y = new YieldResult(0.9572, 0.9543, 0.9600, 20000, "sampled");
        assertEquals(11628815L, Unsettled.unitsToSettle(0.9572, target));
        Unsettled u = new Unsettled(c, y, false, target, 20000, Unsettled.unitsToSettle(0.9572, target), false);
        assertEquals(
                "p is undecided: after 20000 simulated units the true yield is within 95.43 % to 96.00 %, which holds"
                        + " the 95.71 % target; more units cannot settle it below about 11628815 units at the yield"
                        + " seen (max-trials is 20000). What settles it: a looser target (95.43 % or less is shown"
                        + " met), a part with a smaller error, or allowing a trim.",
                AdviceText.undecided(u));
        // the "no" answer for an undecided part: its words around the budget's own figures
        Budget b = ENGINE.compute(s, p.build());
        YieldResult by = b.yield();
        assertEquals(
                "no: p is undecided untrimmed: after " + by.trials() + " simulated units the 95 % interval of its"
                        + " yield still holds the target; yield " + Phrases.yieldPercent(by.value())
                        + " (95 % interval from " + Phrases.yieldPercent(by.low()) + ", target 95.7 %), RSS 3.00 mV"
                        + " against 2.00 mV, limited by initial offset (3.00 mV).",
                AdviceText.answer(Sufficiency.of(b)));
    }

    @Test
    void aPickLimitedByTheBoard() throws Exception {
        // advice.BoardAdviceTest.aPickLimitedByTheBoardIsToldSo: 2 x 40 µV/°C x 0.1 °C x 100 = 800 µV, 80 %
        Stage s = StageLoader.parse(
                "gain: 100\nlimit: 1 mV\nband: {low: 0.1 Hz, high: 10 Hz, filter-order: 1}\n"
                        + "thermal-emf: {junctions: 2, seebeck: 40 uV/C, gradient: 0.1 C}\n",
                null);
        PartFixture p = PartFixture.ideal();
        p.vos = new Spread(null, 1e-6, null);
        assertEquals(
                "Its largest term comes from the board, not the part: thermal EMF, 800 µV at the output (80 % of the"
                        + " limit); a better part would not remove it: pair the 2 junction(s) so their EMFs cancel, or"
                        + " keep heat away from them.",
                lines(Ranker.rank(s, List.of(p.build()), ENGINE)).get(1));
    }

    // ------------------------------------------------------------------ nothing fits: the closest part, the changes

    @Test
    void nothingFitsWithTheChangesAndThePartFigure() {
        // advice.NoFitAdviceTest.gainSourceAndLimitNeededAreSolved: 1.64 mV, 64 % over, bias 0.7 mV; NG 60.9
        // (Rf 59.9 k), full scale 1.5225 V; Rs 857 Ω; limit 1.64 mV (16.4 µV at the input, NG 100); IB 59.9 pA
        Stage s = stage().source(10e3).trim(false, 10e-6, 0.40).build();
        Part p = part("P").vos(null, 4e-6).drift(null, 0.12e-6).ib(null, 0.7e-9).build();
        assertEquals(
                List.of(
                        "Nothing fits. Closest: P, worst-case 1.64 mV of 1.00 mV (64 % over), limited by bias current"
                                + " (700 µV).",
                        "It would fit with any one of these changes:",
                        "  - a gain of 60.9 or lower (now 100): Rf 59.9 kΩ with Rg 1.00 kΩ; full-scale output then"
                                + " 1.52 V (now 2.50 V)",
                        "  - a source resistance of 857 Ω or lower (now 10.0 kΩ)",
                        "  - a limit of 1.64 mV at the output (16.4 µV at the input) or looser (now 1.00 mV)",
                        "A part would fit the stage as it is with any one of these figures, the rest as P's:",
                        "  - IB ≤ 59.9 pA from 0 °C to 70 °C (IOS counted equal to it)"),
                lines(Ranker.rank(s, List.of(p), new LinearEngine())));
    }

    @Test
    void everyPartFailingAConstraintIsCountedByConstraint() {
        // advice.NoFitAdviceTest.whenEveryPartFailsAConstraintTheReasonsAreCounted
        Stage s = stage().supply(48.0).build();
        assertEquals(
                List.of(
                        "Nothing fits: every part fails a hard constraint: supply (2).",
                        "2 part(s) fail a hard constraint and are not ranked (see the rejected list)."),
                lines(Ranker.rank(s, List.of(part("A").build(), part("B").build()), new LinearEngine())));
    }

    @Test
    void aNarrowerRangeAllowingATrimAndTheVosAndDriftFigures() {
        // advice.NoFitAdviceTest.narrowerTemperatureAndAllowingATrimAreSolved: 25 -/+ 18.1 °C; 0.505 mV after the
        // trim, (2.2 - 0.505) / 2.2 = 77 %, at 0.40
        Stage s = stage().limitV(2.2e-3).trim(false, 10e-6, 0.40).build();
        Ranking r = Ranker.rank(
                s, List.of(part("P").vos(null, 20e-6).drift(null, 0.11e-6).build()), new LinearEngine());
        // the trim the stage does not allow, and nothing fits without it: 1.00 + 0.40 = 1.40
        assertEquals(
                "The stage allows no trim; a one-point trim would let P fit at 1.40 USD per unit (price 1.00 USD plus"
                        + " the trim: 0.40 USD), and nothing fits without one; worst-case after the trim 505 µV of 2.20 mV"
                        + " (margin 77 %).",
                lines(r).get(0));
        assertEquals(
                "an ambient range of 6.9 °C to 43.1 °C (now 0 °C to 70 °C)",
                change(r, Change.Kind.NARROWER_TEMPERATURE));
        assertEquals(
                "allow a one-point trim at 25 °C: worst-case after the trim 505 µV of 2.20 mV (margin 77 %), at 0.40 USD"
                        + " per unit",
                change(r, Change.Kind.ALLOW_TRIM));
        // advice.ActionableAdviceTest.vosAndDriftTargetsAreWorkedFromTheirTerms: 4.46 µV and 44.4 nV/°C
        List<String> l = lines(Ranker.rank(
                stage().build(),
                List.of(part("P").vos(null, 8e-6).drift(null, 0.123e-6).build()),
                new LinearEngine()));
        assertEquals(
                List.of("  - vos.max ≤ 4.46 µV at 25 °C (drift as now)", "  - drift ≤ 44.4 nV/°C"),
                l.subList(l.size() - 2, l.size()));
    }

    @Test
    void betterResistorsAndATwoPointCalibration() throws Exception {
        // advice.NoFitAdviceTest.twoPointCalibrationIsOfferedWhenOnePointIsNotEnough: 0 V left after it, at 0.30;
        // resistors: after the one-point trim only the ratio term 2.475 V x tol is left, tol <= 1 mV / 2.475 V = 404
        // ppm
        Stage s = stage().fullScale(2.5)
                .ratioTolerance(0.001)
                .trim(new Trim(true, Trim.Method.ONE_POINT, 0, 0.3))
                .build();
        Ranking r = Ranker.rank(s, List.of(part("P").vos(null, 1e-6).build()), new LinearEngine());
        assertEquals(
                "a two-point calibration instead of the one-point trim: worst-case after the trim 0 V of 1.00 mV"
                        + " (margin 100 %), at 0.30 USD per unit",
                change(r, Change.Kind.TWO_POINT_TRIM));
        assertEquals(
                "resistors matched to 404 ppm with 0 ppm/°C tracking or better (now 0.1 %, 0 ppm/°C)",
                change(r, Change.Kind.BETTER_RESISTORS));
        // advice.NetworkLeverTest.aDifferenceStageIsOfferedBetterMatchedPairs: 0.547 %
        Stage d = StageLoader.parse(
                "topology: difference\ngain: 10\nr2: 100 kohm\ncommon-mode-swing: 1 V\n"
                        + "band: {low: 0.1 Hz, high: 10 Hz, filter-order: 1}\nresistor-ratio: {tolerance: 1 %}\n"
                        + "limit: 10 mV\n",
                null);
        PartFixture p = PartFixture.ideal();
        p.gbw = 10e6;
        assertEquals(
                "better-matched resistor pairs: r2/r1 and r4/r3 each within 0.547 % with 0 ppm/°C tracking or better"
                        + " (now 1 %, 0 ppm/°C); a matched four-resistor network also raises the common-mode rejection",
                change(Ranker.rank(d, List.of(p.build()), ENGINE), Change.Kind.BETTER_RESISTORS));
    }

    @Test
    void lowerGainsInEachTopology() throws Exception {
        // advice.NoFitAdviceTest.invertingGainIsReportedAsSignalGain: NG 83.3, signal gain -82.3 (Rf 82.3 k);
        // full scale 2.5 V x 82.3 / 99 = 2.078 V
        Ranking inv = Ranker.rank(
                stage().topology(Topology.INVERTING).build(),
                List.of(part("P").vos(null, 12e-6).build()),
                new LinearEngine());
        assertEquals(
                "a gain of -82.3 or less in magnitude (now -99; noise gain 83.3): Rf 82.3 kΩ with Rg 1.00 kΩ;"
                        + " full-scale output then 2.08 V (now 2.50 V)",
                change(inv, Change.Kind.LOWER_GAIN));
        // advice.NoFitAdviceTest.theFeedbackResistorOfferedForALowerGainFitsAsPrinted: Rf 1120 Ω, Rg 1005.025 Ω
        double rg = 200e3 / 199;
        Ranking non = Ranker.rank(
                stage().rf(3 * rg).rg(rg).build(),
                List.of(part("P").vos(null, 1e-3 / 2.1205).build()),
                new LinearEngine());
        assertEquals(
                "a gain of 2.12 or lower (now 4): Rf 1.12 kΩ with Rg 1.01 kΩ; full-scale output then 1.32 V (now"
                        + " 2.50 V)",
                change(non, Change.Kind.LOWER_GAIN));
        // advice.NetworkLeverTest.aTransimpedanceStageIsOfferedASmallerFeedbackResistor: Rf 9.99 k, Cf 15.015 pF
        Stage tia = StageLoader.parse(
                "topology: transimpedance\nrf: 15 kohm\ncf: 10 pF\nsource-resistance: 1 Tohm\n"
                        + "source-capacitance: 10 pF\nband: {low: 0.1 Hz, high: 10 Hz, filter-order: 2}\nlimit: 1 mV\n",
                null);
        PartFixture p = PartFixture.ideal();
        p.ib = new Spread(null, 100e-9, null);
        p.gbw = 10e6;
        p.cin = 2e-12;
        assertEquals(
                "a smaller feedback resistor: Rf 9.99 kΩ with Cf 15.0 pF (the same signal bandwidth) or less (now"
                        + " 15.0 kΩ); the output per ampere falls with it",
                change(Ranker.rank(tia, List.of(p.build()), ENGINE), Change.Kind.LOWER_GAIN));
    }

    @Test
    void aGainSplitWithALaterStage() {
        // advice.ActionableAdviceTest.aGainTooLargeForOneStageIsSplitWithALaterStage: 321 here (Rf 320 k), 1000 / 321
        // = 3.115 after, 3.21 mV at this stage's output
        Stage s = stage().rf(999e3)
                .rg(1e3)
                .limit(new Limit(Limit.Kind.INPUT, 10e-6, 0, 0))
                .build();
        Ranking r = Ranker.rank(s, List.of(part("P").vos(null, 2e-6).build()), AdviceFixtures.withGainError(1e5));
        assertEquals(
                "split the gain with a later stage: a gain of 1000 in one stage does not fit even at half of it; 321"
                        + " here (Rf 320 kΩ with Rg 1.00 kΩ) and 3.12 after it would, this stage held to 3.21 mV at its"
                        + " output (the limit divided by 3.12): the later stage's errors are divided by 321 when"
                        + " referred to the input",
                change(r, Change.Kind.SPLIT_GAIN));
    }

    @Test
    void looserLimitsInTheUsersOwnForm() {
        // advice.NoFitAdviceTest.aLooserLimitInTheUsersFormIsPrintedOnTheFittingSide: 2.28 LSB (142 µV); 474 µV at the
        // input (1.42 mV at the output)
        Stage lsb = stage().limit(new Limit(Limit.Kind.LSB, 1, 16, 4.096)).build();
        assertEquals(
                "a limit of 2.28 LSB (142 µV at the output) or looser (now 1 LSB)",
                change(
                        Ranker.rank(lsb, List.of(part("P").vos(null, 1.419e-6).build()), new LinearEngine()),
                        Change.Kind.LOOSER_LIMIT));
        Stage in = stage().rf(2e3)
                .rg(1e3)
                .limit(new Limit(Limit.Kind.INPUT, 100e-6, 0, 0))
                .build();
        assertEquals(
                "a limit of 474 µV at the input (1.42 mV at the output) or looser (now 100 µV at the input)",
                change(
                        Ranker.rank(in, List.of(part("Q").vos(null, 473.2e-6).build()), new LinearEngine()),
                        Change.Kind.LOOSER_LIMIT));
    }

    @Test
    void aLowerYieldTarget() {
        // advice.NoFitAdviceTest.aLowerYieldTargetIsCheckedByReRunningTheBudget: 0.949
        Stage s = stage().criterion(Criterion.yield(0.999)).build();
        assertEquals(
                "a yield target of 94.9 % or lower (now 99.9 %)",
                change(
                        Ranker.rank(
                                s, List.of(part("P").vos(null, 20e-6).build()), AdviceFixtures.yieldStoppingEarly()),
                        Change.Kind.LOWER_YIELD_TARGET));
    }

    @Test
    void lessThermalEmfAndLessLeakage() throws Exception {
        // advice.BoardAdviceTest.noFitFindsTheGradientThatFits: 7.976 µV at 0.0997 °C, now 2 x 40 µV/°C x 0.2 °C
        Stage emf = StageLoader.parse(
                "gain: 100\nlimit: 1 mV\nband: {low: 0.1 Hz, high: 10 Hz, filter-order: 1}\n"
                        + "thermal-emf: {junctions: 2, seebeck: 40 uV/C, gradient: 0.2 C}\n",
                null);
        PartFixture p = PartFixture.ideal();
        p.vos = new Spread(null, 2e-6, null);
        assertEquals(
                "less thermal EMF at the input: 7.98 µV or less (now 16.0 µV): pair the 2 junction(s) so their EMFs"
                        + " cancel, or keep them within 0.0997 °C of each other (now 0.2 °C)",
                change(Ranker.rank(emf, List.of(p.build()), ENGINE), Change.Kind.LESS_THERMAL_EMF));
        // advice.BoardAdviceTest.noFitFindsTheLeakageResistanceThatFits: 10.2 GΩ
        Stage leak = StageLoader.parse(
                "gain: 100\nlimit: 1 mV\nsource-resistance: 10 kohm\n"
                        + "band: {low: 0.1 Hz, high: 10 Hz, filter-order: 1}\nleakage: {resistance: 1 Gohm, voltage: 10 V}\n",
                null);
        assertEquals(
                "less leakage into the + input: 10.2 GΩ or more (now 1.00 GΩ), or a guard ring driven at the node's"
                        + " potential so that no voltage drives it",
                change(Ranker.rank(leak, List.of(PartFixture.ideal().build()), ENGINE), Change.Kind.LESS_LEAKAGE));
    }

    @Test
    void aBiasFigureAtTheRangesWorstTemperature() {
        // advice.ActionableAdviceTest.aBipolarPartOnATenMegohmSourceGetsAnIbTargetThroughTheRealBudget: 56.6 pA at 70
        // °C
        List<String> l =
                lines(Ranker.rank(AdviceFixtures.follower(10e6, 1e-3), List.of(AdviceFixtures.bipolar()), ENGINE));
        assertEquals("  - IB ≤ 56.6 pA at 70 °C (IOS counted equal to it)", l.get(l.size() - 1));
    }

    @Test
    void operatingPointLeversHigherLoadCoolerPackageSteeperFilter() {
        // advice.OperatingPointAdviceTest.aHotDieGetsAHigherLoadAndACoolerPackageWithTheirNumbers: self-heating
        // 406.4 µV; 616 Ω; 55.5 °C/W
        Ranking hot = Ranker.rank(AdviceFixtures.hotStage(), List.of(AdviceFixtures.hotPart()), ENGINE);
        List<String> l = lines(hot);
        assertEquals(
                "Nothing fits. Closest: test-amp, worst-case 679 µV of 350 µV (94 % over), limited by self-heating"
                        + " (406 µV, an operating-point term: a cooler part (lower quiescent power or theta-ja) or a"
                        + " higher load resistance).",
                l.get(0));
        assertEquals(
                "a load resistance of 616 Ω or higher (now 100 Ω): less output current heats the die less",
                change(hot, Change.Kind.HIGHER_LOAD_RESISTANCE));
        assertEquals("  - theta-ja ≤ 55.5 °C/W (a cooler package, or more copper under it)", l.get(l.size() - 1));
        // advice.OperatingPointAdviceTest.chopperRippleGetsTheLowestFilterOrderThatRemovesIt: 20 µV ripple, order 1
        Ranking ripple =
                Ranker.rank(AdviceFixtures.unfilteredStage(), List.of(AdviceFixtures.ripplingChopper()), ENGINE);
        assertEquals(
                "Nothing fits. Closest: test-amp, worst-case 20.0 µV of 10.0 µV (100 % over), limited by chopping"
                        + " ripple (20.0 µV, an operating-point term: a stage filter that removes the ripple, or a part"
                        + " with less ripple).",
                lines(ripple).get(0));
        assertEquals(
                "a Butterworth low-pass of order 1 at 1.00 kHz after the amplifier (now none): it removes the chopping"
                        + " ripple (and shortens the noise band)",
                change(ripple, Change.Kind.STEEPER_FILTER));
    }
}
