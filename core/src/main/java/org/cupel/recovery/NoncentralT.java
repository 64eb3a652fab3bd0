package org.cupel.recovery;

import org.apache.commons.statistics.distribution.NormalDistribution;

/**
 * Distribution function of the noncentral t distribution with ν degrees of freedom and noncentrality δ,
 * the law of T = (Z + δ)/S with Z standard normal and S = √(χ²_ν/ν) independent of Z. Since
 * T ≤ t ⇔ Z ≤ tS − δ, P(T ≤ t) = E[Φ(tS − δ)] = ∫₀^∞ Φ(ts − δ) f_S(s) ds (Johnson, Kotz &amp; Balakrishnan
 * 1995, Continuous Univariate Distributions vol. 2, ch. 31; recalled from memory), integrated numerically by
 * {@link ChiScaleExpectation}, with Φ from Commons Statistics (14–16 µs of CPU a value against 11–13 µs with
 * the hand-written Φ it replaced; docs/performance.md, "Kept libraries"). Neither Commons Math 3.6.1 nor Commons
 * Statistics 1.1 has a noncentral t; accuracy is checked against R's {@code pt(t, df, ncp)}.
 */
public final class NoncentralT {
    private static final NormalDistribution STANDARD_NORMAL = NormalDistribution.of(0, 1);

    private NoncentralT() {
    }

    /** P(T ≤ t) for T noncentral t with {@code df} degrees of freedom and noncentrality {@code ncp}. */
    public static double cdf(double t, double df, double ncp) {
        if (Double.isInfinite(df)) {
            return STANDARD_NORMAL.cumulativeProbability(t - ncp);
        }
        return ChiScaleExpectation.of(df, s -> STANDARD_NORMAL.cumulativeProbability(t * s - ncp));
    }
}
