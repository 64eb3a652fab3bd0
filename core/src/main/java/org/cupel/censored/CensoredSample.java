package org.cupel.censored;

import java.util.Arrays;
import java.util.TreeSet;
import org.cupel.assay.AssayValue;

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

    private CensoredSample(Censoring[] kinds, double[] lower, double[] upper, int missing) {
        this.kinds = kinds;
        this.lower = lower;
        this.upper = upper;
        this.missing = missing;
    }

    /** The sample of the given values; missing values are counted, not used. */
    public static CensoredSample of(Iterable<AssayValue> values) {
        Builder b = builder();
        for (AssayValue v : values) {
            switch (v.qualifier()) {
                case DETECTED -> b.detected(v.value());
                case BELOW_DETECTION -> b.below(v.value());
                case ABOVE_UPPER_LIMIT -> b.above(v.value());
                default -> b.missing();
            }
        }
        return b.build();
    }

    public static Builder builder() {
        return new Builder();
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
        int c = 0;
        for (Censoring k : kinds) {
            if (k == kind) {
                c++;
            }
        }
        return c;
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
        return boundsOf(Censoring.DETECTED, lower);
    }

    /** The limits of the values below detection, one per value, ascending. */
    public double[] belowLimits() {
        return boundsOf(Censoring.BELOW, upper);
    }

    /** The limits of the values above the upper range, one per value, ascending. */
    public double[] aboveLimits() {
        return boundsOf(Censoring.ABOVE, lower);
    }

    /** The distinct detection limits of the values below detection, ascending. */
    public double[] distinctBelowLimits() {
        return distinct(belowLimits());
    }

    /** The distinct upper limits of the values above range, ascending. */
    public double[] distinctAboveLimits() {
        return distinct(aboveLimits());
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

    private double[] boundsOf(Censoring kind, double[] bound) {
        double[] out = new double[count(kind)];
        int k = 0;
        for (int i = 0; i < kinds.length; i++) {
            if (kinds[i] == kind) {
                out[k++] = bound[i];
            }
        }
        Arrays.sort(out);
        return out;
    }

    private static double[] distinct(double[] sorted) {
        TreeSet<Double> set = new TreeSet<>();
        for (double d : sorted) {
            set.add(d);
        }
        return set.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** Collects observations one at a time. */
    public static final class Builder {
        private Censoring[] kinds = new Censoring[64];
        private double[] lower = new double[64];
        private double[] upper = new double[64];
        private int size;
        private int missing;

        private Builder() {
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
