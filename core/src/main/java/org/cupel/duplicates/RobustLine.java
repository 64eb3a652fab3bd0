package org.cupel.duplicates;

/**
 * The ordinary least-squares line y = intercept + slope·x with the heteroscedasticity-consistent covariance of
 * (intercept, slope) in the HC3 form of MacKinnon, J.G. and White, H. (1985, "Some heteroskedasticity-consistent
 * covariance matrix estimators with improved finite sample properties", Journal of Econometrics 29, 305–325),
 * which refines White, H. (1980, "A heteroskedasticity-consistent covariance matrix estimator and a direct test
 * for heteroskedasticity", Econometrica 48, 817–838):
 * V = (XᵀX)⁻¹ Xᵀ diag(eᵢ² / (1 − hᵢ)²) X (XᵀX)⁻¹, with residuals eᵢ and leverages hᵢ = 1/n + (xᵢ − x̄)²/Sxx.
 * It needs no model of how the scatter changes along the line, which is the point of a precision model.
 * Computed in x centred at x̄, where XᵀX is diagonal, and moved back to the intercept at x = 0.
 *
 * @param intercept least-squares intercept
 * @param slope least-squares slope
 * @param interceptVariance HC3 variance of the intercept
 * @param slopeVariance HC3 variance of the slope
 * @param covariance HC3 covariance of intercept and slope
 * @param points points the line was fitted to
 */
record RobustLine(double intercept, double slope, double interceptVariance, double slopeVariance,
                  double covariance, int points) {

    /** Fits {@code y} on {@code x}; variances are NaN when x does not vary or a point has leverage 1. */
    static RobustLine fit(double[] x, double[] y) {
        int n = x.length;
        double[] line = ThompsonHowarth.leastSquares(x, y);
        double mx = mean(x);
        double sxx = 0;
        for (double v : x) {
            sxx += (v - mx) * (v - mx);
        }
        double sumW = 0;
        double sumWx = 0;
        double sumWxx = 0;
        for (int i = 0; i < n; i++) {
            double dx = x[i] - mx;
            double e = y[i] - (line[0] + line[1] * x[i]);
            double h = 1.0 / n + dx * dx / sxx;
            double w = e * e / ((1 - h) * (1 - h));
            sumW += w;
            sumWx += w * dx;
            sumWxx += w * dx * dx;
        }
        double varLevel = sumW / ((double) n * n);
        double varSlope = sumWxx / (sxx * sxx);
        double covLevelSlope = sumWx / (n * sxx);
        double varIntercept = varLevel - 2 * mx * covLevelSlope + mx * mx * varSlope;
        return new RobustLine(line[0], line[1], varIntercept, varSlope, covLevelSlope - mx * varSlope, n);
    }

    /**
     * The HC3 covariance of the non-negative line {@code line} of {@code y} on {@code x}: the ordinary line's
     * when no bound holds; with b₀ held at 0, that of the line through the origin, b₁ = Σxy/Σx², leverages
     * hᵢ = xᵢ²/Σx², Var b₁ = Σ xᵢ²eᵢ²/(1 − hᵢ)² / (Σx²)²; with b₁ held at 0, that of the mean, hᵢ = 1/n,
     * Var b₀ = Σ eᵢ²/(1 − 1/n)² / n². A coefficient held at its bound has variance 0 here.
     */
    static RobustLine fit(double[] x, double[] y, NonNegativeLine line) {
        int n = x.length;
        if (!line.constrained()) {
            return fit(x, y);
        }
        if (line.heldIntercept() && line.heldSlope()) {
            return new RobustLine(0, 0, 0, 0, 0, n);
        }
        double sxx = 0;
        for (double v : x) {
            sxx += v * v;
        }
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double e = y[i] - line.intercept() - line.slope() * x[i];
            double h = line.heldIntercept() ? x[i] * x[i] / sxx : 1.0 / n;
            double w = e * e / ((1 - h) * (1 - h));
            sum += line.heldIntercept() ? x[i] * x[i] * w : w;
        }
        return line.heldIntercept()
                ? new RobustLine(0, line.slope(), 0, sum / (sxx * sxx), 0, n)
                : new RobustLine(line.intercept(), 0, sum / ((double) n * n), 0, 0, n);
    }

    /** The line of c·y: both coefficients times c, the covariance times c². */
    RobustLine scaled(double c) {
        return new RobustLine(c * intercept, c * slope, c * c * interceptVariance, c * c * slopeVariance,
                c * c * covariance, points);
    }

    /** Variance of u·intercept + v·slope. */
    double varianceOf(double u, double v) {
        return u * u * interceptVariance + v * v * slopeVariance + 2 * u * v * covariance;
    }

    private static double mean(double[] x) {
        double s = 0;
        for (double v : x) {
            s += v;
        }
        return s / x.length;
    }
}
