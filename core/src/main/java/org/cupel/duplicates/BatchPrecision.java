package org.cupel.duplicates;

/**
 * The precision of one duplicate type within one batch.
 *
 * @param batch batch ID
 * @param precision the summary over that batch's pairs; its rule is {@code rule}'s outcome
 * @param rule the acceptance rule as a one-sided binomial test of the batch's pairs
 * @param dispersion the batch's RMS CV tested against the set's
 * @param alpha the significance level at which the dispersion test flags the batch
 */
public record BatchPrecision(String batch, PrecisionSummary precision, BatchRuleTest rule, BatchDispersion dispersion,
                             double alpha) {

    /** Whether the batch fails the acceptance rule (its share is significantly below it, {@link BatchRuleTest}). */
    public boolean failsRule() {
        return rule.outcome() == RuleOutcome.FAIL;
    }

    /** Whether the batch's share is below the rule but its pairs are too few to judge it. */
    public boolean tooFewPairs() {
        return rule.outcome() == RuleOutcome.TOO_FEW_PAIRS;
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
