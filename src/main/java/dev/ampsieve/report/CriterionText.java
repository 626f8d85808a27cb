package dev.ampsieve.report;

import dev.ampsieve.stage.Criterion;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;

/** The words for a stage's criterion, as every report and the shell show it. */
public final class CriterionText {
    private CriterionText() {}

    /** "worst-case", "rss", or "yield 99.9 %" (the target to 4 significant digits; never 100 % below it). */
    public static String of(Criterion c) {
        return switch (c.kind()) {
            case WORST_CASE -> "worst-case";
            case RSS -> "rss";
            case YIELD -> "yield " + Units.format(c.yieldTarget(), Dimension.RATIO, 4);
        };
    }
}
