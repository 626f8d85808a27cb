package dev.ampsieve.budget;

/**
 * The yield of a part as it is (untrimmed) when datasheet maxima are read as {@code maxToSigma}
 * standard deviations: the yield depends on that reading more than on the sampling noise, so
 * the single-part budget shows it at a few values besides the stage's.
 *
 * @param maxToSigma the max-to-sigma ratio k the units were drawn with
 * @param yield      fraction of simulated units within the limit
 * @param low        lower end of its 95 % Wilson interval
 * @param high       upper end
 * @param trials     units simulated (0 when decided without sampling)
 */
public record SigmaYield(double maxToSigma, double yield, double low, double high, int trials) {}
