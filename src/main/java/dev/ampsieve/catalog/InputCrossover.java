package dev.ampsieve.catalog;

/**
 * A rail-to-rail input's hand-over between its two input pairs: it sits {@code fromPositiveRail}
 * volts below the positive rail, and the offset changes there by up to {@code offsetStep} (V,
 * a magnitude).
 */
public record InputCrossover(double fromPositiveRail, double offsetStep) {}
