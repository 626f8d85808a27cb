package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;

/**
 * Term 8, resistor ratio: {@code VFS * S * (tolR + tcR * dT)}, volts at the output, with
 * VFS the full-scale output as a peak excursion, tolR the ratio tolerance, tcR the ratio temperature coefficient (1/°C), dT in °C, and the
 * gain sensitivity S = (NG-1)/NG non-inverting, 1 inverting, 0 follower ({@link dev.ampsieve.stage.Network#ratioSensitivity}): from
 * dG/G = (1 - 1/G)(δRf - δRg) non-inverting and δRf - δRg inverting (Sedra &amp; Smith, 7th
 * ed., ch. 2; Franco, 4th ed., ch. 1 [from memory]). First order in the tolerances.
 */
public final class ResistorTerm implements ErrorTerm {
    public static final String KEY = "resistors";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "resistor ratio";
    }

    @Override
    public boolean dc() {
        return false;
    }

    /** Gain sensitivity to the resistor ratio. */
    public static double sensitivity(Stage s) {
        return s.network().ratioSensitivity();
    }

    /** The tolerance part alone (what a two-point calibration removes), V. */
    static double tolerancePart(Stage s) {
        return vfs(s) * sensitivity(s) * s.ratioTolerance();
    }

    /** The tempco part alone, V. */
    static double tempcoPart(Stage s) {
        return vfs(s) * sensitivity(s) * s.ratioTempco() * s.deltaT();
    }

    private static double vfs(Stage s) {
        return s.fullScaleOutput() == null ? 0.0 : s.fullScaleOutput();
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        double out = tolerancePart(s) + tempcoPart(s);
        double at = s.ratioTempco() != 0 && s.deltaT() > 0 ? DriftTerm.farEnd(s) : Double.NaN;
        TermWorking.Builder w = TermWorking.of("resistors")
                .put("VFS", vfs(s), Dimension.VOLTAGE)
                .put("S", sensitivity(s), Dimension.NUMBER)
                .put("tol", s.ratioTolerance(), Dimension.RATIO)
                .put("tc", s.ratioTempco(), Dimension.RATIO_DRIFT)
                .put("dT", s.deltaT(), Dimension.NUMBER);
        switch (s.topology()) {
            case FOLLOWER -> w.remark(TermRemark.FOLLOWER);
            case DIFFERENCE -> w.remark(TermRemark.RESISTOR_PAIRS);
            case TRANSIMPEDANCE -> w.remark(TermRemark.GAIN_IS_RF);
            case NON_INVERTING, INVERTING -> {}
        }
        return ErrorTerm.result(this, s, out, at, false, w.build());
    }
}
