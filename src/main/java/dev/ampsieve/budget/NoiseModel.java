package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.PhysicalConstants;

/**
 * Integrated output noise of a stage over a flat band.
 *
 * <p>Output density (uncorrelated sources add in power; Franco, <i>Design with Operational
 * Amplifiers</i>, 4th ed., ch. 7; Horowitz &amp; Hill, <i>The Art of Electronics</i>, 3rd ed.,
 * ch. 8 [from memory]):
 * <pre>
 *   e_o²(f) = NG² [ en² (1 + fce/f) + 4kT R+ + in² (1 + fci/f) R+²
 *                                  + 4kT R- + in² (1 + fci/f) R-² ]
 * </pre>
 * with resistor thermal noise 4kTR (Johnson; Nyquist, <i>Phys. Rev.</i> 32, 1928) and
 * k exact from the SI Brochure, 9th ed. The thermal noise of Rf and Rg referred to the
 * input combines exactly to 4kT (Rf || Rg) = 4kT R-. The 1/f part integrates in closed form:
 * <pre>
 *   ∫ from f1 to f2 of (1 + fc/f) df = (f2 - f1) + fc ln(f2/f1)
 * </pre>
 * Units: V/√Hz, A/√Hz, Hz, ohm, kelvin in; volts rms out. Valid for a flat (ideal) gain
 * across [f1, f2]; a roll-off is represented by ending the band at its equivalent noise
 * bandwidth (π/2 times the -3 dB frequency for a single pole), see {@link #noiseBandEdge}.
 */
public final class NoiseModel {
    private NoiseModel() {}

    /**
     * Equivalent noise bandwidth of a single pole as a multiple of its -3 dB frequency:
     * ∫0^∞ df / (1 + (f/fc)²) = (π/2) fc (Franco, 4th ed., ch. 7 [from memory]; error-model.md
     * rounds it to 1.57).
     */
    public static final double SINGLE_POLE_ENBW = Math.PI / 2.0;

    /** Peak-to-peak to rms ratio quoted for noise: 6.6 (±3.3 sigma, 99.9 % of the time; Franco, 4th ed., ch. 7 [from memory]). */
    public static final double PEAK_TO_PEAK = 6.6;

    /**
     * rms output noise, V, over [f1, f2] with a flat noise gain.
     *
     * @param en         white input voltage noise density, V/√Hz
     * @param enCorner   its 1/f corner, Hz (0: white only)
     * @param in         white input current noise density, A/√Hz (same at both pins)
     * @param inCorner   its 1/f corner, Hz
     * @param f1         lower band edge, Hz (&gt; 0 when a corner is non-zero)
     * @param f2         upper band edge, Hz
     * @param tempKelvin resistor temperature, K
     */
    public static double outputRms(
            Stage s, double en, double enCorner, double in, double inCorner, double f1, double f2, double tempKelvin) {
        if (!(f2 > f1) || f1 < 0) {
            return 0.0;
        }
        double ng = s.noiseGain();
        double rp = s.rPlus();
        double rm = s.rMinus();
        double white = f2 - f1;
        double fourKT = 4.0 * PhysicalConstants.BOLTZMANN * tempKelvin;
        double vPower = en * en * band(enCorner, f1, f2);
        double iPower = in * in * (rp * rp + rm * rm) * band(inCorner, f1, f2);
        double rPower = fourKT * (rp + rm) * white;
        return ng * Math.sqrt(vPower + iPower + rPower);
    }

    /**
     * ∫ from f1 to f2 of (1 + fc/f) df = (f2 - f1) + fc ln(f2/f1), Hz (Franco, 4th ed., ch. 7
     * [from memory]).
     */
    public static double band(double corner, double f1, double f2) {
        if (corner == 0) {
            return f2 - f1; // no 1/f part: f1 = 0 is then allowed
        }
        if (!(f1 > 0)) {
            throw new IllegalArgumentException("a 1/f corner needs a lower band edge above 0 Hz, got " + f1);
        }
        return (f2 - f1) + corner * Math.log(f2 / f1);
    }

    /** Thermal noise density of a resistor, √(4kTR), V/√Hz (Johnson; Nyquist 1928). */
    public static double resistorDensity(double ohms, double tempKelvin) {
        return Math.sqrt(4.0 * PhysicalConstants.BOLTZMANN * tempKelvin * ohms);
    }

    /**
     * Equivalent noise bandwidth of an n-th order Butterworth low-pass as a multiple of its
     * -3 dB frequency: ∫0^∞ dx / (1 + x^(2n)) = (π/(2n)) / sin(π/(2n)) (the standard integral
     * ∫0^∞ x^(μ-1)/(1 + x^ν) dx = (π/ν)/sin(μπ/ν), Gradshteyn &amp; Ryzhik 3.241.2 [from memory], with
     * μ = 1, ν = 2n). n = 1 gives π/2, n = 2 π/(2√2) = 1.1107, n = 3 1.0472, n = 4 1.0262.
     *
     * @param order filter order, 1 or more
     */
    public static double butterworthEnbw(int order) {
        if (order < 1) {
            throw new IllegalArgumentException("a filter order is 1 or more, got " + order);
        }
        double a = Math.PI / (2.0 * order);
        return a / Math.sin(a);
    }

    /**
     * Noise integration upper limit fN, Hz: the noise bandwidth the stage really has.
     * <ul>
     *   <li>no filter ({@link Stage#NO_FILTER}, also when the stage names none): the closed loop
     *       alone, a single pole at GBW/NG, so fN = (π/2) GBW/NG;</li>
     *   <li>an n-th order Butterworth low-pass at fH: fN = min({@link #butterworthEnbw}(n) fH,
     *       (π/2) GBW/NG). In cascade |H_filter H_loop|² is at most either factor (both are at
     *       most 1), so the cascade's noise bandwidth is at most the smaller of the two: the
     *       minimum never understates it. For n = 1 this is (π/2) min(fH, GBW/NG).</li>
     * </ul>
     * With GBW unknown (NaN) only the filter bounds the band; without a filter either, fN falls
     * back to (π/2) fH and the noise term is marked estimated.
     */
    public static double noiseBandEdge(Stage s, double gbw) {
        double loop = Double.isNaN(gbw) ? Double.POSITIVE_INFINITY : SINGLE_POLE_ENBW * gbw / s.noiseGain();
        int order = s.noiseFilterOrder();
        if (order == Stage.NO_FILTER) {
            return Double.isInfinite(loop) ? SINGLE_POLE_ENBW * s.bandHigh() : loop;
        }
        return Math.min(butterworthEnbw(order) * s.bandHigh(), loop);
    }
}
