package org.cupel.recovery;

/**
 * A confidence interval of a condition's mean recovery, in percent.
 *
 * @param method how it was computed ("t on replicates", "GUM", "Fieller")
 * @param lower lower end ({@code NaN} when not computed or unbounded below)
 * @param upper upper end ({@code NaN} when not computed or unbounded above)
 * @param df degrees of freedom of the t quantile used ({@code Infinity} for a normal quantile)
 * @param scale {@code "recovery"} when computed on recovery itself, {@code "log loss"} when computed on
 *     ln(100 − R) and back-transformed so the interval cannot pass 100%
 * @param note why it is missing or what is unusual about it; empty otherwise
 */
public record RecoveryInterval(String method, double lower, double upper, double df, String scale, String note) {

    public boolean computed() {
        return !Double.isNaN(lower) || !Double.isNaN(upper);
    }

    static RecoveryInterval missing(String method, String why) {
        return new RecoveryInterval(method, Double.NaN, Double.NaN, Double.NaN, "recovery", why);
    }
}
