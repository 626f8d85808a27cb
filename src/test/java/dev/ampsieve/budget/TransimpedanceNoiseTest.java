package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The noise integral against closed forms worked by hand (the ngspice check covers the white sources). */
class TransimpedanceNoiseTest {

    /**
     * 1/f voltage noise through a first-order filter with a flat noise gain (Cf = Ct = 0, an
     * amplifier of A0 1e12 and GBW 1e15 Hz, so |T/(1+T)| = 1 to 1e-9 in band). By hand:
     * ∫ from fL to ∞ of (1 + fc/f)/(1 + (f/fH)²) df
     *   = fH (π/2 - atan(fL/fH)) + fc [ln f - ½ ln(1 + f²/fH²)] from fL to ∞
     *   = fH (π/2 - atan(fL/fH)) + (fc/2) ln((fH² + fL²)/fL²).
     * fL 0.1 Hz, fH 1 kHz, fc 100 Hz: 1570.696 + 50 ln(1e8 + 1) = 1570.696 + 921.034 = 2491.730 Hz;
     * times NG² en² with NG = 1 + Rf/Rsh = 1.001 and en 10 nV/√Hz, thermal noise off (0 K), in = 0.
     */
    @Test
    void flickerNoiseThroughAFirstOrderFilter() {
        double fL = 0.1;
        double fH = 1e3;
        double band = fH * (Math.PI / 2 - Math.atan(fL / fH)) + 50 * Math.log((fH * fH + fL * fL) / (fL * fL));
        assertEquals(2491.730, band, 0.001);
        TransimpedanceResponse r = new TransimpedanceResponse(1e6, 0, 1e9, 0, 1e12, 1e15);
        TransimpedanceNoise.Sources src = new TransimpedanceNoise.Sources(10e-9, 100, 0, 0, 0, 0);
        double v2 = TransimpedanceNoise.integrate(r, src, fL, 1e12, 1, fH); // beyond 1e12 Hz: fH²/1e12 = 1e-6 Hz left
        assertEquals(1.001 * 1.001 * 1e-16 * 2491.730, v2, 1.001 * 1.001 * 1e-16 * 2491.730 * 1e-6);
    }

    /**
     * The tail added beyond 1000 x GBW is e_o²(F) F, exact for a 1/f² fall: with no filter and a
     * single-pole loop, the voltage-noise term above the crossover is en² |A|² ~ en² GBW²/f².
     * Rf 1 kohm, Rsh 1e15, Cf = Ct = 0 (NG = 1), A0 1e6, GBW 1 MHz: a follower-like loop whose
     * output noise is en² ∫ df/(1 + (f/GBW)²) over 0.1 Hz .. ∞ = en² GBW (π/2 - atan(1e-7)) to
     * 1e-6 (single pole, Franco ch. 7 [from memory]); thermal noise off.
     */
    @Test
    void tailMakesTheSinglePoleIntegralComplete() throws Exception {
        dev.ampsieve.stage.Stage s = new dev.ampsieve.stage.Stage(
                new dev.ampsieve.stage.Transimpedance(1e3, 0, 1e15, 0, 0),
                -273.15,
                -273.15,
                null,
                0,
                0,
                null,
                null,
                0.1,
                10,
                0,
                null,
                0,
                0,
                0,
                dev.ampsieve.stage.Limit.output(1e-3),
                dev.ampsieve.stage.Criterion.WORST_CASE,
                3,
                20_000,
                1_000_000,
                1,
                dev.ampsieve.stage.Trim.NONE,
                1000,
                null,
                false,
                null,
                null,
                null,
                null);
        dev.ampsieve.fixtures.PartFixture f = dev.ampsieve.fixtures.PartFixture.ideal();
        f.gbw = 1e6;
        f.aol = new dev.ampsieve.catalog.MinTyp(120.0, null);
        f.noise = new dev.ampsieve.catalog.Noise(10e-9, 0.0, 0.0, 0.0);
        f.cin = 0.0; // none: NG stays 1
        PartValues v = PartValues.of(f.build(), s);
        // A0 1e6 closes the loop to A0/(1 + A0) at DC: the band is GBW (1 + 1/A0) and the level (A0/(1 + A0))²
        double a0 = 1e6;
        double fc = 1e6 * (1 + 1 / a0);
        double expected = 1e-16 * Math.pow(a0 / (1 + a0), 2) * fc * (Math.PI / 2 - Math.atan(0.1 / fc));
        assertEquals(Math.sqrt(expected), TransimpedanceNoise.rms(s, v), Math.sqrt(expected) * 1e-6);
    }
}
