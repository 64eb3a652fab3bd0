package org.cupel.censored;

import java.util.AbstractList;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.Objects;
import java.util.RandomAccess;
import org.apache.commons.statistics.distribution.NormalDistribution;
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
 * Least squares of {@code ln(detect)} on the normal quantile {@code Φ⁻¹(p)} (Commons Statistics'
 * {@link NormalDistribution}, see {@link #quantile}) gives intercept a and slope b; each nondetect is imputed as {@code exp(a + b Φ⁻¹(p))},
 * and the statistics are the ordinary ones of detects plus imputed values ("robust ROS"). Nondetects whose limit exceeds the largest detect have
 * {@code A_j = 0}, so {@code pe_j = pe_{j+1}} and their plotting positions spread below that exceedance
 * probability, as Helsel–Cohn's counting gives; they carry little information and the result says so.
 */
public final class Ros {
    public static final String METHOD = "ROS";
    /** Helsel (2012) advises against ROS with fewer detects than this. */
    public static final int MIN_DETECTS = 3;
    /** Above this censored fraction the estimates rest mostly on the fitted line (Helsel 2012). */
    public static final double HEAVY_CENSORING = 0.80;

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
            // The fit's own points are an immutable view; copying it would make the million points it avoids.
            points = points instanceof Plot ? points : List.copyOf(points);
        }
    }

    private static final NormalDistribution STANDARD_NORMAL = NormalDistribution.of(0, 1);

    private Ros() {
    }

    /**
     * Φ⁻¹(p) for a plotting position p in (0, 1): Commons Statistics computes it as −√2 · erfc⁻¹(2p), the
     * inverse complementary error function of Commons Numbers (a port of Boost's {@code erfc_inv}), which
     * keeps its relative accuracy down to p = 1e-300. Against 50-digit mpmath values at 4,954 probabilities
     * (testdata/reference/special-functions/normal_quantile.csv, ROS plotting positions of n = 10⁶ included)
     * it is at most 3 ulps off; Wichura's AS 241 (PPND16), which Cupel carried by hand before, was at most
     * 4 ulps off. It costs about 15–20 ns more a call: the plain fit at n = 10⁶ (a million quantiles) took
     * 63–66 ms of CPU against 45–50 ms with AS 241 (bench {@code KernelCpuTime}, docs/performance.md, "Kept
     * libraries"), small beside reading and grouping a million results, so the library's is used.
     */
    static double quantile(double p) {
        return STANDARD_NORMAL.inverseCumulativeProbability(p);
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
        Tally detects = sample.detectTally();
        Tally nd = sample.belowTally();
        double[] limits = nd.distinctValues();
        if (limits.length == 0 || detects.value(0) < limits[0]) {
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
            a[j] = detects.countBelow(hi) - detects.countBelow(limits[j]);
            b[j] = nd.countAtOrBelow(limits[j]) + detects.countBelow(limits[j]);
            c[j] = nd.countAtOrBelow(limits[j]) - nd.countBelow(limits[j]);
        }
        double[] pe = new double[m + 1];
        for (int j = m - 1; j >= 0; j--) {
            pe[j] = pe[j + 1] + (a[j] + b[j] == 0 ? 0 : a[j] / (double) (a[j] + b[j])) * (1 - pe[j + 1]);
        }
        double[] line = regression(detects, limits, pe, a);
        double intercept = line[0];
        double slope = line[1];
        List<Tally> values = new ArrayList<>();
        values.add(detects);
        for (int j = 0; j < m; j++) {
            values.add(imputed(pe, c, j, intercept, slope));
        }
        List<String> notes = notes(sample, detects, limits, c);
        CensoredSummary summary = OrdinarySummary.of(METHOD, Tally.union(values), nCens, notes,
                nCens == 0 ? null : "no closed-form standard error for ROS (Helsel 2012 suggests the bootstrap)");
        Plot points = new Plot(detects, limits, pe, a, c, intercept, slope);
        return new Result(points, limits, Arrays.copyOf(pe, m), intercept, slope, summary);
    }

    /** Plotting position of the r-th smallest detect (from 1) of interval j. */
    private static double detectPosition(double[] pe, int[] a, int j, int r) {
        return (1 - pe[j]) + (pe[j] - pe[j + 1]) * r / (a[j] + 1.0);
    }

    /** Plotting position of the r-th nondetect (from 1) at limit j. */
    private static double nondetectPosition(double[] pe, int[] c, int j, int r) {
        return (1 - pe[j]) * r / (c[j] + 1.0);
    }

    /**
     * Least squares of ln(detect) on the normal quantile of its plotting position: intercept and slope of
     * {@code y = a + b z} from the centred sums {@code b = Σ(z − z̄)(y − ȳ) / Σ(z − z̄)²},
     * {@code a = ȳ − b z̄}. Interval j holds the detects {@code [DL_j, DL_{j+1})}, which are whole runs of
     * the tally, so the detects are walked run by run and each run's logarithm is taken once.
     */
    private static double[] regression(Tally detects, double[] limits, double[] pe, int[] a) {
        int n = detects.size();
        double[] y = new double[detects.distinct()];
        double sumY = 0;
        for (int i = 0; i < y.length; i++) {
            y[i] = Math.log(detects.value(i));
            sumY += detects.count(i) * y[i];
        }
        double[] z = new double[n];
        double sumZ = 0;
        int k = 0;
        for (int j = 0; j < limits.length; j++) {
            for (int r = 1; r <= a[j]; r++) {
                z[k] = quantile(detectPosition(pe, a, j, r));
                sumZ += z[k++];
            }
        }
        double meanY = sumY / n;
        double meanZ = sumZ / n;
        double szz = 0;
        double szy = 0;
        k = 0;
        for (int i = 0; i < y.length; i++) {
            double dy = y[i] - meanY;
            for (int end = k + detects.count(i); k < end; k++) {
                double dz = z[k] - meanZ;
                szz += dz * dz;
                szy += dz * dy;
            }
        }
        double slope = szy / szz;
        return new double[] {meanY - slope * meanZ, slope};
    }

    /** The imputed values {@code exp(a + b z)} of the nondetects at limit j. */
    private static Tally imputed(double[] pe, int[] c, int j, double intercept, double slope) {
        double[] v = new double[c[j]];
        for (int r = 1; r <= c[j]; r++) {
            v[r - 1] = imputedValue(quantile(nondetectPosition(pe, c, j, r)), intercept, slope);
        }
        // Monotone in r up to rounding of the quantile function: sort only when that is not enough.
        if (slope < 0) {
            reverse(v);
        }
        if (!ascending(v)) {
            Arrays.sort(v);
        }
        return Tally.ofSorted(v);
    }

    private static double imputedValue(double z, double intercept, double slope) {
        return Math.exp(intercept + slope * z);
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
        Tally d = sample.detectTally();
        if (d.value(0) <= 0) {
            return "not applicable: ROS fits logarithms and a detect is zero or negative";
        }
        if (d.value(0) == d.value(d.distinct() - 1)) {
            return "not applicable: every detect has the same value, so no line can be fitted";
        }
        return null;
    }

    private static List<String> notes(CensoredSample sample, Tally detects, double[] limits, int[] c) {
        List<String> notes = new ArrayList<>();
        notes.add("Helsel–Cohn plotting positions, lognormal fit on detects, nondetects imputed from the line");
        if (sample.censoredFraction() > HEAVY_CENSORING) {
            notes.add("warning: " + Math.round(100 * sample.censoredFraction())
                    + " % of values are censored (above 80 %): the estimates rest mostly on the fitted line");
        }
        double largest = detects.value(detects.distinct() - 1);
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

    private static void reverse(double[] v) {
        for (int i = 0, k = v.length - 1; i < k; i++, k--) {
            double t = v[i];
            v[i] = v[k];
            v[k] = t;
        }
    }

    private static boolean ascending(double[] v) {
        for (int i = 1; i < v.length; i++) {
            if (Double.compare(v[i - 1], v[i]) > 0) {
                return false;
            }
        }
        return true;
    }

    /**
     * The points of a fit, made when asked for from the fit's counts with the same formulas as the fit
     * (detects of each interval in ascending order, then the nondetects of each limit): a million-value
     * sample needs no million point objects unless a caller walks them all.
     */
    private static final class Plot extends AbstractList<Point> implements RandomAccess {
        private final Tally detects;
        private final double[] limits;
        private final double[] pe;
        private final int[] a;
        private final int[] c;
        private final double intercept;
        private final double slope;
        /** First point of detect interval j, then of nondetect block j: {@code start[j]}, {@code start[m + j]}. */
        private final int[] start;

        Plot(Tally detects, double[] limits, double[] pe, int[] a, int[] c, double intercept, double slope) {
            this.detects = detects;
            this.limits = limits;
            this.pe = pe;
            this.a = a;
            this.c = c;
            this.intercept = intercept;
            this.slope = slope;
            int m = limits.length;
            this.start = new int[2 * m + 1];
            for (int k = 0; k < 2 * m; k++) {
                start[k + 1] = start[k] + (k < m ? a[k] : c[k - m]);
            }
        }

        @Override
        public Point get(int i) {
            Objects.checkIndex(i, size());
            int k = Arrays.binarySearch(start, i);
            k = k >= 0 ? k : -k - 2;
            while (start[k + 1] == i) {
                k++;
            }
            int r = i - start[k] + 1;
            double x = k < limits.length ? detects.orderStatistic(detects.countBelow(limits[k]) + r - 1) : Double.NaN;
            return point(k, r, x);
        }

        /**
         * The points in order, block by block: what {@link #get} finds by binary searches for each point (its
         * block, and a detect's rank among the detects and its value) is carried from one point to the next.
         * Copying or streaming the list goes through here.
         */
        @Override
        public Iterator<Point> iterator() {
            return new Iterator<>() {
                private int i;
                private int k = -1;
                /** The rank among all detects of the next detect, and the distinct value it falls in. */
                private int rank;
                private int distinct;

                @Override
                public boolean hasNext() {
                    return i < size();
                }

                @Override
                public Point next() {
                    if (!hasNext()) {
                        throw new NoSuchElementException();
                    }
                    while (start[k + 1] == i) {
                        k++;
                        if (k < limits.length) {
                            // Ascending from block to block, as the limits are: the cursor only moves on.
                            rank = detects.countBelow(limits[k]);
                        }
                    }
                    double x = Double.NaN;
                    if (k < limits.length) {
                        while (distinct + 1 < detects.distinct() && detects.before(distinct + 1) <= rank) {
                            distinct++;
                        }
                        x = detects.value(distinct);
                        rank++;
                    }
                    return point(k, i++ - start[k] + 1, x);
                }
            };
        }

        /** The r-th point (from 1) of block k: detect interval k, or nondetect block k − m; x is a detect's value. */
        private Point point(int k, int r, double x) {
            int m = limits.length;
            if (k < m) {
                double p = detectPosition(pe, a, k, r);
                return new Point(p, quantile(p), x, true, limits[k]);
            }
            int j = k - m;
            double p = nondetectPosition(pe, c, j, r);
            double z = quantile(p);
            return new Point(p, z, imputedValue(z, intercept, slope), false, limits[j]);
        }

        @Override
        public int size() {
            return start[start.length - 1];
        }
    }
}
