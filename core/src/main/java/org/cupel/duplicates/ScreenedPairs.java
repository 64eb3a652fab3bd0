package org.cupel.duplicates;

import java.util.Arrays;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The pairs of one set split by use, as primitive arrays for the kernels. {@code absolute} pairs have two
 * detected positive values and feed Thompson–Howarth and repeatability; {@code relative} pairs also pass the
 * detection-limit multiple and feed HARD, CV and bias. Arrays are index-aligned with their {@code rows}
 * (indices into {@link #pairs()}).
 *
 * @param pairs every pair of the set
 * @param absolute pairs usable in absolute measures
 * @param relative pairs usable in relative measures
 * @param excludedAbsolute counts of pairs left out of absolute measures, by reason
 * @param excludedRelative counts of pairs left out of relative measures, by reason (includes the above)
 * @param limitUnknown relative pairs kept although no detection limit was known to test the multiple
 * @param censoredSubstituted relative pairs with a below-detection member taken at half its limit
 */
record ScreenedPairs(List<DuplicatePair> pairs, Members absolute, Members relative,
                            Map<ExclusionReason, Integer> excludedAbsolute,
                            Map<ExclusionReason, Integer> excludedRelative, int limitUnknown,
                            int censoredSubstituted) {

    public ScreenedPairs {
        pairs = PairList.of(pairs);
        excludedAbsolute = Collections.unmodifiableMap(new EnumMap<>(excludedAbsolute.isEmpty()
                ? new EnumMap<>(ExclusionReason.class) : excludedAbsolute));
        excludedRelative = Collections.unmodifiableMap(new EnumMap<>(excludedRelative.isEmpty()
                ? new EnumMap<>(ExclusionReason.class) : excludedRelative));
    }

    /**
     * Values of the used pairs: {@code a} original, {@code b} duplicate, {@code rows} into the pair list. Immutable:
     * the public accessors return copies; the screening hands its arrays over without copying them.
     */
    public static final class Members {
        private final int[] rows;
        private final double[] a;
        private final double[] b;

        public Members(int[] rows, double[] a, double[] b) {
            this(rows.clone(), a.clone(), b.clone(), true);
        }

        /** Takes the arrays over (the caller keeps no reference). */
        Members(int[] rows, double[] a, double[] b, boolean owned) {
            if (rows.length != a.length || a.length != b.length) {
                throw new IllegalArgumentException("rows, a and b must have the same length");
            }
            this.rows = rows;
            this.a = a;
            this.b = b;
        }

        /** Members without rows (an index per value), copied from {@code a} and {@code b}. */
        static Members copy(double[] a, double[] b) {
            return new Members(new int[a.length], a.clone(), b.clone(), true);
        }

        public int size() {
            return rows.length;
        }

        public int[] rows() {
            return rows.clone();
        }

        public double[] a() {
            return a.clone();
        }

        public double[] b() {
            return b.clone();
        }

        /** The originals themselves, not a copy: for the kernels of this package, which only read them. */
        double[] sharedA() {
            return a;
        }

        /** The duplicates themselves, not a copy (see {@link #sharedA}). */
        double[] sharedB() {
            return b;
        }

        /** The rows themselves, not a copy (see {@link #sharedA}). */
        int[] sharedRows() {
            return rows;
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Members m && Arrays.equals(rows, m.rows) && Arrays.equals(a, m.a)
                    && Arrays.equals(b, m.b);
        }

        @Override
        public int hashCode() {
            return Arrays.hashCode(rows) * 31 + Arrays.hashCode(a);
        }

        @Override
        public String toString() {
            return "Members[n=" + rows.length + "]";
        }
    }

    public int excludedAbsoluteCount() {
        return excludedAbsolute.values().stream().mapToInt(Integer::intValue).sum();
    }

    public int excludedRelativeCount() {
        return excludedRelative.values().stream().mapToInt(Integer::intValue).sum();
    }
}
