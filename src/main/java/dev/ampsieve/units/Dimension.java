package dev.ampsieve.units;

/**
 * What a catalog or stage value measures. Every value is held in SI base units
 * (V, A, ohm, Hz, s, V/s ...); temperatures are held in degrees Celsius because
 * datasheets and stage ranges are written that way and only differences enter the model.
 */
public enum Dimension {
    VOLTAGE("a voltage", "V", "2.5 uV"),
    CURRENT("a current", "A", "2 nA"),
    RESISTANCE("a resistance", "ohm", "10 kohm"),
    FREQUENCY("a frequency", "Hz", "1.5 MHz"),
    CAPACITANCE("a capacitance", "F", "10 pF"),
    DECIBEL("a level in decibels", "dB", "110 dB"),
    TEMPERATURE("a temperature", "°C", "-40 C"),
    VOLTAGE_DRIFT("a voltage drift", "V/°C", "0.6 uV/C"),
    VOLTAGE_DENSITY("a voltage noise density", "V/√Hz", "12 nV/rtHz"),
    CURRENT_DENSITY("a current noise density", "A/√Hz", "3 fA/rtHz"),
    SLEW_RATE("a slew rate", "V/s", "0.5 V/us"),
    RATIO("a ratio", "", "0.1 %"),
    RATIO_DRIFT("a temperature coefficient", "/°C", "25 ppm/C"),
    TIME("a time", "s", "1000 h"),
    /** Junction-to-ambient thermal resistance, °C per watt (kelvin per watt: the same size). */
    THERMAL_RESISTANCE("a thermal resistance", "°C/W", "150 C/W"),
    NUMBER("a plain number", "", "100");

    private final String noun;
    private final String symbol;
    private final String example;

    Dimension(String noun, String symbol, String example) {
        this.noun = noun;
        this.symbol = symbol;
        this.example = example;
    }

    /** "a voltage", for messages. */
    public String noun() {
        return noun;
    }

    /** The SI symbol values are printed with. */
    public String symbol() {
        return symbol;
    }

    /** A well-formed input, for the "fix" half of a message. */
    public String example() {
        return example;
    }
}
