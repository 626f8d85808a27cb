package dev.ampsieve.advice;

import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;

/** Copies of a stage with one thing changed, for "what would make it fit" searches. */
final class StageEdit {
    private StageEdit() {}

    static Stage withLoadResistance(Stage s, double ohms) {
        return s.toBuilder().loadResistance(ohms).build();
    }

    static Stage withFilterOrder(Stage s, int order) {
        return s.toBuilder().filterOrder(order).build();
    }

    static Stage withRf(Stage s, double rf) {
        return s.toBuilder().rf(rf).build();
    }

    /**
     * Rs changed. In an inverting stage Rs is in series with Rg, so the signal gain moves with
     * it and the output with the gain ({@link #withOutputScaled}).
     */
    static Stage withSourceResistance(Stage s, double rs) {
        Stage e = withSourceResistanceOnly(s, rs);
        return s.topology() == dev.ampsieve.stage.Topology.INVERTING ? withOutputScaled(e, s) : e;
    }

    private static Stage withSourceResistanceOnly(Stage s, double rs) {
        return s.toBuilder().sourceResistance(rs).build();
    }

    /**
     * Rf changed with what a change of gain moves with it: the input signal stays, so the
     * full-scale output and the output swing scale with the signal gain ({@link #withOutputScaled}).
     */
    static Stage withGain(Stage s, double rf) {
        return withOutputScaled(withRf(s, rf), s);
    }

    /**
     * {@code edited} (a copy of {@code original} with a resistor changed) with the full-scale
     * output scaled by the ratio of the signal gains, the input signal being the same. A stated
     * output range is kept when the gain falls (the smaller swing lies inside it); when the gain
     * rises each end moves out by the whole span times (ratio - 1), since the stage does not say
     * where in its range the output's zero sits. A limit given as a share of full scale follows
     * the full-scale output; one given at the input follows the gain; one at the output (or in
     * LSB) stays where it is.
     */
    static Stage withOutputScaled(Stage edited, Stage original) {
        double ratio = edited.sourceGain() / original.sourceGain();
        if (!Double.isFinite(ratio) || ratio == 1.0) {
            return edited;
        }
        Stage s = edited;
        Double vfs = s.fullScaleOutput() == null ? null : s.fullScaleOutput() * ratio;
        dev.ampsieve.catalog.Range out = s.outputRange();
        if (out != null && ratio > 1) {
            double widen = (out.max() - out.min()) * (ratio - 1);
            out = new dev.ampsieve.catalog.Range(out.min() - widen, out.max() + widen);
        }
        return s.toBuilder().outputRange(out).fullScaleOutput(vfs).build();
    }

    static Stage withTemperature(Stage s, double tMin, double tMax) {
        return s.toBuilder().tMin(tMin).tMax(tMax).build();
    }

    static Stage withLimit(Stage s, Limit limit) {
        return s.toBuilder().limit(limit).build();
    }

    /** The stage's trim, {@link Trim#NONE} when the stage has none. */
    static Trim trim(Stage s) {
        return s.trim() == null ? Trim.NONE : s.trim();
    }

    /** Resistor ratio tolerance and tempco both scaled by {@code k}. */
    static Stage withResistors(Stage s, double k) {
        return s.toBuilder()
                .ratioTolerance(s.ratioTolerance() * k)
                .ratioTempco(s.ratioTempco() * k)
                .build();
    }

    /** The board's thermal-EMF gradient changed. */
    static Stage withGradient(Stage s, double gradient) {
        dev.ampsieve.stage.Board b = s.board();
        return s.toBuilder()
                .board(new dev.ampsieve.stage.Board(
                        b.junctions(),
                        b.seebeck(),
                        gradient,
                        b.leakageResistance(),
                        b.leakageVoltage(),
                        b.leakageInput()))
                .build();
    }

    /** The board's leakage resistance changed. */
    static Stage withLeakageResistance(Stage s, double ohms) {
        dev.ampsieve.stage.Board b = s.board();
        return s.toBuilder()
                .board(new dev.ampsieve.stage.Board(
                        b.junctions(), b.seebeck(), b.gradient(), ohms, b.leakageVoltage(), b.leakageInput()))
                .build();
    }

    static Stage withCriterion(Stage s, Criterion criterion) {
        return s.toBuilder().criterion(criterion).build();
    }

    static Stage withTrim(Stage s, Trim trim) {
        return s.toBuilder().trim(trim).build();
    }

    /**
     * The stage with its yield sampling capped at {@code trials} units: the no-fit advice's
     * bisection steps sit near the yield target, where an uncapped run goes on to max-trials at
     * each step. An answer left undecided there counts as not fitting, so a capped step can only
     * offer a change larger than needed, never one that flatters the part.
     */
    static Stage capSampling(Stage s) {
        return s.toBuilder().maxTrials(s.trials()).build();
    }
}
