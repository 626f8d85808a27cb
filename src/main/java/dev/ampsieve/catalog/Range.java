package dev.ampsieve.catalog;

/** A closed interval [min, max]; units as the field says. */
public record Range(double min, double max) {
    public boolean contains(double lo, double hi) {
        return lo >= min && hi <= max;
    }
}
