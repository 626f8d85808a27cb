package dev.ampsieve.stage;

import dev.ampsieve.units.Quantity;
import dev.ampsieve.yaml.ProblemFact;

/**
 * A number in a stage file that the loader refuses or questions, as facts: which rule, the values
 * with their dimensions (SI units, temperatures in °C) and, where the fix suggests one, the key's
 * example from {@link StageKeys}. No words: {@code report.ProblemText} words each kind, the
 * problem's field and place say where it is.
 */
public sealed interface StageFact extends ProblemFact {

    /** Which bound a value passed; each has its own reason and fix in the report. */
    enum Bound {
        /** band.low or band.high above {@link StageLoader#MAX_FREQUENCY}. */
        BAND_EDGE,
        /** resistor-ratio.tempco above {@link StageLoader#MAX_TEMPCO}. */
        RATIO_TEMPCO,
        /** service-life above {@link StageLoader#MAX_LIFE}. */
        SERVICE_LIFE,
        /** load-resistance below {@link StageLoader#MIN_LOAD}: a short. */
        LOAD_SHORT,
        /** load-resistance above {@link StageLoader#MAX_RESISTANCE}: no load. */
        LOAD_OPEN,
        /** sample-rate above {@link StageLoader#MAX_FREQUENCY}. */
        SAMPLE_RATE,
        /** A resistor key (rf, rg, r1..r4, source- and balance-resistance) above {@link StageLoader#MAX_RESISTANCE}; with the key's example. */
        RESISTOR,
        /** A per-leg source resistance of a difference stage above {@link StageLoader#MAX_RESISTANCE}. */
        LEG_RESISTOR,
        /** A transimpedance source's shunt resistance above {@link StageLoader#MAX_SHUNT}. */
        SHUNT,
        /** source-capacitance or cf above {@link StageLoader#MAX_CAPACITANCE}. */
        CAPACITANCE,
        /** A level measured against the supply above {@link StageLoader#MAX_VOLTAGE}; with the key's example. */
        VOLTAGE,
        /** max-price or trim.cost above {@link StageLoader#MAX_MONEY}; with the key's example. */
        MONEY,
        /** gain above {@link StageLoader#MAX_GAIN}. */
        GAIN,
        /** rf/rg above {@link StageLoader#MAX_GAIN}. */
        RF_RG_GAIN,
        /** A difference stage's r2/r1 above {@link StageLoader#MAX_GAIN}. */
        R2_R1_GAIN,
        /** thermal-emf.seebeck above {@link StageLoader#MAX_SEEBECK}. */
        SEEBECK,
        /** thermal-emf.gradient above {@link StageLoader#MAX_GRADIENT}. */
        GRADIENT,
        /** |leakage.voltage| above {@link StageLoader#MAX_VOLTAGE}. */
        LEAKAGE_VOLTAGE,
        /** The limit at the output below {@link StageLoader#MIN_LIMIT}. */
        LIMIT_TINY,
        /** A warning: the limit at the output is not below the stage's supply (the bound). */
        LIMIT_OVER_SUPPLY,
        /** A warning: the limit at the output is not below the stage's full-scale output (the bound). */
        LIMIT_OVER_FULL_SCALE
    }

    /**
     * A value past a bound, both in one dimension.
     *
     * @param example the key's example value for the fix ({@link Bound#RESISTOR}, {@link Bound#VOLTAGE},
     *                {@link Bound#MONEY}), else empty
     */
    record Beyond(Bound bound, Quantity value, Quantity limit, String example) implements StageFact {
        public Beyond {
            example = example == null ? "" : example;
        }
    }

    /**
     * An ambient outside {@link StageLoader#MIN_AMBIENT}..{@link StageLoader#MAX_AMBIENT}, °C.
     *
     * @param calibration true for trim.cold or trim.hot, false for the temperature range
     * @param example     the key's example value
     */
    record Ambient(double celsius, double min, double max, boolean calibration, String example) implements StageFact {}

    /** Which two ends are out of order. */
    enum Ends {
        /** A block's min above its max (temperature, a voltage range). */
        MIN_MAX,
        /** band.low not below band.high. */
        LOW_HIGH
    }

    /** Two ends of a range in the wrong order, in one dimension. */
    record Order(Ends ends, Quantity low, Quantity high) implements StageFact {}

    /**
     * supply.variation at or above supply.voltage, volts.
     *
     * @param suggested a variation to suggest: 5 % of the supply
     */
    record SupplyVariation(double variation, double supply, double suggested) implements StageFact {}

    /** resistor-ratio.tolerance of 1 (100 %) or more, a ratio. */
    record RatioTolerance(double tolerance) implements StageFact {}

    /** limit.percent-of-full-scale outside (0, 1], a ratio. */
    record FullScaleShare(double share) implements StageFact {}

    /** An output-range end outside 0..supply, volts. */
    record OutsideRails(double supply) implements StageFact {}

    /**
     * A limit above {@link StageLoader#MAX_LIMIT} at the output.
     *
     * @param written  the limit as written (volts, amperes, or a plain number of LSBs or a share)
     * @param atOutput true when it was written at the output, so {@code outputV} is {@code written}
     * @param outputV  the limit at the output, volts
     * @param max      the largest limit accepted at the output, volts
     */
    record LimitTooLarge(Quantity written, boolean atOutput, double outputV, double max) implements StageFact {}

    /**
     * A warning: a gain above {@link StageLoader#WARN_GAIN}.
     *
     * @param gain      the gain the file sets (the resistor ratio rf/rg of an inverting stage)
     * @param noiseGain the noise gain, which divides the gain-bandwidth
     */
    record HighGain(double gain, double warnAbove, double noiseGain) implements StageFact {}

    /**
     * A warning: too few trials to confirm the yield target even when every unit passes.
     *
     * @param lowerEnd the Wilson interval's lower end when all {@code trials} units pass
     * @param needed   the fewest trials that can confirm the target
     * @param most     the most trials allowed
     */
    record TooFewTrials(int trials, double target, double lowerEnd, long needed, long most) implements StageFact {}

    /**
     * The two calibration temperatures of a two-temperature trim not cold below hot, °C.
     *
     * @param coldFromRange true when trim.cold is not given and temperature.min stands in
     * @param hotFromRange  true when trim.hot is not given and temperature.max stands in
     */
    record CalibrationOrder(double cold, boolean coldFromRange, double hot, boolean hotFromRange)
            implements StageFact {}

    /** A number of the stage outside the range its rule allows. */
    enum Rule {
        /** max-to-sigma outside 1..10: value, low 1, high 10 */
        MAX_TO_SIGMA,
        /** max-trials below trials: value max-trials, low trials */
        MAX_TRIALS,
        /** a difference gain not above 0 or above its ceiling: value gain, high the ceiling */
        DIFFERENCE_GAIN,
        /** a follower's gain other than 1: value gain */
        FOLLOWER_GAIN,
        /** a non-inverting gain below 1: value gain */
        NON_INVERTING_GAIN,
        /** trim.margin outside 1..its ceiling: value margin, low 1, high the ceiling */
        TRIM_MARGIN
    }

    /**
     * A number outside what its rule allows; {@code report.ProblemText} words each rule.
     *
     * @param value the number written (or derived, for a gain)
     * @param low   the least allowed; NaN where the rule has none
     * @param high  the most allowed; NaN where the rule has none
     */
    record Outside(Rule rule, double value, double low, double high) implements StageFact {}
}
