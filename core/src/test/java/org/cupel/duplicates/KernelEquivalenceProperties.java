package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.apache.commons.math3.stat.ranking.NaNStrategy;
import org.apache.commons.math3.stat.ranking.NaturalRanking;
import org.apache.commons.math3.stat.ranking.TiesStrategy;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

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

    /** A seed for the values and how many there are. */
    record Sized(long seed, int n) {
    }

    private static Gen<Sized> sized(int min, int max) {
        Gen<Integer> n = Gen.ints(min, max);
        return r -> new Sized(r.nextLong(), n.next(r));
    }

    /** The smallest and the largest sizes, values drawn from the try's seed. */
    private static List<Gen<Sized>> sizeEdges(int... sizes) {
        return Arrays.stream(sizes).mapToObj(n -> (Gen<Sized>) r -> new Sized(r.nextLong(), n)).toList();
    }

    @Test
    void sortIsTheBoxedIndexSort() {
        SeededTries.forAll(200, sizeEdges(0, 1, 3000), sized(0, 3000), in -> sortIsTheBoxedIndexSort(in.seed(), in.n()));
    }

    private static void sortIsTheBoxedIndexSort(long seed, int n) {
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

    @Test
    void medianBySelectionIsTheMedianOfTheSortedValues() {
        SeededTries.forAll(500, sizeEdges(1, 2, 3, 2000), sized(1, 2000),
                in -> medianBySelectionIsTheMedianOfTheSortedValues(in.seed(), in.n()));
    }

    private static void medianBySelectionIsTheMedianOfTheSortedValues(long seed, int n) {
        Random random = new Random(seed);
        double[] v = random.nextBoolean() ? gridValues(random, n, 1 + random.nextInt(50)) : random.doubles(n).toArray();
        double[] s = v.clone();
        Arrays.sort(s);
        double expected = n % 2 == 1 ? s[n / 2] : (s[n / 2 - 1] + s[n / 2]) / 2.0;
        assertEquals(expected, PrecisionMeasures.medianInPlace(v.clone(), n), 0.0);
    }

    /** Two decimal assay values a·10^−decimals and b·10^−decimals, and any double. */
    record Rounding(int a, int b, int decimals, double any) {
    }

    @Test
    void twelveDigitRoundingIsBigDecimals() {
        Gen<Integer> digits = Gen.ints(0, 99999);
        Gen<Integer> decimals = Gen.ints(0, 6);
        Gen<Double> any = Gen.doubles(-1e6, 1e6);
        // Equal values (difference 0; ulp(0) is the smallest subnormal), the largest difference at both ends
        // of the decimals, and any at 0 and at the ends of its range.
        List<Gen<Rounding>> edges = List.of(Gen.constant(new Rounding(0, 0, 0, 0.0)),
                Gen.constant(new Rounding(99999, 99999, 6, -0.0)), Gen.constant(new Rounding(99999, 0, 0, 1e6)),
                Gen.constant(new Rounding(0, 99999, 6, -1e6)));
        SeededTries.forAll(5000, edges, r -> new Rounding(digits.next(r), digits.next(r), decimals.next(r), any.next(r)),
                in -> twelveDigitRoundingIsBigDecimals(in.a(), in.b(), in.decimals(), in.any()));
    }

    private static void twelveDigitRoundingIsBigDecimals(int a, int b, int decimals, double any) {
        double scale = Math.pow(10, -decimals);
        // Differences of decimal assay values (the case the rounding exists for) and arbitrary doubles.
        for (double x : new double[] {a * scale - b * scale, any, any * 1e-9, Math.ulp(any), a * 0.5e-11}) {
            double expected = new BigDecimal(Math.abs(x)).round(new MathContext(12)).doubleValue();
            assertEquals(expected, PairedTests.roundedMagnitude(x), 0.0, () -> "x = " + x);
        }
    }

    /**
     * n from 60 with 30 % noise: far above the exact-distribution limit of 30 non-zero differences; up to 6,000
     * pairs, so that the keys are sorted both by {@link java.util.Arrays#sort(long[])} and, from
     * {@link PairGroups#RADIX_FROM} on, by radix.
     */
    @Test
    void wilcoxonMatchesTheNaturalRankingVersion() {
        SeededTries.forAll(300, sizeEdges(60, 600, PairGroups.RADIX_FROM - 1, PairGroups.RADIX_FROM, 6000),
                sized(60, 6000), in -> wilcoxonMatchesTheNaturalRankingVersion(in.seed(), in.n()));
    }

    private static void wilcoxonMatchesTheNaturalRankingVersion(long seed, int n) {
        Random random = new Random(seed);
        double[] a = gridValues(random, n, 2000);
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = Math.max(0.001, Math.round(1000 * (a[i] + 0.3 * a[i] * random.nextGaussian())) / 1000.0);
        }
        TestResult actual = PairedTests.wilcoxon(a, b);
        assertEquals("normal approximation with tie and continuity corrections", actual.method());
        assertEquals(replacedWilcoxonW(a, b), actual.statistic(), 0.0);
        assertEquals(replacedWilcoxonP(a, b, actual.statistic()), actual.pValue(), 0.0);
    }

    /**
     * The p-value as computed before, from the statistic and the tie term Σ(t³ − t) over the tie groups of the
     * BigDecimal-rounded magnitudes (normal approximation with tie and continuity corrections).
     */
    private static double replacedWilcoxonP(double[] a, double[] b, double w) {
        double[] abs = Arrays.stream(indices(a.length)).mapToDouble(i -> b[i] - a[i]).filter(x -> x != 0)
                .map(x -> new BigDecimal(Math.abs(x)).round(new MathContext(12)).doubleValue()).sorted().toArray();
        int n = abs.length;
        double tieTerm = 0;
        for (int i = 0; i < n; ) {
            int j = i;
            while (j + 1 < n && abs[j + 1] == abs[i]) {
                j++;
            }
            double t = j - i + 1;
            tieTerm += t * t * t - t;
            i = j + 1;
        }
        double mean = n * (n + 1) / 4.0;
        double var = n * (n + 1) * (2.0 * n + 1) / 24.0 - tieTerm / 48.0;
        double z = (w - mean + 0.5) / Math.sqrt(var);
        return Math.min(1.0, 2 * new org.apache.commons.math3.distribution.NormalDistribution(null, 0, 1)
                .cumulativeProbability(Math.min(z, 0)));
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
}
