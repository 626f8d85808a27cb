package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.PhysicalConstants;

/**
 * Term 10, noise: the rms output noise of {@link NoiseModel} integrated from fL to the stage's
 * noise bandwidth fN ({@link NoiseModel#noiseBandEdge}), with the resistors' thermal noise at the
 * hottest temperature of the range (4kTR grows with T in kelvin), carried in the total as {@code 3.3 x rms}
 * (half the 6.6 x rms peak-to-peak convention: the error stays inside it 99.9 % of the time;
 * Franco, 4th ed., ch. 7 [from memory]). Volts at the output.
 *
 * <p>A transimpedance stage's noise gain rises with frequency (the source's capacitance), so its
 * noise is the numerical integral of {@link TransimpedanceNoise} instead of the closed form; the
 * other topologies keep {@link NoiseModel}'s flat-gain form.
 */
public final class NoiseTerm implements ErrorTerm {
    public static final String KEY = "noise";

    /** Noise allowance in the total, as a multiple of rms: half of {@link NoiseModel#PEAK_TO_PEAK}. */
    public static final double ALLOWANCE = NoiseModel.PEAK_TO_PEAK / 2.0;

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "noise";
    }

    @Override
    public boolean dc() {
        return false;
    }

    /**
     * rms output noise of the stage with this part over its band, V: the closed form of
     * {@link NoiseModel} where the noise gain is flat, the integral of {@link TransimpedanceNoise}
     * where it rises with frequency.
     */
    public static double rms(Stage s, PartValues v) {
        return switch (s.topology()) {
            case NON_INVERTING, INVERTING, FOLLOWER, DIFFERENCE -> {
                double fN = NoiseModel.noiseBandEdge(s, v.gbw());
                yield NoiseModel.outputRms(
                        s, v.en(), v.enCorner(), v.in(), v.inCorner(), s.bandLow(), fN, resistorKelvin(s));
            }
            case TRANSIMPEDANCE -> TransimpedanceNoise.rms(s, v);
        };
    }

    /** Resistor temperature for thermal noise: the hottest ambient of the range, in kelvin (SI Brochure: T = t + 273.15). */
    public static double resistorKelvin(Stage s) {
        return PhysicalConstants.kelvin(s.tMax());
    }

    /** Which limit set fN: the filter (its order), the closed loop (its bandwidth), or neither (GBW missing). */
    private static void band(TermWorking.Builder w, Stage s, double gbw, double fN) {
        int order = s.noiseFilterOrder();
        w.put("order", order, Dimension.NUMBER);
        if (Double.isNaN(gbw)) {
            w.remark(order == Stage.NO_FILTER, TermRemark.GBW_MISSING);
            return;
        }
        boolean loopLimits = order == Stage.NO_FILTER || fN < NoiseModel.butterworthEnbw(order) * s.bandHigh();
        if (loopLimits) {
            w.put("fCL", gbw / s.noiseGain(), Dimension.FREQUENCY)
                    .remark(TermRemark.LOOP_SETS_NOISE_BAND)
                    .remark(s.filterOrder() == null, TermRemark.FILTER_NOT_STATED);
        }
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        return switch (s.topology()) {
            case NON_INVERTING, INVERTING, FOLLOWER, DIFFERENCE -> flat(s, v);
            case TRANSIMPEDANCE -> transimpedance(s, v);
        };
    }

    /**
     * Transimpedance: the integral of {@link TransimpedanceNoise}; estimated also when the
     * amplifier's input capacitance is assumed (it sets the noise gain above the zero).
     */
    private TermResult transimpedance(Stage s, PartValues v) {
        double rms = TransimpedanceNoise.rms(s, v);
        TransimpedanceResponse r = TransimpedanceResponse.of(s, v);
        boolean cinAssumed = v.inputCapacitance().basis() != Basis.GUARANTEED;
        double high = r.cf() > 0 ? 1 + r.ct() / r.cf() : Double.POSITIVE_INFINITY;
        int order = s.noiseFilterOrder();
        TermWorking.Builder w = TermWorking.of("noise-transimpedance")
                .put("en", v.en(), Dimension.VOLTAGE_DENSITY)
                .put("in", v.in(), Dimension.CURRENT_DENSITY)
                .put("NG", s.noiseGain(), Dimension.NUMBER)
                // 1 + Ct/Cf; infinite without cf (the noise gain keeps rising with f)
                .put("NGhigh", high, Dimension.NUMBER)
                .put("Ct", r.ct(), Dimension.CAPACITANCE)
                .remark(cinAssumed, TermRemark.INPUT_CAPACITANCE_ASSUMED)
                .put("rms", rms, Dimension.VOLTAGE)
                .put("pp", NoiseModel.PEAK_TO_PEAK * rms, Dimension.VOLTAGE)
                .put("fL", s.bandLow(), Dimension.FREQUENCY)
                .put("order", order, Dimension.NUMBER);
        if (Double.isNaN(v.gbw())) {
            w.put("fN", NoiseModel.noiseBandEdge(s, v.gbw()), Dimension.FREQUENCY)
                    .remark(TermRemark.GBW_MISSING);
        }
        w.put("T", s.tMax(), Dimension.TEMPERATURE).put("allowance", ALLOWANCE, Dimension.NUMBER);
        boolean est = v.noiseEstimated() || Double.isNaN(v.gbw()) || cinAssumed;
        return ErrorTerm.result(this, s, ALLOWANCE * rms, Double.NaN, est, w.build());
    }

    private TermResult flat(Stage s, PartValues v) {
        double rms = rms(s, v);
        double fN = NoiseModel.noiseBandEdge(s, v.gbw());
        TermWorking.Builder w = TermWorking.of("noise")
                .put("en", v.en(), Dimension.VOLTAGE_DENSITY)
                .put("in", v.in(), Dimension.CURRENT_DENSITY)
                .put("rms", rms, Dimension.VOLTAGE)
                .put("pp", NoiseModel.PEAK_TO_PEAK * rms, Dimension.VOLTAGE)
                .put("fL", s.bandLow(), Dimension.FREQUENCY)
                .put("fN", fN, Dimension.FREQUENCY);
        band(w, s, v.gbw(), fN);
        w.put("T", s.tMax(), Dimension.TEMPERATURE).put("allowance", ALLOWANCE, Dimension.NUMBER);
        boolean est = v.noiseEstimated() || Double.isNaN(v.gbw());
        return ErrorTerm.result(this, s, ALLOWANCE * rms, Double.NaN, est, w.build());
    }
}
