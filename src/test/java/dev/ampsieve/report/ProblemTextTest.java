package dev.ampsieve.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import dev.ampsieve.catalog.CatalogFact;
import dev.ampsieve.stage.StageFact;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Quantity;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Problem;
import dev.ampsieve.yaml.ProblemFact;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** The words of the loaders' facts: every kind has them, laid out as the problem line always was. */
class ProblemTextTest {

    private static final Located AT = new Located(Path.of("s.yaml"), 4, 35);

    private static Quantity v(double x) {
        return new Quantity(x, Dimension.VOLTAGE);
    }

    /** One fact of every record kind the two loaders have. */
    private static final List<ProblemFact> ONE_OF_EACH = List.of(
            new StageFact.Beyond(StageFact.Bound.VOLTAGE, v(2500), v(2000), "2.5 V"),
            new StageFact.Ambient(600, -200, 500, false, "85 C"),
            new StageFact.Order(StageFact.Ends.MIN_MAX, v(3), v(1)),
            new StageFact.SupplyVariation(7, 5, 0.25),
            new StageFact.RatioTolerance(2),
            new StageFact.FullScaleShare(1.5),
            new StageFact.OutsideRails(5),
            new StageFact.LimitTooLarge(v(200), false, 2000, 1000),
            new StageFact.HighGain(3e5, 1e5, 3e5),
            new StageFact.TooFewTrials(1000, 0.9999, 0.996173, 38411, 10_000_000),
            new StageFact.CalibrationOrder(20, true, 20, true),
            new StageFact.Outside(StageFact.Rule.FOLLOWER_GAIN, 2, 1, 1),
            new CatalogFact.PriceRises(1000, 1.25, 100, 1.10),
            new CatalogFact.OutOfBounds(v(6), 1, true, true, false, "an offset of volts leaves no room for a signal"),
            new CatalogFact.Sign(v(-1), true, "write the magnitude"),
            new CatalogFact.Order("typ", v(4e-3), "max", v(2e-3), "check the columns"),
            new CatalogFact.Spread("max", v(75e-3), "typ", v(25e-6), 3000));

    @Test
    void everyKindOfFactHasWords() {
        Set<Class<?>> kinds = new HashSet<>();
        kinds.addAll(Arrays.asList(StageFact.class.getPermittedSubclasses()));
        kinds.addAll(Arrays.asList(CatalogFact.class.getPermittedSubclasses()));
        assertEquals(
                kinds, new HashSet<>(ONE_OF_EACH.stream().map(Object::getClass).toList()));
        for (ProblemFact f : ONE_OF_EACH) {
            Problem p = Problem.error(AT, "x", f);
            assertFalse(ProblemText.message(p).isBlank(), f.toString());
            assertFalse(ProblemText.fix(p).isBlank(), f.toString());
        }
        for (StageFact.Bound b : StageFact.Bound.values()) {
            Problem p = Problem.error(AT, "x", new StageFact.Beyond(b, v(2), v(1), "1 V"));
            assertFalse(ProblemText.fix(p).isBlank(), b.name());
        }
    }

    @Test
    void aFactIsLaidOutAsAProblemInWordsWas() {
        // the line the loader wrote before its numbers became facts (stage file s.yaml, line 4, column 35)
        Problem p = Problem.error(AT, "supply.variation", new StageFact.SupplyVariation(7, 5, 0.25));
        assertEquals(
                "s.yaml:4:35: supply.variation: a variation of 7.00 V on a 5.00 V supply would take it to 0 V or"
                        + " below; write the peak change, well below the supply, such as '250 mV' (5 %)",
                ProblemText.line(p));
        Problem w = Problem.warning(AT, "vos.max", ONE_OF_EACH.get(ONE_OF_EACH.size() - 1));
        assertEquals(
                "s.yaml:4:35: warning: vos.max: max (75.0 mV) is 3000 times typ (25.0 µV); check the prefixes"
                        + " (u, n, m, p) of both against the datasheet",
                ProblemText.line(w));
    }

    @Test
    void aSuggestedVariationIsWrittenAsTheParserReadsIt() {
        // 5 % of a 100 µV supply is 5 µV, suggested with a plain u so it can be typed back
        Problem p = Problem.error(AT, "supply.variation", new StageFact.SupplyVariation(200e-6, 100e-6, 5e-6));
        assertEquals("write the peak change, well below the supply, such as '5.00 uV' (5 %)", ProblemText.fix(p));
    }

    @Test
    void aNegativeValueComparedBySizeIsBelowTheNegatedBound() {
        // ib.typ may carry a sign; its bound is on the size: -2 mA is "below -100 µA"
        Problem p = Problem.warning(
                AT,
                "ib.typ",
                new CatalogFact.OutOfBounds(new Quantity(-2e-3, Dimension.CURRENT), 100e-6, true, false, false, ""));
        assertEquals("-2.00 mA is below -100 µA, implausible for an op amp", ProblemText.message(p));
    }

    @Test
    void aProblemInWordsKeepsThemAndAnInputErrorIsWordedProblemByProblem() {
        Problem words = Problem.error(AT, "gain", "the gain is not given", "add 'gain: 100'");
        Problem fact = Problem.error(AT, "resistor-ratio.tolerance", new StageFact.RatioTolerance(2));
        assertEquals(
                List.of(
                        "s.yaml:4:35: gain: the gain is not given; add 'gain: 100'",
                        "s.yaml:4:35: resistor-ratio.tolerance: a ratio tolerance of 200 % is not a resistor tolerance;"
                                + " write it with its unit, such as '0.1 %'"),
                ProblemText.lines(new InputException(List.of(words, fact))));
    }

    @Test
    void numbersOutsideTheirRuleReadAsTheLoaderWroteThem() {
        // the messages the stage and catalog loaders wrote before these numbers became facts
        assertEquals(
                "20.0 is outside 1..10",
                ProblemText.message(Problem.error(
                        AT, "max-to-sigma", new StageFact.Outside(StageFact.Rule.MAX_TO_SIGMA, 20, 1, 10))));
        Problem trials = Problem.error(
                AT, "max-trials", new StageFact.Outside(StageFact.Rule.MAX_TRIALS, 1000, 2000, Double.NaN));
        assertEquals("1000 is below trials (2000)", ProblemText.message(trials));
        assertEquals("write max-trials at least 2000, or lower trials", ProblemText.fix(trials));
        assertEquals(
                "a follower has gain 1, not 2.5",
                ProblemText.message(
                        Problem.error(AT, "gain", new StageFact.Outside(StageFact.Rule.FOLLOWER_GAIN, 2.5, 1, 1))));
        assertEquals(
                "write the magnitude with 'topology: inverting'",
                ProblemText.fix(Problem.error(
                        AT, "gain", new StageFact.Outside(StageFact.Rule.NON_INVERTING_GAIN, -3, 1, Double.NaN))));
        assertEquals(
                "a non-inverting stage cannot have gain 0.5 (below 1)",
                ProblemText.message(Problem.error(
                        AT, "gain", new StageFact.Outside(StageFact.Rule.NON_INVERTING_GAIN, 0.5, 1, Double.NaN))));
        assertEquals(
                "the unit price at 1000 (1.25) is above the price at 100 (1.10)",
                ProblemText.message(Problem.warning(AT, "price", new CatalogFact.PriceRises(1000, 1.25, 100, 1.10))));
    }
}
