package org.cupel.duplicates;

/**
 * Per-pair measures of the agreement between an original assay {@code a} and its duplicate {@code b}.
 * All are symmetric in (a, b); the relative ones are also unchanged when both are multiplied by the same
 * positive factor (a change of unit).
 */
public final class PairMeasures {
    private PairMeasures() {
    }

    /** Pair mean m = (a + b) / 2. */
    public static double mean(double a, double b) {
        return (a + b) / 2.0;
    }

    /** Absolute difference d = |a − b|. */
    public static double absDifference(double a, double b) {
        return Math.abs(a - b);
    }

    /**
     * Half absolute relative difference HARD = |a − b| / (a + b) (Shaw, W.J., 1997, "Validation of
     * sampling and assaying quality for bankable feasibility studies", in: The Resource Database Towards
     * 2000, AusIMM, Wollongong; citation details recalled from memory). Defined for a + b &gt; 0.
     */
    public static double hard(double a, double b) {
        return Math.abs(a - b) / (a + b);
    }

    /** Relative percent difference as a fraction, RPD = |a − b| / ((a + b) / 2) = 2·HARD. */
    public static double rpd(double a, double b) {
        return Math.abs(a - b) / mean(a, b);
    }

    /**
     * Coefficient of variation of one pair, CV = s / m with s = |a − b| / √2 the SD of two values, so
     * CV = √2·|a − b| / (a + b) (Stanley, C.R. and Lawie, D., 2007, "Average relative error in geochemical
     * determinations: clarification, calculation, and a plea for consistency", Exploration and Mining
     * Geology 16, 267–275).
     */
    public static double cv(double a, double b) {
        return Math.sqrt(2.0) * Math.abs(a - b) / (a + b);
    }
}
