package org.cupel.recovery;

import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.NonPositiveDefiniteMatrixException;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;

/**
 * Data reconciliation by weighted least squares under linear constraints A x = 0 (Kuehn &amp; Davidson 1961,
 * "Computer control II. Mathematics of control", Chem. Eng. Prog. 57; Hodouin &amp; Everell 1980,
 * "A hierarchical procedure for adjustment and material balancing of mineral processes data",
 * Int. J. Miner. Process. 7): minimising (x̂ − x)ᵀV⁻¹(x̂ − x) subject to A x̂ = 0 gives
 * <pre>
 *   r = A x,  x̂ = x − V Aᵀ (A V Aᵀ)⁻¹ r,  V̂ = V − V Aᵀ (A V Aᵀ)⁻¹ A V,
 *   χ² = rᵀ (A V Aᵀ)⁻¹ r  ~ χ²(number of constraints) when the model holds.
 * </pre>
 * A small χ² p-value says the measurements do not close within their stated uncertainties.
 *
 * <p>A V Aᵀ is symmetric positive definite when the constraints are independent. It is inverted by Cholesky
 * after scaling it to unit diagonal, M' = D (A V Aᵀ) D with D = diag(A V Aᵀ)<sup>−1/2</sup>, so
 * (A V Aᵀ)⁻¹ = D M'⁻¹ D (Jacobi equilibration; Golub and Van Loan 2013, "Matrix Computations", 4th ed.,
 * §3.5.2 and §4.2, section numbers recalled from memory). The factorisation's positivity threshold then acts
 * on a scale-free matrix: the result does not depend on the unit of the measurements, and a fire-assay
 * charge holding micrograms of gold (A V Aᵀ ≈ 10⁻¹² g²) reconciles exactly as a kilogram of metal does.
 *
 * @param measured x
 * @param adjusted x̂
 * @param adjustedVariance diagonal of V̂
 * @param chiSquare the closure statistic
 * @param df number of constraints
 * @param p P(χ²_df &gt; chiSquare)
 */
public record Reconciliation(double[] measured, double[] adjusted, double[] adjustedVariance, double chiSquare,
                             int df, double p) {

    public Reconciliation {
        measured = measured.clone();
        adjusted = adjusted.clone();
        adjustedVariance = adjustedVariance.clone();
    }

    @Override
    public double[] measured() {
        return measured.clone();
    }

    @Override
    public double[] adjusted() {
        return adjusted.clone();
    }

    @Override
    public double[] adjustedVariance() {
        return adjustedVariance.clone();
    }

    /**
     * @param x measured values
     * @param variance their variances (diagonal V; measurements independent); all must be positive
     * @param constraints A, one row per constraint; the rows must be linearly independent
     * @throws IllegalArgumentException when a variance is not positive or the constraints are dependent
     */
    public static Reconciliation adjust(double[] x, double[] variance, double[][] constraints) {
        for (double v : variance) {
            if (!(v > 0)) {
                throw new IllegalArgumentException("every variance must be positive to reconcile, got " + v);
            }
        }
        RealMatrix a = new Array2DRowRealMatrix(constraints);
        RealMatrix v = MatrixUtils.createRealDiagonalMatrix(variance);
        RealVector xv = new ArrayRealVector(x);
        RealVector r = a.operate(xv);
        RealMatrix vat = v.multiply(a.transpose());
        RealMatrix inverse = inverseOfPositiveDefinite(a.multiply(vat));
        RealVector adjusted = xv.subtract(vat.operate(inverse.operate(r)));
        RealMatrix vHat = v.subtract(vat.multiply(inverse).multiply(vat.transpose()));
        double chi2 = r.dotProduct(inverse.operate(r));
        double[] diag = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            diag[i] = vHat.getEntry(i, i);
        }
        int df = constraints.length;
        double p = 1 - new ChiSquaredDistribution(null, df).cumulativeProbability(chi2);
        return new Reconciliation(x, adjusted.toArray(), diag, chi2, df, p);
    }

    /** (A V Aᵀ)⁻¹ by Cholesky of the matrix scaled to unit diagonal (see the class comment). */
    private static RealMatrix inverseOfPositiveDefinite(RealMatrix m) {
        int k = m.getRowDimension();
        double[] scale = new double[k];
        for (int i = 0; i < k; i++) {
            double d = m.getEntry(i, i);
            if (!(d > 0) || Double.isInfinite(d)) {
                throw new IllegalArgumentException("constraint " + (i + 1) + " involves no measured quantity");
            }
            scale[i] = 1 / Math.sqrt(d);
        }
        RealMatrix unit = new Array2DRowRealMatrix(k, k);
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                // Averaged with the transpose: the two triangles of A·(V Aᵀ) can differ in the last bit.
                unit.setEntry(i, j, scale[i] * 0.5 * (m.getEntry(i, j) + m.getEntry(j, i)) * scale[j]);
            }
        }
        RealMatrix unitInverse;
        try {
            unitInverse = new CholeskyDecomposition(unit).getSolver().getInverse();
        } catch (NonPositiveDefiniteMatrixException e) {
            throw new IllegalArgumentException("the balance constraints are linearly dependent", e);
        }
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                unitInverse.setEntry(i, j, scale[i] * unitInverse.getEntry(i, j) * scale[j]);
            }
        }
        return unitInverse;
    }
}
