package org.cupel.control;

import java.util.ArrayList;
import java.util.List;
import java.util.function.IntFunction;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.stat.correlation.PearsonsCorrelation;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.apache.commons.statistics.ranking.NaturalRanking;
import org.cupel.assay.AssayValue;

/**
 * Carry-over statistics: the relation of blank values to the grade of the preceding sample.
 *
 * <p>Rank correlation: Spearman (1904), "The proof and measurement of association between two things",
 * Am. J. Psychol. 15, with average ranks for ties; its p-value from the t approximation
 * t = ρ·√((n−2)/(1−ρ²)) with n−2 degrees of freedom (as in Zar 1972, "Significance testing of the
 * Spearman rank correlation coefficient", JASA 67; the same approximation scipy.stats.spearmanr uses).
 * Regression: ordinary least squares of blank on preceding grade, slope b = Sxy/Sxx, SE(b) =
 * √(s²/Sxx), p from t = b/SE(b) on n−2 degrees of freedom (any regression text, e.g. Draper &amp; Smith
 * 1998, Applied Regression Analysis, ch. 1); computed with Commons Math {@link SimpleRegression}.
 */
final class CarryOver {
    /** Fewest pairs for a correlation or slope with a p-value (n−2 ≥ 1 degrees of freedom). */
    public static final int MIN_PAIRS = 3;
    private static final NaturalRanking RANKING = new NaturalRanking();

    private CarryOver() {
    }

    /** The relation over the blanks of one analyte that have a preceding grade. */
    public static CarryOverRelation relation(String analyte, List<BlankResult> results) {
        return relation(analyte, results.size(), i -> results.get(i).observation().value(),
                i -> results.get(i).observation().precedingGrade());
    }

    /**
     * The relation over {@code n} blanks, the i-th blank's value {@code blanks(i)} and its preceding grade
     * {@code preceding(i)}.
     */
    static CarryOverRelation relation(String analyte, int n, IntFunction<AssayValue> blanks,
                                      IntFunction<AssayValue> preceding) {
        List<double[]> ranked = new ArrayList<>();
        List<double[]> detected = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            AssayValue blank = blanks.apply(i);
            AssayValue prev = preceding.apply(i);
            if (blank.isMissing() || prev.isMissing()) {
                continue;
            }
            ranked.add(new double[] {prev.value(), blank.value()});
            if (blank.isDetected() && prev.isDetected()) {
                detected.add(new double[] {prev.value(), blank.value()});
            }
        }
        List<String> notes = new ArrayList<>();
        double[] rank = spearman(ranked, notes);
        double[] ols = regression(detected, notes);
        return new CarryOverRelation(analyte, ranked.size(), rank[0], rank[1], detected.size(), ols[0], ols[1],
                ols[2], ols[3], String.join("; ", notes));
    }

    /** {rho, p}. */
    static double[] spearman(List<double[]> pairs, List<String> notes) {
        int n = pairs.size();
        if (n < MIN_PAIRS) {
            notes.add("rank correlation needs at least " + MIN_PAIRS + " blanks with a preceding grade, have " + n);
            return new double[] {Double.NaN, Double.NaN};
        }
        double[] x = column(pairs, 0);
        double[] y = column(pairs, 1);
        if (constant(x) || constant(y)) {
            notes.add("rank correlation undefined: " + (constant(y) ? "every blank" : "every preceding grade")
                    + " has the same value");
            return new double[] {Double.NaN, Double.NaN};
        }
        double rho = new PearsonsCorrelation().correlation(averageRanks(x), averageRanks(y));
        return new double[] {rho, correlationP(rho, n)};
    }

    /**
     * Ranks 1…n with ties given the mean of their ranks: Commons Statistics' {@link NaturalRanking} (ties
     * AVERAGE, NaN rejected), the ranking Commons Math's {@code SpearmansCorrelation} uses, so the ρ above is
     * the one it gives. Spearman's ρ of 50,000 blanks costs the same CPU time with it as with the hand-written
     * ranks it replaced (14–16 ms; docs/performance.md, "Kept libraries").
     */
    static double[] averageRanks(double[] x) {
        return RANKING.apply(x);
    }

    /** Two-sided p of a correlation coefficient by the t approximation on n−2 degrees of freedom. */
    static double correlationP(double r, int n) {
        if (Math.abs(r) >= 1) {
            return 0;
        }
        double t = r * Math.sqrt((n - 2) / (1 - r * r));
        return 2 * new TDistribution(n - 2).cumulativeProbability(-Math.abs(t));
    }

    /** {slope, SE, intercept, p}. */
    static double[] regression(List<double[]> pairs, List<String> notes) {
        int n = pairs.size();
        double[] none = {Double.NaN, Double.NaN, Double.NaN, Double.NaN};
        if (n < MIN_PAIRS) {
            notes.add("regression needs at least " + MIN_PAIRS + " detected blanks with a detected preceding grade, have "
                    + n);
            return none;
        }
        if (constant(column(pairs, 0))) {
            notes.add("regression undefined: every preceding grade has the same value");
            return none;
        }
        SimpleRegression reg = new SimpleRegression(true);
        for (double[] p : pairs) {
            reg.addData(p[0], p[1]);
        }
        double se = reg.getSlopeStdErr();
        // Not reg.getSignificance(): it forms 1 − cdf(|t|), which loses all digits at p below ~1e-12.
        double p = se == 0 ? 0 : 2 * new TDistribution(n - 2).cumulativeProbability(-Math.abs(reg.getSlope() / se));
        return new double[] {reg.getSlope(), se, reg.getIntercept(), p};
    }

    private static double[] column(List<double[]> pairs, int k) {
        double[] out = new double[pairs.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = pairs.get(i)[k];
        }
        return out;
    }

    private static boolean constant(double[] v) {
        for (double d : v) {
            if (d != v[0]) {
                return false;
            }
        }
        return true;
    }
}
