package org.cupel.censored;

/**
 * One percentile of a fitted or empirical distribution.
 *
 * @param probability the cumulative probability, in (0, 1)
 * @param estimate the value below which that fraction of the population lies
 */
public record Quantile(double probability, Estimate estimate) {
}
