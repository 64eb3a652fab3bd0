package org.cupel.duplicates;

import java.util.Arrays;

/**
 * Sorts two parallel arrays of doubles by the first, ties by the second, in the order of {@link Double#compare}
 * (the order {@link PairGroups#sortByMeanThenDiff} defines), for large arrays: a least-significant-digit radix
 * sort (Knuth, The Art of Computer Programming vol. 3, section 5.2.5, "Sorting by distribution") of the first
 * array's bits, made order-preserving as unsigned integers, carrying the second array along; then each run of
 * equal first values has its second values sorted. Digits that every key shares (the sign and most exponent
 * bits of assay means) are skipped, so a million pairs take three to five passes instead of the twenty of a
 * merge sort. Equal pairs are interchangeable, so the result is the same arrays as any correct sort's. Keys
 * already made sortable are sorted the same way ({@link #sortUnsigned}: the magnitudes and signs of the Wilcoxon
 * signed-rank test).
 */
final class RadixPairSort {
    private static final int BITS = 11;
    private static final int BUCKETS = 1 << BITS;
    private static final int DIGITS = (Long.SIZE + BITS - 1) / BITS;
    private static final int SHORT_RUN = 24;

    private RadixPairSort() {
    }

    /** Sorts {@code first} and {@code second} together, in place: by first, then second. */
    static void sort(double[] first, double[] second) {
        if (first.length < 2) {
            return;
        }
        long[] key = byDigits(keys(first), second);
        fromKeys(key, first);
        sortTies(key, second);
    }

    /** Sorts {@code keys} in place, in ascending unsigned order (the order of {@link Long#compareUnsigned}). */
    static void sortUnsigned(long[] keys) {
        if (keys.length >= 2) {
            long[] sorted = byDigits(keys, null);
            if (sorted != keys) {
                System.arraycopy(sorted, 0, keys, 0, keys.length);
            }
        }
    }

    private static long[] keys(double[] values) {
        long[] key = new long[values.length];
        for (int i = 0; i < key.length; i++) {
            key[i] = sortable(values[i]);
        }
        return key;
    }

    private static void fromKeys(long[] key, double[] values) {
        for (int i = 0; i < key.length; i++) {
            values[i] = unsortable(key[i]);
        }
    }

    /**
     * The keys sorted, one stable distribution pass per digit that the keys do not all share, with
     * {@code payload} (may be null) moved along and left, sorted, in its own array.
     */
    private static long[] byDigits(long[] key, double[] payload) {
        int n = key.length;
        int[][] counts = histograms(key);
        long[] keyOut = new long[n];
        double[] p = payload;
        double[] pOut = payload == null ? null : new double[n];
        for (int digit = 0; digit < DIGITS; digit++) {
            int shift = digit * BITS;
            int[] count = counts[digit];
            if (count[(int) ((key[0] >>> shift) & (BUCKETS - 1))] == n) {
                continue;
            }
            int[] start = new int[BUCKETS];
            for (int b = 1; b < BUCKETS; b++) {
                start[b] = start[b - 1] + count[b - 1];
            }
            for (int i = 0; i < n; i++) {
                int at = start[(int) ((key[i] >>> shift) & (BUCKETS - 1))]++;
                keyOut[at] = key[i];
                if (p != null) {
                    pOut[at] = p[i];
                }
            }
            long[] k = key;
            key = keyOut;
            keyOut = k;
            double[] t = p;
            p = pOut;
            pOut = t;
        }
        if (p != payload) {
            System.arraycopy(p, 0, payload, 0, n);
        }
        return key;
    }

    /** One count per bucket per digit, from a single pass over the keys. */
    private static int[][] histograms(long[] key) {
        int[][] counts = new int[DIGITS][BUCKETS];
        for (long k : key) {
            for (int digit = 0; digit < DIGITS; digit++) {
                counts[digit][(int) ((k >>> (digit * BITS)) & (BUCKETS - 1))]++;
            }
        }
        return counts;
    }

    /** Sorts {@code second} within each run of equal keys. */
    private static void sortTies(long[] key, double[] second) {
        int n = key.length;
        for (int from = 0; from < n; ) {
            int to = from + 1;
            while (to < n && key[to] == key[from]) {
                to++;
            }
            if (to - from > SHORT_RUN) {
                Arrays.sort(second, from, to);
            } else if (to - from > 1) {
                insertionSort(second, from, to);
            }
            from = to;
        }
    }

    /** Short runs (the ties of rounded means) by insertion: {@link Arrays#sort} costs more to set up. */
    private static void insertionSort(double[] v, int from, int to) {
        for (int i = from + 1; i < to; i++) {
            double x = v[i];
            int j = i - 1;
            while (j >= from && Double.compare(v[j], x) > 0) {
                v[j + 1] = v[j];
                j--;
            }
            v[j + 1] = x;
        }
    }

    /**
     * The bits of {@code x} as an unsigned integer in the order of {@link Double#compare} (−0.0 before 0.0, NaN
     * last): negative numbers have every bit flipped, the others only the sign bit.
     */
    static long sortable(double x) {
        long bits = Double.doubleToLongBits(x);
        return bits ^ ((bits >> 63) | Long.MIN_VALUE);
    }

    /** The inverse of {@link #sortable}. */
    static double unsortable(long k) {
        long bits = k < 0 ? k ^ Long.MIN_VALUE : ~k;
        return Double.longBitsToDouble(bits);
    }
}
