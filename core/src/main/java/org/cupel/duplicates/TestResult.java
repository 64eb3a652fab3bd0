package org.cupel.duplicates;

/**
 * A hypothesis test on paired values.
 *
 * @param name "paired t-test" or "Wilcoxon signed-rank test"
 * @param statistic t, or W = min(W+, W−)
 * @param df degrees of freedom (t-test), NaN for the rank test
 * @param pValue two-sided p-value, NaN when not computed (see note)
 * @param n pairs used (non-zero differences for the rank test)
 * @param method how the p-value was obtained
 * @param note empty when computed; else why not
 */
public record TestResult(String name, double statistic, double df, double pValue, int n, String method,
                         String note) {
    public TestResult {
        note = note == null ? "" : note;
        method = method == null ? "" : method;
    }

    public static TestResult unavailable(String name, int n, String reason) {
        return new TestResult(name, Double.NaN, Double.NaN, Double.NaN, n, "", reason);
    }

    public boolean available() {
        return note.isEmpty();
    }
}
