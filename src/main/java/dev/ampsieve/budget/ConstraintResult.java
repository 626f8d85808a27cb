package dev.ampsieve.budget;

/**
 * A hard requirement (supply, temperature grade, common-mode range, output swing, slew, price).
 *
 * @param name   supply, temperature, common-mode, output-swing, slew, price
 * @param ok     met or not
 * @param detail what is needed against what the part offers, and by how much it misses
 */
public record ConstraintResult(String name, boolean ok, String detail) {}
