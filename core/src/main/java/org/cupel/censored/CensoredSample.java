package org.cupel.censored;

import java.util.Arrays;
import java.util.Comparator;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Qualifier;

/**
 * The non-missing values of one analyte as censored observations: detects, values below a detection
 * limit (several limits allowed), values above an upper limit, and, for maximum likelihood, values known
 * only to lie in an interval. Missing values are left out and counted. Each observation is held as the
 * interval that contains it: a detect is {@code [x, x]}, {@code <DL} is {@code (0, DL]}, {@code >UL} is
 * {@code (UL, ∞)}. Immutable.
 */
public final class CensoredSample {
    private final Censoring[] kinds;
    private final double[] lower;
    private final double[] upper;
    private final int missing;
    /** Detected values, limits of values below detection, limits of values above range: sorted once here. */
    private final Tally detects;
    private final Tally belowLimits;
    private final Tally aboveLimits;
    private final IntervalGroups intervals;

    private CensoredSample(Censoring[] kinds, double[] lower, double[] upper, int missing) {
        this.kinds = kinds;
        this.lower = lower;
        this.upper = upper;
        this.missing = missing;
        Tally.Counter d = new Tally.Counter();
        Tally.Counter b = new Tally.Counter();
        Tally.Counter a = new Tally.Counter();
        int nIntervals = 0;
        for (int i = 0; i < kinds.length; i++) {
            switch (kinds[i]) {
                case DETECTED -> d.add(lower[i]);
                case BELOW -> b.add(upper[i]);
                case ABOVE -> a.add(lower[i]);
                case INTERVAL -> nIntervals++;
            }
        }
        this.detects = d.tally();
        this.belowLimits = b.tally();
        this.aboveLimits = a.tally();
        this.intervals = IntervalGroups.of(kinds, lower, upper, nIntervals);
    }

    /** The sample of the given values; missing values are counted, not used. */
    public static CensoredSample of(Iterable<AssayValue> values) {
        Builder b = builder();
        for (AssayValue v : values) {
            b.add(v.qualifier(), v.value());
        }
        return b.build();
    }

    /**
     * The sample of the reported values of {@code column} at {@code rows}, the same as {@link #of(Iterable)}
     * of their {@link AnalyteColumn#value(int)}s, read from the column's arrays without making the values.
     */
    public static CensoredSample of(AnalyteColumn column, int[] rows) {
        Builder b = new Builder(rows.length);
        for (int row : rows) {
            b.add(column.qualifier(row), column.number(row));
        }
        return b.build();
    }

    public static Builder builder() {
        return new Builder(64);
    }

    /** Observations used. */
    public int size() {
        return kinds.length;
    }

    public int missingCount() {
        return missing;
    }

    public Censoring kind(int i) {
        return kinds[i];
    }

    /** The lower end of what is known: the value for a detect, 0 below a limit, the bound otherwise. */
    public double lower(int i) {
        return lower[i];
    }

    /** The upper end: the value for a detect, the limit below a limit, infinity above a limit. */
    public double upper(int i) {
        return upper[i];
    }

    public int count(Censoring kind) {
        return switch (kind) {
            case DETECTED -> detects.size();
            case BELOW -> belowLimits.size();
            case ABOVE -> aboveLimits.size();
            case INTERVAL -> intervals.size();
        };
    }

    public int censoredCount() {
        return size() - count(Censoring.DETECTED);
    }

    /** Fraction of observations censored (any kind); 0 for an empty sample. */
    public double censoredFraction() {
        return size() == 0 ? 0 : censoredCount() / (double) size();
    }

    /** True when only detects and left-censored values occur: what Kaplan–Meier by flipping and ROS need. */
    public boolean isLeftCensoredOnly() {
        return count(Censoring.ABOVE) == 0 && count(Censoring.INTERVAL) == 0;
    }

    /** The detected values, ascending. */
    public double[] detects() {
        return detects.expand();
    }

    /** The limits of the values below detection, one per value, ascending. */
    public double[] belowLimits() {
        return belowLimits.expand();
    }

    /** The limits of the values above the upper range, one per value, ascending. */
    public double[] aboveLimits() {
        return aboveLimits.expand();
    }

    /** The distinct detection limits of the values below detection, ascending. */
    public double[] distinctBelowLimits() {
        return belowLimits.distinctValues();
    }

    /** The distinct upper limits of the values above range, ascending. */
    public double[] distinctAboveLimits() {
        return aboveLimits.distinctValues();
    }

    /** The detected values as distinct values with counts. */
    Tally detectTally() {
        return detects;
    }

    /** The limits of the values below detection as distinct limits with counts. */
    Tally belowTally() {
        return belowLimits;
    }

    /** The limits of the values above range as distinct limits with counts. */
    Tally aboveTally() {
        return aboveLimits;
    }

    /** The interval-censored values as distinct intervals with counts. */
    IntervalGroups intervalGroups() {
        return intervals;
    }

