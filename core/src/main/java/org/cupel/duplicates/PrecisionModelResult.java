package org.cupel.duplicates;

import java.util.List;

/**
 * The concentration-dependent precision of one set of pairs: the Thompson–Howarth fit and the unbiased
 * RMS SD regression side by side, their control-line checks and the precision at chosen grades. When the
 * set is too small, {@link #available()} is false and {@link #note()} says why.
 *
 * @param note empty when fitted; otherwise why not
 * @param usedPairs pairs with two detected values that were grouped (before dropping the remainder)
 * @param groups the group points
 * @param thompsonHowarth median-based fit
 * @param rmsRegression RMS SD regression fit
 * @param line90 exceedances of the 90 % line of the Thompson–Howarth model
 * @param line99 exceedances of the 99 % line of the Thompson–Howarth model
 * @param atGrades precision at the chosen grades
 * @param fitNote empty when the counts above the 90 % and 99 % lines are consistent with the model; otherwise
 *     a sentence saying that the model does not describe the pairs ({@link ControlLineCheck#fitNote})
 */
public record PrecisionModelResult(String note, int usedPairs, PairGroups groups, ModelFit thompsonHowarth,
                                   ModelFit rmsRegression, ControlLineCheck line90, ControlLineCheck line99,
                                   List<GradePrecision> atGrades, String fitNote) {
    public PrecisionModelResult {
        note = note == null ? "" : note;
        fitNote = fitNote == null ? "" : fitNote;
        atGrades = atGrades == null ? List.of() : List.copyOf(atGrades);
    }

    public static PrecisionModelResult refused(int usedPairs, String reason) {
        return new PrecisionModelResult(reason, usedPairs, null, null, null, null, null, List.of(), "");
    }

    public boolean available() {
        return thompsonHowarth != null;
    }
}
