package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.PhysicalConstants;
import dev.ampsieve.units.Units;

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

    /** Which limit set fN, for the note. */
    private static String bandNote(Stage s, double gbw, double fN) {
        int order = s.noiseFilterOrder();
        if (Double.isNaN(gbw)) {
            return order == Stage.NO_FILTER ? "GBW not given: pi/2 x fH assumed" : filterName(order);
        }
        boolean loopLimits = order == Stage.NO_FILTER || fN < NoiseModel.butterworthEnbw(order) * s.bandHigh();
        if (!loopLimits) {
            return filterName(order);
        }
        return "closed-loop bandwidth " + Units.format(gbw / s.noiseGain(), Dimension.FREQUENCY)
                + (order != Stage.NO_FILTER
                        ? ", below the filter"
                        : s.filterOrder() == null ? ", no filter stated" : ", no filter");
    }

    private static String filterName(int order) {
        return order == 1 ? "first-order filter at fH" : "order-" + order + " Butterworth at fH";
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
        String note = "en " + Units.format(v.en(), Dimension.VOLTAGE_DENSITY) + ", in "
                + Units.format(v.in(), Dimension.CURRENT_DENSITY) + "; noise gain "
                + Units.format(s.noiseGain(), Dimension.NUMBER)
                + " at DC"
                + (Double.isFinite(high)
                        ? " rising to " + Units.format(high, Dimension.NUMBER) + " (1 + Ct/Cf)"
                        : " rising with f (no cf)")
                + ", Ct " + Units.format(r.ct(), Dimension.CAPACITANCE)
                + (cinAssumed ? " (input capacitance assumed)" : "")
                + "; rms " + Units.format(rms, Dimension.VOLTAGE) + ", pp (6.6 x rms) "
                + Units.format(NoiseModel.PEAK_TO_PEAK * rms, Dimension.VOLTAGE) + ", integrated from "
                + Units.format(s.bandLow(), Dimension.FREQUENCY) + " through "
                + (Double.isNaN(v.gbw())
                        ? "a flat band to " + Units.format(NoiseModel.noiseBandEdge(s, v.gbw()), Dimension.FREQUENCY)
                                + " (GBW not given)"
                        : (order == Stage.NO_FILTER ? "the closed loop" : filterName(order) + " and the closed loop"))
                + ", resistors at " + Units.format(s.tMax(), Dimension.TEMPERATURE) + "; counted as 3.3 x rms";
        boolean est = v.noiseEstimated() || Double.isNaN(v.gbw()) || cinAssumed;
        return ErrorTerm.result(this, s, ALLOWANCE * rms, Double.NaN, est, note);
    }

    private TermResult flat(Stage s, PartValues v) {
        double rms = rms(s, v);
        double fN = NoiseModel.noiseBandEdge(s, v.gbw());
        String note = "en " + Units.format(v.en(), Dimension.VOLTAGE_DENSITY) + ", in "
                + Units.format(v.in(), Dimension.CURRENT_DENSITY) + "; rms " + Units.format(rms, Dimension.VOLTAGE)
                + ", pp (6.6 x rms) "
                + Units.format(NoiseModel.PEAK_TO_PEAK * rms, Dimension.VOLTAGE) + ", "
                + Units.format(s.bandLow(), Dimension.FREQUENCY) + " to fN "
                + Units.format(fN, Dimension.FREQUENCY) + " (" + bandNote(s, v.gbw(), fN) + "), resistors at "
                + Units.format(s.tMax(), Dimension.TEMPERATURE) + "; counted as 3.3 x rms";
        boolean est = v.noiseEstimated() || Double.isNaN(v.gbw());
        return ErrorTerm.result(this, s, ALLOWANCE * rms, Double.NaN, est, note);
    }
}
