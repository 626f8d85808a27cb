package dev.ampsieve.budget;

import dev.ampsieve.units.Dimension;

/**
 * One value a term's formula was evaluated with, in SI units (temperatures in °C).
 *
 * @param name      the symbol it stands for in the formula: vos, drift, dT, NG, ...
 * @param value     its value
 * @param dimension what it measures, so a report can print it with its unit
 */
public record Operand(String name, double value, Dimension dimension) {}
