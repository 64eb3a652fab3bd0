package org.cupel.duplicates;

/**
 * The least-squares line y = b₀ + b₁·x with b₀ ≥ 0 and b₁ ≥ 0: non-negative least squares in two unknowns
 * (Lawson, C.L. and Hanson, R.J., 1974, "Solving Least Squares Problems", Prentice-Hall, ch. 23; chapter recalled
 * from memory). The problem is a convex quadratic programme, so its solution is the ordinary line when that is
 * feasible, and otherwise lies on the boundary: the better (smaller residual sum of squares) of the line through
 * the origin (b₀ = 0, b₁ = max(0, Σxy/Σx²)) and the flat line (b₁ = 0, b₀ = max(0, ȳ)), each the exact
 * minimum over its face (Karush–Kuhn–Tucker conditions; derived here).
 *
 * <p>For a precision model σ_c = σ₀ + k·c both coefficients are SDs or proportions of one and cannot be
 * negative; an unconstrained fit through group points that scatter near zero concentration can give σ₀ &lt; 0, and
 * then σ_c and the control lines fall to zero or below at low grades, where every pair seems too far apart.
 *
 * @param intercept b₀
 * @param slope b₁
 * @param heldIntercept b₀ held at 0 by its bound
 * @param heldSlope b₁ held at 0 by its bound
 * @param unconstrainedIntercept the ordinary least-squares intercept
 * @param unconstrainedSlope the ordinary least-squares slope
 */
record NonNegativeLine(double intercept, double slope, boolean heldIntercept, boolean heldSlope,
                       double unconstrainedIntercept, double unconstrainedSlope) {

    static NonNegativeLine fit(double[] x, double[] y) {
        double[] free = ThompsonHowarth.leastSquares(x, y);
        if (free[0] >= 0 && free[1] >= 0 || Double.isNaN(free[1])) {
            return new NonNegativeLine(free[0], free[1], false, false, free[0], free[1]);
        }
        double sxx = 0;
        double sxy = 0;
        double sy = 0;
        for (int i = 0; i < x.length; i++) {
            sxx += x[i] * x[i];
            sxy += x[i] * y[i];
            sy += y[i];
        }
        double throughOrigin = sxx > 0 ? Math.max(0, sxy / sxx) : 0;
        double flat = Math.max(0, sy / x.length);
        boolean origin = residualSquares(x, y, 0, throughOrigin) <= residualSquares(x, y, flat, 0);
        return origin
                ? new NonNegativeLine(0, throughOrigin, true, throughOrigin == 0, free[0], free[1])
                : new NonNegativeLine(flat, 0, flat == 0, true, free[0], free[1]);
    }

    boolean constrained() {
        return heldIntercept || heldSlope;
    }

    /** R² = 1 − Σ(y − ŷ)² / Σ(y − ȳ)² of this line (the ordinary R² when unconstrained). */
    double rSquared(double[] x, double[] y) {
        double my = 0;
        for (double v : y) {
            my += v;
        }
        my /= y.length;
        double tss = 0;
        for (double v : y) {
            tss += (v - my) * (v - my);
        }
        return 1 - residualSquares(x, y, intercept, slope) / tss;
    }

    private static double residualSquares(double[] x, double[] y, double b0, double b1) {
        double s = 0;
        for (int i = 0; i < x.length; i++) {
            double e = y[i] - b0 - b1 * x[i];
            s += e * e;
        }
        return s;
    }
}
