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
        sort(keys, null, null);
    }

    /**
     * Sorts {@code keys} in place in ascending unsigned order, stably, moving {@code payload} (same length, or
     * null) along with them: equal keys keep the order of their payloads as given.
     */
    public static void sortUnsigned(long[] keys, int[] payload) {
        sort(keys, payload, null);
    }

    /** As {@link #sortUnsigned(long[], int[])}, with values as the payload. */
    public static void sortUnsigned(long[] keys, double[] payload) {
        sort(keys, null, payload);
    }

    /** One stable distribution pass per digit that the keys do not all share, with at most one payload. */
    private static void sort(long[] keys, int[] ints, double[] doubles) {
        int n = keys.length;
        int payload = ints != null ? ints.length : doubles != null ? doubles.length : n;
        if (payload != n) {
            throw new IllegalArgumentException(n + " keys but " + payload + " payloads");
        }
        if (n < 2) {
            return;
        }
        int[][] counts = histograms(keys);
        long[] key = keys;
        long[] keyOut = new long[n];
        int[] ip = ints;
        int[] ipOut = ints == null ? null : new int[n];
        double[] dp = doubles;
        double[] dpOut = doubles == null ? null : new double[n];
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
                if (ip != null) {
                    ipOut[at] = ip[i];
                } else if (dp != null) {
                    dpOut[at] = dp[i];
                }
            }
            long[] k = key;
            key = keyOut;
            keyOut = k;
            int[] t = ip;
            ip = ipOut;
            ipOut = t;
            double[] d = dp;
            dp = dpOut;
            dpOut = d;
        }
        if (key != keys) {
            System.arraycopy(key, 0, keys, 0, n);
            if (ints != null) {
                System.arraycopy(ip, 0, ints, 0, n);
            }
            if (doubles != null) {
                System.arraycopy(dp, 0, doubles, 0, n);
            }
        }
    }

    /**
     * The stable order of the points {@code (first[i], second[i])} by first, ties by second, both in the order of
     * {@link Double#compare}; points equal in both keep their index order. It is the permutation any stable
     * comparison sort of the indices by that comparison gives: the indices are sorted by the keys of the first
     * values, then each run of equal first values by the keys of its second values, taken once in that order so
     * that a run's keys lie side by side.
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
        long[] tie = null;
        long[] tmpKey = null;
        int[] tmpOrder = null;
        for (int from = 0; from < n; ) {
            int to = from + 1;
            while (to < n && key[to] == key[from]) {
                to++;
            }
            if (to - from > 1 && tie == null) {
                tie = signedKeys(second, order);
            }
            if (to - from >= RADIX_RUN) {
                radixRun(tie, order, from, to);
            } else if (to - from > SHORT_RUN) {
                tmpKey = tmpKey != null ? tmpKey : new long[n];
                tmpOrder = tmpOrder != null ? tmpOrder : new int[n];
                mergeRun(tie, order, from, to, tmpKey, tmpOrder);
            } else if (to - from > 1) {
                insertionRun(tie, order, from, to);
            }
            from = to;
        }
        return order;
    }

    /**
     * The key of each {@code values[order[i]]}, its top bit flipped so that the signed order of the keys is the
     * unsigned order of {@link #sortable} (the order of {@link Double#compare}): a tie is a plain {@code <}.
     */
    private static long[] signedKeys(double[] values, int[] order) {
        long[] k = new long[order.length];
        for (int i = 0; i < k.length; i++) {
            k[i] = sortable(values[order[i]]) ^ Long.MIN_VALUE;
        }
        return k;
    }

    /** Sorts {@code key[from, to)} stably by radix, moving {@code order} along. */
    private static void radixRun(long[] key, int[] order, int from, int to) {
        long[] run = new long[to - from];
        for (int i = 0; i < run.length; i++) {
            run[i] = key[from + i] ^ Long.MIN_VALUE;
        }
        int[] idx = Arrays.copyOfRange(order, from, to);
        sortUnsigned(run, idx);
        System.arraycopy(idx, 0, order, from, idx.length);
    }

    /**
     * Sorts {@code key[from, to)} stably by a merge sort, moving {@code order} along: of two halves, the left
     * one's entry goes first unless the right one's key is smaller, so ties keep their order; halves already in
     * order are not merged.
     */
    private static void mergeRun(long[] key, int[] order, int from, int to, long[] tmpKey, int[] tmpOrder) {
        if (to - from <= SHORT_RUN) {
            insertionRun(key, order, from, to);
            return;
        }
        int mid = (from + to) >>> 1;
        mergeRun(key, order, from, mid, tmpKey, tmpOrder);
        mergeRun(key, order, mid, to, tmpKey, tmpOrder);
        if (key[mid - 1] <= key[mid]) {
            return;
        }
        int i = from;
        int j = mid;
        for (int k = from; k < to; k++) {
            boolean right = i >= mid || j < to && key[j] < key[i];
            int at = right ? j++ : i++;
            tmpKey[k] = key[at];
            tmpOrder[k] = order[at];
        }
        System.arraycopy(tmpKey, from, key, from, to - from);
        System.arraycopy(tmpOrder, from, order, from, to - from);
    }

    /** As {@link #mergeRun}, by insertion: an entry moves only past larger keys, so ties keep their order. */
    private static void insertionRun(long[] key, int[] order, int from, int to) {
        for (int i = from + 1; i < to; i++) {
            long k = key[i];
            int o = order[i];
            int j = i - 1;
            while (j >= from && key[j] > k) {
                key[j + 1] = key[j];
                order[j + 1] = order[j];
                j--;
            }
            key[j + 1] = k;
            order[j + 1] = o;
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
