/**
 * The catalog of amplifier parameter sets: Part records, the key table, loading and validation of a folder of YAML files; may use yaml, units and text.
 */
package dev.ampsieve.catalog;
