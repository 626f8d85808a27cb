package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;

/**
 * Term 6, finite open-loop gain: gain error at full scale {@code VFS * NG / (AOL + NG)},
 * volts at the output, AOL as a ratio, VFS the full-scale output as a peak excursion (the gain
 * error is largest where the output is farthest from its zero). From G = G_ideal / (1 + 1/(AOL β)) with β = 1/NG:
 * the relative error is 1 - G/G_ideal = NG/(AOL + NG) (Sedra &amp; Smith, <i>Microelectronic
 * Circuits</i>, 7th ed., ch. 2; Franco, 4th ed., ch. 1 [from memory]). DC open-loop gain,
 * unloaded; a heavy load lowers it.
 */
public final class OpenLoopGainTerm implements ErrorTerm {
    public static final String KEY = "open-loop-gain";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "open-loop gain";
    }

    @Override
    public boolean dc() {
        return false; // a gain error scales the signal, AC-coupled or not
    }

    /** Relative gain error NG / (AOL + NG) for AOL in dB. */
    public static double relativeError(double noiseGain, double aolDb) {
        double aol = Decibels.toRatio(aolDb);
        return noiseGain / (aol + noiseGain);
    }

    /** Closed-loop gain with finite AOL: G_ideal / (1 + NG/AOL), for tables and checks. */
    public static double closedLoopGain(double idealGain, double noiseGain, double aolDb) {
        return idealGain / (1.0 + noiseGain / Decibels.toRatio(aolDb));
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        Figure db = v.aolDb();
        double vfs = s.fullScaleOutput() == null ? 0.0 : s.fullScaleOutput();
        double out = vfs * relativeError(s.noiseGain(), db.bound());
        TermWorking.Builder w = TermWorking.of("open-loop-gain")
                .put("VFS", vfs, Dimension.VOLTAGE)
                .put("NG", s.noiseGain(), Dimension.NUMBER)
                .put("AOL", db.bound(), Dimension.DECIBEL);
        return ErrorTerm.result(
                this,
                s,
                out,
                Double.NaN,
                db.basis().uncertain(),
                CmrrTerm.remark(w, db.basis()).build());
    }
}
