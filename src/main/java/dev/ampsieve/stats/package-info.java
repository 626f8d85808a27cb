/**
 * Sampling and interval statistics for the yield: truncated normal draws, Wilson intervals, the sequential stopping loop, cancellation, and the normal fit of a measured lot; uses commons-math3 only.
 */
package dev.ampsieve.stats;
