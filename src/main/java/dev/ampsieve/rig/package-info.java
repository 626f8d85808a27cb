/**
 * Bench rigs for measuring a part (issue 16): the offset test circuit that makes a measured lot, sized
 * for a part and a meter, with the error the rig itself adds. Facts only (values, SI units); {@code
 * report} words them. May use units, yaml, catalog, stage, stats and budget (for the part's figures after
 * the missing-value rules).
 */
package dev.ampsieve.rig;
