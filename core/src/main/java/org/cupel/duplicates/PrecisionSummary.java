package org.cupel.duplicates;

import java.util.Map;
import org.cupel.assay.QcRole;

/**
 * The precision of one set of pairs (one type, analyte and scope).
 *
 * @param type duplicate type
 * @param pairs pairs in the set
 * @param usedAbsolute pairs used in absolute measures (repeatability)
 * @param usedRelative pairs used in relative measures (HARD, CV)
 * @param excludedAbsolute pairs left out of absolute measures, by reason
 * @param excludedRelative pairs left out of relative measures, by reason
 * @param limitUnknown relative pairs kept without a known detection limit to test the multiple against
 * @param limitMultiple the detection-limit multiple in force
 * @param hardLimit the type's HARD limit as a fraction
 * @param acceptancePercent the share of pairs required within the limit, %
 * @param percentWithinLimit share of relative pairs with HARD at or below the limit, %
 * @param rule whether the share meets the acceptance rule
 * @param rmsCv RMS CV as a fraction with its 95 % interval (bootstrap, or large-sample above
 *     {@link DuplicateSettings#bootstrapMaxPairs()} pairs); a point estimate for a batch
 * @param meanCv arithmetic mean of the pair CVs as a fraction: biased low, for comparison only
 * @param medianHard median HARD as a fraction
 * @param repeatabilitySd s_r in the analyte's unit
 * @param repeatabilityLimit r = 2.8·s_r in the analyte's unit
 */
public record PrecisionSummary(QcRole type, int pairs, int usedAbsolute, int usedRelative,
                               Map<ExclusionReason, Integer> excludedAbsolute,
                               Map<ExclusionReason, Integer> excludedRelative, int limitUnknown,
                               double limitMultiple, double hardLimit, double acceptancePercent,
                               Estimate percentWithinLimit, RuleOutcome rule, Estimate rmsCv, Estimate meanCv,
                               Estimate medianHard, Estimate repeatabilitySd, Estimate repeatabilityLimit) {
    public PrecisionSummary {
        excludedAbsolute = Map.copyOf(excludedAbsolute);
        excludedRelative = Map.copyOf(excludedRelative);
    }
}
