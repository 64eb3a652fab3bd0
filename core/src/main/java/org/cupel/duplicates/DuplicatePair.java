package org.cupel.duplicates;

import org.cupel.assay.AssayValue;
import org.cupel.assay.QcRole;

/**
 * A duplicate assay and the original it repeats, for one analyte.
 *
 * @param id the duplicate's sample ID (or the row label of a pairs file)
 * @param originalId the original sample's ID
 * @param batch the duplicate's batch (lab job), empty when unknown
 * @param type which kind of duplicate: field, coarse reject, pulp, lab repeat or umpire
 * @param original the original's reported value
 * @param duplicate the duplicate's reported value
 */
public record DuplicatePair(String id, String originalId, String batch, QcRole type, AssayValue original,
                            AssayValue duplicate) {
    public DuplicatePair {
        if (type == null || !type.isDuplicate()) {
            throw new IllegalArgumentException("a duplicate pair needs a duplicate type, got " + type);
        }
        id = id == null ? "" : id;
        originalId = originalId == null ? "" : originalId;
        batch = batch == null ? "" : batch;
    }
}
