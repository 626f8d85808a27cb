package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Measured;
import dev.ampsieve.catalog.MeasuredLot;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stats.NormalFit;
import dev.ampsieve.yaml.Located;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.random.Well19937c;
import org.junit.jupiter.api.Test;

/**
 * A measured lot in the budget, on a follower with an ideal part whose only error is its offset (every other
 * figure zero or guaranteed 0), so a unit passes a limit L when |vos| <= L. The lot is generated here with a
 * seeded commons-math3 NormalDistribution of known sigma, and yields are checked against the closed form of
 * the truncated normal, P(|X| <= L) for X ~ N(m, s) truncated at +/- B:
 * (Phi((L - m)/s) - Phi((-L - m)/s)) / (Phi((B - m)/s) - Phi((-B - m)/s)), by commons-math3 (not the
 * engine's sampler).
 */
class MeasuredYieldTest {

    private static final double MAX = 1e-3; // datasheet vos.max
    private static final double LIMIT = 0.3e-3; // the stage's limit at the output (follower: at the input too)
    private static final double TRUE_SIGMA = 0.2e-3;

    private static final Part PART = PartFixture.ideal().vos(null, MAX, null).build();

    private static double closedForm(double mean, double sigma, double bound) {
        NormalDistribution z = new NormalDistribution(0, 1);
        double in = z.cumulativeProbability((LIMIT - mean) / sigma) - z.cumulativeProbability((-LIMIT - mean) / sigma);
        double kept = Double.isInfinite(bound)
                ? 1.0
                : z.cumulativeProbability((bound - mean) / sigma) - z.cumulativeProbability((-bound - mean) / sigma);
        return in / kept;
    }

    private static Part withLot(Part p, double[] vos) {
        Path f = Path.of("generated-lot.csv");
        MeasuredLot lot = new MeasuredLot(
                f,
                java.util.stream.IntStream.range(0, vos.length)
                        .mapToObj(String::valueOf)
                        .toList(),
                vos,
                new double[0],
                Double.NaN,
                new double[0],
                new double[0]);
        return p.withMeasured(new Measured(f.toString(), f, Located.nowhere(f), lot));
    }

    private static Stage stage() {
        StageFixture s = StageFixture.follower().limitV(LIMIT);
        s.trials = 20_000;
        return s.build();
    }

    @Test
    void theYieldOfAGeneratedLotUsesTheUpperSigmaAndBracketsTheTrueYield() {
        double[] vos = new NormalDistribution(new Well19937c(16), 0, TRUE_SIGMA).sample(30);
        NormalFit fit = NormalFit.of(vos);
        // this seed's interval holds the sigma the lot was drawn with (as 95 % of seeds do)
        assertTrue(fit.sigmaLow() <= TRUE_SIGMA && TRUE_SIGMA <= fit.sigmaHigh(), fit::toString);

        Budget b = BudgetCalculator.compute(stage(), withLot(PART, vos));
        YieldResult y = b.yield();
        assertEquals(20_000, y.trials());
        // the engine draws N(mean, sigma high) truncated at the datasheet's +/- 1 mV (every unit lies inside)
        double engine = closedForm(fit.mean(), fit.sigmaHigh(), MAX);
        assertTrue(y.low() <= engine && engine <= y.high(), () -> y + " should hold " + engine);
        // the fitted yield's interval, from sigma's: the true yield lies in it, and the engine reads its low end
        double atLow = closedForm(fit.mean(), fit.sigmaLow(), MAX);
        double truth = closedForm(0.0, TRUE_SIGMA, MAX);
        assertTrue(engine <= truth && truth <= atLow, () -> engine + " <= " + truth + " <= " + atLow);
        // against the datasheet alone (sigma = max/3 = 333 µV), this lot passes more units
        double sheet = BudgetCalculator.compute(stage(), PART).yield().value();
        assertEquals(closedForm(0, MAX / 3, MAX), sheet, 0.01);
        assertTrue(y.value() > sheet + 0.05, () -> y.value() + " vs " + sheet); // 0.725 against 0.635 here
        // the facts the report shows
        Measurement m = b.measured().get(0);
        assertEquals("vos", m.field());
        assertEquals(30, m.units());
        assertEquals(fit.sigmaHigh(), m.sigmaHigh(), 0.0);
        assertEquals(MAX, m.datasheet(), 0.0);
        assertEquals(0, m.beyond());
        assertEquals(MAX / 3, m.datasheetSigma(), 1e-15);
        assertTrue(m.usedInYield());
    }

