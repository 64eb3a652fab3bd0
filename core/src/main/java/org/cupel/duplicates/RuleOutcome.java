package org.cupel.duplicates;

/** Whether a set of pairs meets the "X % of pairs within the HARD limit" acceptance rule. */
public enum RuleOutcome {
    PASS,
    FAIL,
    /** No pair was usable for relative measures. */
    NOT_JUDGED,
    /**
     * A batch whose share within the limit is below the rule, but whose pairs are too few for the binomial test
     * to show it ({@link BatchRuleTest}); never given to a whole set.
     */
    TOO_FEW_PAIRS
}
