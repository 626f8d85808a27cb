package dev.ampsieve.units;

/** A value in SI base units together with what it measures. */
public record Quantity(double value, Dimension dimension) {
    public Quantity {
        if (dimension == null) {
            throw new IllegalArgumentException("dimension");
        }
    }

    @Override
    public String toString() {
        return Units.format(value, dimension);
    }
}
