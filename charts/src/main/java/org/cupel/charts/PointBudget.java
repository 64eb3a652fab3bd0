package org.cupel.charts;

import org.cupel.sort.RadixSort;

/**
 * Keeps scatter and series charts legible and their rendering time bounded whatever n is: beyond a budget
 * of points a deterministic subset is drawn and the chart says so via {@link ChartNotes}. Only what is
 * drawn is thinned: every line, limit and statistic on a chart comes from core, computed from all points.
 *
 * <p>{@link #thinned} draws every flagged point (failed, outlying, beyond a limit) and spends the rest of
 * the budget on the others, evenly spaced in the order given, first and last included. Given in sorted
 * order (by x, ties by y), the drawn set then holds the extremes of x and depends on the points' values
 * only, not on the order they came in. Only when the flagged points would take more than half the budget
 * are they thinned too, evenly, and the note says so.
 */
public final class PointBudget {
    /** Points drawn at most on one chart. */
    public static final int DEFAULT = 4000;

    private PointBudget() {
    }

    /** Indices {@code 0..n-1} thinned evenly to at most {@code budget}, always keeping the first and last. */
    public static int[] indices(int n, int budget) {
        if (budget < 2) {
            throw new IllegalArgumentException("budget must be at least 2");
        }
        if (n <= budget) {
            int[] all = new int[n];
            for (int i = 0; i < n; i++) {
                all[i] = i;
            }
            return all;
        }
        int[] out = new int[budget];
        double step = (n - 1) / (double) (budget - 1);
        for (int k = 0; k < budget; k++) {
            out[k] = (int) Math.round(k * step);
        }
        return out;
    }

    /**
     * The indices of {@code 0..flagged.length-1} to draw, ascending, at most {@code budget} of them: all
     * flagged ones, the others evenly thinned into what is left. When flagged points are so many that the
     * others would get less than half the budget, both get half (each thinned evenly), so that the chart
     * still shows the bulk the flagged points stand out from.
     */
    public static int[] thinned(boolean[] flagged, int budget) {
        int[] flags = positions(flagged, true);
        int[] others = positions(flagged, false);
        int forOthers = Math.min(others.length, Math.max(budget - flags.length, budget / 2));
        int forFlags = Math.min(flags.length, budget - forOthers);
        return merge(spread(flags, forFlags), spread(others, forOthers));
    }

    /** {@code k} of {@code idx}, evenly spaced, first and last included when {@code k >= 2}. */
    private static int[] spread(int[] idx, int k) {
        if (k >= idx.length) {
            return idx;
        }
        return k >= 2 ? pick(idx, indices(idx.length, k)) : k == 1 ? new int[] {idx[0]} : new int[0];
    }

    private static int[] merge(int[] a, int[] b) {
        int[] out = new int[a.length + b.length];
        int i = 0;
        int j = 0;
        int k = 0;
        while (i < a.length || j < b.length) {
            out[k++] = j >= b.length || i < a.length && a[i] < b[j] ? a[i++] : b[j++];
        }
        return out;
    }

    /** How many of {@code idx} are flagged. */
    public static int flaggedAmong(boolean[] flagged, int[] idx) {
        int c = 0;
        for (int i : idx) {
            if (flagged[i]) {
                c++;
            }
        }
        return c;
    }

    /** How many are flagged. */
    public static int count(boolean[] flagged) {
        int c = 0;
        for (boolean f : flagged) {
            if (f) {
                c++;
            }
        }
        return c;
    }

    /** {@code values} at {@code idx}. */
    public static double[] pick(double[] values, int[] idx) {
        double[] out = new double[idx.length];
        for (int k = 0; k < idx.length; k++) {
            out[k] = values[idx[k]];
        }
        return out;
    }

    /** {@code values} at {@code idx}. */
    public static int[] pick(int[] values, int[] idx) {
        int[] out = new int[idx.length];
        for (int k = 0; k < idx.length; k++) {
            out[k] = values[idx[k]];
        }
        return out;
    }

    /**
     * The order that sorts the points by x, ties by y (in the order of {@link Double#compare}), points equal in
     * both in index order: a permutation of the input gives the same sequence of values, so what is drawn does
     * not depend on input order. By {@link RadixSort#order}, which gives the permutation of a stable comparison
     * sort in a few passes over the keys, not the twenty merge levels of comparisons of half a million points.
     */
    public static int[] orderByXThenY(double[] x, double[] y) {
        return RadixSort.order(x, y);
    }

    private static int[] positions(boolean[] flagged, boolean value) {
        int[] out = new int[flagged.length];
        int k = 0;
        for (int i = 0; i < flagged.length; i++) {
            if (flagged[i] == value) {
                out[k++] = i;
            }
        }
        return java.util.Arrays.copyOf(out, k);
    }
}
