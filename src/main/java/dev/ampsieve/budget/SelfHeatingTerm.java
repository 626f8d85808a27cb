package dev.ampsieve.budget;

import dev.ampsieve.catalog.Range;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
import java.util.List;

/**
 * Self-heating: the die runs above the ambient, {@code Tj = Ta + θJA x P} (the definition of the
 * junction-to-ambient thermal resistance, JEDEC JESD51-1 [from memory]), with
 * <pre>  P = channels x Vs x Iq + max over the output x of (Vs/2 - |x|) x |x| / RL</pre>
 * the quiescent power of every amplifier in the package plus the output stage's dissipation: the
 * load RL is returned to mid-supply, the output sits x from it, and the transistor feeding the load
 * drops Vs/2 - |x| while carrying |x|/RL. That product is largest at |x| = Vs/4, Vs²/(16 RL), the DC
 * form of the class-B output stage's worst dissipation (Sedra &amp; Smith, <i>Microelectronic
 * Circuits</i>, 7th ed., ch. 12 [from memory]); x runs over the output the stage needs
 * ({@link Constraints#neededOutput}), the whole swing when that is not stated.
 * The die then spans {@code Tmin + θJA·Pq} (quiescent only) to {@code Tmax + θJA·P}, and the drift
 * and bias-current terms, evaluated at the ambient, grow: this term is what they add,
 * <pre>  NG x drift x (dTdie - dT)  +  (bias term at the die's ends - bias term at the ambient's ends)</pre>
 * each at least 0 (the currents through {@link PartValues#ibAt}, so a FET input doubling per 10 °C
 * grows with the die). Counted when the stage gives {@code load-resistance} and a supply; kept
 * whole by a trim (the die's rise differs between the trim and use).
 */
public final class SelfHeatingTerm implements ErrorTerm {
    public static final String KEY = "self-heating";

    /** The die's temperature span and what heats it. */
    public record Die(double power, double quiescentPower, double thetaJa, double hot, double cold) {}

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "self-heating";
    }

    @Override
    public boolean dc() {
        return true;
    }

    @Override
    public TermKind kind() {
        return TermKind.OPERATING_POINT;
    }

    /** The largest output-stage dissipation, W, for an output x in [lo, hi] volts from the load's return (mid-supply). */
    static double outputPower(double vs, double rl, double lo, double hi) {
        // |x| over the interval: from 0 when it straddles mid-supply, else from the nearer end
        double aMin = lo <= 0 && hi >= 0 ? 0 : Math.min(Math.abs(lo), Math.abs(hi));
        double aMax = Math.min(vs / 2, Math.max(Math.abs(lo), Math.abs(hi)));
        double peak = vs / 4;
        double best = Math.max(p(vs, rl, aMin), p(vs, rl, aMax));
        if (peak >= aMin && peak <= aMax) {
            best = Math.max(best, p(vs, rl, peak));
        }
        return best;
    }

    private static double p(double vs, double rl, double a) {
        return Math.max(0, vs / 2 - a) * a / rl;
    }

    /** The die's span in this stage, or null when the stage states no load or no supply. */
    public static Die die(Stage s, PartValues v) {
        if (s.loadResistance() == null || s.supplyVoltage() == null) {
            return null;
        }
        double vs = s.supplyVoltage();
        double mid = vs / 2;
        Range out = Constraints.neededOutput(s);
        double lo = out == null ? -mid : Math.max(-mid, out.min() - mid);
        double hi = out == null ? mid : Math.min(mid, out.max() - mid);
        OperatingFigures o = v.operating();
        int channels = Math.max(1, v.part().channels());
        double pq = channels * vs * o.quiescentCurrent().bound();
        double p = pq + outputPower(vs, s.loadResistance(), lo, hi);
        double theta = o.thetaJa().bound();
        return new Die(p, pq, theta, s.tMax() + theta * p, s.tMin() + theta * pq);
    }

    /** The constraint: the die's hottest temperature within the part's rated range; empty when not counted. */
    static List<ConstraintResult> dieLimit(Stage s, PartValues v) {
        Die d = die(s, v);
        if (d == null || Double.isNaN(v.ratedHigh())) {
            return List.of();
        }
        boolean ok = d.hot() <= v.ratedHigh();
        return List.of(new ConstraintResult(
                ConstraintKind.DIE_TEMPERATURE,
                ok,
                new ConstraintFact.Die(
                        d.hot(), s.tMax(), d.thetaJa(), d.power(), v.ratedHigh(), ok ? 0 : d.hot() - v.ratedHigh())));
    }

    private static double driftPart(Stage s, PartValues v, double dT) {
        return DcModel.of(s).perVos() * v.driftBound(dT) * dT;
    }

    private static double biasPart(Stage s, PartValues v, double t) {
        return BiasTerm.magnitude(s, v.ibAt(t), v.iosAt(t));
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        Die d = die(s, v);
        if (d == null) {
            return ErrorTerm.none(
                    this, s, false, s.loadResistance() == null ? "load-resistance-missing" : "supply-voltage-missing");
        }
        double dT = s.deltaT();
        double dTdie = Math.max(Math.abs(d.hot() - Stage.T_REF), Math.abs(d.cold() - Stage.T_REF));
        double drift = Math.max(0, driftPart(s, v, dTdie) - driftPart(s, v, dT));
        double ambientBias = Math.max(biasPart(s, v, s.tMin()), biasPart(s, v, s.tMax()));
        double dieBias = Math.max(biasPart(s, v, d.cold()), biasPart(s, v, d.hot()));
        double bias = Math.max(0, dieBias - ambientBias);
        double out = drift + bias;
        TermWorking w = TermWorking.of("self-heating")
                .put("dieCold", d.cold(), Dimension.TEMPERATURE)
                .put("dieHot", d.hot(), Dimension.TEMPERATURE)
                .put("thetaJa", d.thetaJa(), Dimension.THERMAL_RESISTANCE)
                // watts: the units know no power dimension; the report prints it in mW
                .put("P", d.power(), Dimension.NUMBER)
                .put("drift", drift, Dimension.VOLTAGE)
                .put("bias", bias, Dimension.VOLTAGE)
                .put("ibDie", v.ibAt(d.hot()), Dimension.CURRENT)
                .build();
        OperatingFigures o = v.operating();
        boolean est = o.thetaJa().basis().uncertain()
                || o.quiescentCurrent().basis().uncertain()
                || drift > 0 && v.drift().basis().uncertain()
                || bias > 0 && (v.ib().basis().uncertain() || v.ibExtrapolated(d.hot()));
        return ErrorTerm.result(this, s, out, out > 0 ? s.tMax() : Double.NaN, est, w);
    }
}
