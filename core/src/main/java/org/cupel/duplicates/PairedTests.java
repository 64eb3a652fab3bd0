package org.cupel.duplicates;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Arrays;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.inference.TTest;
import org.apache.commons.math3.stat.inference.WilcoxonSignedRankTest;
import org.cupel.sort.RadixSort;

/** Tests of whether duplicates read systematically higher or lower than their originals. */
final class PairedTests {
    /** Commons Math computes the exact signed-rank distribution up to this n. */
    private static final int EXACT_LIMIT = 30;
    /** 10^0 … 10^22, every one exact in double precision. */
    private static final double[] POWERS_OF_TEN = new double[23];
    private static final MathContext TWELVE_DIGITS = new MathContext(12);

    static {
        POWERS_OF_TEN[0] = 1;
        for (int i = 1; i < POWERS_OF_TEN.length; i++) {
            POWERS_OF_TEN[i] = POWERS_OF_TEN[i - 1] * 10;
        }
    }

    private PairedTests() {
    }

    /**
     * Student's paired t-test of mean(b − a) = 0 (Student 1908, Biometrika 6; as in any statistics text),
     * via Commons Math {@link TTest#pairedT} and {@link TTest#pairedTTest}.
     */
    public static TestResult pairedT(double[] a, double[] b) {
        int n = a.length;
        if (n < 2) {
            return TestResult.unavailable("paired t-test", n, "needs at least 2 pairs, has " + n);
        }
        boolean allEqual = true;
        double d0 = b[0] - a[0];
        for (int i = 1; i < n && allEqual; i++) {
            allEqual = b[i] - a[i] == d0;
        }
        if (allEqual) {
            return TestResult.unavailable("paired t-test", n, "every difference is the same, so there is no "
                    + "spread to test against");
        }
        TTest t = new TTest();
        return new TestResult("paired t-test", t.pairedT(b, a), n - 1, t.pairedTTest(b, a), n,
                "Student t, two-sided", "");
    }

    /**
     * Wilcoxon signed-rank test of differences b − a (Wilcoxon, F., 1945, "Individual comparisons by ranking
     * methods", Biometrics Bulletin 1, 80–83). Zero differences are dropped (Wilcoxon's convention); ties get
     * mid-ranks (magnitudes compared at 12 significant digits). W = min(W+, W−). p-value: exact from Commons Math {@link WilcoxonSignedRankTest} when
     * n ≤ 30 and no ties; otherwise the normal approximation with mean n(n+1)/4, variance
     * n(n+1)(2n+1)/24 − Σ(t³ − t)/48 over tie groups of size t, and a continuity correction of 0.5.
     */
    public static TestResult wilcoxon(double[] a, double[] b) {
        String name = "Wilcoxon signed-rank test";
        double[] d = nonZeroDifferences(a, b);
        int n = d.length;
        if (n < 1) {
            return TestResult.unavailable(name, 0, "every difference is zero");
        }
        long[] keys = new long[n];
        for (int i = 0; i < n; i++) {
            keys[i] = signedRankKey(roundedMagnitude(d[i]), d[i] > 0);
        }
        sortKeys(keys);
        double wPlus = positiveRankSum(keys);
        double total = n * (n + 1) / 2.0;
        double w = Math.min(wPlus, total - wPlus);
        double tieTerm = tieTerm(keys);
        if (n <= EXACT_LIMIT && tieTerm == 0) {
            double p = new WilcoxonSignedRankTest().wilcoxonSignedRankTest(d, new double[n], true);
            return new TestResult(name, w, Double.NaN, Math.min(1.0, p), n, "exact distribution", "");
        }
        double mean = n * (n + 1) / 4.0;
        double var = n * (n + 1) * (2.0 * n + 1) / 24.0 - tieTerm / 48.0;
        double z = (w - mean + 0.5) / Math.sqrt(var);
        double p = Math.min(1.0, 2 * new NormalDistribution(null, 0, 1).cumulativeProbability(Math.min(z, 0)));
        return new TestResult(name, w, Double.NaN, p, n,
                "normal approximation with tie and continuity corrections", "");
    }

    private static double[] nonZeroDifferences(double[] a, double[] b) {
        double[] d = new double[a.length];
        int k = 0;
        for (int i = 0; i < a.length; i++) {
            double x = b[i] - a[i];
            if (x != 0) {
                d[k++] = x;
            }
        }
        return Arrays.copyOf(d, k);
    }

    /**
     * One difference as one sortable key: its magnitude's bits in the order of {@link Double#compare}
     * ({@link RadixSort#sortable}) shifted up by one bit, and its sign in the lowest bit (1: positive). A
     * magnitude is never negative, so the top bit the shift drops is always set; keys in ascending unsigned order
     * are the magnitudes in ascending order, each run of equal magnitudes with its negative differences first.
     * One sort of these keys gives both the ranks of all magnitudes and which of them are positive, where two
     * sorts (all magnitudes, then the positive ones) were needed before.
     */
    static long signedRankKey(double magnitude, boolean positive) {
        return (RadixSort.sortable(magnitude) << 1) | (positive ? 1 : 0);
    }

