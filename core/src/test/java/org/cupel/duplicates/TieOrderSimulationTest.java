package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Thompson–Howarth on rounded assays, where many pairs share a mean: the order given to tied pairs must not
 * bias σ₀. Seeded simulation: true concentrations lognormal (median 0.1, log SD 1.2), each of the two assays
 * c + N(0, σ_c²) with σ_c = 0.010 + 0.05·c, clipped at 0.001 and rounded to 0.001 (three decimals, as ppm gold is
 * reported). The former order of tied means, by |d|, biases σ₀ upwards (0.0117 on the 50,000 pairs below, where
 * random orders give 0.0104–0.0105); so does any fixed order that keeps equal |d| together (a hash of the values
 * gave z ≈ +2 against random orders over eight seeds), which is why runs of ties are shuffled.
 */
class TieOrderSimulationTest {
    private static final double SIGMA0 = 0.010;
    private static final double K = 0.05;
    private static final int GROUP = 11;

    static double[][] simulate(long seed, int n) {
        Random r = new Random(seed);
        double[] a = new double[n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            double c = 0.1 * Math.exp(1.2 * r.nextGaussian());
            double s = SIGMA0 + K * c;
            a[i] = Math.round(Math.max(0.001, c + s * r.nextGaussian()) * 1000) / 1000.0;
            b[i] = Math.round(Math.max(0.001, c + s * r.nextGaussian()) * 1000) / 1000.0;
        }
        return new double[][] {a, b};
    }

    /** σ₀ of the Thompson–Howarth line for means m and differences d already in the order to group them. */
    private static double sigma0(double[] m, double[] d) {
        PairGroups g = PairGroups.ofSorted(m, d, GROUP);
        return NormalDifferenceConstants.SIGMA_PER_MEDIAN * NonNegativeLine.fit(g.means(), g.medianAbsDiff())
                .intercept();
    }

    /** σ₀ with tied means in a random order: shuffle, then a stable sort by mean alone. */
    private static double randomTieOrder(double[] m, double[] d, long seed) {
        int n = m.length;
        Integer[] idx = new Integer[n];
        for (int i = 0; i < n; i++) {
            idx[i] = i;
        }
        java.util.Collections.shuffle(Arrays.asList(idx), new Random(seed));
        Arrays.sort(idx, (x, y) -> Double.compare(m[x], m[y]));
        double[] sm = new double[n];
        double[] sd = new double[n];
        for (int i = 0; i < n; i++) {
            sm[i] = m[idx[i]];
            sd[i] = d[idx[i]];
        }
        return sigma0(sm, sd);
    }

    /**
     * 50,000 pairs: σ₀ with Cupel's order lies within the range of 20 random tie orders widened by half that
     * range (over eight other seeds Cupel's σ₀ stood −1.9 to +0.8 SDs of the random orders from their mean), and
     * within 0.001 (10 %) of the true 0.010, which leaves room for Thompson–Howarth's own biases (grouping by the
     * observed, not the true, mean; rounding to 0.001): random orders give 0.0096–0.0109 over those seeds. The
     * former |d| order is computed too and must lie above the random orders' range, so the test shows the
     * difference it guards against.
     */
    @Test
    void tieOrderDoesNotBiasSigma0() {
        long seed = 20260302L;
        double[][] p = simulate(seed, 50_000);
        int n = p[0].length;
        double[] m = new double[n];
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            m[i] = PairMeasures.mean(p[0][i], p[1][i]);
            d[i] = PairMeasures.absDifference(p[0][i], p[1][i]);
        }
        double[] sm = m.clone();
        double[] sd = d.clone();
        PairGroups.sortByMean(sm, sd);
        double cupel = sigma0(sm, sd);
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < 20; k++) {
            double s = randomTieOrder(m, d, seed + k);
            lo = Math.min(lo, s);
            hi = Math.max(hi, s);
        }
        double byDiff = sigma0(byMeanThenDiff(m, d, true), byMeanThenDiff(m, d, false));
        String report = "seed " + seed + ": Cupel σ₀ " + cupel + ", random orders [" + lo + ", " + hi + "], |d| order "
                + byDiff;
        double slack = (hi - lo) / 2;
        assertTrue(cupel >= lo - slack && cupel <= hi + slack, report);
        assertEquals(SIGMA0, cupel, 0.001, report);
        assertTrue(byDiff > hi + slack, report);
    }

    /** The former order, for comparison: by mean, then by |d|. */
    private static double[] byMeanThenDiff(double[] m, double[] d, boolean means) {
        int n = m.length;
        Integer[] idx = new Integer[n];
        for (int i = 0; i < n; i++) {
            idx[i] = i;
        }
        Arrays.sort(idx, (x, y) -> m[x] != m[y] ? Double.compare(m[x], m[y]) : Double.compare(d[x], d[y]));
        return Arrays.stream(idx).mapToDouble(i -> means ? m[i] : d[i]).toArray();
    }
}
