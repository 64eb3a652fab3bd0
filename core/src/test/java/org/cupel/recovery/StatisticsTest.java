package org.cupel.recovery;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.apache.commons.statistics.distribution.TDistribution;
import org.cupel.testing.SpecialFunctionReference;
import org.junit.jupiter.api.Test;

class StatisticsTest {

    /**
     * NIST/SEMATECH e-Handbook of Statistical Methods §1.3.5.3 (two-sample t-test, AUTO83B data): n = 249,
     * mean 20.14458, sd 6.41470 against n = 79, mean 30.48101, sd 6.10771. NIST publishes the pooled
     * T = −12.62059 (checked here by the pooled formula, to its 5 decimals); the Welch t = −12.946268 and
     * ν = 136.87 are from R (testdata/reference/recovery/welch.csv, recovery_reference.R). Tolerance 1e-6:
     * both are closed forms of the same summary statistics.
     */
    @Test
    void welchMatchesNistAuto83bAndR() throws Exception {
        SampleSummary a = new SampleSummary(249, 20.14458, 6.41470);
        SampleSummary b = new SampleSummary(79, 30.48101, 6.10771);
        double sp = Math.sqrt((248 * 6.41470 * 6.41470 + 78 * 6.10771 * 6.10771) / 326);
        assertEquals(-12.62059, (a.mean() - b.mean()) / (sp * Math.sqrt(1.0 / 249 + 1.0 / 79)), 5e-6);
        WelchTest.Result w = WelchTest.test(a, b, 0.95);
        Map<String, String> r = ReferenceCsv.rows("welch.csv").get(0);
        assertEquals(-12.946268, w.t(), 1e-6);
        assertEquals(ReferenceCsv.number(r, "t"), w.t(), 1e-9);
        assertEquals(136.87, w.df(), 0.005);
        assertEquals(ReferenceCsv.number(r, "df"), w.df(), 1e-9);
        // R's p = 1.57090461546484e-25, printed to 15 digits: 1e-13 relative (R's pt is accurate to ~1e-14).
        assertEquals(ReferenceCsv.number(r, "p"), w.p(), 1e-13 * ReferenceCsv.number(r, "p"));
    }

    /**
     * The t distribution that Welch's p, its interval and TOST come from (Commons Statistics), against
     * 50-digit mpmath values at fractional Satterthwaite-like ν from 1 to 1,000
     * (testdata/reference/special-functions/t_cdf.csv, t_quantile.csv). Tolerances 1e-13 relative on the lower
     * tail down to 1.4e-274 (measured 2.6e-14) and 5e-14 on the 90/95/99 % quantiles (measured 1.1e-14).
     * Commons Math 3's quantile, used before, was 2.3e-10 relative off with its default solver accuracy.
     */
    @Test
    void tDistributionMatchesMpmath() {
        for (Map<String, Double> r : SpecialFunctionReference.rows("t_cdf.csv")) {
            double expected = r.get("cdf");
            assertEquals(expected, TDistribution.of(r.get("df")).cumulativeProbability(r.get("t")), 1e-13 * expected,
                    r::toString);
        }
        for (Map<String, Double> r : SpecialFunctionReference.rows("t_quantile.csv")) {
            double expected = r.get("q");
            assertEquals(expected, TDistribution.of(r.get("df")).inverseCumulativeProbability(r.get("p")),
                    5e-14 * expected, r::toString);
        }
    }

    /** R t.test(var.equal = FALSE) on two small samples: t, ν, p and the 95% CI (welch.csv). Tolerance 1e-9. */
    @Test
    void welchSmallSamplesMatchRTTest() throws Exception {
        Map<String, String> r = ReferenceCsv.rows("welch.csv").get(1);
        WelchTest.Result w = WelchTest.test(new double[] {99.12, 98.85, 99.30}, new double[] {98.40, 98.95}, 0.95);
        assertEquals(ReferenceCsv.number(r, "t"), w.t(), 1e-9);
        assertEquals(ReferenceCsv.number(r, "df"), w.df(), 1e-9);
        assertEquals(ReferenceCsv.number(r, "p"), w.p(), 1e-9);
        assertEquals(ReferenceCsv.number(r, "lower"), w.lower(), 1e-9);
        assertEquals(ReferenceCsv.number(r, "upper"), w.upper(), 1e-9);
    }

    /**
     * Fieller (1954) worked values given in issue 4 of this project: a = 14, b = 7, SE 3 and 2, cov 0,
     * t = 1.812461 → [1.051413, 4.414296]; a = b = 1, SE 0.75 each, z = 1.96 → the whole line.
     * Tolerance 1e-6: the values are given to 6 decimals.
     */
    @Test
    void fiellerBoundedAndWholeLine() {
        Fieller.Interval f = Fieller.ratio(14, 7, 9, 4, 0, 1.812461);
        assertEquals(Fieller.Kind.BOUNDED, f.kind());
        assertEquals(1.051413, f.lower(), 1e-6);
        assertEquals(4.414296, f.upper(), 1e-6);
        Fieller.Interval whole = Fieller.ratio(1, 1, 0.5625, 0.5625, 0, 1.96);
        assertEquals(Fieller.Kind.WHOLE_LINE, whole.kind());
        assertTrue(Double.isNaN(whole.lower()) && !whole.note().isEmpty());
    }

