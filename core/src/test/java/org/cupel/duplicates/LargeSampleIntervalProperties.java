package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Random;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * Invariants of the large-sample intervals (sets above a bootstrap budget of 1,000 pairs). A change of unit
 * (all values times λ) multiplies σ₀ and its interval by λ and leaves k, P_c at the scaled grade and the RMS CV,
 * with their intervals, unchanged; the order in which pairs arrive changes nothing.
 */
class LargeSampleIntervalProperties {
    private static final DuplicateSettings SETTINGS = DuplicateSettings.withDefaults().bootstrapMaxPairs(1000).build();
    private static final double GRADE = 1.5;

    private static double[][] pairs(long seed, int n) {
        return LargeSampleAgreementTest.simulate(new Random(seed), n, 0.8);
    }

    /** A seed for the pairs, how many (1,001 to 1,500) and the power of two λ = 2^power (−12 to 12). */
    record Pairs(long seed, int n, int power) {
    }

    private static final Gen<Integer> N = Gen.ints(1001, 1500);
    private static final Gen<Integer> POWER = Gen.ints(-12, 12);

    /**
     * λ is a power of two, so that every floating-point step scales exactly and the results must too (1e-12
     * relative allows for nothing but that): with another λ, pair means tied in one unit can round apart in the
     * other, which regroups pairs; that is a property of the grouping, not of the intervals.
     */
    @Test
    void scalingAllValuesScalesSigma0AndLeavesTheRest() {
        // The smallest and largest λ, and λ = 1, at the smallest and largest set.
        List<Gen<Pairs>> edges = List.of(r -> new Pairs(r.nextLong(), 1001, -12), r -> new Pairs(r.nextLong(), 1500, 12),
                r -> new Pairs(r.nextLong(), 1001, 0));
        SeededTries.forAll(60, edges, r -> new Pairs(r.nextLong(), N.next(r), POWER.next(r)),
                in -> scalingAllValuesScalesSigma0AndLeavesTheRest(in.seed(), in.n(), in.power()));
    }

    private static void scalingAllValuesScalesSigma0AndLeavesTheRest(long seed, int n, int power) {
        double lambda = Math.scalb(1.0, power);
        double[][] p = pairs(seed, n);
        double[] sa = new double[n];
        double[] sb = new double[n];
        for (int i = 0; i < n; i++) {
            sa[i] = lambda * p[0][i];
            sb[i] = lambda * p[1][i];
        }
        PrecisionModelResult x = ThompsonHowarth.fit(p[0], p[1], new double[] {GRADE}, SETTINGS);
        PrecisionModelResult y = ThompsonHowarth.fit(sa, sb, new double[] {lambda * GRADE}, SETTINGS);
        for (int m = 0; m < 2; m++) {
            ModelFit fx = m == 0 ? x.thompsonHowarth() : x.rmsRegression();
            ModelFit fy = m == 0 ? y.thompsonHowarth() : y.rmsRegression();
            same(fx.sigma0(), fy.sigma0(), lambda);
            same(fx.k(), fy.k(), 1);
        }
        same(x.atGrades().get(0).thompsonHowarth(), y.atGrades().get(0).thompsonHowarth(), 1);
        same(x.atGrades().get(0).rmsRegression(), y.atGrades().get(0).rmsRegression(), 1);
        same(PrecisionMeasures.rmsCv(p[0], p[1], SETTINGS), PrecisionMeasures.rmsCv(sa, sb, SETTINGS), 1);
    }

    /** Thompson–Howarth sorts the pairs, so its intervals are exactly equal; the RMS CV sums in another order. */
    @Test
    void pairOrderDoesNotMatter() {
        SeededTries.forAll(60, r -> new Pairs(r.nextLong(), N.next(r), 0), in -> pairOrderDoesNotMatter(in.seed(), in.n()));
    }

    private static void pairOrderDoesNotMatter(long seed, int n) {
        double[][] p = pairs(seed, n);
        Random random = new Random(seed ^ 0x5DEECE66DL);
        double[] pa = p[0].clone();
        double[] pb = p[1].clone();
        for (int i = n - 1; i > 0; i--) {
            int j = random.nextInt(i + 1);
            double t = pa[i];
            pa[i] = pa[j];
            pa[j] = t;
            t = pb[i];
            pb[i] = pb[j];
            pb[j] = t;
        }
        PrecisionModelResult x = ThompsonHowarth.fit(p[0], p[1], new double[] {GRADE}, SETTINGS);
        PrecisionModelResult y = ThompsonHowarth.fit(pa, pb, new double[] {GRADE}, SETTINGS);
        assertEquals(x.thompsonHowarth(), y.thompsonHowarth());
        assertEquals(x.rmsRegression(), y.rmsRegression());
        assertEquals(x.atGrades(), y.atGrades());
        // 1e-12 relative: the same sums of at most 1,500 positive terms in another order.
        Estimate cx = PrecisionMeasures.rmsCv(p[0], p[1], SETTINGS);
        Estimate cy = PrecisionMeasures.rmsCv(pa, pb, SETTINGS);
        assertEquals(cx.ciLow(), cy.ciLow(), 1e-12 * cx.ciLow());
        assertEquals(cx.ciHigh(), cy.ciHigh(), 1e-12 * cx.ciHigh());
    }

    private static void same(Estimate expected, Estimate scaled, double lambda) {
        double tol = 1e-12 * (Math.abs(lambda * expected.value()) + Math.abs(lambda * expected.ciHigh()));
        assertEquals(lambda * expected.value(), scaled.value(), tol);
        assertEquals(lambda * expected.ciLow(), scaled.ciLow(), tol);
        assertEquals(lambda * expected.ciHigh(), scaled.ciHigh(), tol);
        assertEquals(expected.note(), scaled.note());
    }
}
