package org.cupel.control;

import java.util.List;

/**
 * The verdict on one lab batch: per analyte, and the worst over analytes.
 *
 * @param batch batch ID
 * @param lab lab name (may be empty)
 * @param nSamples rows in the batch
 * @param verdict worst of the analyte verdicts
 * @param analytes one per analyte that has control results anywhere in the project
 */
public record BatchVerdict(String batch, String lab, int nSamples, Verdict verdict, List<AnalyteVerdict> analytes) {
    public BatchVerdict {
        analytes = List.copyOf(analytes);
    }

    /** Every non-pass reason of every analyte. */
    public List<VerdictReason> reasons() {
        return analytes.stream().flatMap(a -> a.reasons().stream()).toList();
    }
}
