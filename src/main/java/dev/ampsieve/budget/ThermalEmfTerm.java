package dev.ampsieve.budget;

import dev.ampsieve.stage.Board;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;

/**
 * Board-level term, thermal EMF: {@code NG x N x S x dT}, volts at the output, with N unpaired
 * junctions of dissimilar metals in the input path, S the thermoelectric (Seebeck) coefficient of
 * one junction (V/°C) and dT the temperature difference across them (°C). Each junction is a
 * thermocouple: it adds S x dT in series with the input, where the noise gain amplifies it as it
 * does the offset (for a junction in the source path of an inverting or difference stage, which
 * sees the smaller signal gain, this is slightly pessimistic). Seebeck effect; coefficients and
 * the advice to pair junctions: Keithley, <i>Low Level Measurements Handbook</i>, 7th ed., §3.2
 * (thermoelectric EMFs) [from memory]; the figures in the key table are common practice. A trim
 * does not remove it: the gradient at calibration is not the one in service.
 */
public final class ThermalEmfTerm implements ErrorTerm {
    public static final String KEY = "thermal-emf";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "thermal EMF";
    }

    @Override
    public boolean dc() {
        return true;
    }

    @Override
    public boolean appliesTo(Stage s) {
        return s.board().thermalEmf();
    }

    @Override
    public TermKind kind() {
        return TermKind.BOARD;
    }

    /** N x S x dT, V, in series with the input. */
    public static double inputVolts(Board b) {
        return b.thermalEmf() ? b.junctions() * b.seebeck() * b.gradient() : 0.0;
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        Board b = s.board();
        double out = s.noiseGain() * inputVolts(b);
        TermWorking w = b.thermalEmf()
                ? TermWorking.of("thermal-emf")
                        .put("NG", s.noiseGain(), Dimension.NUMBER)
                        .put("junctions", b.junctions(), Dimension.NUMBER)
                        .put("seebeck", b.seebeck(), Dimension.VOLTAGE_DRIFT)
                        .put("gradient", b.gradient(), Dimension.NUMBER)
                        .put("emf", inputVolts(b), Dimension.VOLTAGE)
                        .build()
                : TermWorking.plain("no-thermal-emf");
        return ErrorTerm.result(this, s, out, Double.NaN, false, w);
    }
}
