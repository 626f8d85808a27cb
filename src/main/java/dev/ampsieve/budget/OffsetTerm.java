package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;

/**
 * Term 1, initial offset: {@code NG * vos.max}, volts at the output, at 25 °C.
 * The offset voltage appears in series with the + input and is amplified by the noise gain
 * in every topology (Franco, <i>Design with Operational Amplifiers</i>, 4th ed., ch. 5;
 * Sedra &amp; Smith, <i>Microelectronic Circuits</i>, 7th ed., ch. 2 [from memory]).
 * Valid for any gain; sign unknown, so the magnitude is reported.
 */
public final class OffsetTerm implements ErrorTerm {
    public static final String KEY = "offset";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "initial offset";
    }

    @Override
    public boolean dc() {
        return true;
    }

    /** NG * vos bound, V. */
    static double magnitude(Stage s, PartValues v) {
        return DcModel.of(s).perVos() * v.vos().bound();
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        Figure vos = v.vos();
        TermWorking w = TermWorking.of("offset")
                .put("NG", DcModel.of(s).perVos(), Dimension.NUMBER)
                .put("vos", vos.bound(), Dimension.VOLTAGE)
                .remark(vos.basis() == Basis.TYPICAL_ONLY, TermRemark.TYPICAL_TIMES_MAX_TO_SIGMA)
                .build();
        return ErrorTerm.result(
                this, s, magnitude(s, v), Stage.T_REF, vos.basis().uncertain(), w);
    }
}
