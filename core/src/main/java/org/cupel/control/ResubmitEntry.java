package org.cupel.control;

import java.util.List;
import org.cupel.assay.MissingReason;
import org.cupel.assay.SourceLocation;

/**
 * A sample the lab returned without a result because it reported the material insufficient or not received.
 * Re-assay cannot help: there is nothing (or not enough) at the lab to assay again, so the sample is
 * re-submitted, from the coarse reject or a new split (common practice).
 *
 * @param sampleId the sample
 * @param batch its batch
 * @param lab the lab that reported it (may be empty)
 * @param position its position in the batch
 * @param role its QC role, as a label ("routine", "CRM", ...)
 * @param reason {@link MissingReason#INSUFFICIENT_SAMPLE} or {@link MissingReason#NOT_RECEIVED}
 * @param labCodes the distinct codes the lab wrote for it ("IS", "NR"), in analyte order; empty when not known
 * @param analytes the analytes without a result for this reason, in project order
 * @param source the file and line of the sample's row
 */
public record ResubmitEntry(String sampleId, String batch, String lab, int position, String role,
                            MissingReason reason, List<String> labCodes, List<String> analytes,
                            SourceLocation source) {
    public ResubmitEntry {
        labCodes = List.copyOf(labCodes);
        analytes = List.copyOf(analytes);
    }

    /** The reason in words: "insufficient sample", "not received". */
    public String reasonText() {
        return reason == MissingReason.INSUFFICIENT_SAMPLE ? "insufficient sample" : "not received";
    }
}
