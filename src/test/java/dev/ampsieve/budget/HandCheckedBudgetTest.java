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
        Part p = catalog.parts().stream()
                .filter(x -> x.id().equals(part))
                .findFirst()
                .orElseThrow();
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
        // 6. VFS x NG/(AOL + NG) = 2.5 V x 200 / (10^(115/20) + 200) = 2.5 x 200 / 562541.3 (Sedra & Smith ch. 2 [from
        // memory])
        near(888.8236e-6, b.term("open-loop-gain").outputV(), "aol");
        // 7. VFS (1 - 1/sqrt(1 + (fH NG/GBW)^2)), x = 5 x 200 / 1.5 MHz = 6.6667e-4: 2.5 x 2.22222e-7
        assertEquals(5.555554e-7, b.term("bandwidth").outputV(), 1e-12, "bandwidth");
        // 8. VFS x (NG-1)/NG x (tol + tc x dT) = 2.5 x 0.995 x (0.001 + 10 ppm/°C x 45) (reference-checks §8
        // sensitivity)
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
        // 11. operating point: the table at 5 V, common mode 2.5 V (mid-supply); the stage's pins at 1.2..1.3 V,
        //     centre 1.25 V, 1.25 V below mid-supply; same supply: NG x 1.25 V x 10^(-110/20) = 200 x 1.25 x 3.162278
        // µV/V
        near(790.5694e-6, b.term("operating-point").outputV(), "operating point");
        // 12. chopping ripple 1 µV at 12 kHz: |NG(f)| = 200/sqrt(1 + (12 kHz x 200/1.5 MHz)^2) = 200/sqrt(3.56) =
        // 105.99979;
        //     first-order filter at 5 Hz: 1/sqrt(1 + 2400^2) = 4.166666e-4; 1 µV x 105.99979 x 4.166666e-4 = 44.16657
        // nV
        near(44.16657e-9, b.term("chopping-ripple").outputV(), "chopping ripple");
        // 13, 14: the common mode stays far below the assumed crossover (3.0..4.5 V); no load: no self-heating
        assertEquals(0.0, b.term("input-crossover").outputV(), 0.0);
        assertEquals(0.0, b.term("self-heating").outputV(), 0.0);
        // 2.0 + 0.45 + 2.262742 + 0.031623 + 0.158114 + 0.888824 + 0.000001 + 3.606875 + 1.324085 + 0.083395
        //   + 0.790569 + 0.000044 mV
        near(11.596827e-3, b.worstCaseV(), "worst-case");
        // sqrt(4.811965^2 + 1.324085^2 + 0.790569^2 + 0.000044^2) mV
        near(5.053039e-3, b.rssV(), "rss");
        // two-point calibration at 25 °C (the stage's): removes offset, the open-loop gain and the resistor
        // tolerance. What it leaves of the bias term is bounded by the datasheet (error-model.md term 3): a CMOS
        // input's IB and IOS may change sign, so each changes by up to its 70 °C value plus its 25 °C one:
        // 180 k x (5.656854 + 0.25) nA + 110 k x (11.313708 + 0.5) nA = 1.063234 + 1.299508 = 2.362742 mV.
        // Keeps the rest and adds the 1 mV resolution:
        // 0.45 + 2.362742 + 0.031623 + 0.158114 + 0.000556 (bandwidth) + 1.119375 + 0.083395 + 1.0 + 1.324085 mV
        //   + 0.000044 (the ripple; the trim removes the operating point's move)
        near(6.529933e-3, b.trimmed().worstCaseV(), "after the two-point trim");
        assertEquals(Verdict.FITS_AFTER_TRIM, b.verdict());
    }

    @Test
    void bridgeAmplifierWithTheTopGradeBipolarPart() throws Exception {
        // difference stage: r1 = r3 = 4.99 k, r2 = r4 = 499 k, both legs 175 Ω; -40..85 °C (dT 65 °C).
        // a = b = 499 k / (4.99 k + 175) = 499 000 / 5 165 = 96.611810; NG = 1 + a = 97.611810 (Franco §2.2 [from
        // memory])
        Budget b = budget("bridge-amp", "prec-bip-01");
        near(97.611810, b.noiseGain(), "NG");
        // matched pairs: signal gain [(1 + a) b/(1 + b) + a]/2 = a = 96.611810; the 6 mV limit is 6 mV / 96.611810
        // = 62.10421 µV at the bridge
        near(96.611810, b.stage().sourceGain(), "gain");
        near(6e-3, b.limitV(), "limit at the output");
        near(62.10421e-6, b.limitV() / b.stage().sourceGain(), "limit at the bridge");
        near(2.4402953e-3, b.term("offset").outputV(), "offset: 97.611810 x 25 µV");
        // 97.611810 x 0.3 µV/°C x 65 °C = 1.9034303 mV, under the cap 97.611810 x (45 - 25) µV = 1.952236 mV
        near(1.9034303e-3, b.term("drift").outputV(), "drift");
        // over-temperature maxima given: IB 4 nA, IOS 3 nA at the worst temperature.
        // R+ = 5 165 || 499 k = 5 112.0863 Ω; NG R+ = (5 165 + 499 000)/5 165 x 5 165 x 499 000/504 165 = 499 000 = Rf,
        // so IB cancels: |NG R+ - Rf| x 4 nA + (NG R+ + Rf) x 1.5 nA = 0 + 998 000 x 1.5 nA = 1.497 mV (Eggleston §6.4)
        near(1.497e-3, b.term("bias").outputV(), "bias");
        // common mode: dVcm 0.15 V at the bridge; per pair e = 0.1 % + 10 ppm/°C x 65 °C = 0.00165.
        // resistors: worst |b(1-e) - a(1+e)|/(1 + b(1-e)) = 2ae/(1 + a - ae) with a = b:
        //   2 x 96.611810 x 0.00165 = 0.3188190; 1 + 96.611810 - 0.1594095 = 97.452401;
        //   0.3188190/97.452401 = 3.271535e-3 V/V, x 0.15 V = 490.7303 µV (first order 0.15 x 2e a/(1+a): 489.9 µV)
        // amplifier: NG x share x dVcm x 10^(-126/20), share b/(1 + b): NG x share = a = 96.611810;
        //   96.611810 x 0.15 V x 0.5011872e-6 = 7.263091 µV
        // sum (signs unknown): 497.9934 µV
        near(497.9934e-6, b.term("cmrr").outputV(), "cmrr: resistors and amplifier");
        // NG x 0.25 V x 10^(-120/20) = 97.611810 x 0.25 x 1 µV/V (reference-checks §4: 120 dB = 1 µV/V)
        near(24.402953e-6, b.term("psrr").outputV(), "psrr");
        // 1 V x NG / (10^(126/20) + NG) = 97.611810 / 1 995 359.9
        near(48.91940e-6, b.term("open-loop-gain").outputV(), "aol");
        // 1 V x (1 - 1/sqrt(1 + (10 Hz x 97.611810 / 1 MHz)^2)) = 1 - 1/sqrt(1 + 9.528066e-7)
        assertEquals(4.764029e-7, b.term("bandwidth").outputV(), 1e-12, "bandwidth");
        // 1 V x S x (0.1 % + 10 ppm/°C x 65 °C), S = 1 for matched pairs (each pair's error moves G by half of it, and
        // the two add)
        near(1.65e-3, b.term("resistors").outputV(), "resistors");
        // 3 (max-to-sigma) x 97.611810 x 0.3 µV x sqrt(87 660 h / 1000 h) (10 Julian years; √t model: reference-checks
        // §6) = 87.850629 µV x 9.362692 = 822.5184 µV, flagged
        near(822.5184e-6, b.term("aging").outputV(), "aging");
        org.junit.jupiter.api.Assertions.assertTrue(b.term("aging").estimated());
        // first-order filter at 10 Hz: fN = (π/2) x 10 Hz = 15.70796 Hz; from 0.1 Hz: white 15.60796 Hz,
        // ln(157.0796) = 5.056753. Resistors at the hottest 85 °C: 4kT = 1.977918e-20 (Johnson-Nyquist; k from SI9).
        // R+ = R- = 5 112.0863 Ω (the legs count in both):
        // en^2 (15.60796 + 3 x 5.056753) + in^2 (2 x 5 112.0863^2)(15.60796 + 100 x 5.056753) + 4kT x 2 x 5 112.0863 x
        // 15.60796
        // = 64e-18 x 30.77822 + 2.25e-26 x 5.226689e7 x 521.2833 + 1.977918e-20 x 10 224.173 x 15.60796
        // = 1.969806e-15 + 6.130313e-16 + 3.156332e-15 = 5.739169e-15 -> sqrt x 97.611810 = 7.394808 µV rms
        // (Franco ch. 7 [from memory])
        near(7.394808e-6, b.noiseRmsV(), "noise rms");
        // worst case: 2.440295 + 1.903430 + 1.497 + 0.497993 + 0.024403 + 0.048919 + 0.000476 + 1.65 + 0.822518
        //   + 3.3 x 0.007394808 = 8.909439 mV; RSS of the same ten: 3.933156 mV
        // operating point: the table at 30 V, common mode 15 V (mid-supply); the stage at 5 V, the pins centred at
        // mid-supply (2.5 + (2.5 - 2.5) x share): NG x 25 V x 10^(-120/20) = 97.611810 x 25 µV = 2.440295 mV
        near(2.440295e-3, b.term("operating-point").outputV(), "operating point");
        // one input pair (headroom 1 V), no load, no chopping: the other three are 0 V
        for (String k : java.util.List.of("input-crossover", "self-heating", "chopping-ripple")) {
            assertEquals(0.0, b.term(k).outputV(), 0.0, k);
        }
        // 8.909439 + 2.440295 = 11.349734 mV; RSS sqrt(3.933156^2 + 2.440295^2) = 4.628688 mV
        near(11.349734e-3, b.worstCaseV(), "worst-case");
        near(4.628688e-3, b.rssV(), "rss");
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
        // operating point: the table at 5 V, 2.5 V; the pins at 0.05..4.05 V, centre 2.05 V, 0.45 V below mid-supply:
        //   0.45 V x 10^(-115/20) = 0.45 x 1.778279 µV = 800.2257 nV
        near(800.2257e-9, b.term("operating-point").outputV(), "operating point");
        // ripple 2 µV at 200 kHz, no filter (none): 2 µV / sqrt(1 + (200 kHz / 5 MHz)^2) = 1.998402 µV
        near(1.998402e-6, b.term("chopping-ripple").outputV(), "chopping ripple");
        // crossover 1.3 V below V+ (3.7 V, inside 0.05..4.05 V) with a 0 V step: nothing
        assertEquals(0.0, b.term("input-crossover").outputV(), 0.0);
        //   + 0.800226 + 1.998402 µV = 88.34597 µV
        near(88.34597e-6, b.worstCaseV(), "worst-case");
        // root of the sum of the squares of the same nine terms
        // sqrt(51.79785^2 + 0.800226^2 + 1.998402^2) µV
        near(51.84256e-6, b.rssV(), "rss");
        assertEquals(Verdict.FITS, b.verdict(), "RSS criterion: 51.8 µV of 125 µV");
    }
}
