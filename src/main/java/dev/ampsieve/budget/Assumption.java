package dev.ampsieve.budget;

import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.InputType;

/**
 * One thing a budget assumed or estimated in place of a figure the catalog or the stage did not
 * give, or one caveat the stage brings with it: which field it concerns, which rule stood in, and
 * the numbers involved, in SI units (dB for rejections). Facts only: the report package words them.
 * Every record names the catalog or stage path it concerns in {@link #field()}.
 */
public sealed interface Assumption {

    /** The catalog path (for example {@code noise.en}) or the stage path (for example {@code band.filter-order}). */
    String field();

    /** The rule that stood in. */
    Rule rule();

    /** The rules, in our own names. */
    enum Rule {
        /** k x typical is the limit, typical one sigma (error-model.md "Missing and typical-only figures"). */
        TYPICAL_AS_LIMIT,
        /** A rejection given as typical only: 20 log10(k) dB below it, so its error is k x typical's. */
        TYPICAL_LESS_MARGIN,
        /** Only the maximum over temperature is given; it stands for 25 °C too. */
        OVER_TEMPERATURE_AT_25,
        /** No offset at all: the offset term is not counted. */
        OFFSET_NOT_COUNTED,
        /** No gain-bandwidth: the bandwidth term is not counted, noise ends at 1.57 x fH. */
        BANDWIDTH_NOT_COUNTED,
        /** Drift estimated as vos / T (bipolar pair rule). */
        DRIFT_FROM_OFFSET,
        /** A conservative value by input type and architecture ({@link Assumed}). */
        BY_INPUT_KIND,
        /** ios taken equal to ib. */
        IOS_EQUALS_IB,
        /** A pessimistic default rejection or gain, dB. */
        PESSIMISTIC_REJECTION,
        /** Current noise as the shot noise of ib. */
        SHOT_NOISE_OF_IB,
        /** Current noise of at least 1 pA/√Hz. */
        CURRENT_NOISE_FLOOR,
        /** Long-term drift by input kind, scaled to the service life. */
        AGING_BY_KIND,
        /** A conservative default value ({@link Assumed}). */
        DEFAULT_VALUE,
        /** Bias current doubled every 10 °C above 25 °C (junction leakage). */
        DOUBLING_PER_10C,
        /** The trim residual of the bias currents estimated from their 25 °C maxima. */
        TRIM_RESIDUAL_FROM_25C,
        /** The datasheet's test supply taken at the end of the rated supply farthest from the stage's. */
        TEST_SUPPLY_FARTHEST,
        /** The datasheet's test common mode taken at the rail farthest from the stage's. */
        TEST_COMMON_MODE_FARTHEST,
        /** A rail-to-rail input's crossover assumed in a band below the positive rail. */
        CROSSOVER_BAND,
        /** No filter order: noise integrated to pi/2 x the closed-loop bandwidth. */
        NOISE_TO_LOOP_BANDWIDTH,
        /** A two-temperature calibration at a range end for a point not given. */
        CALIBRATION_AT_RANGE_ENDS,
        /** A two-temperature calibration removes the straight-line drift only. */
        STRAIGHT_LINE_CALIBRATION,
        /** AC coupling: DC terms count toward headroom only. */
        AC_COUPLED,
        /** The general caveats of a chopper or auto-zero part. */
        CHOPPER_CAVEATS,
        /** A chopper or auto-zero part without a chopping frequency. */
        CHOPPING_FREQUENCY_UNKNOWN,
        /** The band edge is above a tenth of the chopping frequency. */
        CHOPPING_NEAR_BAND,
        /** The chopping frequency or a harmonic aliases into the band at the stage's sample rate. */
        CHOPPING_ALIAS,
        /** A percentage-of-full-scale limit without a full-scale output. */
        LIMIT_NEEDS_FULL_SCALE,
        /** No full-scale output: the gain errors are not counted. */
        GAIN_TERMS_NOT_COUNTED,
        /** A constraint not checked for want of a catalog figure. */
        NOT_CHECKED,
        /** Headroom to each rail assumed ({@link Assumed#HEADROOM_V}). */
        HEADROOM_DEFAULT,
        /** A measured lot's normal fit is poor (p below 0.05) or could not be tested (too few units). */
        MEASURED_FIT,
        /** Units of a measured lot lie beyond the datasheet's maximum. */
        MEASURED_BEYOND_DATASHEET
    }

    /** A caveat or an absence that carries no number. */
    record Note(String field, Rule rule) implements Assumption {}

    /**
     * A figure given as typical only.
     *
     * @param typical the catalog's typical value
     * @param factor  the stage's max-to-sigma ratio k
     * @param used    the limit used, k x typical
     */
    record TypicalAsLimit(String field, double typical, double factor, double used) implements Assumption {
        @Override
        public Rule rule() {
            return Rule.TYPICAL_AS_LIMIT;
        }
    }

