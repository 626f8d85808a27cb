package dev.ampsieve.catalog;

/** Offset change {@code value} (V) per {@code per} (s) of operation, scaled with the square root of time. */
public record LongTermDrift(double value, double per) {}
