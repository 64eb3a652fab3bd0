package org.cupel.duplicates;

import org.cupel.assay.QcRole;

/**
 * A duplicate that cannot be paired: its original sample ID is empty or not in the project.
 *
 * @param id the duplicate's sample ID
 * @param originalId the reference it gives (may be empty)
 * @param batch its batch
 * @param type its duplicate type
 * @param reason one sentence for the exceptions list
 */
public record OrphanDuplicate(String id, String originalId, String batch, QcRole type, String reason) {
}
