package dev.ampsieve.stage;

import java.util.List;

/**
 * Whether the maker may calibrate each unit, how, to what resolution (output-referred
 * volts) and at what cost per unit (labour, a trimmer or DAC, test time).
 *
 * @param cold for {@link Method#TWO_TEMPERATURE}: the lower calibration temperature, °C; NaN means
 *             the stage's {@code temperature.min}
 * @param hot  the upper calibration temperature, °C; NaN means the stage's {@code temperature.max}
 * @param circuit  the circuit that applies the correction ({@code trim.circuit}; a stored correction by default)
 * @param circuits the circuits the advice compares ({@code trim.circuits}; the stage's circuit alone by default)
 */
public record Trim(
        boolean allowed,
        Method method,
        double resolution,
        double cost,
        double cold,
        double hot,
        TrimCircuit circuit,
        List<TrimCircuit.Kind> circuits) {

    public Trim {
        circuits = List.copyOf(circuits);
    }

    /** A trim applied by a stored correction. */
    public Trim(boolean allowed, Method method, double resolution, double cost, double cold, double hot) {
        this(allowed, method, resolution, cost, cold, hot, TrimCircuit.STORED, List.of(TrimCircuit.Kind.STORED));
    }

    /** How each unit is calibrated. */
    public enum Method {
        /** offset corrected at 25 °C */
        ONE_POINT("one-point"),
        /** zero and span at 25 °C: offset and the static gain errors */
        TWO_POINT("two-point"),
        /** offset corrected at two temperatures: offset and its linear drift */
        TWO_TEMPERATURE("two-temperature");

        private final String key;

        Method(String key) {
            this.key = key;
        }

        /** The word the stage file uses. */
        public String key() {
            return key;
        }
    }

    public static final Trim NONE = new Trim(false, Method.ONE_POINT, 0, 0);

    /** A trim whose calibration temperatures (two-temperature only) are the stage's range ends. */
    public Trim(boolean allowed, Method method, double resolution, double cost) {
        this(allowed, method, resolution, cost, Double.NaN, Double.NaN);
    }

    /** The lower calibration temperature, °C: {@link #cold} or the range's lower end. */
    public double coldIn(Stage s) {
        return Double.isNaN(cold) ? s.tMin() : cold;
    }

    /** The upper calibration temperature, °C: {@link #hot} or the range's upper end. */
    public double hotIn(Stage s) {
        return Double.isNaN(hot) ? s.tMax() : hot;
    }

    /** The same trim applied by another circuit (same settings, the kind changed). */
    public Trim withCircuit(TrimCircuit.Kind kind) {
        return new Trim(allowed, method, resolution, cost, cold, hot, circuit.withKind(kind), circuits);
    }

    /** The cost of trimming one unit: {@link #cost} (test time, storing) plus the circuit's parts and hand work. */
    public double totalCost() {
        return cost + circuit.partsCost();
    }
}
