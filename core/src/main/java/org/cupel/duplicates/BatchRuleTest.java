package org.cupel.duplicates;

import java.util.Locale;
import org.apache.commons.statistics.distribution.BinomialDistribution;
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
     * P(X ≤ k) for X ~ Binomial(n, p): Commons Statistics' {@link BinomialDistribution}, which takes it from
     * Commons Numbers' regularized incomplete beta function (Boost's algorithm) and (1 − p)ⁿ at k = 0.
     * Against exact sums in 50-digit mpmath (testdata/reference/special-functions/binomial_tails.csv, n up to
     * 1,000) it is within 4.4e-14 relative wherever the tail is above 1e-280 (closer to the bottom of the
     * double range it loses digits: 6.5e-10 relative at 1.6e-298). Commons Math 3's cumulative probability was
     * off by up to 5e-9 relative in the far lower tail (0.1⁸ came out 1.0000000050e-8), which is why Cupel
     * summed Commons Math's point probabilities by hand before (within 1.0e-13 on the same values).
     */
    static double lowerTail(int k, int n, double p) {
        return BinomialDistribution.of(n, p).cumulativeProbability(k);
    }
}
