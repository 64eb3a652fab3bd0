package org.cupel.charts;

/**
 * Keeps scatter and series charts legible and their rendering time bounded whatever n is: beyond a
 * budget of points, an evenly spaced subset (in the order given) is drawn and the chart says so via
 * {@link ChartNotes#count(long, long)}. Sorting by the x value before thinning keeps the extremes.
 */
public final class PointBudget {
    /** Points drawn at most on one series. */
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

    /** {@code values} at {@code idx}. */
    public static double[] pick(double[] values, int[] idx) {
        double[] out = new double[idx.length];
        for (int k = 0; k < idx.length; k++) {
            out[k] = values[idx[k]];
        }
        return out;
    }
}
