package org.cupel.duplicates;

/**
 * Precision P_c = 2σ_c / c at one grade from both models, as fractions with 95 % intervals (as for
 * {@link ModelFit}).
 *
 * @param grade the grade c, in the analyte's unit
 * @param thompsonHowarth P_c from the Thompson–Howarth model
 * @param rmsRegression P_c from the RMS SD regression
 */
public record GradePrecision(double grade, Estimate thompsonHowarth, Estimate rmsRegression) {
}
