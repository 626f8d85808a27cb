package dev.ampsieve.budget;

import dev.ampsieve.stage.TrimCircuit;

/**
 * A trim circuit sized for one part in one stage ({@link TrimSizing#of}): facts only, the report
 * words them. Fields a kind does not have are NaN.
 *
 * @param kind                which circuit
 * @param offsetV             the worst untrimmed offset at 25 °C that the trim must cover, output volts
 *                            ({@link TrimSizing#offsetToCover})
 * @param rangeV              the correction the circuit reaches either way, output volts (+-rangeV); NaN for stored
 * @param resolutionV         the smallest step of the correction, output volts
 * @param driftOutVPerC       the drift the circuit adds at the worst unit's correction, output volts per °C
 * @param driftInVPerC        the same referred to the signal source (divided by |signal gain|)
 * @param noiseGain           the noise gain with the injection resistor in place; NaN where the circuit has none
 * @param noiseGainChange     the rise of the noise gain, rf/Rinj (minus node) or 0 (plus node); NaN without one
 * @param gainChange          the relative change of the signal gain the injection resistor makes; NaN without one
 * @param injectionResistance the chosen E96 injection resistor, ohm; NaN without one
 * @param idealResistance     the largest resistance that gives the range with its margin, before the E96 choice, ohm
 * @param transfer            output volts per volt at the injection resistor's driven end; NaN without one
 * @param sourceV             the largest voltage the trimmer's wiper or the DAC drives about the node's reference
 * @param uncoveredV          the part of {@code offsetV} the circuit cannot reach (0 when it covers), output volts
 * @param unusable            why the circuit cannot be used with this part or stage; {@link Unusable#NONE} when it can
 * @param partsCost           what the circuit's parts and hand work add to the trim cost per unit
 */
public record SizedTrim(
        TrimCircuit.Kind kind,
        double offsetV,
        double rangeV,
        double resolutionV,
        double driftOutVPerC,
        double driftInVPerC,
        double noiseGain,
        double noiseGainChange,
        double gainChange,
        double injectionResistance,
        double idealResistance,
        double transfer,
        double sourceV,
        double uncoveredV,
        Unusable unusable,
        double partsCost) {

    /** Why a circuit cannot trim this part in this stage. */
    public enum Unusable {
        NONE("none"),
        /** null-pins for a part whose catalog entry has no {@code null-pins: true} */
        NO_NULL_PINS("no-null-pins"),
        /** the minus node of a stage with no feedback resistor (a follower) */
        NO_FEEDBACK_RESISTOR("no-feedback-resistor"),
        /** the plus node of a stage with no resistance at the + pin */
        NO_PLUS_RESISTANCE("no-plus-resistance"),
        /** the range needs an injection resistor below {@link TrimSizing#MIN_RESISTANCE} */
        RESISTOR_TOO_SMALL("resistor-too-small");

        private final String key;

        Unusable(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }
    }

    /** Whether the circuit reaches the whole worst untrimmed offset. */
    public boolean covers() {
        return unusable == Unusable.NONE && uncoveredV <= 0;
    }
}
