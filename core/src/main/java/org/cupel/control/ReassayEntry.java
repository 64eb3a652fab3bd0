package org.cupel.control;

import java.util.List;

/**
 * One sample to re-assay for one analyte.
 *
 * @param sampleId the sample
 * @param batch its batch
 * @param position its position in the batch
 * @param analyte the analyte to re-assay
 * @param triggeredBy IDs of the failed control samples that put it on the list
 * @param reason why, one sentence per triggering control joined by "; "
 */
public record ReassayEntry(String sampleId, String batch, int position, String analyte, List<String> triggeredBy,
                           String reason) {
    public ReassayEntry {
        triggeredBy = List.copyOf(triggeredBy);
    }
}
