/**
 * Sampling and interval statistics for the yield: truncated normal draws from per-part random streams, Wilson intervals, the sequential stopping loop, cancellation, and the normal fit of a measured lot; uses commons-math3 and commons-rng only.
 */
package dev.ampsieve.stats;
