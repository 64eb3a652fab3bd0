package org.cupel.duplicates;

import java.util.Locale;
import org.apache.commons.math3.distribution.BinomialDistribution;
import org.cupel.assay.LimitComparison;

/**
 * The acceptance rule ("at least 90 % of pairs within the HARD limit") judged on one batch's few pairs. A batch
 * has a handful of duplicates, and with 1–5 pairs one wide pair moves the share by 20–100 points: a plain
 * share would fail most batches of a good set on noise. So a batch fails only when its pairs show that the
 * share is below the rule: the exact one-sided binomial test of H₀: p ≥ p₀ against H₁: p &lt; p₀, p₀ the
 * required share, with p-value P(X ≤ k), X ~ Binomial(n, p₀), k of the n pairs within the limit (Conover 1999,
 * Practical Nonparametric Statistics, 3rd ed., section 3.1, the binomial test; recalled from memory; the
 * p-values equal scipy.stats.binomtest(k, n, p₀, alternative='less'), checked in {@code BatchRuleTestTest}).
 *
 * <ul>
 *   <li>no usable pair: {@link RuleOutcome#NOT_JUDGED};</li>
 *   <li>share k/n at or above p₀: {@link RuleOutcome#PASS};</li>
 *   <li>p-value below α: {@link RuleOutcome#FAIL};</li>
 *   <li>otherwise {@link RuleOutcome#TOO_FEW_PAIRS}: the share is below p₀ but the pairs are too few to say the
 *       batch is worse than the rule allows. With p₀ = 0.9 and α = 0.05 a batch of 1 pair can never fail
 *       (0.1 ≥ 0.05); of 2 pairs it fails with none within (0.01); of 5 pairs with 2 or fewer within
 *       (0.0086), not with 3 (0.081).</li>
 * </ul>
 *
 * @param within pairs with HARD at or below the limit (k)
 * @param n pairs used in relative measures
 * @param acceptancePercent the rule's share, % (100·p₀)
 * @param pValue P(X ≤ k) under p₀; NaN when n = 0 (see note)
 * @param alpha the level below which the batch fails
 * @param outcome pass, fail, too few pairs or not judged
 * @param note empty on a pass or a fail; else why the batch is not judged
 */
public record BatchRuleTest(int within, int n, double acceptancePercent, double pValue, double alpha,
                            RuleOutcome outcome, String note) {

    /** Point probabilities summed in full up to this many terms. */
    static final int SUMMED_TERMS = 1000;

    public static BatchRuleTest of(int within, int n, double acceptancePercent, double alpha) {
        if (n == 0) {
            return new BatchRuleTest(0, 0, acceptancePercent, Double.NaN, alpha, RuleOutcome.NOT_JUDGED,
                    "no pair usable for relative measures");
        }
        double p0 = acceptancePercent / 100.0;
        double p = lowerTail(within, n, p0);
        if (LimitComparison.atLeast(100.0 * within / n, acceptancePercent)) {
            return new BatchRuleTest(within, n, acceptancePercent, p, alpha, RuleOutcome.PASS, "");
        }
        if (p < alpha) {
            return new BatchRuleTest(within, n, acceptancePercent, p, alpha, RuleOutcome.FAIL, "");
        }
        return new BatchRuleTest(within, n, acceptancePercent, p, alpha, RuleOutcome.TOO_FEW_PAIRS,
                String.format(Locale.ROOT, "too few pairs to judge: %d of %d within is below %s %% but not "
                        + "significantly (one-sided binomial p = %.2g, fails below %s)", within, n,
                        org.cupel.assay.Numbers.compact(acceptancePercent), p, org.cupel.assay.Numbers.compact(alpha)));
    }

    /**
     * P(X ≤ k) for X ~ Binomial(n, p) as the sum of the point probabilities, each by Loader's saddle-point
     * method (Loader 2000, "Fast and accurate computation of binomial probabilities", as Commons Math's
     * {@link BinomialDistribution#probability} implements it), smallest k first. Commons Math's own
     * cumulative probability goes through a continued fraction of the incomplete beta function that is off
     * by up to 5e-9 relative in the far lower tail (0.1⁸ came out 1.0000000050e-8); a sum of positive terms
     * each accurate to a few ulps is not.
     *
     * <p>Above {@link #SUMMED_TERMS} terms (a whole set of a million pairs is one batch of a pairs file without a
     * batch column) the sum stops where the terms left cannot change it ({@link #monotoneTail}): below the mode
     * the terms fall away from k geometrically, so P(X ≤ k) is summed from k down; at or above the mode, where the
     * share within meets the rule anyway, P(X ≤ k) = 1 − P(X &gt; k) and the upper tail is summed from k + 1 up.
     */
    static double lowerTail(int k, int n, double p) {
        BinomialDistribution b = new BinomialDistribution(null, n, p);
        if (k < SUMMED_TERMS) {
            double sum = 0;
            for (int j = 0; j <= k; j++) {
                sum += b.probability(j);
            }
            return Math.min(1.0, sum);
        }
        int mode = (int) Math.floor((n + 1) * p);
        if (k < mode) {
            return Math.min(1.0, monotoneTail(b, k, -1, n, p));
        }
        return k >= n ? 1.0 : Math.max(0.0, 1.0 - monotoneTail(b, k + 1, 1, n, p));
    }

    /**
     * Σ P(X = j) from j = {@code from} in direction {@code step} (−1 down to 0, +1 up to n), on the side of the
     * mode where the terms shrink: the ratio of the next term to this one, r = j(1−p)/((n−j+1)p) going down or
     * (n−j)p/((j+1)(1−p)) going up, is below 1 and shrinks further on, so the terms still to come add at most
     * t·r/(1 − r); the sum stops when that is below 2⁻⁶⁰ of it, where it can no longer change the double.
     */
    private static double monotoneTail(BinomialDistribution b, int from, int step, int n, double p) {
        double sum = 0;
        for (int j = from; j >= 0 && j <= n; j += step) {
            double t = b.probability(j);
            sum += t;
            double r = step < 0 ? j * (1 - p) / ((n - j + 1) * p) : (n - j) * p / ((j + 1) * (1 - p));
            if (r < 1 && t * r / (1 - r) <= sum * 0x1p-60) {
                break;
            }
        }
        return sum;
    }
}
