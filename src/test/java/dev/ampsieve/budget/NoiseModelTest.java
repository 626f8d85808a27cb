package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.fixtures.StageFixture;
import dev.ampsieve.stage.Stage;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.analysis.integration.RombergIntegrator;
import org.apache.commons.math3.analysis.integration.SimpsonIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class NoiseModelTest {

    private static final double T25 = 298.15;

    /** Johnson/Nyquist 4kTR with k from SI9; values of reference-checks §1 (tol: half the last digit). */
    @ParameterizedTest
    @CsvSource({
        "1e3, 298.15, 4.0578",
        "10e3, 298.15, 12.8318",
        "100e3, 298.15, 40.5779",
        "1e3, 300.15, 4.0714",
        "10e3, 300.15, 12.8748",
        "100e3, 300.15, 40.7137",
        "1e3, 300.0, 4.0704"
    })
    void resistorThermalNoise(double ohms, double kelvin, double nvPerRtHz) {
        assertEquals(nvPerRtHz * 1e-9, NoiseModel.resistorDensity(ohms, kelvin), 0.5e-13);
    }

    @Test
    void oneKiloOhmAt25C() {
        // 4kTR of 1 kohm at 25 °C = 4.0578 nV/√Hz (Johnson; Nyquist 1928; k exact, SI9)
        assertEquals(4.0578e-9, NoiseModel.resistorDensity(1e3, T25), 0.5e-13);
    }

    private static Stage bare() {
        return StageFixture.follower().build(); // NG 1, R+ = R- = 0: only the amplifier's en
    }

    @Test
    void n1FlickerPlusWhite() {
        // reference-checks N1 (Franco4 ch. 7 [from memory]): 10 nV/√Hz, fc 10 Hz, 0.1-10 Hz -> 74.80 nV rms, 493.7 nV
        // pp
        double rms = NoiseModel.outputRms(bare(), 10e-9, 10, 0, 0, 0.1, 10, T25);
        assertEquals(74.80e-9, rms, 0.01e-9);
        assertEquals(493.7e-9, NoiseModel.PEAK_TO_PEAK * rms, 0.05e-9);
    }

    @Test
    void n1bZeroDrift() {
        // reference-checks N1b: 20 nV/√Hz, no 1/f (zero-drift, Enz & Temes 1996 [from memory]) -> 62.93 nV rms, 415.3
        // nV pp
        double rms = NoiseModel.outputRms(bare(), 20e-9, 0, 0, 0, 0.1, 10, T25);
        assertEquals(62.93e-9, rms, 0.005e-9);
        assertEquals(415.3e-9, NoiseModel.PEAK_TO_PEAK * rms, 0.05e-9);
    }

    @Test
    void n1cLowWhiteHighCorner() {
        // reference-checks N1c: 5 nV/√Hz, fc 100 Hz -> 108.45 nV rms
        double rms = NoiseModel.outputRms(bare(), 5e-9, 100, 0, 0, 0.1, 10, T25);
        assertEquals(108.45e-9, rms, 0.01e-9);
    }

    @Test
    void n2NonInvertingWhiteOverEnbw() {
        // reference-checks N2 (Franco4 ch. 7, AoE3 ch. 8 [from memory]): Rs 1k, Rf 9k, Rg 1k, en 10 nV, in 1 pA,
        // single pole 10 kHz -> ENBW 15 707.96 Hz; 1.4459 µV rms RTI, 14.459 µV rms RTO, tol 0.01 %
        StageFixture f = StageFixture.nonInverting(9e3, 1e3);
        f.rs = 1e3;
        Stage s = f.build();
        double enbw = NoiseModel.SINGLE_POLE_ENBW * 10e3;
        assertEquals(15707.96, enbw, 0.005);
        double rto = NoiseModel.outputRms(s, 10e-9, 0, 1e-12, 0, 0, enbw, T25);
        assertEquals(14.459e-6, rto, 14.459e-6 * 1e-4);
        assertEquals(1.4459e-6, rto / s.noiseGain(), 1.4459e-6 * 1e-4);
    }

    @Test
    void n3InvertingButterworth() {
        // reference-checks N3: inverting Rf 100k, Rg 10k, NG 11, en 5 nV, in 0.5 pA, 2nd-order Butterworth 1 kHz,
        // ENBW pi/(2 sqrt 2) x 1 kHz = 1110.72 Hz -> 5.1239 µV rms, 33.82 µV pp at the output, tol 0.01 %
        Stage s = StageFixture.inverting(100e3, 10e3).build();
        double enbw = Math.PI / (2 * Math.sqrt(2)) * 1e3;
        double rto = NoiseModel.outputRms(s, 5e-9, 0, 0.5e-12, 0, 0, enbw, T25);
        assertEquals(5.1239e-6, rto, 5.1239e-6 * 1e-4);
        assertEquals(33.82e-6, NoiseModel.PEAK_TO_PEAK * rto, 33.82e-6 * 1e-4);
    }

    @Test
    void flickerClosedFormAgainstNumericalIntegration() {
        // ∫(1 + fc/f) df closed form (Franco4 ch. 7) against commons-math3 Legendre-Gauss and Romberg quadrature
        double fc = 10;
        double f1 = 0.1;
        double f2 = 10;
        UnivariateFunction density = f -> 1 + fc / f;
        double gauss = new IterativeLegendreGaussIntegrator(5, 1e-13, 1e-15).integrate(1_000_000, density, f1, f2);
        assertEquals(55.95170, NoiseModel.band(fc, f1, f2), 0.5e-5);
        assertEquals(gauss, NoiseModel.band(fc, f1, f2), 1e-9 * gauss);
        // wider band, current-noise corner: integrate in log f (smooth) with Romberg
        double fci = 200;
        double a = 0.01;
        double b = 1e5;
        UnivariateFunction inLog = u -> {
            double f = Math.exp(u);
            return (1 + fci / f) * f;
        };
        double romberg =
                new RombergIntegrator(1e-13, 1e-15, 3, 32).integrate(10_000_000, inLog, Math.log(a), Math.log(b));
        assertEquals(romberg, NoiseModel.band(fci, a, b), 1e-9 * romberg);
    }

    @Test
    void fullDensityIntegratesToTheModel() {
        // the whole error-model density e_o²(f) integrated numerically (Simpson, commons-math3) over a
        // narrow band equals NoiseModel's closed form
        StageFixture sf = StageFixture.nonInverting(99e3, 1e3);
        sf.rs = 10e3;
        Stage s = sf.build();
        double en = 8e-9, fce = 3, in = 0.4e-12, fci = 50, k4T = 4 * 1.380649e-23 * T25;
        double ng = s.noiseGain(), rp = s.rPlus(), rm = s.rMinus();
        UnivariateFunction psd = f -> ng
                * ng
                * (en * en * (1 + fce / f)
                        + k4T * rp
                        + in * in * (1 + fci / f) * rp * rp
                        + k4T * rm
                        + in * in * (1 + fci / f) * rm * rm);
        double num = new SimpsonIntegrator(1e-12, 1e-30, 3, 64).integrate(10_000_000, psd, 1, 20);
        assertEquals(Math.sqrt(num), NoiseModel.outputRms(s, en, fce, in, fci, 1, 20, T25), 1e-8 * Math.sqrt(num));
    }

    /**
     * ENBW of a single pole: ∫0^∞ df / (1 + (f/fc)²) = (π/2) fc (Franco4 ch. 7; reference-checks §3: 1.570796).
     * Integrated numerically with commons-math3 Romberg after mapping [0, ∞) to [0, 1) with f = fc x / (1 - x).
     */
    @Test
    void singlePoleNoiseBandwidth() {
        double fc = 1.0;
        UnivariateFunction g = x -> fc / ((1 - x) * (1 - x) + x * x); // integrand times df/dx
        double enbw = new RombergIntegrator(1e-12, 1e-14, 3, 32).integrate(10_000_000, g, 0, 1);
        assertEquals(1.570796, enbw / fc, 0.5e-6);
        assertEquals(NoiseModel.SINGLE_POLE_ENBW, enbw, 1e-9);
        // the same for a 2nd-order Butterworth, |H|² = 1/(1 + (f/fc)^4): π/(2√2) = 1.110721 (reference-checks §3)
        // with f = x/(1-x): df/(1 + f^4) = (1-x)² dx / ((1-x)^4 + x^4), finite on [0, 1]
        UnivariateFunction g2 = x -> (1 - x) * (1 - x) / (Math.pow(1 - x, 4) + Math.pow(x, 4));
        double bw2 = new RombergIntegrator(1e-12, 1e-14, 3, 32).integrate(10_000_000, g2, 0, 1);
        assertEquals(1.110721, bw2, 0.5e-6);
    }
}
