package org.cupel.recovery;

import java.util.Arrays;

/**
 * Mean, standard deviation (n − 1 divisor) and count of a small set of replicate values.
 *
 * @param n number of values
 * @param mean arithmetic mean ({@code NaN} only when n = 0)
 * @param sd sample standard deviation ({@code NaN} when n &lt; 2: one value has no scatter to measure)
 */
public record SampleSummary(int n, double mean, double sd) {

    public static SampleSummary of(double[] values) {
        int n = values.length;
        if (n == 0) {
            return new SampleSummary(0, Double.NaN, Double.NaN);
        }
        double mean = Arrays.stream(values).sum() / n;
        if (n < 2) {
            return new SampleSummary(1, mean, Double.NaN);
        }
        double ss = 0;
        for (double v : values) {
            ss += (v - mean) * (v - mean);
        }
        return new SampleSummary(n, mean, Math.sqrt(ss / (n - 1)));
    }

    /** Standard error of the mean, s/√n. */
    public double standardError() {
        return sd / Math.sqrt(n);
    }

    /** Variance of the mean, s²/n. */
    public double varianceOfMean() {
        return sd * sd / n;
    }
}
