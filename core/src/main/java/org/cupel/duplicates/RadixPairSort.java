package org.cupel.duplicates;

import java.util.Arrays;
import org.cupel.sort.RadixSort;

/**
 * Sorts two parallel arrays of doubles by the first, ties by the second, in the order of {@link Double#compare}
 * (the order {@link PairGroups#sortByMeanThenDiff} defines), for large arrays: the first array's keys
 * ({@link RadixSort#sortable}) are sorted by {@link RadixSort}, carrying the second array's values along, then
 * each run of equal first values has its second values sorted. Digits that every key
 * shares (the sign and most exponent bits of assay means) are skipped, so a million pairs take three to five
 * passes instead of the twenty of a merge sort. Equal pairs are interchangeable, so the result is the same
 * arrays as any correct sort's.
 */
final class RadixPairSort {
    private static final int SHORT_RUN = 24;

    private RadixPairSort() {
    }

    /** Sorts {@code first} and {@code second} together, in place: by first, then second. */
    static void sort(double[] first, double[] second) {
        int n = first.length;
        if (n < 2) {
            return;
        }
        long[] key = new long[n];
        for (int i = 0; i < n; i++) {
            key[i] = RadixSort.sortable(first[i]);
        }
        RadixSort.sortUnsigned(key, second);
        for (int i = 0; i < n; i++) {
            first[i] = RadixSort.unsortable(key[i]);
        }
        sortTies(key, second);
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
}
