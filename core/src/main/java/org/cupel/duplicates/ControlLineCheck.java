package org.cupel.duplicates;

/**
 * Pairs above a percentile line |d| = q·σ_c of the fitted model, and whether that count is more than the
 * model allows: under the model each pair exceeds the line with probability 1 − p, so the count is
 * binomial(n, 1 − p); the p-value is the upper tail P(X ≥ count) (the check suggested by Garrett and
 * Grunsky 2003, Computers &amp; Geosciences 29; citation recalled from memory).
 *
 * @param percentile 90 or 99
 * @param factor q, the multiple of σ_c (2.326174 or 3.642773)
 * @param n pairs tested
 * @param exceedances pairs with |d| above the line
 * @param expected n·(1 − p)
 * @param pValue upper-tail binomial p-value of the count
 */
public record ControlLineCheck(double percentile, double factor, int n, int exceedances, double expected,
                               double pValue) {
}
