package org.cupel.censored;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.stat.StatUtils;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;

/**
 * Ordinary sample statistics of a complete set of numbers (detects plus values filled in by ROS or by
 * substitution): mean, SD with divisor n − 1, and percentiles by linear interpolation of order
 * statistics (Hyndman and Fan 1996, "Sample quantiles in statistical packages", Am. Stat. 50, definition
 * 7, the default of R's {@code quantile}).
 */
final class OrdinarySummary {
    private OrdinarySummary() {
    }

    /**
     * @param noStandardError why the standard error s/√n of the mean does not apply (values filled in
     *     are not measurements), or null when it does
     */
    static CensoredSummary of(String method, double[] values, int nCensored, List<String> notes,
                              String noStandardError) {
        int n = values.length;
        double mean = StatUtils.mean(values);
        Estimate meanEst;
        if (noStandardError != null) {
            meanEst = Estimate.of(mean, noStandardError);
        } else if (n > 1) {
            meanEst = Estimate.withError(mean, Math.sqrt(StatUtils.variance(values) / n));
        } else {
            meanEst = Estimate.of(mean, "a single value: no standard error");
        }
        Estimate sd = n > 1 ? Estimate.of(Math.sqrt(StatUtils.variance(values)), "")
                : Estimate.unavailable("a single value has no standard deviation");
        Percentile pct = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
        pct.setData(values);
        List<Quantile> qs = new ArrayList<>();
        for (double p : CensoredSummary.PROBABILITIES) {
            qs.add(new Quantile(p, Estimate.of(pct.evaluate(100 * p), "")));
        }
        return new CensoredSummary(method, n, nCensored, meanEst, sd, Estimate.of(pct.evaluate(50), ""), qs, notes);
    }
}
