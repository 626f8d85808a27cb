package dev.ampsieve.budget;

import dev.ampsieve.catalog.Range;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;

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
            return ErrorTerm.result(this, s, 0.0, Double.NaN, false, "no crossover: the input has one pair");
        }
        if (s.supplyVoltage() == null) {
            return ErrorTerm.result(this, s, 0.0, Double.NaN, false, "supply.voltage not given: not checked");
        }
        double at = s.supplyVoltage() - o.crossoverNear();
        String where = o.crossoverNear() == o.crossoverFar()
                ? "crossover at " + Units.format(at, Dimension.VOLTAGE)
                : "crossover assumed " + Units.format(s.supplyVoltage() - o.crossoverFar(), Dimension.VOLTAGE) + " to "
                        + Units.format(at, Dimension.VOLTAGE);
        Range cm = Constraints.neededCommonMode(s);
        String range = cm == null
                ? ""
                : ", common mode " + Units.format(cm.min(), Dimension.VOLTAGE) + " to "
                        + Units.format(cm.max(), Dimension.VOLTAGE);
        if (!crossed(s, o.crossoverNear(), o.crossoverFar())) {
            return ErrorTerm.result(this, s, 0.0, Double.NaN, false, where + range + ": not crossed");
        }
        double out = s.noiseGain() * o.crossoverStep().bound();
        String note = where + range + ": NG x step "
                + Units.format(o.crossoverStep().bound(), Dimension.VOLTAGE)
                + (o.crossoverStep().basis() == Basis.ASSUMED ? " (assumed 2 x vos)" : "") + "; a trim leaves it";
        return ErrorTerm.result(
                this, s, out, Double.NaN, o.crossoverStep().basis().uncertain(), note);
    }
}
