package dev.ampsieve.catalog;

/**
 * Distance (V) a signal must keep from the negative ({@code low}) and positive
 * ({@code high}) rail; 0 means rail-to-rail, negative means it may go beyond the rail.
 */
public record Headroom(double low, double high) {}
