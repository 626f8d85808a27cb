package dev.ampsieve.budget;

/**
 * Monte Carlo yield: fraction of simulated units whose error is at or under the limit,
 * with its 95 % Wilson score interval.
 *
 * @param trials   units simulated (0 when decided without sampling)
 * @param decided  "sampled", "all-pass" (worst case within the limit) or "none-pass"
 *                 (the smallest possible error exceeds the limit)
 */
public record YieldResult(double value, double low, double high, int trials, String decided) {}