    @Test
    void aSmallLotNeverFlattersTheTrueYieldMoreOftenThanItsConfidenceAllows() {
        // 1000 lots of 10 units: the closed-form yield at the lot's (mean, sigma high) exceeds the true yield
        // only when sigma high < the true sigma (2.5 % of lots, one-sided) and the mean's shift does not make
        // up for it; the binomial standard deviation of 2.5 % of 1000 is 4.9 lots: allow 25 + 3 x 4.9 = 40
        NormalDistribution n = new NormalDistribution(new Well19937c(5), 0, TRUE_SIGMA);
        double truth = closedForm(0, TRUE_SIGMA, MAX);
        int flattering = 0;
        for (int i = 0; i < 1000; i++) {
            NormalFit f = NormalFit.of(n.sample(10));
            if (closedForm(f.mean(), f.sigmaHigh(), MAX) > truth) {
                flattering++;
            }
        }
        assertTrue(flattering <= 40, flattering + " of 1000 lots flatter the yield");
    }

    @Test
    void aLotBeyondTheDatasheetIsFlaggedAndDrawnWithoutItsBound() {
        // datasheet 0.25 mV, inside the 0.3 mV limit: by the datasheet every unit passes (worst case 0.25 mV)
        Part tight = PartFixture.ideal().vos(null, 0.25e-3, null).build();
        assertEquals(1.0, BudgetCalculator.compute(stage(), tight).yield().value(), 0.0);
        double[] vos = new NormalDistribution(new Well19937c(16), 0, TRUE_SIGMA).sample(30);
        NormalFit fit = NormalFit.of(vos);
        Budget b = BudgetCalculator.compute(stage(), withLot(tight, vos));
        Measurement m = b.measured().get(0);
        assertTrue(m.beyond() > 0, m::toString);
        assertTrue(
                b.assumptions().stream()
                        .anyMatch(a -> a instanceof Assumption.MeasuredBeyondDatasheet x
                                && x.field().equals("vos")
                                && x.beyond() == m.beyond()),
                b.assumptions()::toString);
        // the worst case (from the datasheet) no longer bounds every unit: sampled, untruncated
        assertEquals("sampled", b.yield().decided());
        double engine = closedForm(fit.mean(), fit.sigmaHigh(), Double.POSITIVE_INFINITY);
        assertTrue(b.yield().low() <= engine && engine <= b.yield().high(), () -> b.yield() + " should hold " + engine);
    }

    @Test
    void aLotTooSmallToTestIsSaidSo() {
        Budget b = BudgetCalculator.compute(stage(), withLot(PART, new double[] {1e-5, -2e-5, 3e-5, 0, 5e-6}));
        assertEquals(
                List.of(new Assumption.MeasuredFit("vos", 25.0, 5, Double.NaN)),
                b.assumptions().stream()
                        .filter(a -> a instanceof Assumption.MeasuredFit)
                        .toList());
    }

    @Test
    void aLotThatAllReadsTheSameKeepsTheDatasheetsSpread() {
        // five units at 10 µV: s = 0, so the upper sigma is 0 too; a zero spread would pass every unit at the
        // mean, so the datasheet's N(0, 1 mV / 3) stands (and the untested fit is said)
        Part lot = withLot(PART, new double[] {1e-5, 1e-5, 1e-5, 1e-5, 1e-5});
        double sheet = BudgetCalculator.compute(stage(), PART).yield().value();
        Budget b = BudgetCalculator.compute(stage(), lot);
        assertEquals(sheet, b.yield().value(), 0.0);
        assertTrue(b.assumptions().stream().anyMatch(a -> a instanceof Assumption.MeasuredFit));
    }
}
