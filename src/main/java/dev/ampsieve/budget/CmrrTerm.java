package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;

/**
 * Term 4, common-mode rejection: {@code NG * dVcm * 10^(-CMRR/20)}, volts at the output,
 * dVcm the peak common-mode change (V), CMRR the guaranteed minimum in dB. The finite
 * rejection acts as an input-referred offset of dVcm/CMRR, sign unknown (Franco, 4th ed.,
 * ch. 5 [from memory]). DC (low-frequency) CMRR; not valid for fast common-mode disturbances.
 */
public final class CmrrTerm implements ErrorTerm {
    public static final String KEY = "cmrr";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "common-mode rejection";
    }

    @Override
    public boolean dc() {
        return false; // the common-mode swing follows the signal, so it stays an in-band error
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        Figure db = v.cmrrDb();
        double out = s.noiseGain() * s.commonModeSwing() * Decibels.rejected(db.bound());
        String note = "dVcm " + Units.format(s.commonModeSwing(), Dimension.VOLTAGE) + ", CMRR "
                + Units.format(db.bound(), Dimension.DECIBEL, 4) + basisNote(db.basis());
        return ErrorTerm.result(this, s, out, Double.NaN, db.basis().uncertain(), note);
    }

    static String basisNote(Basis b) {
        return switch (b) {
            case TYPICAL_ONLY -> " (typical less 20 log10(max-to-sigma): no guaranteed minimum)";
            case ASSUMED -> " (assumed: not in the catalog)";
            default -> "";
        };
    }
}
