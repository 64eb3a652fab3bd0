package org.cupel.duplicates;

import java.util.Arrays;

/**
 * Pairs sorted by pair mean and cut into consecutive groups of equal size from the lowest mean; the
 * remainder at the top is dropped (the grouping of Thompson and Howarth 1978, "A new approach to the
 * estimation of analytical precision", Journal of Geochemical Exploration 9, 23–30, who use groups of 11).
 * Per group: the mean of pair means, the median |d| and the RMS SD √(Σd²/(2g)).
 *
 * @param groupSize pairs per group
 * @param means mean of the pair means, per group, ascending
 * @param medianAbsDiff median of |d|, per group
 * @param rmsSd √(Σ d² / (2·groupSize)), per group
 * @param dropped pairs at the top left out because they do not fill a group
 * @param droppedFromMean the lowest pair mean among the dropped pairs, NaN when none dropped
 */
public record PairGroups(int groupSize, double[] means, double[] medianAbsDiff, double[] rmsSd, int dropped,
                         double droppedFromMean) {

    public PairGroups {
        means = means.clone();
        medianAbsDiff = medianAbsDiff.clone();
        rmsSd = rmsSd.clone();
    }

    public int groups() {
        return means.length;
    }

    @Override
    public double[] means() {
        return means.clone();
    }

    @Override
    public double[] medianAbsDiff() {
        return medianAbsDiff.clone();
    }

    @Override
    public double[] rmsSd() {
        return rmsSd.clone();
    }

    /** Groups pairs already sorted by mean ({@code sortedMeans}, with their |d| in {@code sortedAbsDiff}). */
    static PairGroups ofSorted(double[] sortedMeans, double[] sortedAbsDiff, int groupSize) {
        int n = sortedMeans.length;
        int g = n / groupSize;
        double[] mean = new double[g];
        double[] med = new double[g];
        double[] rms = new double[g];
        double[] buffer = new double[groupSize];
        for (int j = 0; j < g; j++) {
            int from = j * groupSize;
            double sumM = 0;
            double sumD2 = 0;
            for (int i = 0; i < groupSize; i++) {
                sumM += sortedMeans[from + i];
                double d = sortedAbsDiff[from + i];
                sumD2 += d * d;
                buffer[i] = d;
            }
            mean[j] = sumM / groupSize;
            rms[j] = Math.sqrt(sumD2 / (2.0 * groupSize));
            med[j] = PrecisionMeasures.medianInPlace(buffer, groupSize);
        }
        int dropped = n - g * groupSize;
        return new PairGroups(groupSize, mean, med, rms, dropped, dropped > 0 ? sortedMeans[g * groupSize] : Double.NaN);
    }

    /**
     * The order that sorts pairs by mean, ties broken by |d|, so that the grouping and everything computed
     * from it does not depend on the order the pairs were given in.
     */
    static int[] sortOrder(double[] means, double[] absDiff) {
        Integer[] idx = new Integer[means.length];
        for (int i = 0; i < idx.length; i++) {
            idx[i] = i;
        }
        Arrays.sort(idx, (x, y) -> {
            int c = Double.compare(means[x], means[y]);
            return c != 0 ? c : Double.compare(absDiff[x], absDiff[y]);
        });
        int[] out = new int[idx.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = idx[i];
        }
        return out;
    }
}
