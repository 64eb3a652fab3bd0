package org.cupel.duplicates;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.apache.commons.math3.distribution.BinomialDistribution;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.cupel.assay.LimitComparison;

/**
 * Concentration-dependent precision from duplicate pairs.
 *
 * <p>Thompson–Howarth (Thompson, M. and Howarth, R.J., 1973, Analyst 98; 1976, "Duplicate analysis
 * in geochemical practice", Analyst 101, 690–698 and 699–709; 1978, "A new approach to the estimation of
 * analytical precision", Journal of Geochemical Exploration 9, 23–30; page ranges recalled from memory): sort pairs by mean m = (a+b)/2, cut
 * consecutive groups of 11 from the lowest (the remainder dropped), take per group the mean of m and the
 * median of d = |a − b|, fit median d = b₀ + b₁·m by least squares, and scale by 1/(√2·Φ⁻¹(0.75)) = 1.048358
 * (median |d| = 0.953873σ for normal errors): σ₀ = 1.048358·b₀, k = 1.048358·b₁, σ_c = σ₀ + k·c.
 *
 * <p>The median-based estimate is biased when errors are not normal (skewed or heavy-tailed, as with a
 * nugget effect); Stanley, C.R. and Lawie, D. (2008, "Thompson–Howarth error analysis: unbiased
 * alternatives to the large-sample method for assessing non-normally distributed measurement error in
 * geochemical samples", Geochemistry: Exploration, Environment, Analysis 8, 173–182) give the unbiased
 * alternative computed here beside it: regress the group RMS SD √(Σd²/(2g)) on group mean; intercept and
 * slope are σ₀ and k directly.
 *
 * <p>Both lines are fitted with σ₀ ≥ 0 and k ≥ 0 ({@link NonNegativeLine}): when the ordinary line's intercept
 * is negative, the line is refitted through the origin (σ₀ = 0), and the fit says so in {@link ModelFit#constraint()}.
 * This bound is Cupel's choice, not part of the published method, which fits the line unconstrained; a search of
 * the literature (Thompson and Howarth; Stanley and Lawie 2008) found no published rule for a negative intercept.
 * Pairs with equal means are ordered by a hash of their values, not by |d| ({@link PairGroups#sortByMean}).
 *
 * <p>Whether the model describes the pairs is tested by the counts above its 90 % and 99 % lines
 * ({@link ControlLineCheck}); when either count is far above expectation the result carries a note
 * ({@link PrecisionModelResult#fitNote()}).
 *
 * <p>Intervals for σ₀, k and P_c come from a seeded bootstrap over pairs: pairs are drawn with replacement,
 * regrouped and both lines refitted. Above {@link DuplicateSettings#bootstrapMaxPairs()} pairs, where that costs
 * pairs × resamples and the normal approximation is close, they are normal intervals from the HC3 covariance of
 * each line over its groups ({@link RobustLine}).
 */
final class ThompsonHowarth {
    private ThompsonHowarth() {
    }

    /**
     * Fits both models to pairs with two detected values.
     *
     * @param a originals
     * @param b duplicates
     * @param grades grades at which to state precision
     */
    public static PrecisionModelResult fit(double[] a, double[] b, double[] grades, DuplicateSettings settings) {
        int n = a.length;
        if (n < settings.thMinimumPairs()) {
            return PrecisionModelResult.refused(n, "Thompson–Howarth needs at least " + settings.thMinimumPairs()
                    + " pairs with two detected values; this set has " + n
                    + ". Pool batches or use the RMS CV of the set.");
        }
        double[] m = new double[n];
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            m[i] = PairMeasures.mean(a[i], b[i]);
            d[i] = PairMeasures.absDifference(a[i], b[i]);
        }
        // Sorted in place: the control-line counts below do not depend on the order of the pairs.
        double[] sm = m;
        double[] sd = d;
        PairGroups.sortByMean(sm, sd);
        PairGroups groups = PairGroups.ofSorted(sm, sd, settings.thGroupSize());
        double[] means = groups.means();
        NonNegativeLine thLine = NonNegativeLine.fit(means, groups.medianAbsDiff());
        NonNegativeLine rmsLine = NonNegativeLine.fit(means, groups.rmsSd());
        double c = NormalDifferenceConstants.SIGMA_PER_MEDIAN;
        PrecisionModel th = new PrecisionModel(c * thLine.intercept(), c * thLine.slope());
        PrecisionModel rms = new PrecisionModel(rmsLine.intercept(), rmsLine.slope());

