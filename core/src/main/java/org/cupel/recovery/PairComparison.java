package org.cupel.recovery;

/**
 * Comparison of the mean recoveries of two conditions for one analyte, in percentage points.
 *
 * @param analyte the analyte
 * @param first first condition
 * @param second second condition
 * @param welch Welch test of first − second, with its CI
 * @param holmP Holm-adjusted Welch p over all pairs of this analyte
 * @param gamesHowell Games–Howell family-wise p and simultaneous CI
 * @param tost equivalence test within ± margin
 * @param verdict the conclusion (censored loss assays counted at their limit)
 * @param verdictCensoredAtZero the conclusion with censored loss assays counted as zero
 * @param plan replicates per condition needed to detect the planning difference (given for "cannot tell")
 */
public record PairComparison(String analyte, String first, String second, WelchTest.Result welch, double holmP,
                             GamesHowell gamesHowell, Tost tost, ComparisonVerdict verdict,
                             ComparisonVerdict verdictCensoredAtZero, PowerPlanning.Plan plan) {

    /**
     * Whether the verdict is "cannot tell" although the unadjusted Welch interval excludes zero: the Holm
     * adjustment for the other comparisons of the analyte (Holm 1979) is what keeps it from "different".
     */
    public boolean heldBackByHolm() {
        return verdict == ComparisonVerdict.CANNOT_TELL && welch.computed()
                && (welch.lower() > 0 || welch.upper() < 0);
    }

    /** Whether counting censored loss assays as zero instead of at their limit changes the conclusion. */
    public boolean conclusionDependsOnCensoring() {
        return verdict != verdictCensoredAtZero;
    }
}
