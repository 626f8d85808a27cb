/**
 * Sampling and interval statistics for the yield: truncated normal draws, Wilson intervals, the sequential stopping loop, cancellation; uses commons-math3 and commons-rng only.
 */
package dev.ampsieve.stats;