    /**
     * A rejection or gain given as typical only, dB.
     *
     * @param typical the catalog's typical value, dB
     * @param factor  the stage's max-to-sigma ratio k
     * @param used    the minimum used, typical - 20 log10(k), dB
     */
    record TypicalRejection(String field, double typical, double factor, double used) implements Assumption {
        @Override
        public Rule rule() {
            return Rule.TYPICAL_LESS_MARGIN;
        }
    }

    /**
     * A default by input kind ({@link Rule#BY_INPUT_KIND}).
     *
     * @param value     the value used
     * @param input     the part's input type
     * @param zeroDrift the part chops or auto-zeroes
     */
    record ByInputKind(String field, double value, InputType input, boolean zeroDrift) implements Assumption {
        @Override
        public Rule rule() {
            return Rule.BY_INPUT_KIND;
        }
    }

    /**
     * Drift estimated from the offset.
     *
     * @param vos   the offset it came from, V
     * @param used  the drift used, V/°C
     * @param input the part's input type (the rule holds for bipolar pairs)
     */
    record DriftFromOffset(double vos, double used, InputType input) implements Assumption {
        @Override
        public String field() {
            return "vos-drift";
        }

        @Override
        public Rule rule() {
            return Rule.DRIFT_FROM_OFFSET;
        }
    }

    /** ios assumed equal to ib, A ({@code used}). */
    record IosFromIb(double used) implements Assumption {
        @Override
        public String field() {
            return "ios";
        }

        @Override
        public Rule rule() {
            return Rule.IOS_EQUALS_IB;
        }
    }

    /**
     * Current noise estimated ({@link Rule#SHOT_NOISE_OF_IB} or {@link Rule#CURRENT_NOISE_FLOOR}).
     *
     * @param used the density used, A/√Hz
     * @param ib   the bias current it came from, A
     */
    record CurrentNoise(Rule rule, double used, double ib) implements Assumption {
        @Override
        public String field() {
            return "noise.in";
        }
    }

    /**
     * Long-term drift estimated by input kind.
     *
     * @param perThousandHours the estimate per √(1000 h), V
     * @param used             over the stage's service life, V
     */
    record Aging(double perThousandHours, double used, InputType input, boolean zeroDrift) implements Assumption {
        @Override
        public String field() {
            return "long-term-drift";
        }

        @Override
        public Rule rule() {
            return Rule.AGING_BY_KIND;
        }
    }

    /** A default value ({@link Rule#DEFAULT_VALUE}, or {@link Rule#PESSIMISTIC_REJECTION} in dB). */
    record Default(String field, Rule rule, double used) implements Assumption {}

    /**
     * Bias current over temperature by the doubling rule.
     *
     * @param at25        the 25 °C maximum, A
     * @param factor      2^((T - 25)/10)
     * @param used        the bias current at {@code temperature}, A
     * @param temperature the stage's upper temperature, °C
     * @param zeroDrift   a chopper or auto-zero part, for which the rule is pessimistic
     */
    record IbDoubling(double at25, double factor, double used, double temperature, boolean zeroDrift)
            implements Assumption {
        @Override
        public String field() {
            return "ib";
        }

        @Override
        public Rule rule() {
            return Rule.DOUBLING_PER_10C;
        }
    }

    /**
     * A trim's bias-current residual from the 25 °C maxima.
     *
     * @param doubling  the doubling rule is used too
     * @param signKnown ib flows with a known sign (it may change by its larger end, else by both ends' sum)
     */
    record TrimBiasResidual(boolean doubling, boolean signKnown) implements Assumption {
        @Override
        public String field() {
            return "ib";
        }

        @Override
        public Rule rule() {
            return Rule.TRIM_RESIDUAL_FROM_25C;
        }
    }

    /**
     * The test supply assumed.
     *
     * @param used        the supply used, V
     * @param stageSupply the stage's supply, V
     */
    record TestSupply(double used, double stageSupply) implements Assumption {
        @Override
        public String field() {
            return "test-conditions.supply";
        }

        @Override
        public Rule rule() {
            return Rule.TEST_SUPPLY_FARTHEST;
        }
    }

    /**
     * The test common mode assumed.
     *
     * @param used        the common mode used, V above the negative rail (0: the negative rail)
     * @param testSupply  the test supply, V (the positive rail)
     */
    record TestCommonMode(double used, double testSupply) implements Assumption {
        @Override
        public String field() {
            return "test-conditions.common-mode";
        }

        @Override
        public Rule rule() {
            return Rule.TEST_COMMON_MODE_FARTHEST;
        }
    }

