package org.cupel.recovery;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Map;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.statistics.distribution.NormalDistribution;
import org.cupel.testing.SpecialFunctionReference;
import org.junit.jupiter.api.Test;

class DistributionsTest {

    /**
     * R 4.2 {@code ptukey(q, nmeans, df)}, testdata/reference/recovery/ptukey.csv (recovery_reference.R).
     * Tolerance 5e-6: R and Cupel agree to 1e-7 for ν ≥ 5, but at ν = 3 R's values differ by up to 2.7e-6
     * (q = 8, k = 3) from ours, and ours did not move in the 15th digit when every quadrature panel count
     * was quadrupled, so the gap is R's fixed-grid outer quadrature at small ν, not ours.
     */
    @Test
    void studentizedRangeCdfMatchesRPtukey() throws Exception {
        for (Map<String, String> r : ReferenceCsv.rows("ptukey.csv")) {
            double q = ReferenceCsv.number(r, "q");
            int k = (int) ReferenceCsv.number(r, "k");
            double df = ReferenceCsv.number(r, "df");
            assertEquals(ReferenceCsv.number(r, "p"), StudentizedRange.cdf(q, k, df), 5e-6, r.toString());
        }
    }

    /**
     * R 4.2 {@code qtukey(p, nmeans, df)}, testdata/reference/recovery/qtukey.csv. Tolerance 1e-3 relative:
     * R's qtukey stops its secant search at eps = 0.0001 (R documentation of qtukey).
     */
    @Test
    void studentizedRangeQuantileMatchesRQtukey() throws Exception {
        for (Map<String, String> r : ReferenceCsv.rows("qtukey.csv")) {
            double expected = ReferenceCsv.number(r, "q");
            double got = StudentizedRange.quantile(ReferenceCsv.number(r, "p"), (int) ReferenceCsv.number(r, "k"),
                    ReferenceCsv.number(r, "df"));
            assertEquals(expected, got, 1e-3 * expected, r.toString());
        }
    }

    /**
     * For two means the range of two normals is |Z₁ − Z₂| = √2·|Z|, so P_2(w) = 2Φ(w/√2) − 1 and
     * P(Q ≤ q; 2, ν) = 2 F_t(q/√2; ν) − 1 (derived here from the definitions). Tolerance 1e-9: both exact.
     */
    @Test
    void twoMeanStudentizedRangeIsAFoldedT() {
        NormalDistribution z = NormalDistribution.of(0, 1);
        for (double df : new double[] {2, 5}) {
            TDistribution t = new TDistribution(null, df);
            for (double q : new double[] {0.3, 1, 2.5, 4, 7, 14}) {
                assertEquals(2 * z.cumulativeProbability(q / Math.sqrt(2)) - 1, StudentizedRange.rangeCdf(q, 2),
                        1e-12);
                assertEquals(2 * t.cumulativeProbability(q / Math.sqrt(2)) - 1, StudentizedRange.cdf(q, 2, df), 1e-9);
            }
            double exactQ99 = Math.sqrt(2) * t.inverseCumulativeProbability(0.995);
            assertEquals(exactQ99, StudentizedRange.quantile(0.99, 2, df), 1e-7);
        }
    }

    /**
     * The Φ inside both integrals (Commons Statistics' normal distribution: ½·erfc(−x/√2), Commons Numbers'
     * port of Boost's erfc) against 50-digit mpmath values at 2,987 points of [−38, 8.5]
     * (testdata/reference/special-functions/normal_cdf.csv). The integrals need absolute accuracy: within
     * 2.2e-16 (one ulp of ½; measured 1.1e-16). Relative accuracy in the lower tail: within 2e-14 for x ≥ −8
     * (measured 8.9e-15), because rounding x/√2 to a double moves Φ by about x²·2⁻⁵³ relative (7e-15 at
     * x = −8). Hart's (1968) approximation, carried by hand before, had the same absolute error but was
     * 8.9e-9 relative off at x = −7.9 and returned 0 below −37.
     */
    @Test
    void standardNormalCdfMatchesMpmath() {
        NormalDistribution phi = NormalDistribution.of(0, 1);
        for (Map<String, Double> r : SpecialFunctionReference.rows("normal_cdf.csv")) {
            double x = r.get("x");
            double expected = r.get("cdf");
            double got = phi.cumulativeProbability(x);
            assertEquals(expected, got, 2.2e-16, "x = " + x);
            if (x >= -8) {
                assertEquals(expected, got, 2e-14 * expected, "x = " + x);
            }
        }
    }

    /**
     * R 4.2 {@code pt(t, df, ncp)}, testdata/reference/recovery/noncentral_t.csv. Tolerance 1e-8: R's
     * algorithm (Lenth 1989, AS 243) is accurate to about 1e-12, ours is quadrature with error below 1e-10.
     */
    @Test
    void noncentralTMatchesRPt() throws Exception {
        for (Map<String, String> r : ReferenceCsv.rows("noncentral_t.csv")) {
            double got = NoncentralT.cdf(ReferenceCsv.number(r, "t"), ReferenceCsv.number(r, "df"),
                    ReferenceCsv.number(r, "ncp"));
            assertEquals(ReferenceCsv.number(r, "p"), got, 1e-8, r.toString());
        }
    }
}
