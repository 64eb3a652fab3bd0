package org.cupel.sort;

import java.util.Arrays;

/**
 * Sorting of large arrays of doubles by their bits: a least-significant-digit radix sort (Knuth, The Art of
 * Computer Programming vol. 3, section 5.2.5, "Sorting by distribution") of 64-bit keys made from the doubles so
 * that their unsigned order is the order of {@link Double#compare} ({@link #sortable}). Each pass distributes the
 * keys by one 11-bit digit, stably; digits that every key shares (the sign and most exponent bits of assay
 * values) are skipped, so a million keys take three to six passes instead of the twenty of a merge sort, each
 * a sequential read. Shared by the duplicate analyses (the pairs and the signed-rank keys) and the charts' point
 * order.
 */
public final class RadixSort {
    private static final int BITS = 11;
    private static final int BUCKETS = 1 << BITS;
    private static final int DIGITS = (Long.SIZE + BITS - 1) / BITS;
    /** Runs of ties up to this length are ordered by insertion: a merge costs more to set up. */
    private static final int SHORT_RUN = 24;
    /**
     * Runs of ties from this length on are ordered by radix, shorter ones by a merge sort: a radix sort clears and
     * sums {@value #DIGITS} histograms of {@value #BUCKETS} counts, more work than a merge sort of a few thousand
     * values (the ties of rounded assay means are mostly runs of tens to hundreds).
     */
    private static final int RADIX_RUN = 4096;

    private RadixSort() {
    }

    /**
     * The bits of {@code x} as an unsigned integer in the order of {@link Double#compare} (−0.0 before 0.0, every
     * NaN equal and last): negative numbers have every bit flipped, the others only the sign bit.
     */
    public static long sortable(double x) {
        long bits = Double.doubleToLongBits(x);
        return bits ^ ((bits >> 63) | Long.MIN_VALUE);
    }

    /** The inverse of {@link #sortable} (a NaN comes back as the canonical NaN). */
    public static double unsortable(long k) {
        long bits = k < 0 ? k ^ Long.MIN_VALUE : ~k;
        return Double.longBitsToDouble(bits);
    }

    /** Sorts {@code keys} in place, in ascending unsigned order (the order of {@link Long#compareUnsigned}). */
    public static void sortUnsigned(long[] keys) {
        sortUnsigned(keys, null);
    }

    /**
     * Sorts {@code keys} in place in ascending unsigned order, stably, moving {@code payload} (same length, or
     * null) along with them: equal keys keep the order of their payloads as given.
     */
    public static void sortUnsigned(long[] keys, int[] payload) {
        int n = keys.length;
        if (payload != null && payload.length != n) {
            throw new IllegalArgumentException(n + " keys but " + payload.length + " payloads");
        }
        if (n < 2) {
            return;
        }
        int[][] counts = histograms(keys);
        long[] key = keys;
        long[] keyOut = new long[n];
        int[] p = payload;
        int[] pOut = payload == null ? null : new int[n];
        int[] start = new int[BUCKETS];
        for (int digit = 0; digit < DIGITS; digit++) {
            int shift = digit * BITS;
            int[] count = counts[digit];
            if (count[(int) ((key[0] >>> shift) & (BUCKETS - 1))] == n) {
                continue;
            }
            start[0] = 0;
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
            int[] t = p;
            p = pOut;
            pOut = t;
        }
        if (key != keys) {
            System.arraycopy(key, 0, keys, 0, n);
            if (payload != null) {
                System.arraycopy(p, 0, payload, 0, n);
            }
        }
    }

    /**
     * The stable order of the points {@code (first[i], second[i])} by first, ties by second, both in the order of
     * {@link Double#compare}; points equal in both keep their index order. It is the permutation any stable
     * comparison sort of the indices by that comparison gives: the indices are sorted by the keys of the first
     * values, then each run of equal first values by the keys of its second values.
     */
    public static int[] order(double[] first, double[] second) {
        int n = first.length;
        if (second.length != n) {
            throw new IllegalArgumentException(n + " first values but " + second.length + " second values");
        }
        long[] key = new long[n];
        int[] order = new int[n];
        for (int i = 0; i < n; i++) {
            key[i] = sortable(first[i]);
            order[i] = i;
        }
        sortUnsigned(key, order);
        int[] tmp = null;
        for (int from = 0; from < n; ) {
            int to = from + 1;
            while (to < n && key[to] == key[from]) {
                to++;
            }
            if (to - from >= RADIX_RUN) {
                orderRun(order, from, to, second);
            } else if (to - from > SHORT_RUN) {
                tmp = tmp != null ? tmp : new int[n];
                mergeOrder(order, from, to, second, tmp);
            } else if (to - from > 1) {
                insertionOrder(order, from, to, second);
            }
            from = to;
        }
        return order;
    }

    /**
     * As {@link #orderRun}, by a merge sort: of two halves, the left one's index goes first unless the right
     * one's value is smaller, so ties keep their order; halves already in order are not merged.
     */
    private static void mergeOrder(int[] order, int from, int to, double[] second, int[] tmp) {
        if (to - from <= SHORT_RUN) {
            insertionOrder(order, from, to, second);
            return;
        }
        int mid = (from + to) >>> 1;
        mergeOrder(order, from, mid, second, tmp);
        mergeOrder(order, mid, to, second, tmp);
        if (Double.compare(second[order[mid - 1]], second[order[mid]]) <= 0) {
            return;
        }
        int i = from;
        int j = mid;
        int k = from;
        while (i < mid && j < to) {
            tmp[k++] = Double.compare(second[order[j]], second[order[i]]) < 0 ? order[j++] : order[i++];
        }
        while (i < mid) {
            tmp[k++] = order[i++];
        }
        while (j < to) {
            tmp[k++] = order[j++];
        }
        System.arraycopy(tmp, from, order, from, to - from);
    }

    /** The indices {@code order[from, to)}, ascending, stably sorted by their second values. */
    private static void orderRun(int[] order, int from, int to, double[] second) {
        int[] run = Arrays.copyOfRange(order, from, to);
        long[] key = new long[run.length];
        for (int i = 0; i < run.length; i++) {
            key[i] = sortable(second[run[i]]);
        }
        sortUnsigned(key, run);
        System.arraycopy(run, 0, order, from, run.length);
    }

    /** As {@link #orderRun}, by insertion: an index moves only past larger values, so ties keep their order. */
    private static void insertionOrder(int[] order, int from, int to, double[] second) {
        for (int i = from + 1; i < to; i++) {
            int idx = order[i];
            double v = second[idx];
            int j = i - 1;
            while (j >= from && Double.compare(second[order[j]], v) > 0) {
                order[j + 1] = order[j];
                j--;
            }
            order[j + 1] = idx;
        }
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
}
