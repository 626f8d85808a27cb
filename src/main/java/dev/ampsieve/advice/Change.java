package dev.ampsieve.advice;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One change to the stage that makes a part fit, found by re-running the budget.
 *
 * @param values the numbers needed, SI units, e.g. {@code noiseGain}, {@code rf}, {@code gainHere},
 *               {@code sourceResistance}, {@code tMin}/{@code tMax}, {@code limitV}
 */
public record Change(Kind kind, String text, Map<String, Double> values) {

    public Change {
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }

    public enum Kind {
        LOWER_GAIN("lower-gain"),
        /** The gain split with a later stage: values gainHere, gainAfter, noiseGain, rf, limitHereV. */
        SPLIT_GAIN("split-gain"),
        LOWER_SOURCE_RESISTANCE("lower-source-resistance"),
        NARROWER_TEMPERATURE("narrower-temperature"),
        BETTER_RESISTORS("better-resistors"),
        /** Board-level: the thermal EMF allowed at the input; values thermalEmfV, gradient. */
        LESS_THERMAL_EMF("less-thermal-emf"),
        /** Board-level: the leakage resistance needed; values leakageResistance. */
        LESS_LEAKAGE("less-leakage"),
        ALLOW_TRIM("allow-trim"),
        TWO_POINT_TRIM("two-point-trim"),
        LOOSER_LIMIT("looser-limit"),
        LOWER_YIELD_TARGET("lower-yield-target"),
        /** Operating point: a higher load resistance, value loadResistance (a cooler die). */
        HIGHER_LOAD_RESISTANCE("higher-load-resistance"),
        /** Operating point: a steeper stage filter at band.high, value filterOrder (removes chopping ripple). */
        STEEPER_FILTER("steeper-filter");

        private final String key;

        Kind(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }
    }
}