    /** Every value and limit multiplied by {@code factor > 0} (a unit change). */
    public CensoredSample scaled(double factor) {
        if (!(factor > 0) || Double.isInfinite(factor)) {
            throw new IllegalArgumentException("scale factor must be positive and finite: " + factor);
        }
        double[] lo = lower.clone();
        double[] hi = upper.clone();
        for (int i = 0; i < lo.length; i++) {
            lo[i] *= factor;
            hi[i] *= factor;
        }
        return new CensoredSample(kinds.clone(), lo, hi, missing);
    }

    /** The observations at {@code rows} (repeats allowed), for resampling. */
    CensoredSample select(int[] rows) {
        Censoring[] k = new Censoring[rows.length];
        double[] lo = new double[rows.length];
        double[] hi = new double[rows.length];
        for (int i = 0; i < rows.length; i++) {
            k[i] = kinds[rows[i]];
            lo[i] = lower[rows[i]];
            hi[i] = upper[rows[i]];
        }
        return new CensoredSample(k, lo, hi, 0);
    }

    /**
     * The distinct intervals {@code (low, high]} of the interval-censored values, ordered by low then high,
     * each with its count.
     */
    record IntervalGroups(double[] low, double[] high, int[] counts) {
        static IntervalGroups of(Censoring[] kinds, double[] lower, double[] upper, int n) {
            double[][] pairs = new double[n][];
            int k = 0;
            for (int i = 0; i < kinds.length; i++) {
                if (kinds[i] == Censoring.INTERVAL) {
                    pairs[k++] = new double[] {lower[i], upper[i]};
                }
            }
            Arrays.sort(pairs, Comparator.<double[]>comparingDouble(p -> p[0]).thenComparingDouble(p -> p[1]));
            double[] lo = new double[n];
            double[] hi = new double[n];
            int[] c = new int[n];
            int g = -1;
            for (double[] p : pairs) {
                if (g < 0 || Double.compare(p[0], lo[g]) != 0 || Double.compare(p[1], hi[g]) != 0) {
                    g++;
                    lo[g] = p[0];
                    hi[g] = p[1];
                }
                c[g]++;
            }
            return new IntervalGroups(Arrays.copyOf(lo, g + 1), Arrays.copyOf(hi, g + 1), Arrays.copyOf(c, g + 1));
        }

        int size() {
            int s = 0;
            for (int c : counts) {
                s += c;
            }
            return s;
        }

        int distinct() {
            return counts.length;
        }
    }

    /** Collects observations one at a time. */
    public static final class Builder {
        private Censoring[] kinds;
        private double[] lower;
        private double[] upper;
        private int size;
        private int missing;

        private Builder(int capacity) {
            kinds = new Censoring[Math.max(capacity, 1)];
            lower = new double[kinds.length];
            upper = new double[kinds.length];
        }

        private void add(Qualifier qualifier, double value) {
            switch (qualifier) {
                case DETECTED -> detected(value);
                case BELOW_DETECTION -> below(value);
                case ABOVE_UPPER_LIMIT -> above(value);
                default -> missing();
            }
        }

        public Builder detected(double value) {
            requireFinite(value, "a detected value");
            return add(Censoring.DETECTED, value, value);
        }

        /** A value below the detection limit {@code limit > 0}. */
        public Builder below(double limit) {
            requirePositive(limit, "a detection limit");
            return add(Censoring.BELOW, 0, limit);
        }

        /** A value above the upper limit {@code limit}. */
        public Builder above(double limit) {
            requireFinite(limit, "an upper limit");
            return add(Censoring.ABOVE, limit, Double.POSITIVE_INFINITY);
        }

        /** A value known to lie in {@code (low, high]}, {@code 0 < low < high}. */
        public Builder between(double low, double high) {
            requirePositive(low, "the lower bound of an interval");
            requireFinite(high, "the upper bound of an interval");
            if (!(high > low)) {
                throw new IllegalArgumentException("interval upper bound must exceed the lower: " + low + ", " + high);
            }
            return add(Censoring.INTERVAL, low, high);
        }

        public Builder missing() {
            missing++;
            return this;
        }

        public CensoredSample build() {
            return new CensoredSample(Arrays.copyOf(kinds, size), Arrays.copyOf(lower, size),
                    Arrays.copyOf(upper, size), missing);
        }

        private Builder add(Censoring kind, double lo, double hi) {
            if (size == kinds.length) {
                kinds = Arrays.copyOf(kinds, size * 2);
                lower = Arrays.copyOf(lower, size * 2);
                upper = Arrays.copyOf(upper, size * 2);
            }
            kinds[size] = kind;
            lower[size] = lo;
            upper[size] = hi;
            size++;
            return this;
        }

        private static void requireFinite(double v, String what) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException(what + " must be finite: " + v);
            }
        }

        private static void requirePositive(double v, String what) {
            if (!(v > 0) || Double.isInfinite(v)) {
                throw new IllegalArgumentException(what + " must be positive and finite: " + v);
            }
        }
    }
}
