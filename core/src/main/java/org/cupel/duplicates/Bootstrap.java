package org.cupel.duplicates;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;

/**
 * Percentile bootstrap over pairs (Efron, B. and Tibshirani, R.J., 1993, "An Introduction to the
 * Bootstrap", Chapman &amp; Hall, ch. 13): resample pairs with replacement, recompute the statistic, and take
 * the 2.5th and 97.5th percentiles of the replicates. Seeded, so a rerun gives the same interval.
 */
final class Bootstrap {
    private Bootstrap() {
    }

    /** The 2.5th and 97.5th percentiles (R type 7) of the finite replicates, NaN when none. */
    static double[] percentileInterval(double[] replicates) {
        double[] finite = Arrays.stream(replicates).filter(Double::isFinite).toArray();
        if (finite.length == 0) {
            return new double[] {Double.NaN, Double.NaN};
        }
        Percentile p = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
        p.setData(finite);
        return new double[] {p.evaluate(2.5), p.evaluate(97.5)};
    }

    /**
     * Replicates of the root mean square of {@code values} (the statistic √(mean xᵢ²) for xᵢ² given in
     * {@code squares}).
     */
    static double[] rootMeanSquareReplicates(double[] squares, int resamples, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        int n = squares.length;
        double[] out = new double[resamples];
        for (int r = 0; r < resamples; r++) {
            double sum = 0;
            for (int i = 0; i < n; i++) {
                sum += squares[random.nextInt(n)];
            }
            out[r] = Math.sqrt(sum / n);
        }
        return out;
    }

    /** How many times each of {@code n} items is drawn in one resample of size n. */
    static int[] resampleCounts(int n, SplittableRandom random) {
        int[] counts = new int[n];
        for (int i = 0; i < n; i++) {
            counts[random.nextInt(n)]++;
        }
        return counts;
    }
}
