package org.cupel.censored;

import java.util.Arrays;
import java.util.List;

/**
 * A multiset of numbers as its distinct values, ascending in {@link Double#compare} order (so −0.0 and
 * 0.0 are kept apart, as a {@code TreeSet<Double>} keeps them), each with how often it occurs. Assay
 * values are rounded, so a column of a million values holds a few thousand distinct ones: counting them
 * by hashing and sorting only the distinct values replaces sorting the column, and every order statistic,
 * rank count and weighted sum is then taken over the distinct values. Immutable.
 */
final class Tally {
    static final Tally EMPTY = new Tally(new double[0], new int[0]);

    private final double[] values;
    private final int[] counts;
    /** {@code before[i]}: how many elements are smaller than {@code values[i]}; {@code before[d]} = size. */
    private final int[] before;

    private Tally(double[] values, int[] counts) {
        this.values = values;
        this.counts = counts;
        this.before = new int[values.length + 1];
        for (int i = 0; i < values.length; i++) {
            before[i + 1] = before[i] + counts[i];
        }
    }

    /** Elements, repeats included. */
    int size() {
        return before[values.length];
    }

    /** Distinct values. */
    int distinct() {
        return values.length;
    }

    double value(int i) {
        return values[i];
    }

    int count(int i) {
        return counts[i];
    }

    /** How many elements lie before the i-th distinct value (the size for {@code i = distinct()}). */
    int before(int i) {
        return before[i];
    }

    /** The distinct values, ascending (a copy). */
    double[] distinctValues() {
        return values.clone();
    }

    /** The counts as weights for Commons Math's weighted statistics. */
    double[] weights() {
        double[] w = new double[counts.length];
        for (int i = 0; i < w.length; i++) {
            w[i] = counts[i];
        }
        return w;
    }

    /** Every element, ascending. */
    double[] expand() {
        double[] out = new double[size()];
        for (int i = 0; i < values.length; i++) {
            Arrays.fill(out, before[i], before[i + 1], values[i]);
        }
        return out;
    }

    /** The k-th smallest element, k from 0. */
    double orderStatistic(int k) {
        int i = Arrays.binarySearch(before, 0, values.length, k);
        return values[i >= 0 ? i : -i - 2];
    }

    /** How many elements {@code e} have {@code e < x} (the index of the first {@code ≥ x} in the sorted elements). */
    int countBelow(double x) {
        int lo = 0;
        int hi = values.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (values[mid] < x) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return before[lo];
    }

    /** How many elements {@code e} have {@code e ≤ x}. */
    int countAtOrBelow(double x) {
        int lo = 0;
        int hi = values.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (values[mid] <= x) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return before[lo];
    }

    /** The tally of elements given in ascending order. */
    static Tally ofSorted(double[] sorted) {
        double[] v = new double[sorted.length];
        int[] c = new int[sorted.length];
        int k = 0;
        int i = 0;
        while (i < sorted.length) {
            int j = i + 1;
            while (j < sorted.length && same(sorted[j], sorted[i])) {
                j++;
            }
            v[k] = sorted[i];
            c[k++] = j - i;
            i = j;
        }
        return new Tally(Arrays.copyOf(v, k), Arrays.copyOf(c, k));
    }

    /** The union of the tallies (counts of equal values added), by balanced pairwise merging. */
    static Tally union(List<Tally> parts) {
        if (parts.isEmpty()) {
            return EMPTY;
        }
        if (parts.size() == 1) {
            return parts.get(0);
        }
        int half = parts.size() / 2;
        return merge(union(parts.subList(0, half)), union(parts.subList(half, parts.size())));
    }

    private static Tally merge(Tally a, Tally b) {
        double[] v = new double[a.distinct() + b.distinct()];
        int[] c = new int[v.length];
        int i = 0;
        int j = 0;
        int k = 0;
        while (i < a.distinct() || j < b.distinct()) {
            int cmp = i == a.distinct() ? 1 : j == b.distinct() ? -1 : Double.compare(a.values[i], b.values[j]);
            if (cmp <= 0) {
                v[k] = a.values[i];
                c[k] = a.counts[i++];
                if (cmp == 0) {
                    c[k] += b.counts[j++];
                }
            } else {
                v[k] = b.values[j];
                c[k] = b.counts[j++];
            }
            k++;
        }
        return new Tally(Arrays.copyOf(v, k), Arrays.copyOf(c, k));
    }

    private static boolean same(double a, double b) {
        return Double.doubleToRawLongBits(a) == Double.doubleToRawLongBits(b);
    }

    /**
     * Counts values by open-addressing hashing on their bits; {@link #tally()} sorts only the distinct
     * values. NaN is not expected (observations are finite).
     */
    static final class Counter {
        private long[] keys = new long[64];
        private int[] slotCounts = new int[64];
        private int shift = 64 - 6;
        private int used;
        private long lastBits;
        private int lastSlot = -1;

        void add(double x) {
            add(x, 1);
        }

        void add(double x, int count) {
            long bits = Double.doubleToRawLongBits(x);
            // Neighbouring rows often repeat a value (one detection limit per lab file): skip the probe.
            if (lastSlot >= 0 && bits == lastBits) {
                slotCounts[lastSlot] += count;
                return;
            }
            int mask = keys.length - 1;
            int slot = slot(bits);
            while (slotCounts[slot] != 0 && keys[slot] != bits) {
                slot = (slot + 1) & mask;
            }
            if (slotCounts[slot] == 0) {
                keys[slot] = bits;
                used++;
            }
            slotCounts[slot] += count;
            lastBits = bits;
            lastSlot = slot;
            if (2 * used > keys.length) {
                grow();
                lastSlot = -1;
            }
        }

        Tally tally() {
            double[] v = new double[used];
            int k = 0;
            for (int s = 0; s < keys.length; s++) {
                if (slotCounts[s] != 0) {
                    v[k++] = Double.longBitsToDouble(keys[s]);
                }
            }
            Arrays.sort(v);
            int[] c = new int[used];
            int mask = keys.length - 1;
            for (int i = 0; i < used; i++) {
                long bits = Double.doubleToRawLongBits(v[i]);
                int slot = slot(bits);
                while (keys[slot] != bits || slotCounts[slot] == 0) {
                    slot = (slot + 1) & mask;
                }
                c[i] = slotCounts[slot];
            }
            return new Tally(v, c);
        }

        private void grow() {
            long[] oldKeys = keys;
            int[] oldCounts = slotCounts;
            keys = new long[oldKeys.length * 2];
            slotCounts = new int[oldKeys.length * 2];
            shift--;
            int mask = keys.length - 1;
            for (int s = 0; s < oldKeys.length; s++) {
                if (oldCounts[s] != 0) {
                    int slot = slot(oldKeys[s]);
                    while (slotCounts[slot] != 0) {
                        slot = (slot + 1) & mask;
                    }
                    keys[slot] = oldKeys[s];
                    slotCounts[slot] = oldCounts[s];
                }
            }
        }

        /** Fibonacci hashing: the top bits of the product depend on every bit of the key. */
        private int slot(long bits) {
            return (int) ((bits * 0x9E3779B97F4A7C15L) >>> shift);
        }
    }
}
