package org.cupel.recovery;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.distribution.TDistribution;

/**
 * Power of the two-sided two-sample t-test with n replicates per group and its inverse, the replicates
 * needed. With ν = 2(n − 1), δ = (Δ/σ)·√(n/2) and t* = t_{1−α/2, ν}:
 * power = 1 − F_{ν,δ}(t*), where F is the noncentral t distribution function ({@link NoncentralT}); the
 * far tail P(T &lt; −t*) is ignored, as in R's {@code power.t.test} with its default {@code strict = FALSE}
 * (Cohen 1988, Statistical Power Analysis for the Behavioral Sciences, 2nd ed., ch. 2; recalled from memory).
 * The replicate count is solved over real n, as {@code power.t.test} does; round it up to plan.
 */
public final class PowerPlanning {
    private static final double MAX_N = 1e6;

    private PowerPlanning() {
    }

    /**
     * The replicates per condition needed.
     *
     * @param difference Δ to detect
     * @param sd σ, the replicate SD
     * @param alpha two-sided level
     * @param power target power
     * @param n replicates per condition (real; {@link #perCondition()} rounds up)
     * @param note why it could not be computed, empty when it was
     */
    public record Plan(double difference, double sd, double alpha, double power, double n, String note) {
        /** Whole smelts per condition: ⌈n⌉. */
        @com.fasterxml.jackson.annotation.JsonProperty("perCondition")
        public int perCondition() {
            return (int) Math.ceil(n - 1e-9);
        }
    }

    public static double power(double n, double difference, double sd, double alpha) {
        double nu = 2 * (n - 1);
        double critical = new TDistribution(null, nu).inverseCumulativeProbability(1 - alpha / 2);
        double ncp = Math.sqrt(n / 2) * difference / sd;
        return 1 - NoncentralT.cdf(critical, nu, ncp);
    }

    public static Plan replicatesNeeded(double difference, double sd, double alpha, double power) {
        if (!(sd > 0) || !(difference > 0)) {
            return new Plan(difference, sd, alpha, power, Double.NaN, !(sd > 0)
                    ? "no replicate scatter to plan from (SD is " + sd + ")" : "the difference to detect must be positive");
        }
        if (power(2, difference, sd, alpha) >= power) {
            return new Plan(difference, sd, alpha, power, 2, "");
        }
        if (power(MAX_N, difference, sd, alpha) < power) {
            return new Plan(difference, sd, alpha, power, Double.NaN, "more than a million replicates would be needed");
        }
        double n = new BrentSolver(1e-10, 1e-8).solve(500, x -> power(x, difference, sd, alpha) - power, 2, MAX_N);
        return new Plan(difference, sd, alpha, power, n, "");
    }
}
