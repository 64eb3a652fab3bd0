package org.cupel.duplicates;

/**
 * One fitted precision model with 95 % intervals (bootstrap, or large-sample above
 * {@link DuplicateSettings#bootstrapMaxPairs()} pairs; each {@link Estimate#note()} says which).
 *
 * @param method "Thompson–Howarth (median |d|)" or "RMS SD regression (Stanley & Lawie 2008)"
 * @param lineIntercept intercept of the least-squares line through the group points, fitted with σ₀ ≥ 0 and
 *     k ≥ 0 ({@link NonNegativeLine})
 * @param lineSlope slope of that line
 * @param rSquared R² = 1 − RSS/TSS of that line over the group points
 * @param model σ₀ and k
 * @param sigma0 σ₀ with its 95 % interval
 * @param k k with its 95 % interval
 * @param constraint empty when the ordinary least-squares line has σ₀ ≥ 0 and k ≥ 0; otherwise what the
 *     unconstrained line gave and how the bound was applied
 */
public record ModelFit(String method, double lineIntercept, double lineSlope, double rSquared,
                       PrecisionModel model, Estimate sigma0, Estimate k, String constraint) {
}
