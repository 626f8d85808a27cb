package dev.ampsieve.report;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.text.Visible;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;

/** Two lines naming the stage a result is for: topology, gain, temperatures; limit, criterion, quantity. */
final class StageLine {
    private StageLine() {}

    static String of(Stage s, String label) {
        return "Stage " + head(s, label) + "\n" + "Limit " + limit(s);
    }

    /** "label: topology, noise gain G, T1 to T2" (the label left out when null). */
    static String head(Stage s, String label) {
        return (label == null ? "" : Visible.of(label) + ": ")
                + s.topology().key() + ", noise gain "
                + Units.format(s.noiseGain(), Dimension.NUMBER, 4) + ", "
                + Units.format(s.tMin(), Dimension.TEMPERATURE)
                + " to " + Units.format(s.tMax(), Dimension.TEMPERATURE);
    }

    /** "E at the output (E/G at the input), criterion, quantity N". */
    static String limit(Stage s) {
        double e = s.limitVolts();
        return Figures.volts(e) + " at the output (" + Figures.atInput(s, e / s.sourceGain()) + " at the input), "
                + CriterionText.of(s.criterion()) + ", quantity " + s.quantity();
    }
}
