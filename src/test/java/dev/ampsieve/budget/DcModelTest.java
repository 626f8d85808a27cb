package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Stage;
import org.junit.jupiter.api.Test;

class DcModelTest {

    @Test
    void gainsOfTheTopologies() {
        // reference-checks §2 (Franco4 ch. 1, SS7 ch. 2 [from memory]): Rf 99k, Rg 1k
        Stage ni = StageFixture.nonInverting(99e3, 1e3).build();
        Stage inv = StageFixture.inverting(99e3, 1e3).build();
        assertEquals(100.0, ni.noiseGain(), 0.0);
        assertEquals(100.0, ni.signalGain(), 0.0);
        assertEquals(-99.0, inv.signalGain(), 0.0);
        assertEquals(100.0, inv.noiseGain(), 0.0);
    }

    @Test
    void offsetTimesNoiseGain() {
        // reference-checks §2: 100 µV, NG 100 -> 10.0 mV, tol 1e-9 rel
        Stage s = StageFixture.nonInverting(99e3, 1e3).build();
        assertEquals(10.0e-3, DcModel.outputError(s, 100e-6, 0, 0), 10e-3 * 1e-9);
    }

    @Test
    void gainOf100With1mVOffsetGives100mV() {
        // common practice: the offset reaches the output times the (noise) gain; through the offset term
        Stage s = StageFixture.nonInverting(99e3, 1e3).limitV(1).build();
        Budget b = BudgetCalculator.compute(
                s, PartFixture.ideal().vos(null, 1e-3, null).build());
        assertEquals(100e-3, b.term("offset").outputV(), 1e-12);
        assertEquals(1e-3, b.term("offset").inputV(), 1e-15);
        assertEquals(100e-3, DcModel.outputError(s, 1e-3, 0, 0), 1e-12);
    }

    @Test
    void uncompensatedBiasCurrent() {
        // reference-checks §2: IB- 95 nA, Rf 100 k, Rp 0 -> +9.50 mV (currents into the pins)
        Stage s = StageFixture.nonInverting(100e3, 1e3).build();
        assertEquals(9.50e-3, DcModel.outputError(s, 0, 105e-9, 95e-9), 9.5e-3 * 1e-9);
    }

    @Test
    void balanceResistorLeavesOffsetCurrentTimesRf() {
        // Eggleston §6.4 eqs. 6.16-6.18 [S]; reference-checks §2: Rp = Rf||Rg = 990.099 Ω, IB+ 105 nA,
        // IB- 95 nA, G 101 -> -1.000 mV = -IOS x Rf, tol 1e-9 rel
        StageFixture f = StageFixture.nonInverting(100e3, 1e3);
        f.rp = 100e3 * 1e3 / (100e3 + 1e3);
        assertEquals(990.099, f.rp, 0.0005);
        Stage s = f.build();
        assertEquals(-1.000e-3, DcModel.outputError(s, 0, 105e-9, 95e-9), 1e-3 * 1e-9);
        // the worst-case bias term reduces to IOS x Rf (Eggleston §6.4), whatever IB is
        assertEquals(10e-9 * 100e3, BiasTerm.magnitude(s, 100e-9, 10e-9), 1e-3 * 1e-9);
        assertEquals(10e-9 * 100e3, BiasTerm.magnitude(s, 1e-6, 10e-9), 1e-3 * 1e-9);
    }

    @Test
    void invertingAndFollowerUseTheSameForm() {
        // inverting: + input through Rp only; R- = Rf || (Rg + Rs)
        StageFixture f = StageFixture.inverting(100e3, 10e3);
        f.rp = 5e3;
        f.rs = 1e3;
        Stage inv = f.build();
        // by nodal analysis, not the model's formula: the + pin sits at -IB+ Rp = -20 nA x 5 k = -100 µV, the
        // amplifier's own + at -100 + 50 = -50 µV, and the ideal loop holds the - pin there too. KCL at the - pin:
        // 50 µV / 11 k (from the grounded source through Rg + Rs) + (Vout + 50 µV) / 100 k = IB- = 30 nA, so
        // Vout + 50 µV = 100 k x (30 nA - 4.545454... nA) = 2.5454545... mV: Vout = 2.4954545... mV
        assertEquals(2.49545454545e-3, DcModel.outputError(inv, 50e-6, 20e-9, 30e-9), 1e-14);
        // follower with a feedback resistor and a source resistance
        StageFixture g = StageFixture.follower();
        g.rf = 10e3;
        g.rs = 10e3;
        // by hand: the + pin at -1 nA x 10 k = -10 µV, the - pin (and the amplifier's own +) at 1 mV - 10 µV = 990 µV,
        // and the output above it by IB- Rf = 2 nA x 10 k = 20 µV: 1.010 mV
        assertEquals(1.010e-3, DcModel.outputError(g.build(), 1e-3, 1e-9, 2e-9), 1e-15);
    }
}
