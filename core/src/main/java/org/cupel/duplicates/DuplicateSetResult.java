package org.cupel.duplicates;

import com.fasterxml.jackson.annotation.JsonIgnore;
import java.util.List;
import org.cupel.assay.QcRole;

/**
 * Everything computed for one duplicate type of one analyte over the whole project (or pairs file).
 *
 * @param analyte analyte name
 * @param unit unit symbol of the analyte
 * @param type duplicate type
 * @param precision HARD acceptance, average CV and repeatability
 * @param model Thompson–Howarth and RMS SD regression (or why not fitted)
 * @param bias duplicate against original (umpire against primary lab)
 * @param outliers flagged pairs used in relative measures (by the HARD limit and/or the 99 % line of the
 *     Thompson–Howarth model), largest HARD first
 * @param outliersBelowRelativeThreshold pairs whose mean is below the detection-limit multiple, flagged by the
 *     99 % line only (they are not judged by HARD), largest |d| first
 * @param pairs the values of the set, for charts (not written to JSON: it can hold 50 000 pairs)
 * @param batches the same precision summary per batch
 */
public record DuplicateSetResult(String analyte, String unit, QcRole type, PrecisionSummary precision,
                                 PrecisionModelResult model, BiasResult bias, List<OutlierPair> outliers,
                                 List<OutlierPair> outliersBelowRelativeThreshold,
                                 @JsonIgnore PairValues pairs, List<BatchPrecision> batches) {
    public DuplicateSetResult {
        // The analysis's own lists are unmodifiable already and make each pair when read (FlaggedPairList).
        outliers = outliers instanceof FlaggedPairList ? outliers : List.copyOf(outliers);
        outliersBelowRelativeThreshold = outliersBelowRelativeThreshold instanceof FlaggedPairList
                ? outliersBelowRelativeThreshold : List.copyOf(outliersBelowRelativeThreshold);
        batches = List.copyOf(batches);
    }

    /**
     * The values behind the charts: pairs used in absolute and in relative measures, each with the flags the
     * analysis gave it, so that a chart marks the pairs the flagged-pair tables list and never judges a pair
     * itself.
     *
     * @param absoluteFlags per pair of {@code absoluteA}/{@code absoluteB}
     * @param relativeFlags per pair of {@code relativeA}/{@code relativeB}
     */
    public static final class PairValues {
        private final double[] absoluteA;
        private final double[] absoluteB;
        private final double[] relativeA;
        private final double[] relativeB;
        private final PairFlags absoluteFlags;
        private final PairFlags relativeFlags;

        public PairValues(double[] absoluteA, double[] absoluteB, double[] relativeA, double[] relativeB,
                          PairFlags absoluteFlags, PairFlags relativeFlags) {
            this(ScreenedPairs.Members.copy(absoluteA, absoluteB), ScreenedPairs.Members.copy(relativeA, relativeB),
                    absoluteFlags, relativeFlags);
        }

        /** Shares the screened members' arrays (immutable; a million pairs are tens of MB). */
        PairValues(ScreenedPairs.Members absolute, ScreenedPairs.Members relative, PairFlags absoluteFlags,
                   PairFlags relativeFlags) {
            this.absoluteA = absolute.sharedA();
            this.absoluteB = absolute.sharedB();
            this.relativeA = relative.sharedA();
            this.relativeB = relative.sharedB();
            this.absoluteFlags = absoluteFlags;
            this.relativeFlags = relativeFlags;
            if (absoluteFlags.size() != absoluteA.length || relativeFlags.size() != relativeA.length) {
                throw new IllegalArgumentException("one flag per pair expected");
            }
        }

        public double[] absoluteA() {
            return absoluteA.clone();
        }

        public double[] absoluteB() {
            return absoluteB.clone();
        }

        public double[] relativeA() {
            return relativeA.clone();
        }

        public double[] relativeB() {
            return relativeB.clone();
        }

        public PairFlags absoluteFlags() {
            return absoluteFlags;
        }

        public PairFlags relativeFlags() {
            return relativeFlags;
        }
    }

    /**
     * Which pairs of a member list the analysis flagged, index-aligned with its values.
     *
     * @param beyondHardLimit flagged {@link OutlierPair.Test#OUTSIDE_HARD_LIMIT}: judged by HARD (used in
     *     relative measures) and above the type's limit
     * @param aboveLine99 flagged {@link OutlierPair.Test#ABOVE_99_PERCENT_LINE}
     */
    public record PairFlags(boolean[] beyondHardLimit, boolean[] aboveLine99) {
        public PairFlags {
            if (beyondHardLimit.length != aboveLine99.length) {
                throw new IllegalArgumentException("both flag arrays must have one entry per pair");
            }
            beyondHardLimit = beyondHardLimit.clone();
            aboveLine99 = aboveLine99.clone();
        }

        public int size() {
            return beyondHardLimit.length;
        }

        @Override
        public boolean[] beyondHardLimit() {
            return beyondHardLimit.clone();
        }

        @Override
        public boolean[] aboveLine99() {
            return aboveLine99.clone();
        }
    }
}
