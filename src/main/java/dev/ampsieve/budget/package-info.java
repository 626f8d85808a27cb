/**
 * The output error budget of one part in one stage: one class per error term, the DC model, constraints, worst-case, RSS and Monte Carlo yield, trims and verdicts; returns facts; may use stage, catalog, stats, units and text.
 */
package dev.ampsieve.budget;
