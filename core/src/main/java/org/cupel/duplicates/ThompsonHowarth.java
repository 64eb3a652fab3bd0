package org.cupel.duplicates;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.apache.commons.math3.distribution.BinomialDistribution;
import org.apache.commons.math3.stat.regression.SimpleRegression;

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
 * <p>Intervals for σ₀, k and P_c come from a seeded bootstrap over pairs: pairs are drawn with replacement,
 * regrouped and both lines refitted.
 */
public final class ThompsonHowarth {
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
        int[] order = PairGroups.sortOrder(m, d);
        double[] sm = new double[n];
        double[] sd = new double[n];
        for (int i = 0; i < n; i++) {
            sm[i] = m[order[i]];
            sd[i] = d[order[i]];
        }
        PairGroups groups = PairGroups.ofSorted(sm, sd, settings.thGroupSize());
        SimpleRegression thLine = line(groups.means(), groups.medianAbsDiff());
        SimpleRegression rmsLine = line(groups.means(), groups.rmsSd());
        PrecisionModel th = new PrecisionModel(NormalDifferenceConstants.SIGMA_PER_MEDIAN * thLine.getIntercept(),
                NormalDifferenceConstants.SIGMA_PER_MEDIAN * thLine.getSlope());
        PrecisionModel rms = new PrecisionModel(rmsLine.getIntercept(), rmsLine.getSlope());

        Replicates reps = bootstrap(sm, sd, settings);
        String how = "95 % percentile bootstrap over pairs, " + settings.bootstrapResamples() + " resamples, seed "
                + settings.bootstrapSeed();
        ModelFit thFit = new ModelFit("Thompson–Howarth (median |d|)", thLine.getIntercept(), thLine.getSlope(),
                thLine.getRSquare(), th, estimate(th.sigma0(), reps.thSigma0, n, how), estimate(th.k(), reps.thK, n, how));
        ModelFit rmsFit = new ModelFit("RMS SD regression (Stanley & Lawie 2008)", rmsLine.getIntercept(),
                rmsLine.getSlope(), rmsLine.getRSquare(), rms, estimate(rms.sigma0(), reps.rmsSigma0, n, how),
                estimate(rms.k(), reps.rmsK, n, how));
        List<GradePrecision> atGrades = new ArrayList<>();
        for (double c : grades) {
            atGrades.add(new GradePrecision(c, precision(th, reps.thSigma0, reps.thK, c, n, how),
                    precision(rms, reps.rmsSigma0, reps.rmsK, c, n, how)));
        }
        return new PrecisionModelResult("", n, groups, thFit, rmsFit,
                controlLine(90, NormalDifferenceConstants.P90, th, m, d),
                controlLine(99, NormalDifferenceConstants.P99, th, m, d), atGrades);
    }

    /** Pairs whose |d| lies above {@code factor}·σ_c of {@code model} at their mean. */
    public static boolean[] above(double factor, PrecisionModel model, double[] a, double[] b) {
        boolean[] out = new boolean[a.length];
        for (int i = 0; i < a.length; i++) {
            double line = factor * Math.max(0.0, model.sigmaAt(PairMeasures.mean(a[i], b[i])));
            out[i] = PairMeasures.absDifference(a[i], b[i]) > line;
        }
        return out;
    }

    static ControlLineCheck controlLine(double percentile, double factor, PrecisionModel model, double[] m,
                                        double[] d) {
        int n = m.length;
        int count = 0;
        for (int i = 0; i < n; i++) {
            if (d[i] > factor * Math.max(0.0, model.sigmaAt(m[i]))) {
                count++;
            }
        }
        double pExceed = 1.0 - percentile / 100.0;
        BinomialDistribution binomial = new BinomialDistribution(null, n, pExceed);
        double p = count == 0 ? 1.0 : 1.0 - binomial.cumulativeProbability(count - 1);
        return new ControlLineCheck(percentile, factor, n, count, n * pExceed, p);
    }

    private static SimpleRegression line(double[] x, double[] y) {
        SimpleRegression r = new SimpleRegression(true);
        for (int i = 0; i < x.length; i++) {
            r.addData(x[i], y[i]);
        }
        return r;
    }

    private static Estimate estimate(double value, double[] replicates, int n, String how) {
        double[] ci = Bootstrap.percentileInterval(replicates);
        return Estimate.of(value, ci[0], ci[1], n, how);
    }

    private static Estimate precision(PrecisionModel model, double[] s0, double[] k, double c, int n, String how) {
        if (!(c > 0)) {
            return Estimate.unavailable(n, "precision is stated at positive grades only");
        }
        double[] reps = new double[s0.length];
        for (int r = 0; r < reps.length; r++) {
            reps[r] = new PrecisionModel(s0[r], k[r]).precisionAt(c);
        }
        return estimate(model.precisionAt(c), reps, n, how);
    }

    private static final class Replicates {
        final double[] thSigma0;
        final double[] thK;
        final double[] rmsSigma0;
        final double[] rmsK;

        Replicates(int resamples) {
            thSigma0 = new double[resamples];
            thK = new double[resamples];
            rmsSigma0 = new double[resamples];
            rmsK = new double[resamples];
        }
    }

    /**
     * Resampling the pairs keeps them in sorted order when each pair is simply repeated as often as it was
     * drawn, so no resample needs sorting again.
     */
    private static Replicates bootstrap(double[] sortedM, double[] sortedD, DuplicateSettings settings) {
        int n = sortedM.length;
        int resamples = settings.bootstrapResamples();
        SplittableRandom random = new SplittableRandom(settings.bootstrapSeed());
        Replicates out = new Replicates(resamples);
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
            double[] th = leastSquares(g.means(), g.medianAbsDiff());
            double[] rms = leastSquares(g.means(), g.rmsSd());
            out.thSigma0[r] = NormalDifferenceConstants.SIGMA_PER_MEDIAN * th[0];
            out.thK[r] = NormalDifferenceConstants.SIGMA_PER_MEDIAN * th[1];
            out.rmsSigma0[r] = rms[0];
            out.rmsK[r] = rms[1];
        }
        return out;
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
