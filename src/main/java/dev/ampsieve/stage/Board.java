package dev.ampsieve.stage;

/**
 * Error sources of the board around the amplifier rather than of the part: thermoelectric
 * voltages of unpaired junctions in the input path and surface leakage into a high-impedance
 * input. Each is off ({@link #NONE}) unless the stage names it.
 *
 * @param junctions         unpaired junctions of dissimilar metals in the input path (0: not counted)
 * @param seebeck           thermoelectric coefficient of one junction, V/°C
 * @param gradient          temperature difference across the junctions, °C
 * @param leakageResistance surface leakage resistance into the high-impedance input, ohm (infinite: not counted)
 * @param leakageVoltage    the voltage driving it (a nearby trace's potential relative to the node), V
 * @param leakageInput      the input it flows into
 */
public record Board(
        int junctions,
        double seebeck,
        double gradient,
        double leakageResistance,
        double leakageVoltage,
        Input leakageInput) {

    /** Which amplifier input a leakage current flows into. */
    public enum Input {
        PLUS("plus"),
        MINUS("minus");

        private final String key;

        Input(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }
    }

    /** No board-level source counted. */
    public static final Board NONE = new Board(0, 0, 0, Double.POSITIVE_INFINITY, 0, Input.PLUS);

    /** Whether thermal EMF is counted. */
    public boolean thermalEmf() {
        return junctions > 0;
    }

    /** Whether leakage is counted. */
    public boolean leakage() {
        return Double.isFinite(leakageResistance);
    }

    /** The leakage current, A: voltage over resistance (0 when not counted). */
    public double leakageCurrent() {
        return leakage() ? Math.abs(leakageVoltage) / leakageResistance : 0.0;
    }

    /**
     * The input a leakage current reaches when the stage does not say: the high-impedance node, the
     * + input where the source drives it (non-inverting, follower, difference), the summing node of an
     * inverting or transimpedance stage.
     */
    public static Input defaultInput(Topology t) {
        return switch (t) {
            case NON_INVERTING, FOLLOWER, DIFFERENCE -> Input.PLUS;
            case INVERTING, TRANSIMPEDANCE -> Input.MINUS;
        };
    }
}
