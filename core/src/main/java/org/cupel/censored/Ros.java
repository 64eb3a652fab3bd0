package org.cupel.censored;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.cupel.assay.Numbers;

/**
 * Regression on order statistics for left-censored data with several detection limits (Helsel and Cohn
 * 1988, "Estimation of descriptive statistics for multiply censored water quality data", Water Resour.
 * Res. 24; Helsel 2012, "Statistics for Censored Environmental Data Using Minitab and R", 2nd ed., ch. 6).
 * With distinct limits {@code DL₁ < … < DL_m} (0 prepended when a detect lies below DL₁), and for
 * {@code j = m..1}: {@code A_j} detects in {@code [DL_j, DL_{j+1})}, {@code B_j} observations below
 * {@code DL_j} (nondetects at or below {@code DL_j} and detects below it), {@code C_j} nondetects at
 * {@code DL_j}, the probability of exceeding {@code DL_j} is
 * <pre>  pe_j = pe_{j+1} + A_j / (A_j + B_j) · (1 − pe_{j+1}),   pe_{m+1} = 0.</pre>
 * The r-th smallest detect of interval j plots at {@code (1 − pe_j) + (pe_j − pe_{j+1}) · r / (A_j + 1)}
 * and the r-th nondetect at {@code DL_j} at {@code (1 − pe_j) · r / (C_j + 1)} (plotting constant 0).
 * Least squares of {@code ln(detect)} on the normal quantile {@code Φ⁻¹(p)} gives intercept a and slope
 * b; each nondetect is imputed as {@code exp(a + b Φ⁻¹(p))}, and the statistics are the ordinary ones
 * of detects plus imputed values ("robust ROS"). Nondetects whose limit exceeds the largest detect have
 * {@code A_j = 0}, so {@code pe_j = pe_{j+1}} and their plotting positions spread below that exceedance
 * probability, as Helsel–Cohn's counting gives; they carry little information and the result says so.
 */
