package org.cupel.duplicates;

import org.apache.commons.math3.distribution.TDistribution;

/**
 * Reduced major axis regression, the line for two variables that both carry error (Miller, R.L. and Kahn,
 * J.S., 1962, "Statistical Analysis in the Geological Sciences", Wiley, New York; the formulas used here are
 * theirs, not the alternative form of Sinclair and Bentzen 1998): with sample means x̄, ȳ, sample SDs
 * s_x, s_y and correlation r,
 * <pre>
 *   b = sign(r)·s_y / s_x,         a = ȳ − b·x̄,
 *   SE(b) = |b|·√((1 − r²)/n),     SE(a) = s_y·√(((1 − r²)/n)·(1 + x̄²/s_x²)).
 * </pre>
 * The 95 % intervals are ± t(0.975, n − 2)·SE.
 */
final class ReducedMajorAxis {
    private ReducedMajorAxis() {
    }

    public static RmaFit fit(double[] x, double[] y) {
        int n = x.length;
        if (n < 3) {
            return RmaFit.unavailable(n, "reduced major axis needs at least 3 pairs, has " + n);
        }
        double mx = 0;
        double my = 0;
        for (int i = 0; i < n; i++) {
            mx += x[i];
            my += y[i];
        }
        mx /= n;
        my /= n;
        double sxx = 0;
        double syy = 0;
        double sxy = 0;
        for (int i = 0; i < n; i++) {
            double dx = x[i] - mx;
            double dy = y[i] - my;
            sxx += dx * dx;
            syy += dy * dy;
            sxy += dx * dy;
        }
        if (sxx == 0 || syy == 0) {
            return RmaFit.unavailable(n, "reduced major axis needs values that vary on both axes");
        }
        double sx = Math.sqrt(sxx / (n - 1));
        double sy = Math.sqrt(syy / (n - 1));
        double r = sxy / Math.sqrt(sxx * syy);
        double slope = Math.signum(r == 0 ? 1 : r) * sy / sx;
        double intercept = my - slope * mx;
        double slopeSe = Math.abs(slope) * Math.sqrt((1 - r * r) / n);
        double interceptSe = sy * Math.sqrt(((1 - r * r) / n) * (1 + mx * mx / (sx * sx)));
        double t = new TDistribution(null, n - 2, 1e-14).inverseCumulativeProbability(0.975);
        return new RmaFit(slope, intercept, slopeSe, interceptSe,
                new double[] {slope - t * slopeSe, slope + t * slopeSe},
                new double[] {intercept - t * interceptSe, intercept + t * interceptSe}, r, n, "");
    }
}
