package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Transimpedance;
import dev.ampsieve.units.PhysicalConstants;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;

/**
 * Output noise of a transimpedance stage, integrated over frequency: the noise gain of such a
 * stage is not flat (it rises from 1 + Rf/Rsh at the zero set by Rf and Ct toward 1 + Ct/Cf), so
 * the closed form of {@link NoiseModel} does not apply. Output density (uncorrelated sources add in
 * power; Graeme, <i>Photodiode Amplifiers</i>, 1996, ch. 3; Franco, 4th ed., ch. 7 [from memory]):
 * <pre>
 *   e_o²(f) = |T/(1+T)|² [ (en² (1 + fce/f) + 4kT Rp + in² (1 + fci/f) Rp²) |NG(f)|²
 *                        + (in² (1 + fci/f) + 4kT/Rf + 4kT/Rsh) |Zf(f)|² ] |H_filter(f)|²
 * </pre>
 * with NG, Zf and T of {@link TransimpedanceResponse}: the amplifier's voltage noise and what sits
 * at the + input (Rp's thermal noise, in·Rp) see the noise gain; the current noise at the - input
 * and the thermal noise currents of Rf and Rsh (4kT/R, Johnson; Nyquist 1928) see the feedback
 * impedance, as the signal current does. With a Butterworth filter of order n at fH,
 * |H_filter|² = 1/(1 + (f/fH)^(2n)); without one only the loop limits the band.
 *
 * <p>Integration (commons-math3 {@link IterativeLegendreGaussIntegrator}, 8 points, relative
 * accuracy 1e-10) in ln f, one segment per half decade, from f1 to fTop = 1000 x max(GBW, fH),
 * plus the tail e_o²(fTop) fTop. Why that tail: above the crossover and the filter every term
 * falls at least as 1/f² (the voltage-noise term as |A(f)|², A ∝ 1/f; the current terms as
 * |Zf A/NG|², faster), and ∫ from F to ∞ of c/f² df = c/F = e_o²(F) F, exact for 1/f² and an upper
 * bound for anything steeper, so the integral is never understated. Units: V/√Hz, A/√Hz, ohm,
 * Hz, K in; V² and V rms out.
 */
public final class TransimpedanceNoise {
    private TransimpedanceNoise() {}

    /** Upper integration limit as a multiple of max(GBW, fH); the tail beyond is added in closed form. */
    static final double TOP_FACTOR = 1000.0;

    /** The amplifier's noise and the + input's resistor, as they enter the density. */
    public record Sources(double en, double enCorner, double in, double inCorner, double rp, double kelvin) {}

    /** The part's and stage's sources at the resistor temperature of {@link NoiseTerm#resistorKelvin}. */
    public static Sources sources(Stage s, PartValues v) {
        Transimpedance t = (Transimpedance) s.network();
        return new Sources(v.en(), v.enCorner(), v.in(), v.inCorner(), t.rp(), NoiseTerm.resistorKelvin(s));
    }

    /** e_o²(f), V²/Hz, without a filter. */
    public static double density2(TransimpedanceResponse r, Sources src, double f) {
        double fourKT = 4.0 * PhysicalConstants.BOLTZMANN * src.kelvin();
        double en2 = src.en() * src.en() * (1 + src.enCorner() / f);
        double in2 = src.in() * src.in() * (1 + src.inCorner() / f);
        double atPlus = en2 + fourKT * src.rp() + in2 * src.rp() * src.rp();
        double atMinus = in2 + fourKT / r.rf() + fourKT / r.rsh();
        double ng = r.noiseGainMagnitude(f);
        double zf = r.feedbackImpedance(f).abs();
        double cl = r.closedLoopFactor(f).abs();
        return cl * cl * (atPlus * ng * ng + atMinus * zf * zf);
    }

    /** |H_filter(f)|² of an order-n Butterworth low-pass at fH; 1 for {@link Stage#NO_FILTER}. */
    static double filter2(int order, double fH, double f) {
        return order == Stage.NO_FILTER ? 1.0 : 1.0 / (1.0 + Math.pow(f / fH, 2.0 * order));
    }

    /** ∫ from f1 to f2 of e_o²(f) |H_filter(f)|² df, V², with no tail (f2 finite). */
    public static double integrate(TransimpedanceResponse r, Sources src, double f1, double f2, int order, double fH) {
        if (!(f2 > f1) || !(f1 > 0)) {
            return 0.0;
        }
        IterativeLegendreGaussIntegrator gauss =
                new IterativeLegendreGaussIntegrator(8, 1e-10, Double.MIN_VALUE, 2, 64);
        double u1 = Math.log(f1);
        double u2 = Math.log(f2);
        double step = Math.log(10) / 2;
        int n = Math.max(1, (int) Math.ceil((u2 - u1) / step));
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double a = u1 + (u2 - u1) * i / n;
            double b = u1 + (u2 - u1) * (i + 1) / n;
            sum += gauss.integrate(
                    1_000_000,
                    u -> {
                        double f = Math.exp(u);
                        return density2(r, src, f) * filter2(order, fH, f) * f; // df = f du
                    },
                    a,
                    b);
        }
        return sum;
    }

    /**
     * rms output noise of the stage with this part, V: from band.low through the filter (if any)
     * and the loop to {@link #TOP_FACTOR} x max(GBW, fH), plus the closed-form tail. With GBW not
     * given (an ideal amplifier, whose noise gain may rise without bound) the band ends, flat, at
     * {@link NoiseModel#noiseBandEdge} (the noise term is then marked estimated).
     */
    public static double rms(Stage s, PartValues v) {
        TransimpedanceResponse r = TransimpedanceResponse.of(s, v);
        Sources src = sources(s, v);
        int order = s.noiseFilterOrder();
        if (Double.isNaN(v.gbw())) {
            return Math.sqrt(integrate(
                    r, src, s.bandLow(), NoiseModel.noiseBandEdge(s, v.gbw()), Stage.NO_FILTER, s.bandHigh()));
        }
        double top = TOP_FACTOR * Math.max(v.gbw(), s.bandHigh());
        double tail = density2(r, src, top) * filter2(order, s.bandHigh(), top) * top;
        return Math.sqrt(integrate(r, src, s.bandLow(), top, order, s.bandHigh()) + tail);
    }
}
