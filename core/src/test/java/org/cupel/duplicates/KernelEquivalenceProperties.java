package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Arrays;
import java.util.Random;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.stat.ranking.NaNStrategy;
import org.apache.commons.math3.stat.ranking.NaturalRanking;
import org.apache.commons.math3.stat.ranking.TiesStrategy;

/**
 * The faster kernels of the duplicate analysis give exactly (bit for bit) what the implementations they replaced
 * gave; each reference below is the replaced code.
 */
class KernelEquivalenceProperties {

    /** Values on a coarse decimal grid, so that ties (equal means, equal |d|) are common. */
    private static double[] gridValues(Random random, int n, int steps) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = (1 + random.nextInt(steps)) / 1000.0;
        }
        return v;
    }

    @Property(tries = 200)
    void sortIsTheBoxedIndexSort(@ForAll long seed, @ForAll @IntRange(min = 0, max = 3000) int n) {
        Random random = new Random(seed);
        double[] m = gridValues(random, n, 1 + random.nextInt(500));
        double[] d = gridValues(random, n, 1 + random.nextInt(20));
        Integer[] idx = new Integer[n];
        for (int i = 0; i < n; i++) {
            idx[i] = i;
        }
        Arrays.sort(idx, (x, y) -> {
            int c = Double.compare(m[x], m[y]);
            return c != 0 ? c : Double.compare(d[x], d[y]);
        });
        double[] sm = m.clone();
        double[] sd = d.clone();
        PairGroups.sortByMeanThenDiff(sm, sd);
        assertArrayEquals(Arrays.stream(idx).mapToDouble(i -> m[i]).toArray(), sm, 0.0);
        assertArrayEquals(Arrays.stream(idx).mapToDouble(i -> d[i]).toArray(), sd, 0.0);
    }

    @Property(tries = 500)
    void medianBySelectionIsTheMedianOfTheSortedValues(@ForAll long seed,
                                                        @ForAll @IntRange(min = 1, max = 2000) int n) {
        Random random = new Random(seed);
        double[] v = random.nextBoolean() ? gridValues(random, n, 1 + random.nextInt(50)) : random.doubles(n).toArray();
        double[] s = v.clone();
        Arrays.sort(s);
        double expected = n % 2 == 1 ? s[n / 2] : (s[n / 2 - 1] + s[n / 2]) / 2.0;
        assertEquals(expected, PrecisionMeasures.medianInPlace(v.clone(), n), 0.0);
    }

    @Property(tries = 5000)
    void twelveDigitRoundingIsBigDecimals(@ForAll @IntRange(min = 0, max = 99999) int a,
                                          @ForAll @IntRange(min = 0, max = 99999) int b,
                                          @ForAll @IntRange(min = 0, max = 6) int decimals,
                                          @ForAll @DoubleRange(min = -1e6, max = 1e6) double any) {
        double scale = Math.pow(10, -decimals);
        // Differences of decimal assay values (the case the rounding exists for) and arbitrary doubles.
        for (double x : new double[] {a * scale - b * scale, any, any * 1e-9, Math.ulp(any), a * 0.5e-11}) {
            double expected = new BigDecimal(Math.abs(x)).round(new MathContext(12)).doubleValue();
            assertEquals(expected, PairedTests.roundedMagnitude(x), 0.0, () -> "x = " + x);
        }
    }

    /** n from 60 with 30 % noise: far above the exact-distribution limit of 30 non-zero differences. */
    @Property(tries = 300)
    void wilcoxonMatchesTheNaturalRankingVersion(@ForAll long seed, @ForAll @IntRange(min = 60, max = 600) int n) {
        Random random = new Random(seed);
        double[] a = gridValues(random, n, 2000);
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = Math.max(0.001, Math.round(1000 * (a[i] + 0.3 * a[i] * random.nextGaussian())) / 1000.0);
        }
        TestResult actual = PairedTests.wilcoxon(a, b);
        assertEquals("normal approximation with tie and continuity corrections", actual.method());
        assertEquals(replacedWilcoxonW(a, b), actual.statistic(), 0.0);
    }

    /** W = min(W+, W−) as computed before, with Commons Math mid-ranks of BigDecimal-rounded magnitudes. */
    private static double replacedWilcoxonW(double[] a, double[] b) {
        double[] d = Arrays.stream(indices(a.length)).mapToDouble(i -> b[i] - a[i]).filter(x -> x != 0).toArray();
        double[] abs = Arrays.stream(d)
                .map(x -> new BigDecimal(Math.abs(x)).round(new MathContext(12)).doubleValue()).toArray();
        double[] ranks = new NaturalRanking(NaNStrategy.FAILED, TiesStrategy.AVERAGE).rank(abs);
        double wPlus = 0;
        for (int i = 0; i < d.length; i++) {
            if (d[i] > 0) {
                wPlus += ranks[i];
            }
        }
        double total = d.length * (d.length + 1) / 2.0;
        return Math.min(wPlus, total - wPlus);
    }

    private static int[] indices(int n) {
        int[] out = new int[n];
        Arrays.setAll(out, i -> i);
        return out;
    }

    @Property(tries = 2000)
    void chiSquareTailIsCommonsMaths(@ForAll @IntRange(min = 1, max = 400) int df,
                                     @ForAll @DoubleRange(min = 0, max = 1000) double t) {
        assertEquals(1.0 - new ChiSquaredDistribution(null, df).cumulativeProbability(t),
                BatchDispersion.upperTail(df, t), 0.0);
    }
}