    /** The magnitude of a {@link #signedRankKey}, as a key of equal magnitudes only: its sign bit dropped. */
    private static long magnitudeBits(long key) {
        return key >>> 1;
    }

    /**
     * W+: the sum of the ranks of the positive differences among all magnitudes, ties given the mean of their
     * ranks, (first + last)/2 for a run of equal magnitudes at ranks first..last (as Commons Math's
     * {@code NaturalRanking} with {@code TiesStrategy.AVERAGE} computes it), from {@code sortedKeys}
     * ({@link #signedRankKey}, ascending unsigned). One walk: a run of t equal magnitudes holding c positive ones
     * adds c times its mid-rank. Mid-ranks are multiples of ½, so the sum is exact in any order (below 2⁵³). Kept
     * by hand rather than Commons Statistics' ranking for a measured reason: the library's ranking took the whole
     * test at 50,000 pairs from 3.9–4.4 ms to 7.7–7.9 ms of CPU (bench KernelCpuTime), and at a million pairs the
     * Wilcoxon test was 14 % of the duplicates command's time (JFR samples, docs/performance.md); this walk
     * allocates nothing. Checked against the ranks of NaturalRanking (ties AVERAGE) by PositiveRankSumProperties.
     */
    static double positiveRankSum(long[] sortedKeys) {
        double sum = 0;
        int i = 0;
        while (i < sortedKeys.length) {
            long magnitude = magnitudeBits(sortedKeys[i]);
            int j = i;
            int c = (int) (sortedKeys[i] & 1);
            while (j + 1 < sortedKeys.length && magnitudeBits(sortedKeys[j + 1]) == magnitude) {
                j++;
                c += (int) (sortedKeys[j] & 1);
            }
            sum += c * ((i + j + 2) / 2.0);
            i = j + 1;
        }
        return sum;
    }

    /**
     * |x| to 12 significant digits, rounding half up: assay values are decimals, and without rounding
     * 0.35 − 0.33 and 0.33 − 0.31 differ in the last binary digit and would not rank as the tie they are.
     * Equal to {@code new BigDecimal(|x|).round(new MathContext(12)).doubleValue()}, which it falls back on
     * where the fast route cannot be sure: |x|·10^p (p making it a 12-digit number, p ≤ 22 so 10^p is exact)
     * is within half an ulp (below 1e-4) of the exact product, so unless its fraction lies within 1e-3 of ½ it
     * rounds to the same integer L; L / 10^p, a correctly rounded division of two exact doubles, is then the
     * double nearest the decimal L·10^−p, which is what {@code BigDecimal.doubleValue} returns.
     */
    static double roundedMagnitude(double x) {
        double v = Math.abs(x);
        if (v > 0 && v < Double.POSITIVE_INFINITY) {
            int p = 11 - (int) Math.floor(Math.log10(v));
            if (p >= 0 && p < POWERS_OF_TEN.length) {
                double scaled = v * POWERS_OF_TEN[p];
                double floor = Math.floor(scaled);
                double fraction = scaled - floor;
                if (scaled >= 1e11 && scaled < 1e12 && Math.abs(fraction - 0.5) > 1e-3) {
                    return (fraction > 0.5 ? floor + 1 : floor) / POWERS_OF_TEN[p];
                }
            }
        }
        return new BigDecimal(v).round(TWELVE_DIGITS).doubleValue();
    }

    /**
     * {@link #signedRankKey}s in ascending unsigned order: by radix from {@link PairGroups#RADIX_FROM} keys on (a
     * million differences at 1M pairs), else by {@link Arrays#sort(long[])} of the keys with their top bit
     * flipped, which turns the unsigned order into the signed one.
     */
    private static void sortKeys(long[] keys) {
        if (keys.length >= PairGroups.RADIX_FROM) {
            RadixSort.sortUnsigned(keys);
            return;
        }
        for (int i = 0; i < keys.length; i++) {
            keys[i] ^= Long.MIN_VALUE;
        }
        Arrays.sort(keys);
        for (int i = 0; i < keys.length; i++) {
            keys[i] ^= Long.MIN_VALUE;
        }
    }

    /** The tie correction Σ(t³ − t) over runs of equal magnitudes of {@code sortedKeys} ({@link #positiveRankSum}). */
    private static double tieTerm(long[] sortedKeys) {
        double sum = 0;
        int i = 0;
        while (i < sortedKeys.length) {
            int j = i;
            while (j + 1 < sortedKeys.length && magnitudeBits(sortedKeys[j + 1]) == magnitudeBits(sortedKeys[i])) {
                j++;
            }
            double t = j - i + 1;
            sum += t * t * t - t;
            i = j + 1;
        }
        return sum;
    }
}
