/**
 * Ranking, the Pareto front, trim and zero-drift advice and the no-fit changes found by re-running the budget; may use budget, search and the packages below them.
 */
package dev.ampsieve.advice;
