package org.cupel.recovery;

import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.apache.commons.math3.special.Gamma;

/**
 * The expectation E[g(S)] of a function of S = √(χ²_ν/ν), the ratio of a sample standard deviation to σ
 * with ν degrees of freedom. Its density is
 * f(s) = 2 (ν/2)^{ν/2} / Γ(ν/2) · s^{ν−1} · exp(−ν s²/2), s &gt; 0 (e.g. Johnson, Kotz &amp; Balakrishnan
 * 1994, Continuous Univariate Distributions vol. 1, ch. 18, the chi distribution rescaled; recalled from
 * memory). Both the noncentral t and the studentized range distribution functions are such expectations.
 *
 * <p>The integral is taken by composite Gauss–Legendre quadrature over s ∈ [0, 1 + 12/√(2ν)] (beyond the
 * upper end the density is below 1e-30 for every ν ≥ 1: S has mean ≈ 1 and SD ≈ 1/√(2ν)).
 */
final class ChiScaleExpectation {
    private static final int PANELS = 20;
    private static final int POINTS = 16;
    private static final GaussIntegratorFactory FACTORY = new GaussIntegratorFactory();

    private ChiScaleExpectation() {
    }

    static double of(double nu, DoubleUnaryOperator g) {
        if (!(nu > 0)) {
            throw new IllegalArgumentException("degrees of freedom must be positive: " + nu);
        }
        double width = 12.0 / Math.sqrt(2 * nu);
        double lo = Math.max(0, 1 - width);
        double hi = 1 + width + (nu < 3 ? 8 : 0);
        double logNorm = Math.log(2) + (nu / 2) * Math.log(nu / 2) - Gamma.logGamma(nu / 2);
        double step = (hi - lo) / PANELS;
        double sum = 0;
        for (int p = 0; p < PANELS; p++) {
            GaussIntegrator rule = FACTORY.legendre(POINTS, lo + p * step, lo + (p + 1) * step);
            for (int i = 0; i < rule.getNumberOfPoints(); i++) {
                double s = rule.getPoint(i);
                double logDensity = logNorm + (nu - 1) * Math.log(s) - nu * s * s / 2;
                sum += rule.getWeight(i) * Math.exp(logDensity) * g.applyAsDouble(s);
            }
        }
        return sum;
    }
}
