/**
 * One amplifier stage: the network type (one record per topology), the Stage record, its key table, and reading and writing stage files; may use catalog, yaml, units and text.
 */
package dev.ampsieve.stage;
