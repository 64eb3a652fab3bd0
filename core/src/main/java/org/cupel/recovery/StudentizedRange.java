package org.cupel.recovery;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.statistics.distribution.NormalDistribution;

/**
 * The studentized range distribution: the law of Q = (max − min of k independent standard normals) / S,
 * S = √(χ²_ν/ν) independent of them. Neither Commons Math 3.6.1 nor Commons Statistics 1.1 has it, so
 * its distribution function is integrated numerically from the standard representation
 * <pre>
 *   P(Q ≤ q; k, ν) = ∫₀^∞ f_S(s) · P_k(q s) ds,
 *   P_k(w) = k ∫ φ(z) [Φ(z) − Φ(z − w)]^{k−1} dz        (the range of k normals, ν = ∞)
 * </pre>
 * (Hartley 1942, "The range in random samples", Biometrika 32; Copenhaver &amp; Holland 1988, J. Statist.
 * Comput. Simul. 30, whose algorithm R's {@code ptukey} follows; both recalled from memory). The inner
 * integral uses composite Gauss–Legendre quadrature over z ∈ [−8.5, 8.5], where φ is above 1e-16; the
 * outer one {@link ChiScaleExpectation}. Φ is Commons Statistics' normal distribution (½·erfc(−x/√2), within
 * 1.1e-16 absolute of 50-digit values; {@code DistributionsTest}); Hart's approximation, carried by hand
 * before for speed, made no measurable difference to the whole integral (3.2–3.7 ms of CPU per
 * distribution function value before and after; docs/performance.md, "Kept libraries"). Checked against R's
 * {@code ptukey} and {@code qtukey}.
 */
final class StudentizedRange {
    private static final NormalDistribution STANDARD_NORMAL = NormalDistribution.of(0, 1);
    private static final int PANELS = 16;
    private static final int POINTS = 16;
    private static final double Z_LIMIT = 8.5;
    private static final double[] NODES;
    private static final double[] WEIGHTS;
    private static final double[] PHI_AT_NODES;

    static {
        GaussIntegratorFactory factory = new GaussIntegratorFactory();
        NODES = new double[PANELS * POINTS];
        WEIGHTS = new double[PANELS * POINTS];
        PHI_AT_NODES = new double[PANELS * POINTS];
        double step = 2 * Z_LIMIT / PANELS;
        for (int p = 0; p < PANELS; p++) {
            GaussIntegrator rule = factory.legendre(POINTS, -Z_LIMIT + p * step, -Z_LIMIT + (p + 1) * step);
            for (int i = 0; i < POINTS; i++) {
                NODES[p * POINTS + i] = rule.getPoint(i);
                WEIGHTS[p * POINTS + i] = rule.getWeight(i) * STANDARD_NORMAL.density(rule.getPoint(i));
                PHI_AT_NODES[p * POINTS + i] = STANDARD_NORMAL.cumulativeProbability(rule.getPoint(i));
            }
        }
    }

    private StudentizedRange() {
    }

    /** P(Q ≤ q) for k means and ν degrees of freedom ({@code Double.POSITIVE_INFINITY} allowed). */
    public static double cdf(double q, int k, double df) {
        if (k < 2) {
            throw new IllegalArgumentException("the studentized range needs at least 2 means, got " + k);
        }
        if (q <= 0) {
            return 0;
        }
        if (Double.isInfinite(df)) {
            return rangeCdf(q, k);
        }
        return Math.min(1, ChiScaleExpectation.of(df, s -> rangeCdf(q * s, k)));
    }

    /** The q with P(Q ≤ q) = p, by Brent's method on {@link #cdf}. */
    public static double quantile(double p, int k, double df) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException("probability must lie in (0, 1): " + p);
        }
        double hi = 2;
        while (cdf(hi, k, df) < p) {
            hi *= 2;
        }
        return new BrentSolver(1e-12, 1e-10).solve(200, q -> cdf(q, k, df) - p, 0, hi);
    }

    /** P_k(w): the distribution function of the range of k standard normals. */
    static double rangeCdf(double w, int k) {
        if (w <= 0) {
            return 0;
        }
        double sum = 0;
        for (int i = 0; i < NODES.length; i++) {
            double inside = PHI_AT_NODES[i] - STANDARD_NORMAL.cumulativeProbability(NODES[i] - w);
            sum += WEIGHTS[i] * Math.pow(inside, k - 1);
        }
        return Math.min(1, k * sum);
    }
}
