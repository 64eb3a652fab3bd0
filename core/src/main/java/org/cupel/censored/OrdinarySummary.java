package org.cupel.censored;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.stat.descriptive.moment.Mean;
import org.apache.commons.math3.stat.descriptive.moment.Variance;

/**
 * Ordinary sample statistics of a complete set of numbers (detects plus values filled in by ROS or by
 * substitution), held as distinct values with counts: mean, SD with divisor n − 1 (Commons Math's
 * frequency-weighted mean and variance, the same two-pass formulas as for the expanded numbers), and
 * percentiles by linear interpolation of order statistics (Hyndman and Fan 1996, "Sample quantiles in
 * statistical packages", Am. Stat. 50, definition 7, the default of R's {@code quantile}): with
 * {@code h = 1 + (n − 1) p}, {@code Q(p) = x₍⌊h⌋₎ + (h − ⌊h⌋)(x₍⌊h⌋+1₎ − x₍⌊h⌋₎)}, computed as Commons
 * Math's {@code Percentile} with {@code EstimationType.R_7} computes it.
 */
final class OrdinarySummary {
    private OrdinarySummary() {
    }

    /**
     * @param values the numbers, at least one
     * @param noStandardError why the standard error s/√n of the mean does not apply (values filled in
     *     are not measurements), or null when it does
     */
    static CensoredSummary of(String method, Tally values, int nCensored, List<String> notes,
                              String noStandardError) {
        int n = values.size();
        double[] x = values.distinctValues();
        double[] w = values.weights();
        double mean = new Mean().evaluate(x, w);
        double variance = n > 1 ? new Variance().evaluate(x, w, mean) : Double.NaN;
        Estimate meanEst;
        if (noStandardError != null) {
            meanEst = Estimate.of(mean, noStandardError);
        } else if (n > 1) {
            meanEst = Estimate.withError(mean, Math.sqrt(variance / n));
        } else {
            meanEst = Estimate.of(mean, "a single value: no standard error");
        }
        Estimate sd = n > 1 ? Estimate.of(Math.sqrt(variance), "")
                : Estimate.unavailable("a single value has no standard deviation");
        List<Quantile> qs = new ArrayList<>();
        for (double p : CensoredSummary.PROBABILITIES) {
            qs.add(new Quantile(p, Estimate.of(percentile(values, 100 * p), "")));
        }
        return new CensoredSummary(method, n, nCensored, meanEst, sd, Estimate.of(percentile(values, 50), ""), qs,
                notes);
    }

    /** The {@code percent}-th percentile, definition 7, with Commons Math's arithmetic step for step. */
    static double percentile(Tally values, double percent) {
        int n = values.size();
        double pos = 1 + (n - 1) * (percent / 100);
        if (pos < 1) {
            return values.orderStatistic(0);
        }
        if (pos >= n) {
            return values.orderStatistic(n - 1);
        }
        double floor = Math.floor(pos);
        int k = (int) floor;
        double lower = values.orderStatistic(k - 1);
        double upper = values.orderStatistic(k);
        return lower + (pos - floor) * (upper - lower);
    }
}
