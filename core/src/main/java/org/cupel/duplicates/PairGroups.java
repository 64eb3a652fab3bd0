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
    /** Runs this short are sorted by insertion before {@link #sortByMean} merges them. */
    private static final int RUN = 32;
    /** From this many pairs on, {@link RadixPairSort} is faster than the merge sort. */
    static final int RADIX_FROM = 4096;

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
     * Sorts pairs by mean so that the grouping, and everything computed from it, does not depend on the order the
     * pairs were given in, and shuffles each run of equal means (common with rounded assays) into a fixed
     * pseudo-random order ({@link #shuffleTies}). {@code means} and {@code absDiff} are reordered together, in
     * place. Leaving a run of ties in order of |d| put its small differences into one group and its large ones
     * into the next, which biased the group medians and so σ₀ (on 50,000 simulated pairs with σ₀ = 0.010 rounded
     * to 0.001: 0.0117 against about 0.0104 for random orders); any order that keeps equal |d| together does the
     * same in a smaller way, because the median of a block of equal values is that value.
     */
    static void sortByMean(double[] means, double[] absDiff) {
        sortByMeanThenDiff(means, absDiff);
        shuffleTies(means, absDiff);
    }

    /**
     * Sorts pairs by mean, ties broken by |d|: the canonical order of the multiset of pairs (pairs with equal mean
     * and |d| are interchangeable, so only the sorted values matter). It orders any two parallel arrays by the
     * first, then the second: by {@link RadixPairSort} from {@link #RADIX_FROM} pairs on, else by
     * {@link #mergeSort}; both give the same arrays.
     */
    static void sortByMeanThenDiff(double[] means, double[] absDiff) {
        if (means.length >= RADIX_FROM) {
            RadixPairSort.sort(means, absDiff);
        } else {
            mergeSort(means, absDiff);
        }
    }

    /** A merge sort of the values themselves (no index indirection, no boxing) by first, then second. */
    static void mergeSort(double[] means, double[] absDiff) {
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

    /**
     * Fisher–Yates shuffle (Knuth, The Art of Computer Programming vol. 2, Algorithm 3.4.2 P) of the |d| within
     * each run of equal means of pairs in canonical order, drawing from SplitMix64 (Steele, Lea and Flood 2014,
     * "Fast splittable pseudorandom number generators", OOPSLA) seeded with the run's index and length. The seed
     * depends on nothing but the canonical order, so the result is the same for every input order and for every
     * change of unit that keeps the order (a positive scale factor that rounds no means together).
     */
    static void shuffleTies(double[] sortedMeans, double[] absDiff) {
        int n = sortedMeans.length;
        long run = 0;
        for (int from = 0; from < n; ) {
            int to = from + 1;
            while (to < n && sortedMeans[to] == sortedMeans[from]) {
                to++;
            }
            if (to - from > 1) {
                long state = run * 0x9E3779B97F4A7C15L + (to - from);
                for (int i = to - from - 1; i > 0; i--) {
                    state += 0x9E3779B97F4A7C15L;
                    int j = (int) Long.remainderUnsigned(mix(state), i + 1);
                    double t = absDiff[from + i];
                    absDiff[from + i] = absDiff[from + j];
                    absDiff[from + j] = t;
                }
                run++;
            }
            from = to;
        }
    }

    /** The SplitMix64 output function. */
    private static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
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
