package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.catalog.Headroom;
import dev.ampsieve.catalog.MinTyp;
import dev.ampsieve.catalog.Range;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.report.ConstraintText;
import dev.ampsieve.stage.Stage;
import org.junit.jupiter.api.Test;

/**
 * full-scale-output is the peak output excursion (error-model.md, VFS): one stage with VFS = 2 V
 * peak, every figure that depends on it worked by hand.
 *
 * <p>Stage: non-inverting, Rf 9 kohm, Rg 1 kohm (NG 10), 0..70 °C (dT 45 °C), fH 10 kHz,
 * resistor ratio 0.1 % and 10 ppm/°C, 5 V supply. Part: AOL 100 dB, GBW 1 MHz.
 */
class FullScalePeakTest {

    private static StageFixture stage() {
        StageFixture f = StageFixture.nonInverting(9e3, 1e3).limitV(1);
        f.fullScale = 2.0;
        f.fH = 10e3;
        f.tol = 0.001;
        f.tc = 10e-6;
        f.supply = 5.0;
        return f;
    }

    private static PartFixture part() {
        PartFixture p = PartFixture.ideal();
        p.aol = new MinTyp(100.0, null);
        p.gbw = 1e6;
        return p;
    }

    private static ConstraintResult get(Budget b, String name) {
        return b.constraints().stream()
                .filter(c -> c.name().equals(name))
                .findFirst()
                .orElseThrow();
    }

    @Test
    void resistorRatioGainErrorAtTwoVoltsPeak() {
        // by hand: S = (NG - 1)/NG = 9/10 = 0.9 (Sedra & Smith 7th ed. ch. 2 sensitivity [from memory]);
        // tol + tc x dT = 0.001 + 10e-6 x 45 = 0.00145; 2 V x 0.9 x 0.00145 = 2.610 mV
        Budget b = BudgetCalculator.compute(stage().build(), part().build());
        assertEquals(2.610e-3, b.term("resistors").outputV(), 1e-9);
    }

    @Test
    void openLoopGainErrorAtTwoVoltsPeak() {
        // by hand: AOL 100 dB = 1e5; VFS NG/(AOL + NG) = 2 x 10/100010 = 199.98 µV (Sedra & Smith 7th ed. ch. 2 [from
        // memory])
        Budget b = BudgetCalculator.compute(stage().build(), part().build());
        assertEquals(199.98e-6, b.term("open-loop-gain").outputV(), 0.005e-6);
    }

    @Test
    void bandwidthErrorAtTwoVoltsPeak() {
        // by hand: closed-loop pole GBW/NG = 100 kHz; x = 10 kHz/100 kHz = 0.1; 1/sqrt(1.01) = 0.9950372;
        // 2 V x (1 - 0.9950372) = 9.9256 mV (single-pole response, Franco 4th ed. ch. 6 [from memory])
        Budget b = BudgetCalculator.compute(stage().build(), part().build());
        assertEquals(9.9256e-3, b.term("bandwidth").outputV(), 0.00005e-3);
    }

    @Test
    void slewNeededForATwoVoltPeakSine() {
        // by hand: the slope of 2 V sin(2π 10 kHz t) peaks at 2π x 10e3 x 2 = 125 663.7 V/s = 0.1257 V/µs
        // (Franco 4th ed. ch. 6, full-power bandwidth [from memory]); a 0.1 V/µs part is short, 0.12567 V/µs is enough
        Stage s = stage().build();
        assertEquals(125_663.7, Constraints.neededSlew(s), 0.05);
        PartFixture p = part();
        p.slew = 0.1e6;
        assertFalse(get(BudgetCalculator.compute(s, p.build()), "slew").ok());
        p.slew = 125_670.0;
        assertTrue(get(BudgetCalculator.compute(s, p.build()), "slew").ok());
    }

    @Test
    void outputSwingIsMidSupplyPlusOrMinusThePeak() {
        // by hand: 5 V supply, mid 2.5 V; 2.5 V +/- 2 V = 0.5 .. 4.5 V (not 2.5 +/- 1 V = 1.5 .. 3.5 V)
        Stage s = stage().build();
        Range need = Constraints.neededOutput(s);
        assertEquals(0.5, need.min(), 1e-12);
        assertEquals(4.5, need.max(), 1e-12);
        // headroom 0.5 V from each rail reaches exactly 0.5 .. 4.5 V: fits
        PartFixture p = part();
        p.outHead = new Headroom(0.5, 0.5);
        assertTrue(get(BudgetCalculator.compute(s, p.build()), "output-swing").ok());
        // 0.6 V from the low rail reaches only 0.6 V: 0.6 - 0.5 = 100 mV short at the low end, nothing at the high end
        p.outHead = new Headroom(0.6, 0.1);
        ConstraintResult c = get(BudgetCalculator.compute(s, p.build()), "output-swing");
        assertFalse(c.ok());
        assertTrue(ConstraintText.detail(c).contains("short by 100 mV at the low end"), ConstraintText.detail(c));
        assertFalse(ConstraintText.detail(c).contains("at the high end"), ConstraintText.detail(c));
    }

    @Test
    void followerCommonModeIsMidSupplyPlusOrMinusThePeak() {
        // a follower's inputs follow the output: default swing = VFS = 2 V peak; 2.5 V +/- 2 V = 0.5 .. 4.5 V
        StageFixture f = StageFixture.follower().limitV(1);
        f.supply = 5.0;
        f.fullScale = 2.0;
        f.cmSwing = 2.0; // what the stage loader derives for a follower (StageLoaderTest)
        Range need = Constraints.neededCommonMode(f.build());
        assertEquals(0.5, need.min(), 1e-12);
        assertEquals(4.5, need.max(), 1e-12);
    }
}
