package dev.ampsieve.budget;

/**
 * Totals left after a calibration, output-referred volts.
 *
 * @param yield   Monte Carlo yield after the trim; null unless the stage is judged by a yield
 *                criterion and allows a trim
 * @param circuit the stage's trim circuit sized for the part; null where no budget sized one
 */
public record Trimmed(double worstCaseV, double rssV, YieldResult yield, SizedTrim circuit) {

    public Trimmed(double worstCaseV, double rssV) {
        this(worstCaseV, rssV, null, null);
    }

    public Trimmed(double worstCaseV, double rssV, YieldResult yield) {
        this(worstCaseV, rssV, yield, null);
    }

    public Trimmed withYield(YieldResult y) {
        return new Trimmed(worstCaseV, rssV, y, circuit);
    }
}
