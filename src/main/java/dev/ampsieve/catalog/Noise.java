package dev.ampsieve.catalog;

/**
 * Input noise: white voltage density {@code en} (V/√Hz) with its 1/f corner
 * {@code enCorner} (Hz), white current density {@code in} (A/√Hz) with its corner.
 * Null when not given.
 */
public record Noise(Double en, Double enCorner, Double in, Double inCorner) {
    public static final Noise NONE = new Noise(null, null, null, null);
}
