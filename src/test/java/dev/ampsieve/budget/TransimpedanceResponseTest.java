package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * TransimpedanceResponse against hand-worked cases and closed forms worked independently of the
 * class (the second-order denominator solved as a quadratic, the asymptotic crossover at
 * Graeme's Cf solved by hand).
 */
class TransimpedanceResponseTest {

    /**
     * Two-pole loop with a known crossover. Cf = 0, Rsh = 1e15 (Rf/Rsh = 1e-9), so
     * NG = (1 + 1e-9) + j f/fz with fz = 1/(2π Rf Ct) = 1/(2π 1e6 1e-11) = 15915.494 Hz. With
     * GBW = √2 fz and A0 = 1e6: at f = fz, |A| = A0/√(1 + (A0 fz/GBW)²) = √2 (1 - 1e-12) and
     * |NG| = √2 (1 + 5e-10), so the crossover is fz to 1e-9. Phase there: A -atan(fz/fa) =
     * -(90° - atan(fa/fz)), fa/fz = √2/1e6; NG +45°. PM = 180 - 90 + atan(√2e-6) - 45
     * = 45° + 8.103e-5° (worked by hand).
     */
    @Test
    void phaseMarginOfATwoPoleLoopWithAKnownCrossover() {
        double fz = 1 / (2 * Math.PI * 1e6 * 10e-12);
        TransimpedanceResponse r = new TransimpedanceResponse(1e6, 0, 1e15, 10e-12, 1e6, Math.sqrt(2) * fz);
        assertEquals(15915.494309, r.crossover(), 15915.494309 * 1e-8); // hand: fz
        assertEquals(45.0 + Math.toDegrees(Math.atan(Math.sqrt(2) * 1e-6)), r.phaseMargin(), 1e-6); // hand: 45.000081°
        assertEquals(45.000081, r.phaseMargin(), 1e-6);
    }

    /**
     * A feedback pole alone: GBW 1e12 Hz, A0 1e6, Ct 0, so |H| = Rf/|1 + j 2π f Rf Cf| within
     * 1e-6; -3 dB at 1/(2π Rf Cf) = 1/(2π 1e6 1e-12) = 159154.94 Hz (single pole, Franco ch. 6).
     */
    @Test
    void bandwidthOfTheFeedbackPole() {
        TransimpedanceResponse r = new TransimpedanceResponse(1e6, 1e-12, 1e12, 0, 1e6, 1e12);
        assertEquals(159154.94, r.bandwidth(), 159154.94 * 1e-5);
        assertEquals(1e6 / Math.sqrt(2), r.transimpedanceMagnitude(159154.94), 1e6 * 1e-5);
    }

    /**
     * Cf = 0 makes the closed loop second order. With NG = c + j f/fz (c = 1 + Rf/Rsh) and
     * A = A0/(1 + j f/fa), GBW = A0 fa: H = -Rf/(1 + NG/A) = -Rf A0/D,
     * D = (A0 + c) + j f (c/fa + 1/fz) - f²/(fz fa). |D(f)|² = 2 |D(0)|² is a quadratic in y = f²:
     * a² y² + (b² - 2 a d0) y - d0² = 0 with d0 = A0 + c, b = c/fa + 1/fz, a = 1/(fz fa);
     * its positive root (worked here, apart from the class) is the -3 dB frequency squared.
     */
    @Test
    void bandwidthWithoutCfIsTheSecondOrderRoot() {
        double rf = 1e6;
        double rsh = 1e9;
        double ct = 10e-12;
        double a0 = 1e5;
        double gbw = 1e6;
        double fz = 1 / (2 * Math.PI * rf * ct);
        double fa = gbw / a0;
        double c = 1 + rf / rsh;
        double d0 = a0 + c;
        double b = c / fa + 1 / fz;
        double a = 1 / (fz * fa);
        double p = b * b - 2 * a * d0;
        double y = (-p + Math.sqrt(p * p + 4 * a * a * d0 * d0)) / (2 * a * a);
        TransimpedanceResponse r = new TransimpedanceResponse(rf, 0, rsh, ct, a0, gbw);
        assertEquals(Math.sqrt(y), r.bandwidth(), Math.sqrt(y) * 1e-9);
        // the DC transimpedance: Rf A0/(A0 + c)
        assertEquals(rf * a0 / d0, r.transimpedanceMagnitude(0), 1e-6);
    }

    /**
     * Graeme's rule. For Ct ≫ Cf and f ≫ fz: |NG| ≈ (Ct/Cf) x/√(1 + x²), x = f/fp,
     * fp = 1/(2π Rf Cf); |A| = GBW/f = (GBW/fp)/x, and Graeme's Cf² = Ct/(2π Rf GBW) makes
     * GBW/fp = Ct/Cf. Crossover: 1/x = x/√(1 + x²), x⁴ - x² - 1 = 0, x² = (1 + √5)/2, x = 1.27202;
     * PM = 180 - 90 - (90 - atan x) = atan(1.27202) = 51.83° (worked by hand). The exact 45° root
     * has its crossover at x = 1: GBW 2π Rf Cf = (Ct/Cf)/√2, so Cf = Graeme / 2^(1/4) = 0.8409 x
     * Graeme. Here Ct/Cf ≈ 56 (Ct 50 pF, Rf 1 Mohm, GBW 10 MHz), so the asymptotes hold to a few
     * percent of Cf/Ct and fz/fc.
     */
    @Test
    void graemeRuleAndTheExactRoot() {
        double ct = 50e-12;
        double rf = 1e6;
        double gbw = 10e6;
        double graeme = TransimpedanceResponse.graemeCf(rf, ct, gbw);
        assertEquals(0.8921e-12, graeme, 0.0001e-12); // sqrt(50e-12/(2π 1e6 1e7)) = 0.8921 pF by hand
        TransimpedanceResponse r = new TransimpedanceResponse(rf, graeme, 1e12, ct, 1e6, gbw);
        assertEquals(51.83, r.phaseMargin(), 1.5);
        double exact = r.cfForPhaseMargin(45.0);
        assertEquals(0.8409 * graeme, exact, 0.8409 * graeme * 0.03);
        assertEquals(45.0, r.withCf(exact).phaseMargin(), 1e-6);
        // Cf = 0 leaves the two-pole loop of the zero at fz = 3.18 kHz: far below 45°
        assertTrue(
                r.withCf(0).phaseMargin() < 10,
                "phase margin without cf " + r.withCf(0).phaseMargin());
    }

    /**
     * Noise gain: 1 + Rf/Rsh at DC and 1 + Ct/Cf far above both corners (Graeme ch. 2):
     * Rf 1 Mohm, Rsh 100 Mohm, Ct 20 pF, Cf 1 pF: 1.01 and 21.
     */
    @Test
    void noiseGainRunsFromTheResistorRatioToTheCapacitorRatio() {
        TransimpedanceResponse r = new TransimpedanceResponse(1e6, 1e-12, 100e6, 20e-12, 1e6, 10e6);
        assertEquals(1.01, r.noiseGainMagnitude(1e-3), 1e-9);
        assertEquals(21.0, r.noiseGainMagnitude(1e12), 1e-6);
    }
}