public final class Ros {
    public static final String METHOD = "ROS";
    /** Helsel (2012) advises against ROS with fewer detects than this. */
    public static final int MIN_DETECTS = 3;
    /** Above this censored fraction the estimates rest mostly on the fitted line (Helsel 2012). */
    public static final double HEAVY_CENSORING = 0.80;

    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1);

    /** One observation on the probability plot. */
    public record Point(double plottingPosition, double normalQuantile, double value, boolean detected,
                        double limit) {
    }

    /**
     * @param points every observation with its plotting position (imputed value for nondetects)
     * @param limits the distinct detection limits used (0 first when prepended)
     * @param exceedance {@code pe_j} for each limit
     * @param intercept a of {@code ln x = a + b z}
     * @param slope b
     * @param summary statistics of detects plus imputed values
     */
    public record Result(List<Point> points, double[] limits, double[] exceedance, double intercept, double slope,
                         CensoredSummary summary) {
        public Result {
            points = List.copyOf(points);
        }
    }

    private Ros() {
    }

    /**
     * ROS with the mean's standard error and 95 % interval from {@code replicates} bootstrap resamples
     * ({@link RosBootstrap}); {@code replicates = 0} gives the plain fit. Above {@code maxN} observations
     * the bootstrap is skipped to bound run time, and the mean's note says so.
     */
    public static Result fit(CensoredSample sample, int replicates, long seed, int maxN) {
        Result r = fit(sample);
        if (replicates == 0 || !r.summary().isApplicable() || r.summary().nCensored() == 0) {
            return r;
        }
        CensoredSummary s = r.summary();
        Estimate mean = sample.size() > maxN
                ? Estimate.of(s.mean().value(), s.mean().note() + "; bootstrap skipped for n above " + maxN
                        + " (setting censored.bootstrapMaxN)")
                : RosBootstrap.mean(sample, s.mean().value(), replicates, seed);
        CensoredSummary withSe = new CensoredSummary(s.method(), s.n(), s.nCensored(), mean, s.sd(), s.median(),
                s.percentiles(), s.notes());
        return new Result(r.points(), r.limits(), r.exceedance(), r.intercept(), r.slope(), withSe);
    }

    /** ROS without bootstrap: the mean carries no standard error. */
    public static Result fit(CensoredSample sample) {
        int n = sample.size();
        int nCens = sample.censoredCount();
        String why = notApplicable(sample);
        if (why != null) {
            return new Result(List.of(), new double[0], new double[0], Double.NaN, Double.NaN,
                    CensoredSummary.notApplicable(METHOD, n, nCens, why));
        }
        double[] detects = sample.detects();
        double[] nd = sample.belowLimits();
        double[] limits = sample.distinctBelowLimits();
        if (limits.length == 0 || detects[0] < limits[0]) {
            double[] withZero = new double[limits.length + 1];
            System.arraycopy(limits, 0, withZero, 1, limits.length);
            limits = withZero;
        }
        int m = limits.length;
        int[] a = new int[m];
        int[] b = new int[m];
        int[] c = new int[m];
        for (int j = 0; j < m; j++) {
            double hi = j + 1 < m ? limits[j + 1] : Double.POSITIVE_INFINITY;
            a[j] = lowerBound(detects, hi) - lowerBound(detects, limits[j]);
            b[j] = upperBound(nd, limits[j]) + lowerBound(detects, limits[j]);
            c[j] = upperBound(nd, limits[j]) - lowerBound(nd, limits[j]);
        }
        double[] pe = new double[m + 1];
        for (int j = m - 1; j >= 0; j--) {
            pe[j] = pe[j + 1] + (a[j] + b[j] == 0 ? 0 : a[j] / (double) (a[j] + b[j])) * (1 - pe[j + 1]);
        }
        List<Point> points = new ArrayList<>(n);
        SimpleRegression reg = new SimpleRegression(true);
        for (int j = 0; j < m; j++) {
            int from = lowerBound(detects, limits[j]);
            for (int r = 1; r <= a[j]; r++) {
                double p = (1 - pe[j]) + (pe[j] - pe[j + 1]) * r / (a[j] + 1.0);
                double z = STANDARD_NORMAL.inverseCumulativeProbability(p);
                double x = detects[from + r - 1];
                reg.addData(z, Math.log(x));
                points.add(new Point(p, z, x, true, limits[j]));
            }
        }
        double intercept = reg.getIntercept();
        double slope = reg.getSlope();
        for (int j = 0; j < m; j++) {
            for (int r = 1; r <= c[j]; r++) {
                double p = (1 - pe[j]) * r / (c[j] + 1.0);
                double z = STANDARD_NORMAL.inverseCumulativeProbability(p);
                points.add(new Point(p, z, Math.exp(intercept + slope * z), false, limits[j]));
            }
        }
        double[] values = points.stream().mapToDouble(Point::value).toArray();
        List<String> notes = notes(sample, detects, limits, c);
        CensoredSummary summary = OrdinarySummary.of(METHOD, values, nCens, notes,
                nCens == 0 ? null : "no closed-form standard error for ROS (Helsel 2012 suggests the bootstrap)");
        return new Result(points, limits, Arrays.copyOf(pe, m), intercept, slope, summary);
    }

    private static String notApplicable(CensoredSample sample) {
        if (sample.size() == 0) {
            return "no values";
        }
        if (!sample.isLeftCensoredOnly()) {
            return "not applicable: ROS handles values below detection only, and this sample has values above "
                    + "range or in intervals (use maximum likelihood)";
        }
        int detects = sample.count(Censoring.DETECTED);
        if (detects < MIN_DETECTS) {
            return "not applicable: " + detects + " detect" + (detects == 1 ? "" : "s") + "; ROS needs at least "
                    + MIN_DETECTS + " to fit a line";
        }
        if (sample.detects()[0] <= 0) {
            return "not applicable: ROS fits logarithms and a detect is zero or negative";
        }
        double[] d = sample.detects();
        if (d[0] == d[d.length - 1]) {
            return "not applicable: every detect has the same value, so no line can be fitted";
        }
        return null;
    }

    private static List<String> notes(CensoredSample sample, double[] detects, double[] limits, int[] c) {
        List<String> notes = new ArrayList<>();
        notes.add("Helsel–Cohn plotting positions, lognormal fit on detects, nondetects imputed from the line");
        if (sample.censoredFraction() > HEAVY_CENSORING) {
            notes.add("warning: " + Math.round(100 * sample.censoredFraction())
                    + " % of values are censored (above 80 %): the estimates rest mostly on the fitted line");
        }
        double largest = detects[detects.length - 1];
        int above = 0;
        for (int j = 0; j < limits.length; j++) {
            if (limits[j] > largest) {
                above += c[j];
            }
        }
        if (above > 0) {
            notes.add(above + " nondetect" + (above == 1 ? " has a limit" : "s have limits") + " above the largest detect ("
                    + Numbers.compact(largest) + "): as in Helsel–Cohn (1988) and Helsel (2012, ch. 6) they count as "
                    + "below every lower limit and get plotting positions below their limit's exceedance "
                    + "probability; they carry little information");
        }
        return notes;
    }

    /** Index of the first element {@code ≥ x} in sorted data. */
    private static int lowerBound(double[] sorted, double x) {
        int lo = 0;
        int hi = sorted.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (sorted[mid] < x) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** Index of the first element {@code > x} in sorted data. */
    private static int upperBound(double[] sorted, double x) {
        int lo = 0;
        int hi = sorted.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (sorted[mid] <= x) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }
}
