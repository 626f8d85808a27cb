package dev.ampsieve.advice;

import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;

/** Copies of a stage with one thing changed, for "what would make it fit" searches. */
final class StageEdit {
    private StageEdit() {
    }

    static Stage withRf(Stage s, double rf) {
        return new Stage(s.topology(), rf, s.rg(), s.sourceResistance(), s.balanceResistance(), s.tMin(), s.tMax(),
                s.supplyVoltage(), s.supplyVariation(), s.commonModeSwing(), s.commonModeRange(), s.outputRange(),
                s.bandLow(), s.bandHigh(), s.filterOrder(), s.fullScaleOutput(), s.ratioTolerance(), s.ratioTempco(), s.serviceLife(),
                s.limit(), s.criterion(), s.maxToSigma(), s.trials(), s.maxTrials(), s.seed(), s.trim(), s.quantity(), s.maxPrice(),
                s.acCoupled(), s.where());
    }

    static Stage withSourceResistance(Stage s, double rs) {
        return new Stage(s.topology(), s.rf(), s.rg(), rs, s.balanceResistance(), s.tMin(), s.tMax(),
                s.supplyVoltage(), s.supplyVariation(), s.commonModeSwing(), s.commonModeRange(), s.outputRange(),
                s.bandLow(), s.bandHigh(), s.filterOrder(), s.fullScaleOutput(), s.ratioTolerance(), s.ratioTempco(), s.serviceLife(),
                s.limit(), s.criterion(), s.maxToSigma(), s.trials(), s.maxTrials(), s.seed(), s.trim(), s.quantity(), s.maxPrice(),
                s.acCoupled(), s.where());
    }

    static Stage withTemperature(Stage s, double tMin, double tMax) {
        return new Stage(s.topology(), s.rf(), s.rg(), s.sourceResistance(), s.balanceResistance(), tMin, tMax,
                s.supplyVoltage(), s.supplyVariation(), s.commonModeSwing(), s.commonModeRange(), s.outputRange(),
                s.bandLow(), s.bandHigh(), s.filterOrder(), s.fullScaleOutput(), s.ratioTolerance(), s.ratioTempco(), s.serviceLife(),
                s.limit(), s.criterion(), s.maxToSigma(), s.trials(), s.maxTrials(), s.seed(), s.trim(), s.quantity(), s.maxPrice(),
                s.acCoupled(), s.where());
    }

    static Stage withLimit(Stage s, Limit limit) {
        return new Stage(s.topology(), s.rf(), s.rg(), s.sourceResistance(), s.balanceResistance(), s.tMin(), s.tMax(),
                s.supplyVoltage(), s.supplyVariation(), s.commonModeSwing(), s.commonModeRange(), s.outputRange(),
                s.bandLow(), s.bandHigh(), s.filterOrder(), s.fullScaleOutput(), s.ratioTolerance(), s.ratioTempco(), s.serviceLife(),
                limit, s.criterion(), s.maxToSigma(), s.trials(), s.maxTrials(), s.seed(), s.trim(), s.quantity(), s.maxPrice(),
                s.acCoupled(), s.where());
    }

    /** The stage's trim, {@link Trim#NONE} when the stage has none. */
    static Trim trim(Stage s) {
        return s.trim() == null ? Trim.NONE : s.trim();
    }

    /** Resistor ratio tolerance and tempco both scaled by {@code k}. */
    static Stage withResistors(Stage s, double k) {
        return new Stage(s.topology(), s.rf(), s.rg(), s.sourceResistance(), s.balanceResistance(), s.tMin(), s.tMax(),
                s.supplyVoltage(), s.supplyVariation(), s.commonModeSwing(), s.commonModeRange(), s.outputRange(),
                s.bandLow(), s.bandHigh(), s.filterOrder(), s.fullScaleOutput(), s.ratioTolerance() * k, s.ratioTempco() * k,
                s.serviceLife(), s.limit(), s.criterion(), s.maxToSigma(), s.trials(), s.maxTrials(), s.seed(), s.trim(), s.quantity(),
                s.maxPrice(), s.acCoupled(), s.where());
    }

    static Stage withCriterion(Stage s, Criterion criterion) {
        return new Stage(s.topology(), s.rf(), s.rg(), s.sourceResistance(), s.balanceResistance(), s.tMin(), s.tMax(),
                s.supplyVoltage(), s.supplyVariation(), s.commonModeSwing(), s.commonModeRange(), s.outputRange(),
                s.bandLow(), s.bandHigh(), s.filterOrder(), s.fullScaleOutput(), s.ratioTolerance(), s.ratioTempco(), s.serviceLife(),
                s.limit(), criterion, s.maxToSigma(), s.trials(), s.maxTrials(), s.seed(), s.trim(), s.quantity(), s.maxPrice(),
                s.acCoupled(), s.where());
    }

    static Stage withTrim(Stage s, Trim trim) {
        return new Stage(s.topology(), s.rf(), s.rg(), s.sourceResistance(), s.balanceResistance(), s.tMin(), s.tMax(),
                s.supplyVoltage(), s.supplyVariation(), s.commonModeSwing(), s.commonModeRange(), s.outputRange(),
                s.bandLow(), s.bandHigh(), s.filterOrder(), s.fullScaleOutput(), s.ratioTolerance(), s.ratioTempco(), s.serviceLife(),
                s.limit(), s.criterion(), s.maxToSigma(), s.trials(), s.maxTrials(), s.seed(), trim, s.quantity(), s.maxPrice(),
                s.acCoupled(), s.where());
    }

    /**
     * The stage with its yield sampling capped at {@code trials} units: the no-fit advice's
     * bisection steps sit near the yield target, where an uncapped run goes on to max-trials at
     * each step. An answer left undecided there counts as not fitting, so a capped step can only
     * offer a change larger than needed, never one that flatters the part.
     */
    static Stage capSampling(Stage s) {
        return new Stage(s.topology(), s.rf(), s.rg(), s.sourceResistance(), s.balanceResistance(), s.tMin(), s.tMax(),
                s.supplyVoltage(), s.supplyVariation(), s.commonModeSwing(), s.commonModeRange(), s.outputRange(),
                s.bandLow(), s.bandHigh(), s.filterOrder(), s.fullScaleOutput(), s.ratioTolerance(), s.ratioTempco(), s.serviceLife(),
                s.limit(), s.criterion(), s.maxToSigma(), s.trials(), s.trials(), s.seed(), s.trim(), s.quantity(), s.maxPrice(),
                s.acCoupled(), s.where());
    }
}
