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

    /** rms output noise of the stage with this part over its band, V. */
    public static double rms(Stage s, PartValues v) {
        double fN = NoiseModel.noiseBandEdge(s, v.gbw());
        return NoiseModel.outputRms(s, v.en(), v.enCorner(), v.in(), v.inCorner(), s.bandLow(), fN, resistorKelvin(s));
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
                + (order != Stage.NO_FILTER ? ", below the filter" : s.filterOrder() == null ? ", no filter stated" : ", no filter");
    }

    private static String filterName(int order) {
        return order == 1 ? "first-order filter at fH" : "order-" + order + " Butterworth at fH";
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        double rms = rms(s, v);
        double fN = NoiseModel.noiseBandEdge(s, v.gbw());
        String note = "en " + Units.format(v.en(), Dimension.VOLTAGE_DENSITY) + ", in "
                + Units.format(v.in(), Dimension.CURRENT_DENSITY) + "; rms " + Units.format(rms, Dimension.VOLTAGE) + ", pp (6.6 x rms) "
                + Units.format(NoiseModel.PEAK_TO_PEAK * rms, Dimension.VOLTAGE) + ", "
                + Units.format(s.bandLow(), Dimension.FREQUENCY) + " to fN "
                + Units.format(fN, Dimension.FREQUENCY) + " (" + bandNote(s, v.gbw(), fN) + "), resistors at "
                + Units.format(s.tMax(), Dimension.TEMPERATURE) + "; counted as 3.3 x rms";
        boolean est = v.noiseEstimated() || Double.isNaN(v.gbw());
        return ErrorTerm.result(this, s, ALLOWANCE * rms, Double.NaN, est, note);
    }
}
