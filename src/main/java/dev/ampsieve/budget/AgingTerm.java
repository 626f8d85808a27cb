package dev.ampsieve.budget;

import dev.ampsieve.catalog.LongTermDrift;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;

/**
 * Term 9, long-term drift: {@code NG * k * D * sqrt(L / t0)}, volts at the output, with D the
 * offset change the catalog gives per time t0 (commonly per 1000 h), L the service life (same
 * unit) and k the stage's max-to-sigma ratio. Offset aging behaves like a random walk, so it
 * grows with the square root of time (common practice; linear scaling would be the pessimistic
 * alternative). Datasheets publish the figure as typical, so the worst case takes k times it
 * (error-model.md "Missing and typical-only figures") and the term is flagged; a missing
 * figure takes the estimate of {@link Assumed#agingPer1000h} (see {@link PartValues#aging()}).
 */
public final class AgingTerm implements ErrorTerm {
    public static final String KEY = "aging";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "long-term drift";
    }

    @Override
    public boolean dc() {
        return true;
    }

    /** Input-referred offset change after {@code life} seconds at the catalog's (typical) figure, V (√t model). */
    public static double inputAging(LongTermDrift d, double life) {
        if (d == null || life <= 0 || d.per() <= 0) {
            return 0.0;
        }
        return d.value() * Math.sqrt(life / d.per());
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        double life = s.serviceLife();
        if (life <= 0) {
            return ErrorTerm.none(this, s, false, "no-service-life");
        }
        Figure a = v.aging();
        double out = DcModel.of(s).perVos() * a.bound();
        LongTermDrift d = v.part().longTermDrift();
        TermWorking.Builder w = TermWorking.of("aging").put("NG", DcModel.of(s).perVos(), Dimension.NUMBER);
        if (a.basis() == Basis.ESTIMATED) {
            w.put("shift", a.bound(), Dimension.VOLTAGE)
                    .put("life", life, Dimension.TIME)
                    .remark(TermRemark.AGING_ESTIMATED);
        } else {
            w.put("maxToSigma", s.maxToSigma(), Dimension.NUMBER)
                    .put("typical", d.value(), Dimension.VOLTAGE)
                    .put("per", d.per(), Dimension.TIME)
                    .put("life", life, Dimension.TIME);
        }
        return ErrorTerm.result(this, s, out, Double.NaN, a.basis().uncertain() && out > 0, w.build());
    }
}
