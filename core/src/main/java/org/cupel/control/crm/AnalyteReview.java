package org.cupel.control.crm;

/**
 * Lab-wide findings for one analyte over all its CRMs.
 *
 * @param analyte analyte name
 * @param drift trend, EWMA and CUSUM of every judged z-score of the analyte in time order
 * @param biasVsGrade mean bias % of each CRM against certified value
 */
public record AnalyteReview(String analyte, SeriesDrift drift, BiasVsGrade biasVsGrade) {
}
