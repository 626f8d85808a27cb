package dev.ampsieve.catalog;

/**
 * The conditions of the datasheet's 25 °C table: the total supply (V+ minus V-) and the input
 * common mode, volts above the negative rail. Either may be null (not given).
 */
public record TestConditions(Double supply, Double commonMode) {}
