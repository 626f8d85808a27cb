package dev.ampsieve.advice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.Headroom;
import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Range;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.catalog.TestConditions;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.report.AdviceText;
import dev.ampsieve.stage.Stage;
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

    /** JFET input, IB 10 pA at 25 °C doubling every 10 °C (10.24 nA at 125 °C), drift 1 µV/°C, 1 mA, 200 °C/W. */
    private static Part hotPart() {
        PartFixture p = PartFixture.ideal();
        p.input = InputType.JFET;
        p.temperature = new Range(-40, 125);
        p.ib = new Spread(null, 10e-12, 10.24e-9);
        p.ios = new Spread(null, 0.0, 0.0);
        p.drift = new Spread(null, 1e-6, null);
        p.iq = 1e-3;
        p.thetaJa = 200.0;
        p.testConditions = new TestConditions(10.0, 5.0);
        return p.build();
    }

    /** Follower from 1 Mohm, 10 V, 0..70 °C, full scale 2.5 V, a 100 ohm load, limit 350 µV. */
    private static Stage hotStage() {
        StageFixture f = StageFixture.follower();
        f.rs = 1e6;
        f.supply = 10.0;
        f.fullScale = 2.5;
        return f.limitV(350e-6).build().toBuilder().loadResistance(100.0).build();
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
        Part p = hotPart();
        Stage s = hotStage();
        Ranking r = Ranker.rank(s, List.of(p), ENGINE);
        assertEquals("self-heating", r.advice().noFit().limitingTerm());
        assertEquals(
                406.4e-6, r.candidates().get(0).budget().term("self-heating").outputV(), 0.1e-6);
        assertTrue(
                AdviceText.lines(r.advice()).stream()
                        .anyMatch(l -> l.contains("limited by self-heating (")
                                && l.contains(
                                        "an operating-point term: a cooler part (lower quiescent power or theta-ja) or a higher load"
                                                + " resistance")),
                AdviceText.lines(r.advice()).toString());

        Change load = changes(r).get(Change.Kind.HIGHER_LOAD_RESISTANCE);
        assertNotNull(load, AdviceText.lines(r.advice()).toString());
        double rl = load.values().get("loadResistance");
        assertEquals(616, rl, 1, "hand estimate 616 ohm");
        // re-checked: the printed value fits, one unit less in the third digit does not
        assertTrue(fits(s.toBuilder().loadResistance(rl).build(), p));
        assertFalse(fits(s.toBuilder().loadResistance(rl - Rounding.unit3(rl)).build(), p));

        PartTarget theta = r.advice().noFit().targets().stream()
                .filter(t -> t.quantity() == PartTarget.Quantity.THETA_JA)
                .findFirst()
                .orElseThrow();
        assertEquals(55.5, theta.value(), 0.1, "hand estimate 55.6 °C/W, printed rounded down");
        assertTrue(fits(s, PartEdit.withThetaJa(p, theta.value())));
        assertFalse(fits(s, PartEdit.withThetaJa(p, theta.value() + Rounding.unit3(theta.value()))));
        assertTrue(
                AdviceText.lines(r.advice())
                        .contains("  - theta-ja ≤ "
                                + dev.ampsieve.units.Units.format(
                                        theta.value(), dev.ampsieve.units.Dimension.THERMAL_RESISTANCE)
                                + " (a cooler package, or more copper under it)"),
                AdviceText.lines(r.advice()).toString());
    }

    @Test
    void chopperRippleGetsTheLowestFilterOrderThatRemovesIt() {
        // follower from 0 ohm (no resistor noise), a chopper with no noise of its own, 20 µV ripple at 100 kHz,
        // GBW 10 MHz; no filter: 20 µV / sqrt(1 + (100 kHz/10 MHz)^2) = 19.999 µV against 10 µV. A first-order
        // filter at 1 kHz: x 1/sqrt(1 + 100^2) = 9.9995e-3 -> 0.19998 µV: order 1 is enough.
        PartFixture f = PartFixture.ideal();
        f.architecture = Architecture.CHOPPER;
        f.input = InputType.CMOS;
        f.gbw = 10e6;
        f.chop = 100e3;
        f.ripple = 20e-6;
        f.inHead = new Headroom(1.5, 1.5);
        f.testConditions = new TestConditions(5.0, 2.5);
        StageFixture sf = StageFixture.follower();
        sf.supply = 5.0;
        sf.fH = 1e3;
        sf.filterOrder = 0;
        Stage s = sf.limitV(10e-6).build();
        Ranking r = Ranker.rank(s, List.of(f.build()), ENGINE);
        assertEquals("chopping-ripple", r.advice().noFit().limitingTerm());
        assertEquals(
                19.999e-6,
                r.candidates().get(0).budget().term("chopping-ripple").outputV(),
                1e-9);
        Change c = changes(r).get(Change.Kind.STEEPER_FILTER);
        assertNotNull(c, AdviceText.lines(r.advice()).toString());
        assertEquals(1.0, c.values().get("filterOrder"), 0.0);
        assertTrue(
                AdviceText.change(c, r.stage())
                        .startsWith("a Butterworth low-pass of order 1 at 1.00 kHz after the amplifier (now none)"),
                AdviceText.change(c, r.stage()));
        assertTrue(
                AdviceText.lines(r.advice()).stream()
                        .anyMatch(l -> l.contains("a stage filter that removes the ripple")),
                AdviceText.lines(r.advice()).toString());
    }
}
