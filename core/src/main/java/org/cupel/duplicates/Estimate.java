package org.cupel.duplicates;

/**
 * One statistic with its 95 % interval and the number of pairs it used, or, when it cannot be
 * computed, the reason why (then {@link #value()} is NaN and {@link #note()} says why; never a bare NaN).
 *
 * @param value the estimate
 * @param ciLow lower end of the 95 % interval, NaN when no interval is given (see {@link #note()})
 * @param ciHigh upper end of the 95 % interval
 * @param n pairs used
 * @param note empty when computed; otherwise one sentence on why not, or how the interval was made
 */
public record Estimate(double value, double ciLow, double ciHigh, int n, String note) {

    public Estimate {
        note = note == null ? "" : note;
        if (Double.isNaN(value) && note.isEmpty()) {
            throw new IllegalArgumentException("an estimate that cannot be computed needs a reason");
        }
    }

    public static Estimate of(double value, double ciLow, double ciHigh, int n, String note) {
        return new Estimate(value, ciLow, ciHigh, n, note);
    }

    /** Why a point estimate has no interval: its NaN bounds must not reach an output unexplained. */
    public static final String NO_INTERVAL = "point estimate; no confidence interval is computed for it";

    /** A point estimate without interval (the note says so). */
    public static Estimate point(double value, int n) {
        return new Estimate(value, Double.NaN, Double.NaN, n, Double.isNaN(value) ? "" : NO_INTERVAL);
    }

    public static Estimate unavailable(int n, String reason) {
        return new Estimate(Double.NaN, Double.NaN, Double.NaN, n, reason);
    }

    public boolean available() {
        return !Double.isNaN(value);
    }

    public boolean hasInterval() {
        return !Double.isNaN(ciLow) && !Double.isNaN(ciHigh);
    }
}
