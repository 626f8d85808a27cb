package dev.ampsieve.budget;

import dev.ampsieve.stage.Board;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;

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
        String note = b.leakage()
                ? Units.format(Math.abs(b.leakageVoltage()), Dimension.VOLTAGE) + " / "
                        + Units.format(b.leakageResistance(), Dimension.RESISTANCE) + " = "
                        + Units.format(i, Dimension.CURRENT)
                        + " into the "
                        + (b.leakageInput() == Board.Input.PLUS
                                ? "+ input, x NG x R+ " + Units.format(s.rPlus(), Dimension.RESISTANCE)
                                : "- input, x Rf " + Units.format(s.rf(), Dimension.RESISTANCE))
                : "no leakage named";
        return ErrorTerm.result(this, s, out, Double.NaN, false, note);
    }
}
