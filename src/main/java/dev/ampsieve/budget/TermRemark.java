package dev.ampsieve.budget;

/**
 * A qualification of how a term was computed: where a figure came from, or which branch of
 * the formula applied. Facts only; the report words them.
 */
public enum TermRemark {
    /** A typical-only maximum figure taken as max-to-sigma x typical. */
    TYPICAL_TIMES_MAX_TO_SIGMA,
    /** A typical-only rejection (dB) taken as typical less 20 log10(max-to-sigma). */
    TYPICAL_LESS_MAX_TO_SIGMA,
    /** A rejection figure not in the catalog, assumed. */
    ASSUMED_NOT_IN_CATALOG,
    /** Drift not in the catalog, estimated as vos / T. */
    DRIFT_FROM_VOS,
    /** Drift capped by the guaranteed vos over temperature. */
    DRIFT_CAPPED,
    /** Bias current not in the catalog, estimated. */
    IB_ESTIMATED,
    /** The 25 °C bias limits are taken to hold over the whole range. */
    BIAS_25C_LIMITS_HOLD,
    /** No long-term drift figure in the catalog: the aging is estimated. */
    AGING_ESTIMATED,
    /** The supply of the operating-point table is assumed. */
    TEST_SUPPLY_ASSUMED,
    /** The common mode of the operating-point table is assumed. */
    TEST_COMMON_MODE_ASSUMED,
    /** The chopping ripple is assumed. */
    RIPPLE_ASSUMED,
    /** The chopping frequency is not given: no roll-off credited. */
    CHOPPING_FREQUENCY_MISSING,
    /** No filter after the stage. */
    NO_FILTER,
    /** The crossover step is assumed (2 x vos). */
    STEP_ASSUMED,
    /** Crossover given as a range of voltages (near and far differ). */
    CROSSOVER_RANGE,
    /** A follower: no gain resistors. */
    FOLLOWER,
    /** A difference amplifier: tolerance per pair. */
    RESISTOR_PAIRS,
    /** A transimpedance stage: the gain is rf itself. */
    GAIN_IS_RF,
    /** Leakage flows into the + input. */
    LEAKAGE_PLUS_INPUT,
    /** The amplifier's input capacitance is assumed. */
    INPUT_CAPACITANCE_ASSUMED,
    /** GBW not given: the noise is integrated over a flat band (pi/2 x fH). */
    GBW_MISSING,
    /** The closed loop, not the filter, sets the noise bandwidth. */
    LOOP_SETS_NOISE_BAND,
    /** The stage names no filter (as opposed to naming none explicitly). */
    FILTER_NOT_STATED,
    /** The null-pin V/T rule is for a bipolar pair; for this input it stands in as an estimate. */
    NULL_PIN_RULE_NOT_BIPOLAR,
    /** The static gain change is calibrated by the two-point trim. */
    GAIN_CHANGE_CALIBRATED,
    /** A two-temperature calibration removes the circuit's linear drift. */
    CIRCUIT_DRIFT_CALIBRATED
}
