package org.cupel.duplicates;

import org.cupel.assay.QcRole;

/**
 * Whether the duplicates (for umpire checks: the second lab) read systematically differently from their
 * originals (the primary lab).
 *
 * @param type duplicate type
 * @param n pairs used (those usable for relative measures)
 * @param rma reduced major axis line of duplicate (y) on original (x)
 * @param meanRelativeBias mean of (b − a)/m as a fraction, with a Student-t 95 % interval
 * @param meanDifference mean of b − a in the analyte's unit, with a Student-t 95 % interval
 * @param pairedT paired t-test on b − a
 * @param wilcoxon Wilcoxon signed-rank test on b − a
 * @param significant whether the 95 % interval of the mean relative bias excludes zero
 * @param verdict one plain sentence
 */
public record BiasResult(QcRole type, int n, RmaFit rma, Estimate meanRelativeBias, Estimate meanDifference,
                         TestResult pairedT, TestResult wilcoxon, boolean significant, String verdict) {
}
