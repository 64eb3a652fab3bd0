package org.cupel.control.crm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Bias intervals and regressions against R 4.2 (t.test, qbinom/pbinom for the sign-test median interval,
 * lm and confint): testdata/reference/control/crm_bias_drift.R.
 */
class BiasAndTrendTest {
    static final double[] X = {2.48, 2.55, 2.61, 2.43, 2.58, 2.66, 2.52, 2.71, 2.57, 2.63, 2.69, 2.60};
    static final double[] DAY = {0, 7, 14, 21, 28, 35, 42, 49, 56, 63, 70, 77};

    @Test
    void biasIntervalsMatchR() throws IOException {
        Map<String, Double> r = ReferenceData.keyValues("crm_bias_drift.csv");
        BiasEstimate b = BiasEstimate.of(X, 2.50, 0.95);
        // 1e-9: R prints 15 significant digits; t quantiles agree to ~1e-12.
        assertEquals(r.get("mean_bias_pct"), b.meanBiasPct(), 1e-9);
        assertEquals(r.get("mean_low_pct"), b.meanLowPct(), 1e-9);
        assertEquals(r.get("mean_high_pct"), b.meanHighPct(), 1e-9);
        assertEquals(r.get("median_bias_pct"), b.median().median(), 1e-9);
        assertEquals(r.get("median_low_pct"), b.median().low(), 1e-9);
        assertEquals(r.get("median_high_pct"), b.median().high(), 1e-9);
        assertEquals(r.get("median_coverage"), b.median().coverage(), 1e-12);
        assertEquals(12, b.n());
        assertFalse(b.certifiedInsideMeanInterval());
        assertFalse(b.certifiedInsideMedianInterval());
    }

    @Test
    void driftRegressionMatchesR() throws IOException {
        Map<String, Double> r = ReferenceData.keyValues("crm_bias_drift.csv");
        double[] z = new double[X.length];
        for (int i = 0; i < z.length; i++) {
            z[i] = (X[i] - 2.50) / 0.10;
        }
        LinearFit f = LinearFit.of(DAY, z, 0.95);
        // 1e-9: closed-form least squares; R and Commons Math differ only in rounding.
        assertEquals(r.get("slope"), f.slope(), 1e-9);
        assertEquals(r.get("slope_low"), f.slopeLow(), 1e-9);
        assertEquals(r.get("slope_high"), f.slopeHigh(), 1e-9);
        assertEquals(r.get("intercept"), f.intercept(), 1e-9);
        assertEquals(r.get("slope_p"), f.pValue(), 1e-9);
        assertEquals(r.get("r_squared"), f.rSquared(), 1e-9);
        assertFalse(f.slopeExcludesZero());
    }

    @Test
    void biasVsGradeRegressionMatchesR() throws IOException {
        Map<String, Double> r = ReferenceData.keyValues("crm_bias_drift.csv");
        LinearFit f = LinearFit.of(new double[] {0.52, 1.21, 2.50, 6.84}, new double[] {0.8, 1.9, 3.6, 6.1}, 0.95);
        assertEquals(r.get("grade_slope"), f.slope(), 1e-9);
        assertEquals(r.get("grade_slope_low"), f.slopeLow(), 1e-9);
        assertEquals(r.get("grade_slope_high"), f.slopeHigh(), 1e-9);
        assertEquals(r.get("grade_intercept"), f.intercept(), 1e-9);
        assertEquals(r.get("grade_p"), f.pValue(), 1e-9);
        assertTrue(f.slopeExcludesZero());
    }

    @Test
    void medianIntervalRanksMatchR() throws IOException {
        var ref = ReferenceData.columns("median_ranks.csv");
        for (int k = 0; k < ref.get("n").length; k++) {
            int n = (int) ref.get("n")[k];
            double[] x = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = i + 1;
            }
            MedianInterval m = MedianInterval.of(x, 0.95);
            // Exact: with x = 1..n the interval ends are the ranks themselves.
            assertEquals(ref.get("r")[k], m.low(), 0.0, "n = " + n);
            assertEquals(n - ref.get("r")[k] + 1, m.high(), 0.0, "n = " + n);
            // 1e-9: binomial CDF by R's pbinom and Commons Math's regularized beta.
            assertEquals(ref.get("coverage")[k], m.coverage(), 1e-9, "n = " + n);
        }
    }

    @Test
    void smallSamplesSayWhyNothingIsEstimated() {
        // Sign-test interval: 2·0.5⁵ = 0.0625 > 0.05, so n = 5 has no 95 % interval (Conover 1999, 3.2).
        assertFalse(MedianInterval.of(new double[] {1, 2, 3, 4, 5}, 0.95).estimated());
        assertTrue(MedianInterval.of(new double[] {1, 2, 3, 4, 5, 6}, 0.95).estimated());
        assertEquals("fewer than 3 points (n = 2)", LinearFit.of(new double[] {1, 2}, new double[] {1, 2}, 0.95).note());
        BiasEstimate one = BiasEstimate.of(new double[] {2.6}, 2.5, 0.95);
        assertTrue(Double.isNaN(one.meanLowPct()));
        assertFalse(one.note().isEmpty());
    }
}
