package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class ThompsonHowarthTest {
    private static final double B0 = 0.5;
    private static final double B1 = 0.05;
    private static final double[] MEANS = {10, 20, 30, 40, 50};
    /** |d| as multiples of the group median: the sixth of eleven is 1. */
    private static final double[] SPREAD = {0.2, 0.4, 0.6, 0.8, 0.9, 1.0, 1.1, 1.5, 2.0, 3.0, 4.0};
    private static final DuplicateSettings SETTINGS = DuplicateSettings.withDefaults().bootstrapResamples(200)
            .bootstrapSeed(11L).build();

    /**
     * Constructed case: five groups of 11 pairs, all pairs of group j with mean c_j and |d| spread around a
     * median of exactly b0 + b1·c_j, plus three pairs at mean 100 with |d| = 50 that must be dropped (they
     * would pull the line far up if kept). The answer follows from the definition (Thompson and Howarth 1978).
     */
    static double[][] constructed() {
        int n = MEANS.length * SPREAD.length + 3;
        double[] a = new double[n];
        double[] b = new double[n];
        int k = 0;
        for (double c : MEANS) {
            double median = B0 + B1 * c;
            for (double s : SPREAD) {
                double d = s * median;
                a[k] = c + d / 2;
                b[k] = c - d / 2;
                k++;
            }
        }
        for (int i = 0; i < 3; i++) {
            a[k] = 125;
            b[k] = 75;
            k++;
        }
        return new double[][] {a, b};
    }

    @Test
    void constructedCaseRecoversTheLineAndDropsTheRemainder() {
        double[][] p = constructed();
        PrecisionModelResult r = ThompsonHowarth.fit(p[0], p[1], new double[] {20}, SETTINGS);
        assertTrue(r.available(), r.note());
        assertEquals(5, r.groups().groups());
        assertEquals(3, r.groups().dropped());
        assertEquals(100, r.groups().droppedFromMean(), 1e-12);
        // Exact by construction; 1e-9 covers floating-point rounding of a ± d/2.
        assertArrayEquals(MEANS, r.groups().means(), 1e-9);
        assertEquals(B0, r.thompsonHowarth().lineIntercept(), 1e-9);
        assertEquals(B1, r.thompsonHowarth().lineSlope(), 1e-9);
        assertEquals(1.048358 * B0, r.thompsonHowarth().model().sigma0(), 1e-6);
        assertEquals(1.048358 * B1, r.thompsonHowarth().model().k(), 1e-6);
        // P_c = 2 sigma_c / c at c = 20: 2·1.048358·(0.5 + 1)/20.
        assertEquals(2 * 1.048358 * 1.5 / 20, r.atGrades().get(0).thompsonHowarth().value(), 1e-6);
    }

    @Test
    void controlLineCountsAndBinomialTailsMatchScipy() {
        double[][] p = constructed();
        PrecisionModelResult r = ThompsonHowarth.fit(p[0], p[1], new double[0], SETTINGS);
        // 90 % line = 2.326174·1.048358 = 2.4387 medians: SPREAD 3 and 4 exceed it in each of 5 groups,
        // plus the 3 dropped pairs (|d| = 50 against a line of 13.4): 13. 99 % line = 3.8189 medians:
        // only SPREAD 4 per group, plus the 3 dropped pairs: 8.
        assertEquals(58, r.line90().n());
        assertEquals(13, r.line90().exceedances());
        assertEquals(8, r.line99().exceedances());
        assertEquals(5.8, r.line90().expected(), 1e-12);
        JsonNode tails = ReferenceData.json("bias_reference.json").get("binomialUpperTail");
        // scipy.stats.binom.sf; 1e-10 relative: both evaluate the same finite sum, rounding differs.
        double p90 = tails.get("n58_x13_p010").asDouble();
        double p99 = tails.get("n58_x8_p001").asDouble();
        assertEquals(p90, r.line90().pValue(), 1e-10 * p90);
        assertEquals(p99, r.line99().pValue(), 1e-10 * p99);
    }

    @Test
    void refusesBelowFiftyPairsWithAReason() {
        double[] a = new double[49];
        double[] b = new double[49];
        for (int i = 0; i < 49; i++) {
            a[i] = 1 + i;
            b[i] = 1.1 + i;
        }
        PrecisionModelResult r = ThompsonHowarth.fit(a, b, new double[0], SETTINGS);
        assertFalse(r.available());
        assertTrue(r.note().contains("at least 50"), r.note());
        assertTrue(r.note().contains("has 49"), r.note());
    }

    /**
     * Simulation: pairs of independent normal measurements with SD sigma_c = s0 + k·c at lognormal grades.
     * With normal errors both estimators are consistent (Thompson and Howarth 1978; Stanley and Lawie 2008),
     * so the true s0 and k must lie inside the bootstrap 95 % intervals. Seeds fixed; n = 3000 pairs.
     */
    @Test
    void simulationRecoversSigma0AndKWithinTheirIntervals() {
        double s0 = 0.02;
        double k = 0.05;
        Random random = new Random(424242L);
        int n = 3000;
        double[] a = new double[n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            double c = Math.exp(random.nextGaussian() * 1.2);
            double sd = s0 + k * c;
            a[i] = c + sd * random.nextGaussian();
            b[i] = c + sd * random.nextGaussian();
        }
        DuplicateSettings settings = DuplicateSettings.withDefaults().bootstrapResamples(500).bootstrapSeed(99L)
                .build();
        PrecisionModelResult r = ThompsonHowarth.fit(a, b, new double[] {1.0}, settings);
        for (ModelFit fit : List.of(r.thompsonHowarth(), r.rmsRegression())) {
            assertTrue(fit.sigma0().ciLow() <= s0 && s0 <= fit.sigma0().ciHigh(), fit.method() + " " + fit.sigma0());
            assertTrue(fit.k().ciLow() <= k && k <= fit.k().ciHigh(), fit.method() + " " + fit.k());
        }
        // Under the model, about 10 % and 1 % of pairs exceed the control lines; counts of order 300 and 30.
        assertTrue(r.line90().pValue() > 0.001, r.line90().toString());
    }
}
