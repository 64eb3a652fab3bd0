package org.cupel.control.crm;

/**
 * Mean bias % of each CRM against its certified value, across the CRMs of one analyte: a lab that is
 * accurate at low grade and biased at high grade shows a slope. Ordinary least squares of the CRMs'
 * mean bias % on certified value ({@link LinearFit}); n is the number of CRMs, so the interval is wide
 * with the usual three to five CRMs.
 *
 * @param analyte analyte name
 * @param fit the regression; slope in bias % per unit of grade
 */
public record BiasVsGrade(String analyte, LinearFit fit) {
}
