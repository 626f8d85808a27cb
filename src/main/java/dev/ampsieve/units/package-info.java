/**
 * Quantities with SI prefixes and units: parsing, printing, dimensions and physical constants; imports nothing.
 */
package dev.ampsieve.units;
