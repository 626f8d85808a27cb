package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.catalog.MinTyp;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class GainAndRejectionTest {

    /** reference-checks §4 dB table [Calc]: error ratio 10^(-dB/20) in µV/V, gain 10^(dB/20); tol half the last digit. */
    @ParameterizedTest
    @CsvSource({
        "80, 100, 0.5, 1e4, 0.5",
        "90, 31.623, 0.0005, 31623, 0.5",
        "100, 10, 0.5, 1e5, 0.5",
        "110, 3.1623, 0.00005, 316228, 0.5",
        "120, 1, 0.5, 1e6, 0.5",
        "140, 0.1, 0.05, 1e7, 0.5"
    })
    void decibelTable(double db, double microPerVolt, double tolMicro, double gain, double tolGain) {
        assertEquals(microPerVolt * 1e-6, Decibels.rejected(db), tolMicro * 1e-6);
        assertEquals(gain, Decibels.toRatio(db), tolGain);
        assertEquals(db, Decibels.of(Decibels.toRatio(db)), 1e-9);
    }

    /**
     * Finite open-loop gain, G = G_ideal / (1 + NG/A) (SS7 ch. 2, Franco4 ch. 1 [from memory]);
     * reference-checks §4 table, printed values, tol half the last digit.
     */
    @ParameterizedTest
    @CsvSource({
        "100, 100, 100, 99.90010, 0.000005, -999.0",
        "100, 100, 120, 99.99000, 0.000005, -99.99",
        "1000, 1000, 100, 990.0990, 0.00005, -9901",
        "-99, 100, 100, -98.90110, 0.000005, -999.0"
    })
    void finiteOpenLoopGain(double ideal, double ng, double aolDb, double expected, double tol, double ppm) {
        assertEquals(expected, OpenLoopGainTerm.closedLoopGain(ideal, ng, aolDb), tol);
        // error ≈ -NG/A: -999.0 ppm for 100 dB at NG 100; -0.990 % at NG 1000
        assertEquals(ppm, -1e6 * OpenLoopGainTerm.relativeError(ng, aolDb), Math.abs(ppm) * 1e-3);
    }

    @Test
    void gain100AtAol100dBGives99_9001() {
        // issue 3 / reference-checks §4: gain 100, AOL 100 dB -> 99.9001
        assertEquals(99.9001, OpenLoopGainTerm.closedLoopGain(100, 100, 100), 0.00005);
    }

    @Test
    void openLoopGainTermAtFullScale() {
        // VFS x NG/(A + NG): 1 V, NG 100, 100 dB -> 999.0 µV (reference-checks §4 error column)
        StageFixture f = StageFixture.nonInverting(99e3, 1e3).limitV(1);
        f.fullScale = 1.0;
        PartFixture p = PartFixture.ideal();
        p.aol = new MinTyp(100.0, null);
        Budget b = BudgetCalculator.compute(f.build(), p.build());
        assertEquals(999.0e-6, b.term("open-loop-gain").outputV(), 0.05e-6);
    }

    @Test
    void rejectionExamples() {
        // reference-checks §4 (Franco4 ch. 5 [from memory]): 5 V with CMRR 90 dB -> 158.11 µV; 1 V with PSRR 100 dB ->
        // 10.00 µV
        StageFixture f = StageFixture.follower().limitV(1);
        f.cmSwing = 5;
        f.supplyVariation = 1;
        PartFixture p = PartFixture.ideal();
        p.cmrr = new MinTyp(90.0, 110.0);
        p.psrr = new MinTyp(100.0, null);
        Budget b = BudgetCalculator.compute(f.build(), p.build());
        assertEquals(158.11e-6, b.term("cmrr").outputV(), 0.005e-6);
        assertEquals(10.00e-6, b.term("psrr").outputV(), 0.005e-6);
    }

    @Test
    void resistorRatioTempco() {
        // reference-checks §8 [Calc] (SS7/Franco4 gain sensitivity): G 100, +25/-25 ppm/°C, ΔT 50 °C
        // -> 2475 ppm non-inverting, 2500 ppm inverting
        StageFixture ni = StageFixture.nonInverting(99e3, 1e3).limitV(1).temps(25, 75);
        ni.fullScale = 1.0;
        ni.tc = 50e-6;
        Stage s = ni.build();
        assertEquals(
                2475e-6,
                BudgetCalculator.compute(s, PartFixture.ideal().build())
                        .term("resistors")
                        .outputV(),
                1e-12);
        StageFixture inv = StageFixture.inverting(100e3, 1e3).limitV(1).temps(25, 75);
        inv.fullScale = 1.0;
        inv.tc = 50e-6;
        assertEquals(
                2500e-6,
                BudgetCalculator.compute(inv.build(), PartFixture.ideal().build())
                        .term("resistors")
                        .outputV(),
                1e-12);
    }

    @Test
    void bandwidthTermIsASinglePole() {
        // closed-loop pole at GBW/NG: at fH equal to the pole the amplitude is 1/√2 (Franco4 ch. 6 [from memory])
        assertEquals(1 - 1 / Math.sqrt(2), BandwidthTerm.relativeError(10e3, 100, 1e6), 1e-15);
    }
}
