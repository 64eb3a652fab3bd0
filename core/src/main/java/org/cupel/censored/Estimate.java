package org.cupel.censored;

/**
 * One estimated quantity with its uncertainty, or the reason it could not be estimated. A value that
 * cannot be computed is never a bare {@code NaN}: {@link #note()} then says why.
 *
 * @param value the estimate, {@code NaN} only when {@link #isAvailable()} is false
 * @param standardError its standard error, {@code NaN} when the method gives none (see note)
 * @param lower lower bound of the confidence interval, {@code NaN} when none is given
 * @param upper upper bound of the confidence interval, {@code NaN} when none is given
 * @param note why the value or its uncertainty is missing, or how the interval was made; may be empty
 */
public record Estimate(double value, double standardError, double lower, double upper, String note) {

    public Estimate {
        note = note == null ? "" : note;
        if (Double.isNaN(value) && note.isEmpty()) {
            throw new IllegalArgumentException("an unavailable estimate needs a note saying why");
        }
    }

    public static Estimate of(double value, String note) {
        return new Estimate(value, Double.NaN, Double.NaN, Double.NaN, note);
    }

    public static Estimate withError(double value, double standardError) {
        return new Estimate(value, standardError, Double.NaN, Double.NaN, "");
    }

    public static Estimate unavailable(String why) {
        return new Estimate(Double.NaN, Double.NaN, Double.NaN, Double.NaN, why);
    }

    public boolean isAvailable() {
        return !Double.isNaN(value);
    }

    public boolean hasInterval() {
        return !Double.isNaN(lower) && !Double.isNaN(upper);
    }

    /** This estimate with a confidence interval and a note naming how it was made. */
    public Estimate withInterval(double lo, double hi, String how) {
        return new Estimate(value, standardError, lo, hi, note.isEmpty() ? how : note + "; " + how);
    }

    /** The same estimate after multiplying the data by {@code factor > 0}. */
    Estimate scaled(double factor) {
        return new Estimate(value * factor, standardError * factor, lower * factor, upper * factor, note);
    }
}
