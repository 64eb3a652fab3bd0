package org.cupel.demo;

import java.util.List;

/**
 * A problem the generator planted on purpose, so that an analysis (or a reader) can check it is found.
 *
 * @param kind   what kind of problem
 * @param where  file, batch or CRM code where it is
 * @param sampleIds sample IDs concerned, in file order; empty when the problem spans a whole CRM series
 * @param detail one sentence of what was planted
 */
public record PlantedProblem(Kind kind, String where, List<String> sampleIds, String detail) {

    public PlantedProblem {
        sampleIds = List.copyOf(sampleIds);
    }

    /** The kinds of planted problem; the first five are QC findings, the rest data-entry problems. */
    public enum Kind {
        CRM_DRIFT,
        CRM_SWAP,
        BLANK_CARRY_OVER,
        POOR_PULP_PRECISION,
        OVER_LIMIT_REASSAY,
        DUPLICATE_ID_ROW,
        TEXT_TYPO,
        NEVER_RECEIVED,
        INSUFFICIENT_SAMPLE_CODE,
        NOT_RECEIVED_CODE
    }
}
