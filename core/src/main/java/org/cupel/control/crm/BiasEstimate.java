package org.cupel.control.crm;

import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.stat.descriptive.SummaryStatistics;

/**
 * Bias of a lab on one CRM, in percent of the certified value: bᵢ = 100·(xᵢ − c)/c. The mean bias has a
 * Student t-interval b̄ ± t(1 − α/2, n − 1)·s/√n (Student 1908; any statistics text); the median bias
 * has the distribution-free {@link MedianInterval}. The certified value is "inside" when the interval
 * contains 0 % bias. A CRM with certified value 0 has no relative bias.
 *
 * @param n results used
 * @param meanResult mean of the results, in the analyte's unit
 * @param sdResult sample SD of the results (n − 1), NaN for n &lt; 2
 * @param meanBiasPct mean bias %
 * @param meanLowPct lower end of its interval, NaN for n &lt; 2
 * @param meanHighPct upper end
 * @param median the median bias with its interval
 * @param confidence level of both intervals
 * @param note empty, or what could not be estimated
 */
public record BiasEstimate(int n, double meanResult, double sdResult, double meanBiasPct, double meanLowPct,
                           double meanHighPct, MedianInterval median, double confidence, String note) {

    public static BiasEstimate of(double[] results, double certified, double confidence) {
        int n = results.length;
        if (certified == 0 || n == 0) {
            String why = n == 0 ? "no results" : "certified value is 0: no relative bias";
            return new BiasEstimate(n, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    MedianInterval.of(new double[0], confidence), confidence, why);
        }
        SummaryStatistics raw = new SummaryStatistics();
        SummaryStatistics pct = new SummaryStatistics();
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            raw.addValue(results[i]);
            b[i] = 100 * (results[i] - certified) / certified;
            pct.addValue(b[i]);
        }
        MedianInterval median = MedianInterval.of(b, confidence);
        if (n < 2) {
            return new BiasEstimate(n, raw.getMean(), Double.NaN, pct.getMean(), Double.NaN, Double.NaN, median,
                    confidence, "one result: no interval for the mean bias");
        }
        double t = new TDistribution(n - 1).inverseCumulativeProbability(1 - (1 - confidence) / 2);
        double half = t * pct.getStandardDeviation() / Math.sqrt(n);
        return new BiasEstimate(n, raw.getMean(), raw.getStandardDeviation(), pct.getMean(), pct.getMean() - half,
                pct.getMean() + half, median, confidence, median.note());
    }

    /** Whether the certified value lies inside the interval of the mean; false when there is no interval. */
    public boolean certifiedInsideMeanInterval() {
        return meanLowPct <= 0 && meanHighPct >= 0;
    }

    /** Whether the certified value lies inside the interval of the median; false when there is none. */
    public boolean certifiedInsideMedianInterval() {
        return median.low() <= 0 && median.high() >= 0;
    }
}
