package dev.ampsieve.budget;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.StageLoader;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Three demo budgets worked line by line by hand (a calculator and the textbook formulas, not
 * the engine's code), one per demo stage and topology. Values are the demo catalog's invented
 * figures and the demo stage files; each expected number is written out with the formula and
 * source it comes from. Relative tolerance 1e-6 unless a line says otherwise.
 */
class HandCheckedBudgetTest {

    private static Catalog catalog;

    @BeforeAll
    static void load() throws Exception {
        catalog = CatalogLoader.load(Path.of("demo-catalog"), false);
    }

    private static Budget budget(String stage, String part) throws Exception {
        Stage s = StageLoader.load(Path.of("demo-catalog/stages/" + stage + ".yaml"));
        Part p = catalog.parts().stream().filter(x -> x.id().equals(part)).findFirst().orElseThrow();
        return BudgetCalculator.compute(s, p);
    }

    private static void near(double expected, double actual, String what) {
        assertEquals(expected, actual, Math.abs(expected) * 1e-6 + 1e-15, what);
    }

    @Test
    void thermocoupleFrontEndWithTheAutoZeroPart() throws Exception {
        // non-inverting, gain 200 with Rf 200 k (Rg = 200 k / 199); Rs 100 Ω, Rp 0; 0..70 °C; limit 40 µV input
        Budget b = budget("thermocouple", "zd-az-05");
        near(200, b.noiseGain(), "NG = 1 + Rf/Rg (reference-checks §2)");
        // limit: input-referred x NG = 40 µV x 200 (error-model.md: input-referred = divided by NG)
        near(8.0e-3, b.limitV(), "limit");
        // 1. NG x vos.max = 200 x 10 µV (Franco ch. 5 [from memory]; reference-checks §2 "VOS to output")
        near(2.0e-3, b.term("offset").outputV(), "offset");
        // 2. NG x drift.max x dT, dT = max(|0-25|, |70-25|) = 45 °C: 200 x 0.05 µV/°C x 45
        near(450e-6, b.term("drift").outputV(), "drift");
        // 3. CMOS input, no over-temperature figure: IB and IOS double every 10 °C above 25 °C
        //    (common practice): x 2^4.5 = 22.6274 at 70 °C -> IB 5.656854 nA, IOS 11.313708 nA.
        //    |NG R+ - Rf| IB + (NG R+ + Rf) IOS/2 = |20 k - 200 k| x 5.656854 nA + 220 k x 5.656854 nA
        //    = 1.018234 mV + 1.244508 mV (Eggleston §6.4 eqs. 6.16-6.18)
        near(2.2627417e-3, b.term("bias").outputV(), "bias");
        near(70.0, b.term("bias").worstAtC(), "bias worst at the hot end");
        // 4. NG x dVcm x 10^(-CMRR/20) = 200 x 50 mV x 3.162278 µV/V (110 dB: reference-checks §4)
        near(31.62278e-6, b.term("cmrr").outputV(), "cmrr");
        // 5. NG x dVs x 10^(-PSRR/20) = 200 x 0.25 V x 3.162278 µV/V
        near(158.1139e-6, b.term("psrr").outputV(), "psrr");
        // 6. VFS x NG/(AOL + NG) = 2.5 V x 200 / (10^(115/20) + 200) = 2.5 x 200 / 562541.3 (Sedra & Smith ch. 2 [from memory])
        near(888.8236e-6, b.term("open-loop-gain").outputV(), "aol");
        // 7. VFS (1 - 1/sqrt(1 + (fH NG/GBW)^2)), x = 5 x 200 / 1.5 MHz = 6.6667e-4: 2.5 x 2.22222e-7
        assertEquals(5.555554e-7, b.term("bandwidth").outputV(), 1e-12, "bandwidth");
        // 8. VFS x (NG-1)/NG x (tol + tc x dT) = 2.5 x 0.995 x (0.001 + 10 ppm/°C x 45) (reference-checks §8 sensitivity)
        near(3.606875e-3, b.term("resistors").outputV(), "resistors");
        // 9. no long-term drift in the catalog: the conservative estimate for a zero-drift part, 1 µV per
        //    sqrt(1000 h) (common practice, budget/Assumed), over 5 Julian years = 43 830 h:
        //    200 x 1 µV x sqrt(43.83) = 200 x 6.620423 µV = 1.324085 mV, flagged estimated
        near(1.3240846e-3, b.term("aging").outputV(), "aging (estimated)");
        org.junit.jupiter.api.Assertions.assertTrue(b.term("aging").estimated());
        // 10. first-order filter at fH (the stage file): fN = (π/2) min(5 Hz, 1.5 MHz/200) = 7.853982 Hz;
        //     band 0.05 Hz..fN = 7.803982 Hz.
        //     input density^2 = en^2 + 4kT (R+ + R-) + in^2 (R+^2 + R-^2), R+ 100 Ω, R- = Rf/NG = 1 kΩ, resistors at
        //     the hottest 70 °C: 4kT = 4 x 1.380649e-23 x 343.15 K = 1.895079e-20 (Johnson-Nyquist; k from SI9):
        //     2.025e-15 + 1.895079e-20 x 1100 + 1e-26 x 1.01e6 = 2.045856e-15 V^2/Hz
        //     rms = 200 x sqrt(2.045856e-15 x 7.803982) = 25.27119 µV; allowance 3.3 x rms (Franco ch. 7 [from memory])
        near(25.27119e-6, b.noiseRmsV(), "noise rms");
        near(83.39492e-6, b.term("noise").outputV(), "noise allowance");
        // totals: worst-case sum; RSS (GUM eq. 10 for the root-sum-square)
        // 2.0 + 0.45 + 2.262742 + 0.031623 + 0.158114 + 0.888824 + 0.000001 + 3.606875 + 1.324085 + 0.083395 mV
        near(10.806213e-3, b.worstCaseV(), "worst-case");
        // sqrt(4.811965^2 + 1.324085^2) mV: the total without aging plus the estimate
        near(4.990812e-3, b.rssV(), "rss");
        // two-point calibration at 25 °C (the stage's): removes offset, the open-loop gain and the resistor
        // tolerance. What it leaves of the bias term is bounded by the datasheet (error-model.md term 3): a CMOS
        // input's IB and IOS may change sign, so each changes by up to its 70 °C value plus its 25 °C one:
        // 180 k x (5.656854 + 0.25) nA + 110 k x (11.313708 + 0.5) nA = 1.063234 + 1.299508 = 2.362742 mV.
        // Keeps the rest and adds the 1 mV resolution:
        // 0.45 + 2.362742 + 0.031623 + 0.158114 + 0.000556 (bandwidth) + 1.119375 + 0.083395 + 1.0 + 1.324085 mV
        near(6.529889e-3, b.trimmed().worstCaseV(), "after the two-point trim");
        assertEquals(Verdict.FITS_AFTER_TRIM, b.verdict());
    }

    @Test
    void bridgeAmplifierWithTheTopGradeBipolarPart() throws Exception {
        // non-inverting, gain 100 with Rf 100 k; Rs 350 Ω + Rp 649 Ω = R+ 999 Ω; -40..85 °C (dT 65 °C)
        Budget b = budget("bridge-amp", "prec-bip-01");
        near(100, b.noiseGain(), "NG");
        near(2.5e-3, b.term("offset").outputV(), "offset: 100 x 25 µV");
        // 100 x 0.3 µV/°C x 65 °C = 1.95 mV, under the cap 100 x (45 - 25) µV = 2.0 mV (error-model.md term 2)
        near(1.95e-3, b.term("drift").outputV(), "drift");
        // over-temperature maxima given: IB 4 nA, IOS 3 nA at the worst temperature.
        // |NG R+ - Rf| = |99 900 - 100 000| = 100 Ω; NG R+ + Rf = 199 900 Ω:
        // 100 x 4 nA + 199 900 x 1.5 nA = 0.4 µV + 299.85 µV (nearly the IOS x Rf of a balanced input: Eggleston §6.4)
        near(300.25e-6, b.term("bias").outputV(), "bias");
        // 100 x 0.15 V x 10^(-126/20) = 15 x 0.5011872 µV/V
        near(7.517809e-6, b.term("cmrr").outputV(), "cmrr");
        // 100 x 0.25 V x 10^(-120/20) = 25 x 1 µV/V (reference-checks §4: 120 dB = 1 µV/V)
        near(25.0e-6, b.term("psrr").outputV(), "psrr");
        // 1 V x 100 / (10^(126/20) + 100) = 100 / 1 995 362.3
        near(50.11621e-6, b.term("open-loop-gain").outputV(), "aol");
        // 1 V x (1 - 1/sqrt(1 + (10 x 100 / 1 MHz)^2)) = 1 - 1/sqrt(1 + 1e-6)
        assertEquals(4.999996e-7, b.term("bandwidth").outputV(), 1e-12, "bandwidth");
        // 1 V x 0.99 x (0.1 % + 10 ppm/°C x 65 °C) = 0.99 x 0.00165
        near(1.6335e-3, b.term("resistors").outputV(), "resistors");
        // 100 x 0.3 µV x sqrt(87 660 h / 1000 h) (10 Julian years; √t model: reference-checks §6) = 30 µV x 9.362692
        // = 280.8808 µV at the typical figure; the worst case takes max-to-sigma 3 x typical (error-model.md
        // "Missing and typical-only figures"): 842.6423 µV, flagged
        near(842.6423e-6, b.term("aging").outputV(), "aging");
        org.junit.jupiter.api.Assertions.assertTrue(b.term("aging").estimated());
        // first-order filter at 10 Hz (the stage file): fN = (π/2) x 10 Hz = 15.70796 Hz; from 0.1 Hz: white
        // 15.60796 Hz, ln(157.0796) = 5.056753. Resistors at the hottest 85 °C: 4kT = 4 x 1.380649e-23 x 358.15 K
        // = 1.977918e-20 (Johnson-Nyquist; k from SI9).
        // en^2 (15.60796 + 3 x 5.056753) + in^2 (999^2 + 1000^2)(15.60796 + 100 x 5.056753) + 4kT x 1999 x 15.60796
        // = 64e-18 x 30.77822 + 2.25e-26 x 1.998001e6 x 521.2833 + 1.977918e-20 x 1999 x 15.60796
        // = 1.969806e-15 + 2.343430e-17 + 6.171165e-16 = 2.610357e-15 -> x 100 -> 5.109165 µV rms (Franco ch. 7
        // [from memory])
        near(5.109165e-6, b.noiseRmsV(), "noise rms");
        // totals with 1 x the typical aging were 6.764625 mV, RSS 3.590731 mV; with 3 x aging:
        // 6.764625 - 0.280881 + 0.842642; sqrt(3.590731^2 - 0.280881^2 + 0.842642^2)
        near(7.326386e-3, b.worstCaseV(), "worst-case");
        near(3.677567e-3, b.rssV(), "rss");
    }

    @Test
    void adcDriverFollowerWithTheLowNoiseChopper() throws Exception {
        // follower (NG 1, Rf 0), Rs 100 Ω; 0..50 °C (dT 25 °C); limit 2 LSB of 4.096 V / 2^16 (reference-checks §9)
        Budget b = budget("adc-driver", "zd-chop-03");
        near(1, b.noiseGain(), "NG");
        near(125e-6, b.limitV(), "2 x 62.5 µV");
        near(10e-6, b.term("offset").outputV(), "offset");
        // 0.05 µV/°C x 25 °C = 1.25 µV, under the cap 12 - 10 µV
        near(1.25e-6, b.term("drift").outputV(), "drift");
        // CMOS chopper: IB on the exponential through 1 nA at 25 °C and 2.5 nA at the rating's upper end 125 °C,
        // at 50 °C: 1 nA x 2.5^(25/100) = 1.257433 nA; IOS 2 nA x (4/2)^0.25 = 2.378414 nA (error-model.md term 3).
        // |R+ - Rf| IB + (R+ + Rf) IOS/2 = 100 x 1.257433 nA + 100 x 1.189207 nA = 244.6640 nV
        // (the old rule charged the 125 °C maxima: 450 nV)
        near(244.6640e-9, b.term("bias").outputV(), "bias");
        // common-mode swing 2 V peak (the stage file's re-stated value) x 10^(-115/20) = 2 x 1.778279 µV/V;
        // supply 0.25 V x 1.778279 µV/V
        near(3.556559e-6, b.term("cmrr").outputV(), "cmrr");
        near(444.5699e-9, b.term("psrr").outputV(), "psrr");
        // full-scale output 2 V peak (0.05..4.05 V span = 2.05 V +/- 2 V): 2 V x 1/(10^6 + 1)
        near(1.999998e-6, b.term("open-loop-gain").outputV(), "aol");
        // 2 V x (1 - 1/sqrt(1 + (20 kHz / 5 MHz)^2)) = 2 x 7.999904e-6
        near(15.99981e-6, b.term("bandwidth").outputV(), "bandwidth");
        assertEquals(0.0, b.term("resistors").outputV(), 0.0, "a follower has no gain resistors");
        // no filter after the buffer (filter-order: none): fN = (π/2) x GBW/NG = (π/2) x 5 MHz = 7 853 981.6 Hz,
        // band from 0.1 Hz 7 853 981.5 Hz; resistors at the hottest 50 °C: 4kT = 4 x 1.380649e-23 x 323.15 K
        // = 1.784627e-20 (Johnson-Nyquist; k from SI9);
        // (25e-18 + 1.784627e-20 x 100 + 0.16e-24 x 1e4) x 7 853 981.5 = 2.678623e-17 x 7 853 981.5 -> 14.50443 µV rms
        near(14.50443e-6, b.noiseRmsV(), "noise rms");
        // no long-term drift in the catalog, 2 Julian years = 17 532 h: zero-drift estimate 1 µV x sqrt(17.532)
        // = 4.187123 µV (common practice, budget/Assumed)
        near(4.187123e-6, b.term("aging").outputV(), "aging (estimated)");
        // 10 + 1.25 + 0.244664 + 3.556559 + 0.4445699 + 1.999998 + 15.99981 + 3.3 x 14.50443 + 4.187123 µV
        near(85.54734e-6, b.worstCaseV(), "worst-case");
        // root of the sum of the squares of the same nine terms
        near(51.79785e-6, b.rssV(), "rss");
        assertEquals(Verdict.FITS, b.verdict(), "RSS criterion: 51.8 µV of 125 µV");
    }
}
