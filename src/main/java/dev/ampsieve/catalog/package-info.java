/**
 * The catalog of amplifier parameter sets: Part records, the key table, loading and validation of a folder of YAML files, and the facts of a bad figure (CatalogFact); may use yaml, units and text.
 */
package dev.ampsieve.catalog;
