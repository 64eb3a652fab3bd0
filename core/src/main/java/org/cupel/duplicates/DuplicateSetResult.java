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
        outliers = List.copyOf(outliers);
        outliersBelowRelativeThreshold = List.copyOf(outliersBelowRelativeThreshold);
        batches = List.copyOf(batches);
    }

    /** The values behind the charts: pairs used in absolute and in relative measures. */
    public record PairValues(double[] absoluteA, double[] absoluteB, double[] relativeA, double[] relativeB) {
        public PairValues {
            absoluteA = absoluteA.clone();
            absoluteB = absoluteB.clone();
            relativeA = relativeA.clone();
            relativeB = relativeB.clone();
        }

        @Override
        public double[] absoluteA() {
            return absoluteA.clone();
        }

        @Override
        public double[] absoluteB() {
            return absoluteB.clone();
        }

        @Override
        public double[] relativeA() {
            return relativeA.clone();
        }

        @Override
        public double[] relativeB() {
            return relativeB.clone();
        }
    }
}
