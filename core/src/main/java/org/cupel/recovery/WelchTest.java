package org.cupel.recovery;

import org.apache.commons.math3.distribution.TDistribution;

/**
 * Welch's two-sample t-test for unequal variances (Welch 1947, "The generalization of 'Student's' problem
 * when several different population variances are involved", Biometrika 34) with the Satterthwaite (1946)
 * approximate degrees of freedom, as given in NIST/SEMATECH e-Handbook of Statistical Methods §1.3.5.3:
 * <pre>
 *   d = ȳ₁ − ȳ₂,  SE = √(s₁²/n₁ + s₂²/n₂),  t = d / SE,
 *   ν = SE⁴ / [ (s₁²/n₁)²/(n₁−1) + (s₂²/n₂)²/(n₂−1) ],
 *   p = 2 P(T_ν &gt; |t|),  CI = d ± t_{1−α/2, ν} · SE.
 * </pre>
 */
public final class WelchTest {
    private WelchTest() {
    }

    /**
     * The result of one Welch comparison.
     *
     * @param difference ȳ₁ − ȳ₂
     * @param standardError SE of the difference
     * @param t the statistic
     * @param df Satterthwaite degrees of freedom
     * @param p two-sided p-value
     * @param lower lower end of the (1 − α) CI of the difference
     * @param upper upper end
     * @param confidence 1 − α
     * @param n1 replicates of the first group
     * @param n2 replicates of the second group
     * @param note why the test could not be computed, empty when it was
     */
    public record Result(double difference, double standardError, double t, double df, double p, double lower,
                         double upper, double confidence, int n1, int n2, String note) {
        public boolean computed() {
            return note.isEmpty();
        }
    }

    public static Result test(double[] a, double[] b, double confidence) {
        return test(SampleSummary.of(a), SampleSummary.of(b), confidence);
    }

    public static Result test(SampleSummary a, SampleSummary b, double confidence) {
        double d = a.mean() - b.mean();
        if (a.n() < 2 || b.n() < 2) {
            return new Result(d, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, confidence,
                    a.n(), b.n(), "needs at least 2 replicates in each condition (have " + a.n() + " and " + b.n()
                    + ")");
        }
        double va = a.varianceOfMean();
        double vb = b.varianceOfMean();
        double se = Math.sqrt(va + vb);
        if (!(se > 0)) {
            return new Result(d, 0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, confidence, a.n(),
                    b.n(), "replicates agree exactly in both conditions: no scatter to test against");
        }
        double df = satterthwaite(va, a.n() - 1, vb, b.n() - 1);
        double t = d / se;
        TDistribution dist = new TDistribution(null, df);
        double p = 2 * dist.cumulativeProbability(-Math.abs(t));
        double half = dist.inverseCumulativeProbability(1 - (1 - confidence) / 2) * se;
        return new Result(d, se, t, df, p, d - half, d + half, confidence, a.n(), b.n(), "");
    }

    /**
     * Satterthwaite's (1946) effective degrees of freedom of a sum of independent variance estimates:
     * ν = (Σ vᵢ)² / Σ (vᵢ²/νᵢ); the same formula is the Welch–Satterthwaite formula of JCGM 100:2008
     * Annex G.4.1. A component with infinite νᵢ contributes nothing to the denominator.
     */
    public static double satterthwaite(double v1, double nu1, double v2, double nu2) {
        return WelchSatterthwaite.effectiveDf(new double[] {v1, v2}, new double[] {nu1, nu2});
    }
}
