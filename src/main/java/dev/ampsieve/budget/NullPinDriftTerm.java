package dev.ampsieve.budget;

import dev.ampsieve.catalog.InputType;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.TrimCircuit;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.PhysicalConstants;

/**
 * Trim circuit term, offset nulled by the part's null pins: the drift the nulling adds,
 * {@code Vn x (1/T + TCpot) x dT} at the output, with Vn the output offset nulled (the worst
 * unit's, at most the pins' range; {@link TrimSizing}), T the trim temperature in kelvin (25 °C,
 * 298.15 K), TCpot the trimmer's tempco and dT the largest distance from 25 °C.
 *
 * <p>Rule of thumb, common practice, not a datasheet figure: a bipolar pair nulled by unbalancing
 * its collector loads gains a base-emitter voltage difference proportional to absolute temperature,
 * so the nulled offset drifts as V/T: about 3.3 uV/°C per mV nulled at 300 K (the pair's own
 * offset, if it came only from mismatched saturation currents, would be cancelled with its drift;
 * offsets from outside the pair, such as bias current through the resistors, are not, which is why
 * the worst unit's whole nulled offset is counted). For FET and CMOS inputs the same rule stands
 * in and the term is marked estimated: no rule of thumb for them is known to be smaller. The
 * trimmer's own tempco moves the balance it set by TCpot of the nulled offset per °C (the trimmer
 * against the part's internal resistors). A pins' null cannot follow temperature, so a
 * two-temperature calibration never uses it (the stage loader refuses that pairing).
 */
public final class NullPinDriftTerm extends TrimCircuitTerm {
    public static final String KEY = "null-pin-drift";

    public NullPinDriftTerm() {
        super(KEY, "null-pin drift", true, k -> k == TrimCircuit.Kind.NULL_PINS);
    }

    /**
     * Output volts per °C added by nulling {@code nulledOut} output volts: nulledOut x (1/T + TCpot),
     * T = 298.15 K. Output-referred in, output-referred out (the V/T rule holds at the pins, and the
     * noise gain scales both sides alike).
     */
    public static double perDegree(double nulledOut, double potTempco) {
        return nulledOut * (1.0 / PhysicalConstants.ROOM_KELVIN + potTempco);
    }

    @Override
    TermResult evaluateFor(Stage s, PartValues v) {
        SizedTrim t = TrimSizing.of(s, v);
        double dT = s.deltaT();
        double out = t.driftOutVPerC() * dT;
        boolean bipolar = v.part().input() == null || v.part().input() == InputType.BIPOLAR;
        TermWorking w = TermWorking.of(t.unusable() == SizedTrim.Unusable.NONE ? KEY : "trim-circuit-unusable")
                .put("nulled", Math.min(t.offsetV(), t.rangeV()), Dimension.VOLTAGE)
                .put("trimKelvin", PhysicalConstants.ROOM_KELVIN, Dimension.NUMBER)
                .put("potTempco", BudgetCalculator.trimOf(s).circuit().potTempco(), Dimension.RATIO_DRIFT)
                .put("dT", dT, Dimension.NUMBER)
                .remark(!bipolar, TermRemark.NULL_PIN_RULE_NOT_BIPOLAR)
                .build();
        return ErrorTerm.result(this, s, out, DriftTerm.farEnd(s), !bipolar, w);
    }
}
