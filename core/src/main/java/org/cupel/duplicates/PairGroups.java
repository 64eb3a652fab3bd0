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
    /** Runs this short are sorted by insertion before {@link #sortByMeanThenDiff} merges them. */
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
     * Sorts pairs by mean, ties broken by |d|, so that the grouping and everything computed from it does not
     * depend on the order the pairs were given in: {@code means} and {@code absDiff} are reordered together, in
     * place. A merge sort of the values themselves (no index indirection, no boxing); pairs with equal mean and
     * |d| are interchangeable, so only the sorted values matter.
     */
    static void sortByMeanThenDiff(double[] means, double[] absDiff) {
        int n = means.length;
        for (int from = 0; from < n; from += RUN) {
            insertionSort(means, absDiff, from, Math.min(n, from + RUN));
        }
        double[] m = means;
        double[] d = absDiff;
        double[] mOut = new double[n];
        double[] dOut = new double[n];
        for (int width = RUN; width < n; width *= 2) {
            for (int from = 0; from < n; from += 2 * width) {
                merge(m, d, mOut, dOut, from, Math.min(n, from + width), Math.min(n, from + 2 * width));
            }
            double[] t = m;
            m = mOut;
            mOut = t;
            t = d;
            d = dOut;
            dOut = t;
        }
        if (m != means) {
            System.arraycopy(m, 0, means, 0, n);
            System.arraycopy(d, 0, absDiff, 0, n);
        }
    }

    private static boolean after(double m1, double d1, double m2, double d2) {
        int c = Double.compare(m1, m2);
        return c > 0 || (c == 0 && Double.compare(d1, d2) > 0);
    }

    private static void insertionSort(double[] m, double[] d, int from, int to) {
        for (int i = from + 1; i < to; i++) {
            double xm = m[i];
            double xd = d[i];
            int j = i - 1;
            while (j >= from && after(m[j], d[j], xm, xd)) {
                m[j + 1] = m[j];
                d[j + 1] = d[j];
                j--;
            }
            m[j + 1] = xm;
            d[j + 1] = xd;
        }
    }

    /** Merges the sorted runs [from, mid) and [mid, to) of (m, d) into (mOut, dOut). */
    private static void merge(double[] m, double[] d, double[] mOut, double[] dOut, int from, int mid, int to) {
        int i = from;
        int j = mid;
        for (int k = from; k < to; k++) {
            if (j >= to || (i < mid && !after(m[i], d[i], m[j], d[j]))) {
                mOut[k] = m[i];
                dOut[k] = d[i++];
            } else {
                mOut[k] = m[j];
                dOut[k] = d[j++];
            }
        }
    }
}