    /**
     * The exclusive case (derived here from the Fieller inequality): a = 3, b = 1, v_a = v_b = 0.5, t = 2
     * gives A = −1, B = 3, C = 7, D = 16; the set is θ ≤ (3 + 4)/(−1) = −7 or θ ≥ (3 − 4)/(−1) = 1.
     */
    @Test
    void fiellerExclusivePieces() {
        Fieller.Interval f = Fieller.ratio(3, 1, 0.5, 0.5, 0, 2);
        assertEquals(Fieller.Kind.EXCLUSIVE, f.kind());
        assertEquals(-7, f.lower(), 1e-12);
        assertEquals(1, f.upper(), 1e-12);
    }

    /** R 4.2 {@code p.adjust(c(0.01, 0.04, 0.03, 0.005), "holm")} = (0.03, 0.06, 0.06, 0.02) (holm.csv). */
    @Test
    void holmMatchesRPAdjust() throws Exception {
        List<Map<String, String>> rows = ReferenceCsv.rows("holm.csv");
        double[] p = rows.stream().mapToDouble(r -> ReferenceCsv.number(r, "p")).toArray();
        double[] expected = rows.stream().mapToDouble(r -> ReferenceCsv.number(r, "holm")).toArray();
        assertArrayEquals(new double[] {0.03, 0.06, 0.06, 0.02}, Holm.adjust(p), 1e-15);
        assertArrayEquals(expected, Holm.adjust(p), 1e-15);
    }

    /**
     * statsmodels 0.13 {@code ttost_ind(a, b, -margin, margin, usevar='unequal')} and scipy 1.10
     * {@code ttest_ind(equal_var=False)} (tost.csv, tost_reference.py). Tolerance 1e-9: same closed forms.
     */
    @Test
    void tostMatchesStatsmodels() throws Exception {
        for (Map<String, String> r : ReferenceCsv.rows("tost.csv")) {
            double[] a = Arrays.stream(r.get("a").split(" ")).mapToDouble(Double::parseDouble).toArray();
            double[] b = Arrays.stream(r.get("b").split(" ")).mapToDouble(Double::parseDouble).toArray();
            WelchTest.Result w = WelchTest.test(a, b, 0.95);
            Tost t = Tost.test(w, ReferenceCsv.number(r, "margin"));
            assertEquals(ReferenceCsv.number(r, "p_tost"), t.p(), 1e-9, r.get("case"));
            assertEquals(ReferenceCsv.number(r, "t_lower"), t.tLower(), 1e-9, r.get("case"));
            assertEquals(ReferenceCsv.number(r, "p_upper"), t.pUpper(), 1e-9, r.get("case"));
            assertEquals(ReferenceCsv.number(r, "welch_t"), w.t(), 1e-9, r.get("case"));
            assertEquals(ReferenceCsv.number(r, "welch_p"), w.p(), 1e-9, r.get("case"));
        }
    }

    /**
     * Games–Howell (1976) against R 4.2 (games_howell.csv): Welch t and ν from {@code t.test}, then
     * {@code ptukey(√2|t|, k, ν, lower.tail = FALSE)} and {@code qtukey(0.95, k, ν)/√2 · SE}. Tolerances as
     * for ptukey (5e-6, R's quadrature at small ν) and qtukey (1e-3 relative, R's eps = 0.0001).
     */
    @Test
    void gamesHowellMatchesRPtukey() throws Exception {
        for (Map<String, String> r : ReferenceCsv.rows("games_howell.csv")) {
            double[] a = Arrays.stream(r.get("a").split(" ")).mapToDouble(Double::parseDouble).toArray();
            double[] b = Arrays.stream(r.get("b").split(" ")).mapToDouble(Double::parseDouble).toArray();
            WelchTest.Result w = WelchTest.test(a, b, 0.95);
            assertEquals(ReferenceCsv.number(r, "t"), w.t(), 1e-9);
            GamesHowell gh = GamesHowell.of(w, (int) ReferenceCsv.number(r, "k"));
            assertEquals(ReferenceCsv.number(r, "p"), gh.p(), 5e-6);
            double half = ReferenceCsv.number(r, "half_width");
            assertEquals(half, (gh.upper() - gh.lower()) / 2, 1e-3 * half);
        }
    }

    /**
     * Weighted least-squares reconciliation against R 4.2, which solves it another way (substituting the
     * constraint and fitting with lm weights; reconciliation.csv). Tolerance 1e-12 g on adjusted metal
     * (values ~0.08 g; double rounding only) and 1e-9 on χ².
     */
    @Test
    void reconciliationMatchesRWeightedRegression() throws Exception {
        List<Map<String, String>> rows = ReferenceCsv.rows("reconciliation.csv");
        double[] x = rows.stream().mapToDouble(r -> ReferenceCsv.number(r, "measured")).toArray();
        double[] v = rows.stream().mapToDouble(r -> ReferenceCsv.number(r, "variance")).toArray();
        Reconciliation rec = Reconciliation.adjust(x, v, new double[][] {{1, -1, -1}});
        for (int i = 0; i < x.length; i++) {
            assertEquals(ReferenceCsv.number(rows.get(i), "adjusted"), rec.adjusted()[i], 1e-12);
        }
        assertEquals(ReferenceCsv.number(rows.get(0), "chi2"), rec.chiSquare(), 1e-9);
        assertEquals(ReferenceCsv.number(rows.get(0), "p"), rec.p(), 1e-9);
        assertEquals(0, rec.adjusted()[0] - rec.adjusted()[1] - rec.adjusted()[2], 1e-15);
    }
}
