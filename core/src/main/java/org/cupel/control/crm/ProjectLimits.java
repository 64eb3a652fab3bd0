package org.cupel.control.crm;

import org.apache.commons.math3.stat.descriptive.SummaryStatistics;

/**
 * Limits from the project's own results of a CRM, shown beside the certified ones: mean ± 2 and ± 3
 * sample SDs of the judged results (swaps left out). Available from {@code minN} results on; before that
 * the note says how many there are.
 *
 * @param n results used
 * @param mean mean of the results
 * @param sd sample SD (n − 1)
 * @param available whether n reached the minimum
 * @param note empty when available, else why not
 */
public record ProjectLimits(int n, double mean, double sd, boolean available, String note) {

    public static ProjectLimits of(double[] values, int minN) {
        SummaryStatistics s = new SummaryStatistics();
        for (double v : values) {
            s.addValue(v);
        }
        int n = values.length;
        if (n < minN) {
            return new ProjectLimits(n, n == 0 ? Double.NaN : s.getMean(), n < 2 ? Double.NaN
                    : s.getStandardDeviation(), false, n + " results; project limits need " + minN);
        }
        return new ProjectLimits(n, s.getMean(), s.getStandardDeviation(), true, "");
    }

    public double warnLow() {
        return mean - 2 * sd;
    }

    public double warnHigh() {
        return mean + 2 * sd;
    }

    public double failLow() {
        return mean - 3 * sd;
    }

    public double failHigh() {
        return mean + 3 * sd;
    }
}
