package org.cupel.duplicates;

import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * The large-sample 95 % interval estimate ± z·SE with z = Φ⁻¹(0.975) ≈ 1.959964, used instead of the bootstrap
 * above {@link DuplicateSettings#bootstrapMaxPairs()}. For a smooth statistic of many pairs the percentile
 * bootstrap and this normal interval agree to first order (Efron, B. and Tibshirani, R.J., 1993, "An
 * Introduction to the Bootstrap", Chapman &amp; Hall, ch. 13; section recalled from memory).
 */
final class NormalInterval {
    /** Φ⁻¹(0.975). */
    static final double Z975 = new NormalDistribution(null, 0, 1).inverseCumulativeProbability(0.975);

    private NormalInterval() {
    }

    /** {value − z·√variance, value + z·√variance}; NaN ends when the variance is not finite. */
    static double[] around(double value, double variance) {
        double half = Z975 * Math.sqrt(variance);
        return Double.isFinite(half) ? new double[] {value - half, value + half}
                : new double[] {Double.NaN, Double.NaN};
    }
}
