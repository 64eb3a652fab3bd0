package org.cupel.duplicates;

import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * Quantiles of the absolute difference of two independent normal measurements of the same material.
 * If a and b are N(μ, σ²), then a − b is N(0, 2σ²) and the p-quantile of |a − b| is
 * √2·Φ⁻¹((1 + p)/2)·σ. These give the factors of Thompson and Howarth (1976, "Duplicate analysis in
 * geochemical practice, Part I", Analyst 101, 690–698): median |d| = 0.953873σ, so σ = 1.048358·median |d|,
 * and the 90th and 99th percentile control lines 2.326174σ and 3.642773σ.
 */
public final class NormalDifferenceConstants {
    private static final NormalDistribution STANDARD = new NormalDistribution(null, 0, 1);

    /** Median of |d| / σ. */
    public static final double MEDIAN_ABS_DIFF = quantileOfAbsDifference(0.5);
    /** σ / median |d|, the Thompson–Howarth factor. */
    public static final double SIGMA_PER_MEDIAN = 1.0 / MEDIAN_ABS_DIFF;
    /** 90th percentile of |d| / σ. */
    public static final double P90 = quantileOfAbsDifference(0.90);
    /** 95th percentile of |d| / σ. */
    public static final double P95 = quantileOfAbsDifference(0.95);
    /** 99th percentile of |d| / σ. */
    public static final double P99 = quantileOfAbsDifference(0.99);

    private NormalDifferenceConstants() {
    }

    /** The p-quantile of |a − b| / σ for a, b independent N(μ, σ²). */
    public static double quantileOfAbsDifference(double p) {
        return Math.sqrt(2.0) * STANDARD.inverseCumulativeProbability((1.0 + p) / 2.0);
    }
}
