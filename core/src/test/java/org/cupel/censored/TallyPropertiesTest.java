package org.cupel.censored;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.stat.StatUtils;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * The distinct-values-with-counts form gives what sorting the expanded numbers gives: the same sorted
 * numbers, rank counts and order statistics (exactly), the same R-7 percentiles as Commons Math's
 * {@code Percentile} (exactly) and the same mean and SD as {@code StatUtils} up to summation order.
 */
class TallyPropertiesTest {
    /** Mean and SD are sums in another order: rounding only, n ≤ 300 terms of |x| ≤ 50 (n·ε·max|x| ≈ 3e-12 at worst, relative to max|x| 1e-12 is ample as errors are not all one-signed). */
    private static final double SUMMATION = 1e-12;

    /** Lab values repeat: one decimal gives many ties; signed zeros and negatives included. */
    private static final Gen<double[]> ROUNDED = Gen.doubleArrays(
            Gen.oneOf(Gen.doubles(-5, 50, 1), Gen.of(0.0, -0.0, 1e-3)), 1, 300);

    /** One value at each end of the range, each signed zero alone, and the two zeros together. */
    private static final List<Gen<double[]>> EDGES = List.of(Gen.constant(new double[] {-5}),
            Gen.constant(new double[] {50}), Gen.constant(new double[] {0.0}), Gen.constant(new double[] {-0.0}),
            Gen.constant(new double[] {0.0, -0.0, 0.0, -0.0}));

    @Test
    void countingEqualsSorting() {
        SeededTries.forAll(1000, EDGES, ROUNDED, x -> {
            Tally t = tally(x);
            double[] sorted = x.clone();
            Arrays.sort(sorted);
            assertArrayEquals(sorted, t.expand());
            assertEquals(x.length, t.size());
            for (int k = 0; k < x.length; k++) {
                assertEquals(Double.doubleToRawLongBits(sorted[k]), Double.doubleToRawLongBits(t.orderStatistic(k)));
            }
            for (double probe : new double[] {x[0], x[x.length - 1], 0.0, -0.0, 2.5, 1e9, -1e9}) {
                assertEquals(Arrays.stream(x).filter(v -> v < probe).count(), t.countBelow(probe));
                assertEquals(Arrays.stream(x).filter(v -> v <= probe).count(), t.countAtOrBelow(probe));
            }
        });
    }

    record Three(double[] x, double[] y, double[] z) {
    }

    @Test
    void unionEqualsSortingTheConcatenation() {
        List<Gen<Three>> zeros = List.of(
                Gen.constant(new Three(new double[] {0.0}, new double[] {-0.0}, new double[] {0.0, -0.0})));
        SeededTries.forAll(1000, zeros, r -> new Three(ROUNDED.next(r), ROUNDED.next(r), ROUNDED.next(r)), in -> {
            double[] x = in.x();
            double[] y = in.y();
            double[] z = in.z();
            List<Tally> parts = new ArrayList<>(List.of(tally(x), tally(y), tally(z)));
            double[] all = new double[x.length + y.length + z.length];
            System.arraycopy(x, 0, all, 0, x.length);
            System.arraycopy(y, 0, all, x.length, y.length);
            System.arraycopy(z, 0, all, x.length + y.length, z.length);
            Arrays.sort(all);
            assertArrayEquals(all, Tally.union(parts).expand());
            assertArrayEquals(all, Tally.ofSorted(all).expand());
            assertEquals(tally(all).distinct(), Tally.union(parts).distinct());
        });
    }

    @Test
    void ordinarySummaryEqualsCommonsMathOnTheExpandedNumbers() {
        SeededTries.forAll(1000, EDGES, ROUNDED, x -> {
            CensoredSummary s = OrdinarySummary.of("m", tally(x), 0, List.of(), null);
            Percentile p = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
            p.setData(x);
            assertEquals(p.evaluate(50), s.median().value(), 0);
            for (Quantile q : s.percentiles()) {
                assertEquals(p.evaluate(100 * q.probability()), q.estimate().value(), 0);
            }
            double scale = Math.max(1, Math.max(Math.abs(StatUtils.min(x)), Math.abs(StatUtils.max(x))));
            assertEquals(StatUtils.mean(x), s.mean().value(), SUMMATION * scale);
            if (x.length > 1) {
                assertEquals(Math.sqrt(StatUtils.variance(x)), s.sd().value(), SUMMATION * scale);
                assertEquals(Math.sqrt(StatUtils.variance(x) / x.length), s.mean().standardError(), SUMMATION * scale);
            }
        });
    }

    private static Tally tally(double[] x) {
        Tally.Counter c = new Tally.Counter();
        for (double v : x) {
            c.add(v);
        }
        return c.tally();
    }
}