        Uncertainties u = settings.bootstraps(n) ? bootstrap(sm, sd, settings)
                : largeSample(groups, thLine, rmsLine, settings.bootstrapMaxPairs());
        ModelFit thFit = new ModelFit("Thompson–Howarth (median |d|)", thLine.intercept(), thLine.slope(),
                thLine.rSquared(means, groups.medianAbsDiff()), th, u.th().sigma0(th, n), u.th().k(th, n),
                constraint(thLine, c));
        ModelFit rmsFit = new ModelFit("RMS SD regression (Stanley & Lawie 2008)", rmsLine.intercept(),
                rmsLine.slope(), rmsLine.rSquared(means, groups.rmsSd()), rms, u.rms().sigma0(rms, n),
                u.rms().k(rms, n), constraint(rmsLine, 1));
        List<GradePrecision> atGrades = new ArrayList<>();
        for (double g : grades) {
            atGrades.add(new GradePrecision(g, precision(u.th(), th, g, n), precision(u.rms(), rms, g, n)));
        }
        ControlLineCheck line90 = controlLine(90, NormalDifferenceConstants.P90, th, m, d);
        ControlLineCheck line99 = controlLine(99, NormalDifferenceConstants.P99, th, m, d);
        return new PrecisionModelResult("", n, groups, thFit, rmsFit, line90, line99, atGrades,
                ControlLineCheck.fitNote(line90, line99));
    }

    /** What the σ₀ ≥ 0, k ≥ 0 bounds did to a line, in the model's units (coefficients times {@code scale}). */
    private static String constraint(NonNegativeLine line, double scale) {
        if (!line.constrained()) {
            return "";
        }
        String free = "the unconstrained line gives σ₀ = " + org.cupel.assay.Numbers.significant(
                scale * line.unconstrainedIntercept(), 3) + " and k = " + org.cupel.assay.Numbers.significant(
                scale * line.unconstrainedSlope(), 3);
        if (line.heldIntercept() && !line.heldSlope()) {
            return free + "; an SD cannot be negative, so the line is refitted through the origin (σ₀ = 0, "
                    + "least squares with σ₀ ≥ 0, k ≥ 0)";
        }
        return free + "; an SD cannot be negative, so " + (line.heldSlope() && line.heldIntercept()
                ? "both are held at 0" : "k is held at 0 and σ₀ is the mean of the group points")
                + " (least squares with σ₀ ≥ 0, k ≥ 0)";
    }

    /** Pairs whose |d| lies above {@code factor}·σ_c of {@code model} at their mean. */
    public static boolean[] above(double factor, PrecisionModel model, double[] a, double[] b) {
        boolean[] out = new boolean[a.length];
        for (int i = 0; i < a.length; i++) {
            out[i] = aboveLine(PairMeasures.mean(a[i], b[i]), PairMeasures.absDifference(a[i], b[i]), factor, model);
        }
        return out;
    }

    /**
     * Whether a pair of mean {@code m} and |d| = {@code d} lies above the control line factor·max(0, σ_c(m)).
     * Compared by {@link LimitComparison#above}, as every limit in Cupel: a difference on the line is not
     * above it.
     */
    public static boolean aboveLine(double m, double d, double factor, PrecisionModel model) {
        return LimitComparison.above(d, factor * Math.max(0.0, model.sigmaAt(m)));
    }

    static ControlLineCheck controlLine(double percentile, double factor, PrecisionModel model, double[] m,
                                        double[] d) {
        int n = m.length;
        int count = 0;
        for (int i = 0; i < n; i++) {
            if (aboveLine(m[i], d[i], factor, model)) {
                count++;
            }
        }
        return ControlLineCheck.of(percentile, factor, n, count);
    }

    private static Estimate precision(Uncertainty u, PrecisionModel model, double c, int n) {
        if (!(c > 0)) {
            return Estimate.unavailable(n, "precision is stated at positive grades only");
        }
        return u.precisionAt(model, c, n);
    }

    /** The uncertainty of the Thompson–Howarth model and of the RMS SD model. */
    private record Uncertainties(Uncertainty th, Uncertainty rms) {
    }

    /** Where the 95 % intervals of one fitted model's σ₀, k and P_c come from. */
    private interface Uncertainty {
        Estimate sigma0(PrecisionModel model, int n);

        Estimate k(PrecisionModel model, int n);

        Estimate precisionAt(PrecisionModel model, double c, int n);
    }

    /** Percentile intervals of the bootstrap replicates of σ₀ and k (and of P_c computed from each pair). */
    private record Replicates(double[] sigma0, double[] k, String how) implements Uncertainty {
        @Override
        public Estimate sigma0(PrecisionModel model, int n) {
            return estimate(model.sigma0(), Bootstrap.percentileInterval(sigma0), n, how);
        }

        @Override
        public Estimate k(PrecisionModel model, int n) {
            return estimate(model.k(), Bootstrap.percentileInterval(k), n, how);
        }

        @Override
        public Estimate precisionAt(PrecisionModel model, double c, int n) {
            double[] reps = new double[sigma0.length];
            for (int r = 0; r < reps.length; r++) {
                reps[r] = new PrecisionModel(sigma0[r], k[r]).precisionAt(c);
            }
            return estimate(model.precisionAt(c), Bootstrap.percentileInterval(reps), n, how);
        }
    }

    /**
     * Normal intervals from the HC3 covariance of the model's line over the groups: σ₀ and k are the line's
     * intercept and slope (times 1.048358 for Thompson–Howarth), and P_c = (2/c)·σ₀ + 2k is linear in them,
     * so Var P_c = (2/c)²·Var σ₀ + 4·Var k + 2·(2/c)·2·Cov(σ₀, k). The group points are treated as
     * independent, which holds closely when the groups are many and each holds different pairs. A coefficient
     * held at 0 by its bound gets the interval of the unconstrained line ({@code free}) cut at 0 (the bound only
     * removes impossible values); the other coefficient's comes from the constrained line.
     */
    private record LineCovariance(RobustLine line, RobustLine free, NonNegativeLine bounds, String how)
            implements Uncertainty {
        @Override
        public Estimate sigma0(PrecisionModel model, int n) {
            double[] ci = bounds.heldIntercept()
                    ? cutAtZero(NormalInterval.around(free.intercept(), free.interceptVariance()))
                    : NormalInterval.around(model.sigma0(), line.interceptVariance());
            return estimate(model.sigma0(), ci, n, how);
        }

        @Override
        public Estimate k(PrecisionModel model, int n) {
            double[] ci = bounds.heldSlope() ? cutAtZero(NormalInterval.around(free.slope(), free.slopeVariance()))
                    : NormalInterval.around(model.k(), line.slopeVariance());
            return estimate(model.k(), ci, n, how);
        }

        private static double[] cutAtZero(double[] ci) {
            return new double[] {Math.max(0, ci[0]), Math.max(0, ci[1])};
        }

        @Override
        public Estimate precisionAt(PrecisionModel model, double c, int n) {
            double p = model.precisionAt(c);
            return estimate(p, NormalInterval.around(p, line.varianceOf(2 / c, 2)), n, how);
        }
    }

    private static Estimate estimate(double value, double[] ci, int n, String how) {
        return Estimate.of(value, ci[0], ci[1], n, how);
    }

    /** Thompson–Howarth and RMS SD uncertainty from the HC3 covariance of their lines over the groups. */
    private static Uncertainties largeSample(PairGroups groups, NonNegativeLine thLine, NonNegativeLine rmsLine,
                                             int bootstrapMaxPairs) {
        String how = "95 % normal interval from HC3 standard errors (MacKinnon and White 1985) of the line over "
                + groups.groups() + " groups; bootstrap skipped above duplicates.bootstrapMaxPairs = "
                + bootstrapMaxPairs + " pairs";
        double[] means = groups.means();
        double c = NormalDifferenceConstants.SIGMA_PER_MEDIAN;
        double[] med = groups.medianAbsDiff();
        double[] rms = groups.rmsSd();
        return new Uncertainties(new LineCovariance(RobustLine.fit(means, med, thLine).scaled(c),
                RobustLine.fit(means, med).scaled(c), thLine, how),
                new LineCovariance(RobustLine.fit(means, rms, rmsLine), RobustLine.fit(means, rms), rmsLine, how));
    }

    /**
     * Thompson–Howarth and RMS SD replicates from one seeded bootstrap over pairs. Resampling the pairs keeps
     * them in sorted order when each pair is simply repeated as often as it was drawn, so no resample needs
     * sorting again.
     */
    private static Uncertainties bootstrap(double[] sortedM, double[] sortedD, DuplicateSettings settings) {
        int n = sortedM.length;
        int resamples = settings.bootstrapResamples();
        SplittableRandom random = new SplittableRandom(settings.bootstrapSeed());
        double[] thSigma0 = new double[resamples];
        double[] thK = new double[resamples];
        double[] rmsSigma0 = new double[resamples];
        double[] rmsK = new double[resamples];
        double[] rm = new double[n];
        double[] rd = new double[n];
        for (int r = 0; r < resamples; r++) {
            int[] counts = Bootstrap.resampleCounts(n, random);
            int k = 0;
            for (int i = 0; i < n; i++) {
                for (int c = 0; c < counts[i]; c++) {
                    rm[k] = sortedM[i];
                    rd[k] = sortedD[i];
                    k++;
                }
            }
            PairGroups g = PairGroups.ofSorted(rm, rd, settings.thGroupSize());
            double[] means = g.means();
            NonNegativeLine th = NonNegativeLine.fit(means, g.medianAbsDiff());
            NonNegativeLine rms = NonNegativeLine.fit(means, g.rmsSd());
            thSigma0[r] = NormalDifferenceConstants.SIGMA_PER_MEDIAN * th.intercept();
            thK[r] = NormalDifferenceConstants.SIGMA_PER_MEDIAN * th.slope();
            rmsSigma0[r] = rms.intercept();
            rmsK[r] = rms.slope();
        }
        String how = "95 % percentile bootstrap over pairs, " + resamples + " resamples, seed "
                + settings.bootstrapSeed() + "; each resample fitted with σ₀ ≥ 0, k ≥ 0";
        return new Uncertainties(new Replicates(thSigma0, thK, how), new Replicates(rmsSigma0, rmsK, how));
    }

    /** Intercept and slope of the ordinary least-squares line; NaN when x does not vary. */
    static double[] leastSquares(double[] x, double[] y) {
        int n = x.length;
        double mx = 0;
        double my = 0;
        for (int i = 0; i < n; i++) {
            mx += x[i];
            my += y[i];
        }
        mx /= n;
        my /= n;
        double sxx = 0;
        double sxy = 0;
        for (int i = 0; i < n; i++) {
            sxx += (x[i] - mx) * (x[i] - mx);
            sxy += (x[i] - mx) * (y[i] - my);
        }
        double slope = sxx > 0 ? sxy / sxx : Double.NaN;
        return new double[] {my - slope * mx, slope};
    }
}
