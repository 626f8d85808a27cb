package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Topology;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.stage.TrimCircuit;
import dev.ampsieve.units.Dimension;

/**
 * Trim circuit term, what the injection resistor (injection network or DAC) does to the gains:
 * {@code (dNG/NG) x (drift + CMRR + PSRR + aging + noise after the trim) + VFS x |dG/G| + NG x |dG/G| x share x Vcm},
 * output volts, with
 * <ul>
 * <li>dNG = Rf/Rinj, the rise of the noise gain when Rinj goes to the summing node (Rinj in parallel
 * with Rg: NG = 1 + Rf/(Rg || Rinj) = 1 + Rf/Rg + Rf/Rinj; Franco, <i>Design with Operational
 * Amplifiers</i>, 4th ed., ch. 1 and 5 [from memory]); 0 into the + pin. Every error the amplifier
 * adds at its inputs reaches the output multiplied by NG, so those left after the trim grow by
 * dNG/NG (noise: an upper bound, since a higher noise gain also narrows the closed-loop noise
 * bandwidth);</li>
 * <li>dG/G the relative change of the signal gain ({@link #gainChange}): the + pin's signal sees
 * the new noise gain (non-inverting, difference) or is divided by R+/(R+ + Rinj) (plus node); VFS
 * the full-scale output. Counted as it stands, as if rg were kept (choose rg so that rg || Rinj is
 * the stated rg to keep the gain); a two-point trim calibrates it away;</li>
 * <li>in a difference stage the + leg's gain changes by dG/G while the - leg's stays, so the two no
 * longer cancel the common mode: the pins' common mode (share x common-mode-swing) reaches the output
 * times NG x |dG/G| (dNG at the summing node). Superposition on the four-resistor stage, Franco §2.2.</li>
 * </ul>
 * Not counted: Rinj's own thermal noise, 4kT/Rinj into the summing node, below rg's by Rg/Rinj.
 */
public final class InjectionGainTerm extends TrimCircuitTerm {
    public static final String KEY = "injection-gain";

    public InjectionGainTerm() {
        super(KEY, "injection gain", false /* it scales the noise too */, TrimCircuit.Kind::injects);
    }

    /**
     * Relative change of the signal gain when Rinj is added: summing node, signal at the + pin:
     * dNG/NG; plus node, signal at the + pin: -R+/(R+ + Rinj) (the divider); a signal at the - pin
     * (inverting, transimpedance) keeps Rf/Rg or Rf: 0.
     */
    public static double gainChange(
            Topology topology, TrimCircuit.Node node, double dNg, double ng, double rPlus, double rinj) {
        if (!TrimSizing.signalAtPlus(topology)) {
            return 0.0;
        }
        return switch (node) {
            case MINUS -> dNg / ng;
            case PLUS -> -rPlus / (rPlus + rinj);
        };
    }

    /** The after-trim terms that scale with the noise gain, output volts. */
    static double scaledByNoiseGain(Stage s, PartValues v) {
        boolean line = BudgetCalculator.trimOf(s).method() == Trim.Method.TWO_TEMPERATURE;
        return (line ? 0.0 : DriftTerm.afterTrim(s, v))
                + new CmrrTerm().evaluate(s, v).outputV()
                + new PsrrTerm().evaluate(s, v).outputV()
                + new AgingTerm().evaluate(s, v).outputV()
                + new NoiseTerm().evaluate(s, v).outputV();
    }

    @Override
    TermResult evaluateFor(Stage s, PartValues v) {
        SizedTrim t = TrimSizing.of(s, v);
        if (t.unusable() != SizedTrim.Unusable.NONE) {
            return ErrorTerm.none(this, s, false, "trim-circuit-unusable");
        }
        boolean two = BudgetCalculator.trimOf(s).method() == Trim.Method.TWO_POINT;
        double ng = s.noiseGain();
        double scaled = scaledByNoiseGain(s, v);
        double vfs = s.fullScaleOutput() == null ? 0.0 : s.fullScaleOutput();
        double gain = two ? 0.0 : vfs * Math.abs(t.gainChange());
        double cm = s.topology() == Topology.DIFFERENCE
                ? Math.abs(t.gainChange()) * ng * s.network().commonModeShare() * s.commonModeSwing()
                : 0.0;
        double out = t.noiseGainChange() / ng * scaled + gain + cm;
        TermWorking w = TermWorking.of(KEY)
                .put("dNG", t.noiseGainChange(), Dimension.NUMBER)
                .put("NG", ng, Dimension.NUMBER)
                .put("scaled", scaled, Dimension.VOLTAGE)
                .put("gainChange", t.gainChange(), Dimension.RATIO)
                .put("VFS", vfs, Dimension.VOLTAGE)
                .put("commonMode", cm, Dimension.VOLTAGE)
                .remark(two, TermRemark.GAIN_CHANGE_CALIBRATED)
                .build();
        return ErrorTerm.result(this, s, out, Double.NaN, false, w);
    }
}
