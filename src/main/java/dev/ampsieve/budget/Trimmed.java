package dev.ampsieve.budget;

/**
 * Totals left after a calibration, output-referred volts.
 *
 * @param yield Monte Carlo yield after the trim; null unless the stage is judged by a yield
 *              criterion and allows a trim
 */
public record Trimmed(double worstCaseV, double rssV, YieldResult yield) {

    public Trimmed(double worstCaseV, double rssV) {
        this(worstCaseV, rssV, null);
    }

    public Trimmed withYield(YieldResult y) {
        return new Trimmed(worstCaseV, rssV, y);
    }
}
