package org.cupel.recovery;

import org.apache.commons.statistics.distribution.TDistribution;

/**
 * Schuirmann's (1987) two one-sided tests for equivalence ("A comparison of the two one-sided tests
 * procedure and the power approach for assessing the equivalence of average bioavailability",
 * J. Pharmacokin. Biopharm. 15), with the Welch standard error and Satterthwaite degrees of freedom:
 * <pre>
 *   t_L = (d + Δ)/SE, p_L = P(T_ν &gt; t_L);   t_U = (d − Δ)/SE, p_U = P(T_ν &lt; t_U);   p = max(p_L, p_U).
 * </pre>
 * Equivalent within ±Δ at level α when p &lt; α, which is the same as the (1 − 2α) CI lying inside ±Δ. The
 * tails are Commons Statistics' {@link TDistribution} (as in {@link WelchTest}); p_L is its survival function,
 * not 1 − F, so a small p_L keeps its digits.
 *
 * @param margin Δ
 * @param tLower t_L
 * @param pLower p_L
 * @param tUpper t_U
 * @param pUpper p_U
 * @param p the TOST p-value, max(p_L, p_U)
 * @param note why it could not be computed, empty when it was
 */
public record Tost(double margin, double tLower, double pLower, double tUpper, double pUpper, double p, String note) {

    public static Tost test(WelchTest.Result welch, double margin) {
        if (!welch.computed()) {
            return new Tost(margin, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, welch.note());
        }
        TDistribution dist = TDistribution.of(welch.df());
        double tl = (welch.difference() + margin) / welch.standardError();
        double tu = (welch.difference() - margin) / welch.standardError();
        double pl = dist.survivalProbability(tl);
        double pu = dist.cumulativeProbability(tu);
        return new Tost(margin, tl, pl, tu, pu, Math.max(pl, pu), "");
    }

    public boolean equivalent(double alpha) {
        return note.isEmpty() && p < alpha;
    }
}
