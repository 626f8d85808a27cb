package dev.ampsieve.budget;

/** Totals left after a calibration, output-referred volts. */
public record Trimmed(double worstCaseV, double rssV) {
}
