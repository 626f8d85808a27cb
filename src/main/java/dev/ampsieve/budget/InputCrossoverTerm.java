package dev.ampsieve.budget;

import dev.ampsieve.catalog.Range;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;

/**
 * The offset step of a rail-to-rail input's crossover: such an input has two complementary pairs
 * and hands over from one to the other at a common mode some distance below the positive rail;
 * each pair has its own offset, so the offset jumps there by up to the published step (Kitchin &amp;
 * Counts, <i>A Designer's Guide to Instrumentation Amplifiers</i>, and Franco, 4th ed., ch. 5 on
 * rail-to-rail inputs [from memory]). When the common-mode range the stage's pins must take
 * ({@link Constraints#neededCommonMode}) reaches the crossover, {@code NG x step} at the output.
 * A one-point trim corrects the offset at one common mode, on one side: the step stays, so a trim
 * removes nothing of it. Without a stage supply the crossover's place is unknown: not counted.
 */
public final class InputCrossoverTerm implements ErrorTerm {
    public static final String KEY = "input-crossover";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "input crossover";
    }

    @Override
    public boolean dc() {
        return true;
    }

    @Override
    public TermKind kind() {
        return TermKind.OPERATING_POINT;
    }

    /**
     * Whether the stage's common-mode range reaches a crossover somewhere {@code near} to {@code far}
     * volts below the positive rail (ends included: at the crossover itself the offset is between
     * the pairs'); false without a supply or a range.
     */
    static boolean crossed(Stage s, double near, double far) {
        Range cm = Constraints.neededCommonMode(s);
        if (cm == null || s.supplyVoltage() == null || Double.isNaN(near)) {
            return false;
        }
        double lowest = s.supplyVoltage() - far;
        double highest = s.supplyVoltage() - near;
        return cm.min() <= highest && cm.max() >= lowest;
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        OperatingFigures o = v.operating();
        if (Double.isNaN(o.crossoverNear())) {
            return ErrorTerm.none(this, s, false, "one-input-pair");
        }
        if (s.supplyVoltage() == null) {
            return ErrorTerm.none(this, s, false, "supply-voltage-missing");
        }
        double at = s.supplyVoltage() - o.crossoverNear();
        boolean crossed = crossed(s, o.crossoverNear(), o.crossoverFar());
        TermWorking.Builder w = TermWorking.of(crossed ? "crossover" : "crossover-not-crossed");
        if (o.crossoverNear() != o.crossoverFar()) {
            w.put("crossoverFrom", s.supplyVoltage() - o.crossoverFar(), Dimension.VOLTAGE)
                    .remark(TermRemark.CROSSOVER_RANGE);
        }
        w.put("crossover", at, Dimension.VOLTAGE);
        Range cm = Constraints.neededCommonMode(s);
        if (cm != null) {
            w.put("cmMin", cm.min(), Dimension.VOLTAGE).put("cmMax", cm.max(), Dimension.VOLTAGE);
        }
        if (!crossed) {
            return ErrorTerm.result(this, s, 0.0, Double.NaN, false, w.build());
        }
        double out = s.noiseGain() * o.crossoverStep().bound();
        w.put("NG", s.noiseGain(), Dimension.NUMBER)
                .put("step", o.crossoverStep().bound(), Dimension.VOLTAGE)
                .remark(o.crossoverStep().basis() == Basis.ASSUMED, TermRemark.STEP_ASSUMED);
        return ErrorTerm.result(
                this, s, out, Double.NaN, o.crossoverStep().basis().uncertain(), w.build());
    }
}
