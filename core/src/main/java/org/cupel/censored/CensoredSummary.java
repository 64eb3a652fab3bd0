package org.cupel.censored;

import java.util.List;

/**
 * The summary statistics one method gives for a {@link CensoredSample}: every Cupel method (Kaplan–Meier,
 * ROS, maximum likelihood, substitution) reports in this one shape so that they can sit side by side.
 *
 * @param method short label ("Kaplan–Meier", "ROS", "MLE lognormal", "Substitution DL/2")
 * @param n observations used (missing values excluded)
 * @param nCensored of which censored (below, above or interval)
 * @param mean estimated population mean
 * @param sd estimated population standard deviation
 * @param median estimated population median
 * @param percentiles further percentiles (10th, 25th, 75th, 90th)
 * @param notes conventions used and warnings (too few detects, more than 80 % censored, ...)
 */
public record CensoredSummary(String method, int n, int nCensored, Estimate mean, Estimate sd, Estimate median,
                              List<Quantile> percentiles, List<String> notes) {

    /** The percentiles every summary reports besides the median. */
    public static final double[] PROBABILITIES = {0.10, 0.25, 0.75, 0.90};

    public CensoredSummary {
        percentiles = List.copyOf(percentiles);
        notes = List.copyOf(notes);
    }

    /** A summary for a method that cannot be applied to the sample, with the reason. */
    public static CensoredSummary notApplicable(String method, int n, int nCensored, String why) {
        Estimate none = Estimate.unavailable(why);
        List<Quantile> qs = new java.util.ArrayList<>();
        for (double p : PROBABILITIES) {
            qs.add(new Quantile(p, none));
        }
        return new CensoredSummary(method, n, nCensored, none, none, none, qs, List.of(why));
    }

    public boolean isApplicable() {
        return mean.isAvailable() || median.isAvailable();
    }

    /** Coefficient of variation sd/mean, or NaN when either is unavailable. */
    public double cv() {
        return sd.value() / mean.value();
    }
}
