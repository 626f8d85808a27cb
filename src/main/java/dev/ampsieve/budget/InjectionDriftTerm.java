package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.TrimCircuit;
import dev.ampsieve.units.Dimension;

/**
 * Trim circuit term, injection network (reference, trimmer, injection resistor): the drift it adds,
 * {@code c x (TCref + TCratio + TCpot x Rth/(Rinj + Rth)) x dT} at the output, with c the
 * correction the worst unit needs (its untrimmed offset, at most the range; {@link TrimSizing}),
 * TCref the reference's tempco, TCratio the tempco of Rinj against the resistor it works with
 * (tracking, or twice each resistor's tempco), TCpot the trimmer's tempco, Rth = R_pot/4 the largest
 * resistance of the wiper seen from Rinj (a divider's Thevenin resistance, largest at midtravel)
 * and dT the largest distance from 25 °C.
 *
 * <p>Derivation: the correction is c = u·K with u the wiper's voltage (a fixed share of the reference)
 * and K the network's transfer ({@link TrimSizing#transfer}); dc/c = du/u + dK/K. The reference's
 * tempco moves u; K is a ratio of Rf (or R+) to Rinj plus the wiper's resistance in series, so the
 * ratio's tempco and the wiper resistance's share of the series resistance times its tempco move it.
 * Each taken at its magnitude (linear worst case): first-order sensitivity analysis, Franco,
 * <i>Design with Operational Amplifiers</i>, 4th ed., ch. 5 [from memory]; the default coefficients
 * are common practice (stage keys).
 */
public final class InjectionDriftTerm extends TrimCircuitTerm {
    public static final String KEY = "injection-drift";

    public InjectionDriftTerm() {
        super(KEY, "injection drift", true, k -> k == TrimCircuit.Kind.INJECTION);
    }

    /** Output volts per °C for a correction {@code c} (output volts): c x (refTc + ratioTc + potTc x rth/(rinj + rth)). */
    public static double perDegree(double c, double refTc, double ratioTc, double potTc, double rth, double rinj) {
        return c * (refTc + ratioTc + potTc * rth / (rinj + rth));
    }

    @Override
    TermResult evaluateFor(Stage s, PartValues v) {
        SizedTrim t = TrimSizing.of(s, v);
        TrimCircuit c = BudgetCalculator.trimOf(s).circuit();
        double dT = s.deltaT();
        TermWorking w = TermWorking.of(t.unusable() == SizedTrim.Unusable.NONE ? KEY : "trim-circuit-unusable")
                .put("correction", Math.min(t.offsetV(), t.rangeV()), Dimension.VOLTAGE)
                .put("referenceTempco", c.referenceTempco(), Dimension.RATIO_DRIFT)
                .put("ratioTempco", c.ratioTempco(), Dimension.RATIO_DRIFT)
                .put("potTempco", c.potTempco(), Dimension.RATIO_DRIFT)
                .put("Rth", c.potResistance() / 4, Dimension.RESISTANCE)
                .put("Rinj", t.injectionResistance(), Dimension.RESISTANCE)
                .put("dT", dT, Dimension.NUMBER)
                .build();
        return ErrorTerm.result(this, s, t.driftOutVPerC() * dT, DriftTerm.farEnd(s), false, w);
    }
}
