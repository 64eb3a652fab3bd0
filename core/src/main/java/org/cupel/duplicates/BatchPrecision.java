package org.cupel.duplicates;

/**
 * The precision of one duplicate type within one batch.
 *
 * @param batch batch ID
 * @param precision the summary over that batch's pairs
 * @param dispersion the batch's RMS CV tested against the set's
 * @param alpha the significance level at which the dispersion test flags the batch
 */
public record BatchPrecision(String batch, PrecisionSummary precision, BatchDispersion dispersion, double alpha) {

    /** Whether the batch fails the acceptance rule. */
    public boolean failsRule() {
        return precision.rule() == RuleOutcome.FAIL;
    }

    /** Whether the batch is significantly less precise than the set (chi-square test at {@link #alpha()}). */
    public boolean lessPrecise() {
        return dispersion.available() && dispersion.pValue() < alpha;
    }

    /** Flagged by either check. */
    public boolean flagged() {
        return failsRule() || lessPrecise();
    }
}