    /**
     * A rail-to-rail input's crossover assumed.
     *
     * @param nearest  nearest distance below the positive rail, V
     * @param farthest farthest distance, V
     * @param step     the offset step used, 2 x vos, V
     */
    record Crossover(double nearest, double farthest, double step) implements Assumption {
        @Override
        public String field() {
            return "input-crossover";
        }

        @Override
        public Rule rule() {
            return Rule.CROSSOVER_BAND;
        }
    }

    /**
     * The noise band without a filter order.
     *
     * @param loopBandwidth closed-loop bandwidth, GBW / noise gain, Hz
     * @param noiseBand     the band noise is integrated to, pi/2 x it, Hz
     * @param filteredBand  where a first-order filter at band.high would end it, pi/2 x band.high, Hz
     */
    record NoiseBand(double loopBandwidth, double noiseBand, double filteredBand) implements Assumption {
        @Override
        public String field() {
            return "band.filter-order";
        }

        @Override
        public Rule rule() {
            return Rule.NOISE_TO_LOOP_BANDWIDTH;
        }
    }

    /**
     * The two-temperature calibration points, °C, when one or both are not given.
     *
     * @param coldGiven the stage gives trim.cold
     * @param hotGiven  the stage gives trim.hot
     */
    record CalibrationPoints(double cold, double hot, boolean coldGiven, boolean hotGiven) implements Assumption {
        @Override
        public String field() {
            return "trim";
        }

        @Override
        public Rule rule() {
            return Rule.CALIBRATION_AT_RANGE_ENDS;
        }
    }

    /** A chopper caveat without numbers ({@link Rule#CHOPPER_CAVEATS}, {@link Rule#CHOPPING_FREQUENCY_UNKNOWN}). */
    record Chopper(String field, Rule rule, Architecture architecture) implements Assumption {}

    /**
     * The band edge close to (or above) the chopping frequency.
     *
     * @param bandEdge          band.high, Hz
     * @param choppingFrequency Hz
     */
    record ChoppingNearBand(Architecture architecture, double bandEdge, double choppingFrequency)
            implements Assumption {
        @Override
        public String field() {
            return "chopping-frequency";
        }

        @Override
        public Rule rule() {
            return Rule.CHOPPING_NEAR_BAND;
        }
    }

    /**
     * The chopping frequency or one of its harmonics aliasing into the band.
     *
     * @param harmonic   1 for the chopping frequency itself
     * @param frequency  the harmonic's frequency, Hz
     * @param sampleRate the stage's sample rate, Hz
     * @param alias      where it lands, Hz
     * @param bandEdge   band.high, Hz
     */
    record ChoppingAlias(int harmonic, double frequency, double sampleRate, double alias, double bandEdge)
            implements Assumption {
        @Override
        public String field() {
            return "sample-rate";
        }

        @Override
        public Rule rule() {
            return Rule.CHOPPING_ALIAS;
        }
    }

    /** The slew rate not checked for want of the catalog's; {@code needed} V/s. */
    record SlewNotChecked(double needed) implements Assumption {
        @Override
        public String field() {
            return "slew";
        }

        @Override
        public Rule rule() {
            return Rule.NOT_CHECKED;
        }
    }

    /**
     * Headroom assumed for a constraint.
     *
     * @param field      input-headroom or output-headroom
     * @param constraint the constraint it serves (common-mode, output-swing)
     * @param used       V from each rail
     */
    record Headroom(String field, String constraint, double used) implements Assumption {
        @Override
        public Rule rule() {
            return Rule.HEADROOM_DEFAULT;
        }
    }

    /**
     * A measured lot's normal fit ({@link Measurements}) is poor or untested.
     *
     * @param temperature where the quantity was measured, °C
     * @param units       units in the lot
     * @param pValue      the Anderson-Darling p-value; NaN when too few units (or all equal) to test
     */
    record MeasuredFit(String field, double temperature, int units, double pValue) implements Assumption {
        @Override
        public Rule rule() {
            return Rule.MEASURED_FIT;
        }
    }

    /**
     * Units of a measured lot beyond the datasheet's maximum: the lot breaks the guarantee (or the
     * measurement added error), so the Monte Carlo draws the offset untruncated.
     *
     * @param temperature where, °C
     * @param units       units in the lot
     * @param beyond      units beyond the maximum
     * @param largest     the largest magnitude measured
     * @param datasheet   the datasheet's maximum (as the budget resolved it)
     */
    record MeasuredBeyondDatasheet(
            String field, double temperature, int units, int beyond, double largest, double datasheet)
            implements Assumption {
        @Override
        public Rule rule() {
            return Rule.MEASURED_BEYOND_DATASHEET;
        }
    }
}
