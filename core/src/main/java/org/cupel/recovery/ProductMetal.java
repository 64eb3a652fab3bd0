package org.cupel.recovery;

/**
 * Metal in one product of one smelt.
 *
 * @param product product name
 * @param role collected or loss
 * @param massGrams product mass
 * @param gradeGpt the assay used (after the censored-value treatment)
 * @param metalGrams mass × grade
 * @param censored whether the assay was below detection
 * @param limitGpt the detection limit when censored, else {@code NaN}
 */
public record ProductMetal(String product, ProductRole role, double massGrams, double gradeGpt, double metalGrams,
                           boolean censored, double limitGpt) {
}
