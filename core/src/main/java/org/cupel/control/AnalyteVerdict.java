package org.cupel.control;

import java.util.List;

/**
 * One batch, one analyte: the worst verdict of its control results.
 *
 * @param analyte analyte name
 * @param verdict worst of the control results; CANNOT_JUDGE when the batch has none for this analyte
 * @param nControls control results judged in the batch for this analyte
 * @param reasons the results that were not a pass, in run order
 */
public record AnalyteVerdict(String analyte, Verdict verdict, int nControls, List<VerdictReason> reasons) {
    public AnalyteVerdict {
        reasons = List.copyOf(reasons);
    }
}
