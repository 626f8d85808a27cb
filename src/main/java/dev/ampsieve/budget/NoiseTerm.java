package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.PhysicalConstants;
import dev.ampsieve.units.Units;

/**
 * Term 10, noise: the rms output noise of {@link NoiseModel} integrated from fL to
 * fN = (π/2) min(fH, GBW/NG) at T = 298.15 K, carried in the total as {@code 3.3 x rms}
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
        return NoiseModel.outputRms(s, v.en(), v.enCorner(), v.in(), v.inCorner(), s.bandLow(), fN,
                PhysicalConstants.ROOM_KELVIN);
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        double rms = rms(s, v);
        double fN = NoiseModel.noiseBandEdge(s, v.gbw());
        String note = "rms " + Units.format(rms, Dimension.VOLTAGE) + ", pp (6.6 x rms) "
                + Units.format(NoiseModel.PEAK_TO_PEAK * rms, Dimension.VOLTAGE) + ", "
                + Units.format(s.bandLow(), Dimension.FREQUENCY) + " to fN "
                + Units.format(fN, Dimension.FREQUENCY) + "; counted as 3.3 x rms";
        boolean est = v.noiseEstimated() || Double.isNaN(v.gbw());
        return ErrorTerm.result(this, s, ALLOWANCE * rms, Double.NaN, est, note);
    }
}
