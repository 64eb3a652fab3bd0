package org.cupel.censored;

import java.util.Arrays;
import org.apache.commons.math3.random.MersenneTwister;
import org.apache.commons.math3.stat.StatUtils;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;

/**
 * Standard error and 95 % percentile interval of the ROS mean by the nonparametric bootstrap: resample
 * the n observations (each keeping its censoring) with replacement, refit ROS, and take the SD and the
 * 2.5th and 97.5th percentiles of the resampled means (Efron and Tibshirani 1993, "An Introduction to the
 * Bootstrap", ch. 6 and 13; Helsel 2012, ch. 6, recommends the bootstrap for ROS intervals). Resamples
 * on which ROS cannot be fitted (too few detects) are skipped and counted. Deterministic for a seed.
 */
final class RosBootstrap {
    /** Fewer usable resamples than this give no interval. */
    private static final int MIN_USABLE = 100;

    private RosBootstrap() {
    }

    static Estimate mean(CensoredSample sample, double mean, int replicates, long seed) {
        MersenneTwister rng = new MersenneTwister(seed);
        int n = sample.size();
        double[] means = new double[replicates];
        int used = 0;
        int[] rows = new int[n];
        for (int b = 0; b < replicates; b++) {
            for (int i = 0; i < n; i++) {
                rows[i] = rng.nextInt(n);
            }
            CensoredSummary s = Ros.fit(sample.select(rows)).summary();
            if (s.mean().isAvailable()) {
                means[used++] = s.mean().value();
            }
        }
        String how = "bootstrap, " + used + " of " + replicates + " resamples usable, seed " + seed;
        if (used < MIN_USABLE) {
            return Estimate.of(mean, "no bootstrap interval: only " + used + " of " + replicates
                    + " resamples could be fitted");
        }
        double[] m = Arrays.copyOf(means, used);
        Percentile p = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
        p.setData(m);
        return new Estimate(mean, Math.sqrt(StatUtils.variance(m)), p.evaluate(2.5), p.evaluate(97.5),
                "95 % percentile interval, " + how);
    }
}
