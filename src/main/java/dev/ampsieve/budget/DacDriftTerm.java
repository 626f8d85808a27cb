package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.stage.TrimCircuit;
import dev.ampsieve.units.Dimension;

/**
 * Trim circuit term, a DAC driving the injection resistor: the drift it adds,
 * {@code [(do + g x (Vref/2 + c/K)) x K + c x TCratio] x dT} at the output, with do the DAC's
 * zero-code drift (V/°C), g its gain drift (1/°C), Vref its full scale, c the correction the worst
 * unit needs (output volts, at most the range), K the network's transfer ({@link TrimSizing#transfer})
 * so that c/K is the DAC's output from midscale, TCratio the tempco of Rinj against the resistor it
 * works with, and dT the largest distance from 25 °C.
 *
 * <p>Derivation: the DAC's output is its zero plus a gain times the code; at the correcting code it
 * holds Vref/2 + c/K above code 0, so its gain drift moves it by g of that (conservative: the
 * midscale that stands for "no correction" is taken not to track the DAC's own gain), its zero by
 * do; both reach the output through K. The ratio tempco moves K as in {@link InjectionDriftTerm}.
 * First-order sensitivity, each part at its magnitude; DAC figures as IEEE 1241 / IEC 60748-4 name
 * them (offset and gain error) [from memory]; default values common practice (stage keys). Under a
 * two-temperature calibration the term is 0: this drift is linear in temperature, and the
 * calibration line removes it with the part's own.
 */
public final class DacDriftTerm extends TrimCircuitTerm {
    public static final String KEY = "dac-drift";

    public DacDriftTerm() {
        super(KEY, "trim DAC drift", true, k -> k == TrimCircuit.Kind.DAC);
    }

    /** Output volts per °C for a correction {@code c} (output volts) through transfer {@code k}. */
    public static double perDegree(
            double c, double k, double offsetDrift, double gainDrift, double dacReference, double ratioTc) {
        return (offsetDrift + gainDrift * (dacReference / 2 + c / k)) * k + c * ratioTc;
    }

    @Override
    TermResult evaluateFor(Stage s, PartValues v) {
        SizedTrim t = TrimSizing.of(s, v);
        TrimCircuit c = BudgetCalculator.trimOf(s).circuit();
        boolean line = BudgetCalculator.trimOf(s).method() == Trim.Method.TWO_TEMPERATURE;
        double dT = s.deltaT();
        TermWorking w = TermWorking.of(t.unusable() == SizedTrim.Unusable.NONE ? KEY : "trim-circuit-unusable")
                .put("correction", Math.min(t.offsetV(), t.rangeV()), Dimension.VOLTAGE)
                .put("K", t.transfer(), Dimension.NUMBER)
                .put("dacOffsetDrift", c.dacOffsetDrift(), Dimension.VOLTAGE_DRIFT)
                .put("dacGainDrift", c.dacGainDrift(), Dimension.RATIO_DRIFT)
                .put("dacReference", c.dacReference(), Dimension.VOLTAGE)
                .put("ratioTempco", c.ratioTempco(), Dimension.RATIO_DRIFT)
                .put("dT", dT, Dimension.NUMBER)
                .remark(line, TermRemark.CIRCUIT_DRIFT_CALIBRATED)
                .build();
        double out = line ? 0.0 : t.driftOutVPerC() * dT;
        return ErrorTerm.result(this, s, out, DriftTerm.farEnd(s), false, w);
    }
}
