package org.cupel.duplicates;

import java.util.List;

/**
 * The duplicate analysis of one analyte: one result per duplicate type found, and the duplicates that
 * could not be paired.
 *
 * @param analyte analyte name
 * @param unit unit symbol
 * @param settings the settings in force
 * @param sets one result per type, in the order field, coarse, pulp, lab repeat, umpire
 * @param orphans duplicates whose original is missing
 * @param detectionLimits where the detection limits for the limit-multiple rule came from
 */
public record DuplicateReport(String analyte, String unit, DuplicateSettings settings, List<DuplicateSetResult> sets,
                              List<OrphanDuplicate> orphans, String detectionLimits) {
    public DuplicateReport {
        sets = List.copyOf(sets);
        orphans = List.copyOf(orphans);
    }

    /** Batches that fail the acceptance rule for some type. */
    public List<BatchPrecision> flaggedBatches() {
        return sets.stream().flatMap(s -> s.batches().stream()).filter(BatchPrecision::flagged).toList();
    }
}
