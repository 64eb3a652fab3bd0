package org.cupel.recovery;

/**
 * Metal held in a mass of material at a grade: metal (g) = mass (g) × grade (g/t) × 10⁻⁶, because
 * 1 g/t = 1 g per 10⁶ g = 1 µg/g (common practice; the unit identity is exact). Grades in other units are
 * converted to g/t by {@link org.cupel.units.GradeUnit} before they get here, masses to grams by
 * {@link org.cupel.units.MassUnit}.
 */
final class MetalContent {
    private static final double GRAMS_PER_GRAM_PER_GPT = 1e-6;

    private MetalContent() {
    }

    /** Grams of metal in {@code massGrams} of material grading {@code gradeGpt} g/t. */
    public static double grams(double massGrams, double gradeGpt) {
        return massGrams * gradeGpt * GRAMS_PER_GRAM_PER_GPT;
    }

    /** Grade in g/t of {@code metalGrams} spread through {@code massGrams}. */
    public static double gradeGpt(double metalGrams, double massGrams) {
        return metalGrams / massGrams / GRAMS_PER_GRAM_PER_GPT;
    }
}
