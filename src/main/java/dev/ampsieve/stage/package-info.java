/**
 * One amplifier stage: the network type (one record per topology), the Stage record, its key table, reading and writing stage files, and the facts of a bad value in one (StageFact); may use catalog, yaml, units and text.
 */
package dev.ampsieve.stage;
