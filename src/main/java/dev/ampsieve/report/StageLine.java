package dev.ampsieve.report;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.text.Visible;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;

/** Two lines naming the stage a result is for: topology, gain, temperatures; limit, criterion, quantity. */
final class StageLine {
    private StageLine() {}

    static String of(Stage s, String label) {
        double e = s.limitVolts();
        return "Stage " + (label == null ? "" : Visible.of(label) + ": ")
                + s.topology().key() + ", noise gain "
                + Units.format(s.noiseGain(), Dimension.NUMBER, 4) + ", "
                + Units.format(s.tMin(), Dimension.TEMPERATURE)
                + " to " + Units.format(s.tMax(), Dimension.TEMPERATURE) + "\n"
                + "Limit " + Figures.volts(e) + " at the output (" + Figures.atInput(s, e / s.sourceGain())
                + " at the input), "
                + s.criterion() + ", quantity " + s.quantity();
    }
}
