package org.cupel.control;

/**
 * How blank values relate to the grade of the sample before them, across a project, for one analyte.
 * A positive, significant relation means carry-over (contamination from the previous sample in the
 * sequence) rather than random contamination.
 *
 * @param analyte analyte name
 * @param nRank pairs in the rank correlation (blank and preceding grade both reported; censored values
 *     enter at their limit, which ranks them below every detect above that limit)
 * @param spearmanRho Spearman's rank correlation (average ranks for ties)
 * @param spearmanP two-sided p-value of rho from t = ρ√((n−2)/(1−ρ²)) on n−2 degrees of freedom
 * @param nRegression pairs in the regression (both detected)
 * @param slope least-squares slope of blank on preceding grade: the average fraction carried over
 * @param slopeStdErr standard error of the slope
 * @param intercept least-squares intercept (the blank level with no carry-over)
 * @param slopeP two-sided p-value of the slope (t test on n−2 degrees of freedom)
 * @param note empty when both statistics are given, else why one is {@code NaN}
 */
public record CarryOverRelation(String analyte, int nRank, double spearmanRho, double spearmanP, int nRegression,
                                double slope, double slopeStdErr, double intercept, double slopeP, String note) {
}
