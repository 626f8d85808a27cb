package dev.ampsieve.shell;

import dev.ampsieve.units.Dimension;
import java.util.List;

/**
 * The units offered by completion after a number, per dimension: the ones a datasheet uses,
 * in the spelling {@link dev.ampsieve.units.Units#parse} reads (a test holds them to that).
 */
final class UnitHints {
    private UnitHints() {}

    static List<String> of(Dimension d) {
        if (d == null) {
            return List.of();
        }
        return switch (d) {
            case VOLTAGE -> List.of("V", "mV", "uV", "nV");
            case CURRENT -> List.of("A", "mA", "uA", "nA", "pA", "fA");
            case RESISTANCE -> List.of("ohm", "kohm", "Mohm");
            case FREQUENCY -> List.of("Hz", "kHz", "MHz");
            case CAPACITANCE -> List.of("pF", "nF", "fF");
            case DECIBEL -> List.of("dB");
            case TEMPERATURE -> List.of("C", "K");
            case VOLTAGE_DRIFT -> List.of("uV/C", "nV/C");
            case VOLTAGE_DENSITY -> List.of("nV/rtHz", "uV/rtHz");
            case CURRENT_DENSITY -> List.of("pA/rtHz", "fA/rtHz");
            case SLEW_RATE -> List.of("V/us", "V/s");
            case RATIO -> List.of("%", "ppm");
            case RATIO_DRIFT -> List.of("ppm/C", "%/C");
            case TIME -> List.of("h", "d", "y");
            case THERMAL_RESISTANCE -> List.of("C/W", "K/W");
            case NUMBER -> List.of();
        };
    }
}
