package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;

/**
 * Term 7, closed-loop bandwidth: amplitude error at the band edge
 * {@code VFS * (1 - 1/sqrt(1 + (fH*NG/GBW)²))}, volts at the output, VFS the peak amplitude
 * of a full-scale sine at fH. The closed loop is a
 * single pole at GBW/NG (Franco, 4th ed., ch. 6; Sedra &amp; Smith, 7th ed., ch. 2
 * [from memory]); valid for a dominant-pole amplifier well below its second pole.
 */
public final class BandwidthTerm implements ErrorTerm {
    public static final String KEY = "bandwidth";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "closed-loop bandwidth";
    }

    @Override
    public boolean dc() {
        return false;
    }

    /** Relative amplitude loss of a single pole at GBW/NG, seen at fH. */
    public static double relativeError(double fH, double noiseGain, double gbw) {
        double x = fH * noiseGain / gbw;
        return 1.0 - 1.0 / Math.sqrt(1.0 + x * x);
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        double vfs = s.fullScaleOutput() == null ? 0.0 : s.fullScaleOutput();
        if (Double.isNaN(v.gbw())) {
            return ErrorTerm.result(this, s, 0.0, Double.NaN, true, "GBW not given: not counted");
        }
        double out = vfs * relativeError(s.bandHigh(), s.noiseGain(), v.gbw());
        String note = "fH " + Units.format(s.bandHigh(), Dimension.FREQUENCY) + ", closed-loop pole "
                + Units.format(v.gbw() / s.noiseGain(), Dimension.FREQUENCY);
        return ErrorTerm.result(this, s, out, Double.NaN, false, note);
    }
}
