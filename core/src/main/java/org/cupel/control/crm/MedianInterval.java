package org.cupel.control.crm;

import java.util.Arrays;
import org.apache.commons.math3.distribution.BinomialDistribution;

/**
 * Distribution-free confidence interval for a median from order statistics (the sign-test interval;
 * Conover 1999, Practical Nonparametric Statistics, 3rd ed., section 3.2, confidence interval for a
 * quantile): with B ~ Binomial(n, ½), take the largest rank r with P(B ≤ r − 1) ≤ α/2; the interval
 * [x₍ᵣ₎, x₍ₙ₋ᵣ₊₁₎] covers the median with probability 1 − 2·P(B ≤ r − 1) ≥ 1 − α. Needs
 * n with 2·0.5ⁿ ≤ α (n ≥ 6 for 95 %).
 *
 * @param n observations
 * @param median sample median
 * @param low lower end, NaN when n is too small
 * @param high upper end, NaN when n is too small
 * @param coverage the exact coverage achieved (≥ the level asked for), NaN when n is too small
 * @param note empty, or why no interval exists
 */
public record MedianInterval(int n, double median, double low, double high, double coverage, String note) {

    public static MedianInterval of(double[] values, double confidence) {
        double[] s = values.clone();
        Arrays.sort(s);
        int n = s.length;
        if (n == 0) {
            return new MedianInterval(0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, "no values");
        }
        double median = n % 2 == 1 ? s[n / 2] : (s[n / 2 - 1] + s[n / 2]) / 2;
        double tail = (1 - confidence) / 2;
        BinomialDistribution b = new BinomialDistribution(null, n, 0.5);
        int r = largestRank(b, n, tail);
        if (r == 0) {
            return new MedianInterval(n, median, Double.NaN, Double.NaN, Double.NaN,
                    "n = " + n + " is too small for a distribution-free " + Math.round(confidence * 100)
                            + " % interval of the median");
        }
        double coverage = 1 - 2 * b.cumulativeProbability(r - 1);
        return new MedianInterval(n, median, s[r - 1], s[n - r], coverage, "");
    }

    /**
     * The largest r ≤ (n + 1)/2 with P(B ≤ r − 1) ≤ tail, or 0. The search starts at the normal
     * approximation n/2 − z·√n/2 and steps to the exact rank, so large n cost a few CDF evaluations.
     */
    private static int largestRank(BinomialDistribution b, int n, double tail) {
        double z = new org.apache.commons.math3.distribution.NormalDistribution(null, 0, 1)
                .inverseCumulativeProbability(1 - tail);
        int max = (n + 1) / 2;
        int r = (int) Math.max(0, Math.min(max, Math.floor(n / 2.0 - z * Math.sqrt(n) / 2)));
        while (r > 0 && b.cumulativeProbability(r - 1) > tail) {
            r--;
        }
        while (r + 1 <= max && b.cumulativeProbability(r) <= tail) {
            r++;
        }
        return r;
    }

    public boolean estimated() {
        return note.isEmpty();
    }
}
