package org.cupel.duplicates;

/**
 * One fitted precision model with 95 % intervals (bootstrap, or large-sample above
 * {@link DuplicateSettings#bootstrapMaxPairs()} pairs; each {@link Estimate#note()} says which).
 *
 * @param method "Thompson–Howarth (median |d|)" or "RMS SD regression (Stanley & Lawie 2008)"
 * @param lineIntercept intercept of the least-squares line through the group points
 * @param lineSlope slope of that line
 * @param rSquared R² of the line over the group points
 * @param model σ₀ and k
 * @param sigma0 σ₀ with its 95 % interval
 * @param k k with its 95 % interval
 */
public record ModelFit(String method, double lineIntercept, double lineSlope, double rSquared,
                       PrecisionModel model, Estimate sigma0, Estimate k) {
}
