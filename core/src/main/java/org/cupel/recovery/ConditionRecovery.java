package org.cupel.recovery;

import java.util.List;

/**
 * Mean recovery of one analyte under one condition, with three confidence intervals.
 *
 * @param condition the condition
 * @param feed the feed(s) charged, comma-separated when several
 * @param analyte the analyte
 * @param definition the recovery definition
 * @param censoredAs how censored product assays were counted
 * @param n smelts used
 * @param replicates the per-smelt recoveries (%) used
 * @param mean mean recovery (%)
 * @param sd replicate SD (percentage points; {@code NaN} when n &lt; 2)
 * @param tInterval t-interval on the replicates
 * @param gum GUM interval with the head-grade uncertainty
 * @param fieller Fieller interval of the ratio
 * @param bootstrapNote why no bootstrap interval is given
 * @param lowerBound mean of the per-smelt lower bounds when a loss assay was censored, else the mean
 * @param upperBound mean of the per-smelt upper bounds likewise
 * @param excluded smelts left out, each with its reason
 */
public record ConditionRecovery(String condition, String feed, String analyte, RecoveryDefinition definition,
                                CensoredAs censoredAs, int n, double[] replicates, double mean, double sd,
                                RecoveryInterval tInterval, RecoveryInterval gum, RecoveryInterval fieller,
                                String bootstrapNote, double lowerBound, double upperBound, List<String> excluded) {
    public ConditionRecovery {
        replicates = replicates.clone();
        excluded = List.copyOf(excluded);
    }

    @Override
    public double[] replicates() {
        return replicates.clone();
    }
}
