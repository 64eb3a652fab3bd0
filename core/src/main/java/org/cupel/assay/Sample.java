package org.cupel.assay;

/**
 * A row view of one sample in a {@link SampleTable}: its identity, place in the lab sequence and QC role.
 *
 * @param id sample ID as submitted
 * @param batch the lab batch holding the sample's reported result
 * @param position 1-based position of the sample in the batch sequence
 * @param role QC role
 * @param reference the CRM code for a CRM, the original sample's ID for a duplicate, else empty
 * @param source the file and line of the sample's lab result
 */
public record Sample(String id, Batch batch, int position, QcRole role, String reference, SourceLocation source) {
}
