package dev.ampsieve.budget;

import dev.ampsieve.catalog.Headroom;
import dev.ampsieve.catalog.InputCrossover;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Range;
import dev.ampsieve.catalog.TestConditions;
import dev.ampsieve.stage.Stage;
import java.util.List;

/**
 * The catalog figures of the operating-point terms after the missing-value rules, resolved once
 * with {@link PartValues} (each substitution listed there as an {@link Assumption}, only when the stage makes it count).
 * Volts above the negative rail for common modes; SI units.
 *
 * @param testSupply      total supply of the datasheet's 25 °C table, V: the catalog's, else
 *                        (ASSUMED) the end of the part's rated supply range farthest from the stage's
 *                        supply; NaN bound when the stage states no supply
 * @param testCommonMode  common mode of that table, V above the negative rail: the catalog's, else
 *                        (ASSUMED) the rail of the test supply farthest from the stage's common mode,
 *                        both measured from mid-supply; NaN bound when the stage states no supply
 * @param crossoverNear   the crossover's least distance below the positive rail, V; NaN: no crossover
 * @param crossoverFar    its largest distance (the same as near when the catalog gives it)
 * @param crossoverStep   the offset step at the crossover, V: the catalog's; for a rail-to-rail input
 *                        without one (ASSUMED) two offsets, 2 x vos, since each pair is held to vos.max
 * @param thetaJa         junction-to-ambient thermal resistance, °C/W (ASSUMED {@link Assumed#THETA_JA})
 * @param quiescentCurrent supply current per amplifier, A (ASSUMED {@link Assumed#QUIESCENT_CURRENT})
 * @param choppingRipple  input-referred ripple at the chopping frequency, V peak: 0 for a part that
 *                        does not chop; else the catalog's, or (ASSUMED) {@link Assumed#CHOPPING_RIPPLE}
 */
public record OperatingFigures(
        Figure testSupply,
        Figure testCommonMode,
        double crossoverNear,
        double crossoverFar,
        Figure crossoverStep,
        Figure thetaJa,
        Figure quiescentCurrent,
        Figure choppingRipple) {

    static OperatingFigures of(Part part, Stage stage, Figure vos, List<Assumption> w) {
        Double vs = stage.supplyVoltage();
        TestConditions tc = part.testConditions();
        Figure testSupply;
        if (tc != null && tc.supply() != null) {
            testSupply = Figure.of(tc.supply(), Basis.GUARANTEED);
        } else if (vs == null || part.supply() == null) {
            testSupply = Figure.of(Double.NaN, Basis.ASSUMED);
        } else {
            Range r = part.supply();
            double far = Math.abs(r.max() - vs) >= Math.abs(vs - r.min()) ? r.max() : r.min();
            testSupply = Figure.of(far, Basis.ASSUMED);
            w.add(new Assumption.TestSupply(far, vs));
        }
        Figure testCm;
        if (tc != null && tc.commonMode() != null) {
            testCm = Figure.of(tc.commonMode(), Basis.GUARANTEED);
        } else if (vs == null || Double.isNaN(testSupply.bound())) {
            testCm = Figure.of(Double.NaN, Basis.ASSUMED);
        } else {
            double fromMid = OperatingPointTerm.commonModeFromMid(stage);
            double rail = fromMid >= 0 ? 0.0 : testSupply.bound(); // the rail on the other side of mid-supply
            testCm = Figure.of(rail, Basis.ASSUMED);
            w.add(new Assumption.TestCommonMode(rail, testSupply.bound()));
        }

        InputCrossover x = part.inputCrossover();
        double near = Double.NaN;
        double far = Double.NaN;
        Figure step = Figure.of(0.0, Basis.GUARANTEED);
        if (x != null) {
            near = x.fromPositiveRail();
            far = x.fromPositiveRail();
            step = Figure.of(x.offsetStep(), Basis.GUARANTEED);
        } else if (railToRailInput(part)) {
            near = Assumed.CROSSOVER_NEAREST;
            far = Assumed.CROSSOVER_FARTHEST;
            step = Figure.of(2 * vos.bound(), Basis.ASSUMED);
            if (vs != null && InputCrossoverTerm.crossed(stage, near, far)) {
                w.add(new Assumption.Crossover(near, far, step.bound()));
            }
        }

        Figure theta = part.thetaJa() != null
                ? Figure.of(part.thetaJa(), Basis.GUARANTEED)
                : Figure.of(Assumed.THETA_JA, Basis.ASSUMED);
        Figure iq = part.quiescentCurrent() != null
                ? Figure.of(part.quiescentCurrent(), Basis.GUARANTEED)
                : Figure.of(Assumed.QUIESCENT_CURRENT, Basis.ASSUMED);
        if (stage.loadResistance() != null && vs != null) {
            if (theta.basis() == Basis.ASSUMED) {
                w.add(new Assumption.Default("theta-ja", Assumption.Rule.DEFAULT_VALUE, Assumed.THETA_JA));
            }
            if (iq.basis() == Basis.ASSUMED) {
                w.add(new Assumption.Default(
                        "quiescent-current", Assumption.Rule.DEFAULT_VALUE, Assumed.QUIESCENT_CURRENT));
            }
        }

        Figure ripple;
        if (!part.selfCorrecting()) {
            ripple = Figure.of(0.0, Basis.GUARANTEED);
        } else if (part.choppingRipple() != null) {
            ripple = Figure.of(part.choppingRipple(), Basis.GUARANTEED);
        } else {
            ripple = Figure.of(Assumed.CHOPPING_RIPPLE, Basis.ASSUMED);
            w.add(new Assumption.Default("chopping-ripple", Assumption.Rule.DEFAULT_VALUE, Assumed.CHOPPING_RIPPLE));
        }
        return new OperatingFigures(testSupply, testCm, near, far, step, theta, iq, ripple);
    }

    /** An input that reaches the positive rail (headroom at most 0 there): complementary pairs, hence a crossover. */
    static boolean railToRailInput(Part p) {
        Headroom h = p.inputHeadroom();
        return h != null && h.high() <= 0;
    }
}
