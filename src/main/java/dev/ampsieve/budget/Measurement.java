package dev.ampsieve.budget;

import java.nio.file.Path;

/**
 * One quantity of a measured lot fitted by a normal distribution, beside the datasheet's figure
 * ({@link Measurements}). Facts only, SI units; the report words them.
 *
 * @param field        the catalog field measured: {@code vos}, {@code ib}, or {@code vos-drift} (each
 *                     unit's (vos(T) - vos(25 °C)) / (T - 25 °C) from the second temperature)
 * @param temperature  where it was measured, °C (25 for the plain columns; the second temperature for
 *                     {@code ib} measured there; for the drift, the second temperature)
 * @param units        units measured
 * @param mean         fitted mean
 * @param sigma        sample standard deviation
 * @param sigmaLow     lower end of the 95 % confidence interval of sigma (chi-square)
 * @param sigmaHigh    upper end: the figure the Monte Carlo uses for the offset
 * @param fitTest      the goodness-of-fit test's name
 * @param pValue       its p-value; NaN with fewer units than the test needs, or all units equal
 * @param datasheet    the datasheet's bound for the same quantity at that temperature (as the budget
 *                     resolved it); NaN where the catalog has none
 * @param beyond       units whose magnitude exceeds {@code datasheet}
 * @param largest      the largest magnitude measured
 * @param usedInYield  the Monte Carlo draws this quantity from the fit (the offset at 25 °C)
 * @param datasheetSigma the sigma the Monte Carlo would use from the datasheet alone (the offset's
 *                     max(typ, max/k)); NaN for the quantities not drawn from the lot
 * @param file         the lot file
 */
public record Measurement(
        String field,
        double temperature,
        int units,
        double mean,
        double sigma,
        double sigmaLow,
        double sigmaHigh,
        String fitTest,
        double pValue,
        double datasheet,
        int beyond,
        double largest,
        boolean usedInYield,
        double datasheetSigma,
        Path file) {}
