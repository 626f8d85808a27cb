package dev.ampsieve.budget;

import dev.ampsieve.stage.Board;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;

/**
 * Board-level term, surface leakage: a current {@code I = |V| / R} from a nearby trace at V
 * through the board's surface resistance R into the high-impedance input, where it adds to that
 * input's bias current. Through the one DC model ({@link DcModel}: Vout = NG (vos - IB+ R+) + IB- Rf)
 * it gives {@code NG x I x R+} volts at the output into the + input and {@code I x Rf} into the -
 * input (Ohm's law; guarding against it: Keithley, <i>Low Level Measurements Handbook</i>, 7th
 * ed., §2.2 [from memory]). Its sign is fixed by V, but the bias current's is not, so the magnitude
 * adds. A trim does not remove it: surface leakage follows humidity and contamination.
 */
public final class LeakageTerm implements ErrorTerm {
    public static final String KEY = "leakage";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "leakage";
    }

    @Override
    public boolean dc() {
        return true;
    }

    @Override
    public boolean appliesTo(Stage s) {
        return s.board().leakage();
    }

    @Override
    public TermKind kind() {
        return TermKind.BOARD;
    }

    /** Output volts per ampere of leakage into the board's input: |NG x R+| or |Rf|. */
    public static double perAmpere(Stage s) {
        return s.board().leakageInput() == Board.Input.PLUS
                ? Math.abs(DcModel.outputError(s, 0, 1.0, 0))
                : Math.abs(DcModel.outputError(s, 0, 0, 1.0));
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        Board b = s.board();
        double i = b.leakageCurrent();
        double out = i * perAmpere(s);
        if (!b.leakage()) {
            return ErrorTerm.result(this, s, out, Double.NaN, false, TermWorking.plain("no-leakage"));
        }
        boolean plus = b.leakageInput() == Board.Input.PLUS;
        TermWorking.Builder w = TermWorking.of("leakage")
                .put("V", Math.abs(b.leakageVoltage()), Dimension.VOLTAGE)
                .put("R", b.leakageResistance(), Dimension.RESISTANCE)
                .put("I", i, Dimension.CURRENT)
                .remark(plus, TermRemark.LEAKAGE_PLUS_INPUT);
        if (plus) {
            w.put("NG", s.noiseGain(), Dimension.NUMBER).put("R+", s.rPlus(), Dimension.RESISTANCE);
        } else {
            w.put("Rf", s.rf(), Dimension.RESISTANCE);
        }
        return ErrorTerm.result(this, s, out, Double.NaN, false, w.build());
    }
}
