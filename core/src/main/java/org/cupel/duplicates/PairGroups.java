package org.cupel.duplicates;

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
    /** Runs this short are sorted by insertion before {@link #sortOrder} merges them. */
    private static final int RUN = 32;

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
     * from it does not depend on the order the pairs were given in. A stable merge sort of primitive indices
     * (equal keys keep their input order, as {@code Arrays.sort} of objects would), without boxing.
     */
    static int[] sortOrder(double[] means, double[] absDiff) {
        int n = means.length;
        int[] order = new int[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        int[] scratch = new int[n];
        for (int from = 0; from < n; from += RUN) {
            insertionSort(order, from, Math.min(n, from + RUN), means, absDiff);
        }
        for (int width = RUN; width < n; width *= 2) {
            for (int from = 0; from < n - width; from += 2 * width) {
                merge(order, scratch, from, from + width, Math.min(n, from + 2 * width), means, absDiff);
            }
        }
        return order;
    }

    private static int compare(int x, int y, double[] means, double[] absDiff) {
        int c = Double.compare(means[x], means[y]);
        return c != 0 ? c : Double.compare(absDiff[x], absDiff[y]);
    }

    private static void insertionSort(int[] order, int from, int to, double[] means, double[] absDiff) {
        for (int i = from + 1; i < to; i++) {
            int x = order[i];
            int j = i - 1;
            while (j >= from && compare(order[j], x, means, absDiff) > 0) {
                order[j + 1] = order[j];
                j--;
            }
            order[j + 1] = x;
        }
    }

    /** Merges order[from, mid) and order[mid, to), taking from the left run on ties (stability). */
    private static void merge(int[] order, int[] scratch, int from, int mid, int to, double[] means,
                              double[] absDiff) {
        if (compare(order[mid - 1], order[mid], means, absDiff) <= 0) {
            return;
        }
        System.arraycopy(order, from, scratch, from, to - from);
        int i = from;
        int j = mid;
        for (int k = from; k < to; k++) {
            if (j >= to || (i < mid && compare(scratch[i], scratch[j], means, absDiff) <= 0)) {
                order[k] = scratch[i++];
            } else {
                order[k] = scratch[j++];
            }
        }
    }
}
