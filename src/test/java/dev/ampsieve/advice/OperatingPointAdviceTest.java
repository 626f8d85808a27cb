package dev.ampsieve.advice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.TermKind;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.testing.AdviceFixtures;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/**
 * When an operating-point term limits the closest part, the advice says so, names the lever and gives
 * the number that makes the part fit: a higher load resistance, a cooler package, a stage filter.
 * Each number is worked approximately by hand and re-checked exactly through the budget.
 */
class OperatingPointAdviceTest {

    private static final BudgetFunction ENGINE = BudgetCalculator::compute;

    private static boolean fits(Stage s, Part p) {
        Budget b = ENGINE.compute(s, p);
        return b.constraintsMet() && (b.verdict() == Verdict.FITS || b.verdict() == Verdict.FITS_AFTER_TRIM);
    }

    private static Map<Change.Kind, Change> changes(Ranking r) {
        return r.advice().noFit().changes().stream().collect(Collectors.toMap(Change::kind, c -> c));
    }

    @Test
    void aHotDieGetsAHigherLoadAndACoolerPackageWithTheirNumbers() {
        // By hand: P = 10 V x 1 mA + 6.25/RL (the output at 2.5 V = Vs/4 from mid-supply), rise dT = 200 x P.
        // The term: IB through 1 Mohm grows 226.274 µV x (2^(dT/10) - 1), drift 1 µV/°C x dT. Beside it the bias
        // term 226.274 µV (10 pA x 2^4.5 x 1 Mohm), the drift term 1 µV/°C x 45 °C = 45 µV and the 1 Mohm's noise
        // allowance, 3.3 x sqrt(4kT R (15.708 - 0.1) Hz) at 343.15 K = 1.795 µV: the term may take
        // 350 - 226.274 - 45 - 1.795 = 76.93 µV, reached at dT = 4.03 °C (2^0.403 - 1 = 0.32226; x 226.274 = 72.92, +
        // 4.03).
        // At 100 ohm (P = 72.5 mW, dT 14.5 °C) it is 226.274 x (2^1.45 - 1) + 14.5 = 406.4 µV.
        // Load: 200 x (0.01 + 6.25/RL) = 4.03 -> RL = 6.25/0.010145 = 616 ohm (about).
        // Package: at 100 ohm, P = 72.5 mW: theta-ja <= 4.03 / 0.0725 = 55.6 °C/W (about).
        Part p = AdviceFixtures.hotPart();
        Stage s = AdviceFixtures.hotStage();
        Ranking r = Ranker.rank(s, List.of(p), ENGINE);
        assertEquals("self-heating", r.advice().noFit().limitingTerm());
        assertEquals(
                406.4e-6, r.candidates().get(0).budget().term("self-heating").outputV(), 0.1e-6);
        // an operating-point term: the lever is where the part runs, not the part's own figures
        assertEquals(
                TermKind.OPERATING_POINT,
                r.candidates().get(0).budget().term("self-heating").kind());

        Change load = changes(r).get(Change.Kind.HIGHER_LOAD_RESISTANCE);
        assertNotNull(load, changes(r).toString());
        double rl = load.values().get("loadResistance");
        assertEquals(616, rl, 1, "hand estimate 616 ohm");
        // as offered: 3 digits on the fitting side, 616 Ω (the re-check below shows 615 Ω would not fit)
        assertEquals(616.0, rl, 1e-9);
        // re-checked: the printed value fits, one unit less in the third digit does not
        assertTrue(fits(s.toBuilder().loadResistance(rl).build(), p));
        assertFalse(fits(s.toBuilder().loadResistance(rl - Rounding.unit3(rl)).build(), p));

        PartTarget theta = r.advice().noFit().targets().stream()
                .filter(t -> t.quantity() == PartTarget.Quantity.THETA_JA)
                .findFirst()
                .orElseThrow();
        assertEquals(55.5, theta.value(), 0.1, "hand estimate 55.6 °C/W, printed rounded down");
        // as offered: 3 digits on the fitting side, 55.5 °C/W (the re-check below shows 55.6 would not fit)
        assertEquals(55.5, theta.value(), 1e-12);
        assertTrue(fits(s, PartEdit.withThetaJa(p, theta.value())));
        assertFalse(fits(s, PartEdit.withThetaJa(p, theta.value() + Rounding.unit3(theta.value()))));
        // a package figure: no temperature of its own
        assertTrue(Double.isNaN(theta.atC()));
    }

    @Test
    void chopperRippleGetsTheLowestFilterOrderThatRemovesIt() {
        // follower from 0 ohm (no resistor noise), a chopper with no noise of its own, 20 µV ripple at 100 kHz,
        // GBW 10 MHz; no filter: 20 µV / sqrt(1 + (100 kHz/10 MHz)^2) = 19.999 µV against 10 µV. A first-order
        // filter at 1 kHz: x 1/sqrt(1 + 100^2) = 9.9995e-3 -> 0.19998 µV: order 1 is enough.
        Stage s = AdviceFixtures.unfilteredStage();
        Ranking r = Ranker.rank(s, List.of(AdviceFixtures.ripplingChopper()), ENGINE);
        assertEquals("chopping-ripple", r.advice().noFit().limitingTerm());
        assertEquals(
                19.999e-6,
                r.candidates().get(0).budget().term("chopping-ripple").outputV(),
                1e-9);
        Change c = changes(r).get(Change.Kind.STEEPER_FILTER);
        assertNotNull(c, changes(r).toString());
        assertEquals(1.0, c.values().get("filterOrder"), 0.0);
        // an operating-point term: the lever is a stage filter, not the part's own figures
        assertEquals(
                TermKind.OPERATING_POINT,
                r.candidates().get(0).budget().term("chopping-ripple").kind());
    }
}
