package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;

/**
 * Term 5, supply rejection: {@code NG * dVs * 10^(-PSRR/20)}, volts at the output, dVs the
 * peak change of the total supply (V), PSRR the guaranteed minimum in dB; an input-referred
 * offset of dVs/PSRR, sign unknown (Franco, 4th ed., ch. 5 [from memory]). DC PSRR: switching
 * ripple needs the PSRR at its frequency, which is lower.
 */
public final class PsrrTerm implements ErrorTerm {
    public static final String KEY = "psrr";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "supply rejection";
    }

    @Override
    public boolean dc() {
        return false; // supply variation may be ripple inside the band: kept in the error
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        Figure db = v.psrrDb();
        double out = s.noiseGain() * s.supplyVariation() * Decibels.rejected(db.bound());
        TermWorking.Builder w = TermWorking.of("psrr")
                .put("NG", s.noiseGain(), Dimension.NUMBER)
                .put("dVs", s.supplyVariation(), Dimension.VOLTAGE)
                .put("PSRR", db.bound(), Dimension.DECIBEL);
        return ErrorTerm.result(
                this,
                s,
                out,
                Double.NaN,
                db.basis().uncertain(),
                CmrrTerm.remark(w, db.basis()).build());
    }
}
