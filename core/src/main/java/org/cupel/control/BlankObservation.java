package org.cupel.control;

import org.cupel.assay.AssayValue;

/**
 * One blank result for one analyte, with the sample assayed just before it in the batch sequence.
 *
 * @param row the blank's row in the sample table
 * @param sampleId the blank's sample ID
 * @param batch batch ID
 * @param position position in the batch sequence
 * @param analyte analyte name
 * @param unit unit symbol of the analyte ("g/t")
 * @param value the blank's reported value
 * @param detectionLimit the method's detection limit for this result, {@code NaN} when unknown
 * @param precedingId ID of the sample before it in the sequence; empty when the blank opens the batch
 * @param precedingGrade that sample's value for the same analyte; missing when there is none
 */
public record BlankObservation(int row, String sampleId, String batch, int position, String analyte, String unit,
                               AssayValue value, double detectionLimit, String precedingId,
                               AssayValue precedingGrade) {
    public BlankObservation {
        precedingId = precedingId == null ? "" : precedingId;
    }
}
