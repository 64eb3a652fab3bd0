package org.cupel.recovery;

/**
 * The Games–Howell (1976, "Pairwise multiple comparison procedures with unequal n's and/or variances:
 * a Monte Carlo study", J. Educ. Statist. 1) family-wise comparison of k means with unequal variances: each
 * pair uses its Welch standard error and Satterthwaite ν, and the studentized range with k means:
 * <pre>
 *   p = 1 − P_Q(√2 · |t|; k, ν),   CI = d ± q_{1−α; k, ν} / √2 · SE.
 * </pre>
 *
 * @param p the family-wise adjusted p-value
 * @param lower lower end of the simultaneous CI
 * @param upper upper end
 * @param k number of conditions in the family
 * @param note why it could not be computed, empty when it was
 */
public record GamesHowell(double p, double lower, double upper, int k, String note) {

    public static GamesHowell of(WelchTest.Result welch, int k) {
        if (!welch.computed()) {
            return new GamesHowell(Double.NaN, Double.NaN, Double.NaN, k, welch.note());
        }
        if (k < 2) {
            return new GamesHowell(Double.NaN, Double.NaN, Double.NaN, k, "needs at least 2 conditions");
        }
        double p = 1 - StudentizedRange.cdf(Math.sqrt(2) * Math.abs(welch.t()), k, welch.df());
        double q = StudentizedRange.quantile(welch.confidence(), k, welch.df());
        double half = q / Math.sqrt(2) * welch.standardError();
        return new GamesHowell(Math.max(0, p), welch.difference() - half, welch.difference() + half, k, "");
    }
}
