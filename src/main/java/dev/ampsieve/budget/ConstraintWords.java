package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;

/**
 * Constraint details that are still worded below the report (issue 11: constraints are not yet
 * returned as data). Kept out of the term classes so that each term returns its formula's
 * operands only; the domain's count of {@code Units.format} calls is held by a ratchet test.
 */
final class ConstraintWords {

    private ConstraintWords() {}

    /** The die-temperature constraint's detail: hottest die temperature, how it arises, the rating. */
    static String dieTemperature(Stage s, SelfHeatingTerm.Die d, double ratedHigh, boolean ok) {
        return "die up to " + Units.format(d.hot(), Dimension.TEMPERATURE) + " (ambient "
                + Units.format(s.tMax(), Dimension.TEMPERATURE) + " + "
                + Units.format(d.thetaJa(), Dimension.THERMAL_RESISTANCE)
                + " x " + Units.format(d.power() * 1e3, Dimension.NUMBER) + " mW), rated to "
                + Units.format(ratedHigh, Dimension.TEMPERATURE)
                + (ok ? "" : ": " + Units.format(d.hot() - ratedHigh, Dimension.NUMBER) + " °C too hot");
    }
}
