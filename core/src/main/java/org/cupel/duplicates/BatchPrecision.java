package org.cupel.duplicates;

/**
 * The precision of one duplicate type within one batch.
 *
 * @param batch batch ID
 * @param precision the summary over that batch's pairs
 */
public record BatchPrecision(String batch, PrecisionSummary precision) {
    /** Whether the batch fails the acceptance rule. */
    public boolean flagged() {
        return precision.rule() == RuleOutcome.FAIL;
    }
}
