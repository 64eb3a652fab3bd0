package org.cupel.duplicates;

/** Whether a set of pairs meets the "X % of pairs within the HARD limit" acceptance rule. */
public enum RuleOutcome {
    PASS,
    FAIL,
    /** No pair was usable for relative measures. */
    NOT_JUDGED
}
