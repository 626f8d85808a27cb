package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.catalog.Noise;
import dev.ampsieve.fixtures.PartFixture;
import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Stage;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.RombergIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The noise bandwidth a stage really has (error-model.md term 10) and resistor noise at the hottest temperature. */
class NoiseBandwidthTest {

    /**
     * ENBW of an n-th order Butterworth low-pass, |H|² = 1/(1 + (f/fc)^(2n)), as a multiple of fc.
     * Second method: commons-math3 Romberg quadrature of ∫0^∞ dx/(1 + x^(2n)) after mapping [0, ∞)
     * onto [0, 1) with x = t/(1 - t), dx = dt/(1 - t)²: the integrand becomes
     * (1 - t)^(2n-2) / ((1 - t)^(2n) + t^(2n)), finite on [0, 1].
     * Printed values: π/2 = 1.5708, π/(2√2) = 1.1107 (reference-checks §3), 1.0472 (= π/3), 1.0262
     * [from memory], each to half its last digit.
     */
    @ParameterizedTest
    @CsvSource({"1, 1.5708", "2, 1.1107", "3, 1.0472", "4, 1.0262"})
    void butterworthNoiseBandwidth(int n, double printed) {
        UnivariateFunction g = t -> Math.pow(1 - t, 2 * n - 2) / (Math.pow(1 - t, 2 * n) + Math.pow(t, 2 * n));
        double romberg = new RombergIntegrator(1e-12, 1e-14, 3, 32).integrate(10_000_000, g, 0, 1);
        assertEquals(printed, romberg, 0.00005);
        assertEquals(romberg, NoiseModel.butterworthEnbw(n), 1e-9);
    }

    private static StageFixture gain10(Integer order) {
        StageFixture f = StageFixture.nonInverting(9e3, 1e3); // NG 10
        f.fH = 1e3;
        f.filterOrder = order;
        return f;
    }

    @Test
    void noFilterRunsToTheClosedLoopBandwidth() {
        // GBW 1 MHz, NG 10: closed-loop pole 100 kHz; single pole: (π/2) x 100 kHz = 157 079.6 Hz, whatever fH is
        Stage none = gain10(Stage.NO_FILTER).build();
        assertEquals(157_079.6, NoiseModel.noiseBandEdge(none, 1e6), 0.05);
        // not stated counts as no filter: the larger, never flattering noise bandwidth
        assertEquals(157_079.6, NoiseModel.noiseBandEdge(gain10(null).build(), 1e6), 0.05);
    }

    @Test
    void aFilterAtTheBandEdgeLimitsItUnlessTheLoopIsNarrower() {
        // 2nd-order Butterworth at 1 kHz: 1.110721 x 1 kHz = 1110.72 Hz (reference-checks §3, π/(2√2))
        assertEquals(1110.72, NoiseModel.noiseBandEdge(gain10(2).build(), 1e6), 0.005);
        // first order at 1 kHz: (π/2) x 1 kHz = 1570.80 Hz (Franco 4th ed. ch. 7 [from memory])
        assertEquals(1570.80, NoiseModel.noiseBandEdge(gain10(1).build(), 1e6), 0.005);
        // GBW 5 kHz, NG 10: the loop's pole at 500 Hz lies below the filter: (π/2) x 500 Hz = 785.40 Hz,
        // an upper bound of the cascade (|H_filter H_loop|² is at most each factor)
        assertEquals(785.40, NoiseModel.noiseBandEdge(gain10(4).build(), 5e3), 0.005);
    }

    @Test
    void resistorNoiseAtTheHottestTemperature() {
        // follower from a 10 kohm source, -40..85 °C, first-order band 0.1 Hz .. 1 kHz, noiseless amplifier.
        // By hand: T = 85 + 273.15 = 358.15 K; 4kTR = 4 x 1.380649e-23 x 358.15 x 1e4 = 1.977918e-16 V²/Hz
        // (14.0638 nV/√Hz; Johnson, Nyquist 1928, k exact from SI Brochure 9th ed.); band (π/2) x 1 kHz - 0.1 Hz
        // = 1570.696 Hz; rms = sqrt(1.977918e-16 x 1570.696) = 557.38 nV (at 25 °C it would be 508.55 nV)
        StageFixture f = StageFixture.follower().limitV(1).temps(-40, 85);
        f.rs = 10e3;
        f.fH = 1e3;
        PartFixture p = PartFixture.ideal();
        p.noise = new Noise(0.0, 0.0, 0.0, 0.0);
        Stage s = f.build();
        assertEquals(358.15, NoiseTerm.resistorKelvin(s), 1e-12);
        assertEquals(14.0638e-9, NoiseModel.resistorDensity(10e3, NoiseTerm.resistorKelvin(s)), 0.00005e-9);
        Budget b = BudgetCalculator.compute(s, p.build());
        assertEquals(557.38e-9, b.noiseRmsV(), 0.005e-9);
        // the resistors' temperature operand is the stage's hottest, 85 °C (set above)
        assertEquals(85.0, b.term("noise").working().value("T"), 0.0);
    }
}
