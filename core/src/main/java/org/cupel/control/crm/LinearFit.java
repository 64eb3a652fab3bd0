package org.cupel.control.crm;

import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.stat.regression.SimpleRegression;

/**
 * Ordinary least squares y = a + b·x (Commons Math {@link SimpleRegression}) with a two-sided
 * t-interval for the slope, b ± t(1 − α/2, n − 2)·SE(b), and the p-value of H₀: b = 0 (any textbook on
 * regression, e.g. Draper &amp; Smith 1998, Applied Regression Analysis, ch. 1). Needs n ≥ 3 and x not
 * all equal; otherwise the estimates are NaN and {@link #note()} says why.
 *
 * @param n points used
 * @param slope b
 * @param slopeLow lower end of the slope interval
 * @param slopeHigh upper end
 * @param intercept a
 * @param pValue two-sided p for b = 0
 * @param rSquared coefficient of determination
 * @param confidence confidence level of the interval
 * @param note empty, or why nothing could be estimated
 */
public record LinearFit(int n, double slope, double slopeLow, double slopeHigh, double intercept, double pValue,
                        double rSquared, double confidence, String note) {

    public static LinearFit of(double[] x, double[] y, double confidence) {
        int n = x.length;
        if (n < 3) {
            return empty(n, confidence, "fewer than 3 points (n = " + n + ")");
        }
        SimpleRegression r = new SimpleRegression(true);
        double minX = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            r.addData(x[i], y[i]);
            minX = Math.min(minX, x[i]);
            maxX = Math.max(maxX, x[i]);
        }
        if (minX == maxX) {
            return empty(n, confidence, "all points at the same x");
        }
        double t = new TDistribution(n - 2).inverseCumulativeProbability(1 - (1 - confidence) / 2);
        double se = r.getSlopeStdErr();
        return new LinearFit(n, r.getSlope(), r.getSlope() - t * se, r.getSlope() + t * se, r.getIntercept(),
                r.getSignificance(), r.getRSquare(), confidence, "");
    }

    private static LinearFit empty(int n, double confidence, String why) {
        return new LinearFit(n, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                confidence, why);
    }

    public boolean estimated() {
        return note.isEmpty();
    }

    /** The p-value as printed in reports: "p = 0.012", "p < 0.0001", or "p not estimated". */
    public String pText() {
        if (!Double.isFinite(pValue)) {
            return "p not estimated";
        }
        return pValue < 1e-4 ? "p < 0.0001" : "p = " + org.cupel.assay.Numbers.significant(pValue, 2);
    }

    /** Whether the slope interval excludes zero. */
    public boolean slopeExcludesZero() {
        return estimated() && (slopeLow > 0 || slopeHigh < 0);
    }
}
