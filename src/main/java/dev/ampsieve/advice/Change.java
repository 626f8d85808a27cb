package dev.ampsieve.advice;

import dev.ampsieve.stage.Network;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One change to the stage that makes a part fit, found by re-running the budget; {@code report}
 * words it against the stage as it is now.
 *
 * @param values  the numbers needed, SI units, e.g. {@code noiseGain}, {@code rf}, {@code gainHere},
 *                {@code sourceResistance}, {@code tMin}/{@code tMax}, {@code limitV}
 * @param network for a change of gain: the gain network as built with the offered resistor; null
 *                otherwise
 * @param after   for a change of trim: the part as it stands with the change; null otherwise
 */
public record Change(Kind kind, Map<String, Double> values, Network network, Candidate after) {

    public Change {
        values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }

    public Change(Kind kind, Map<String, Double> values) {
        this(kind, values, null, null);
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
