package org.cupel.censored;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.apache.commons.math3.stat.StatUtils;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;

/**
 * The distinct-values-with-counts form gives what sorting the expanded numbers gives: the same sorted
 * numbers, rank counts and order statistics (exactly), the same R-7 percentiles as Commons Math's
 * {@code Percentile} (exactly) and the same mean and SD as {@code StatUtils} up to summation order.
 */
class TallyPropertiesTest {
    /** Mean and SD are sums in another order: rounding only, n ≤ 300 terms of |x| ≤ 50 (n·ε·max|x| ≈ 3e-12 at worst, relative to max|x| 1e-12 is ample as errors are not all one-signed). */
    private static final double SUMMATION = 1e-12;

    @Provide
    Arbitrary<double[]> rounded() {
        // Lab values repeat: one decimal gives many ties; signed zeros and negatives included.
        return Arbitraries.oneOf(Arbitraries.doubles().between(-5, 50).ofScale(1), Arbitraries.of(0.0, -0.0, 1e-3))
                .array(double[].class).ofMinSize(1).ofMaxSize(300);
    }

    @Property
    void countingEqualsSorting(@ForAll("rounded") double[] x) {
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
    }

    @Property
    void unionEqualsSortingTheConcatenation(@ForAll("rounded") double[] x, @ForAll("rounded") double[] y,
                                            @ForAll("rounded") double[] z) {
        List<Tally> parts = new ArrayList<>(List.of(tally(x), tally(y), tally(z)));
        double[] all = new double[x.length + y.length + z.length];
        System.arraycopy(x, 0, all, 0, x.length);
        System.arraycopy(y, 0, all, x.length, y.length);
        System.arraycopy(z, 0, all, x.length + y.length, z.length);
        Arrays.sort(all);
        assertArrayEquals(all, Tally.union(parts).expand());
        assertArrayEquals(all, Tally.ofSorted(all).expand());
        assertEquals(tally(all).distinct(), Tally.union(parts).distinct());
    }

    @Property
    void ordinarySummaryEqualsCommonsMathOnTheExpandedNumbers(@ForAll("rounded") double[] x) {
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
    }

    private static Tally tally(double[] x) {
        Tally.Counter c = new Tally.Counter();
        for (double v : x) {
            c.add(v);
        }
        return c.tally();
    }
}
