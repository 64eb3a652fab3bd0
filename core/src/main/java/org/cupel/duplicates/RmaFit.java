package org.cupel.duplicates;

/**
 * A reduced major axis line y = intercept + slope·x with standard errors and 95 % intervals.
 *
 * @param slope b
 * @param intercept a
 * @param slopeSe standard error of b
 * @param interceptSe standard error of a
 * @param slopeCi95 {low, high}
 * @param interceptCi95 {low, high}
 * @param r Pearson correlation of x and y
 * @param n pairs used
 * @param note empty when fitted, else why not
 */
public record RmaFit(double slope, double intercept, double slopeSe, double interceptSe, double[] slopeCi95,
                     double[] interceptCi95, double r, int n, String note) {
    public RmaFit {
        slopeCi95 = slopeCi95 == null ? new double[0] : slopeCi95.clone();
        interceptCi95 = interceptCi95 == null ? new double[0] : interceptCi95.clone();
        note = note == null ? "" : note;
    }

    public static RmaFit unavailable(int n, String reason) {
        return new RmaFit(Double.NaN, Double.NaN, Double.NaN, Double.NaN, null, null, Double.NaN, n, reason);
    }

    public boolean available() {
        return note.isEmpty();
    }

    @Override
    public double[] slopeCi95() {
        return slopeCi95.clone();
    }

    @Override
    public double[] interceptCi95() {
        return interceptCi95.clone();
    }
}
