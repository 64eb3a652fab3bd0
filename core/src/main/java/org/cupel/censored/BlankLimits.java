package org.cupel.censored;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.stat.StatUtils;
import org.cupel.assay.AssayValue;

/**
 * Detection limits estimated from replicate measurements of a blank (or a low-level spike), so that a
 * lab's stated limit can be checked against its own blanks. With s the SD of the n replicates:
 * <ul>
 * <li>3·s: the common "three sigma of the blank" convention (common practice, no single source);</li>
 * <li>Currie (1968), "Limits for qualitative detection and quantitative determination", Anal. Chem. 40:
 *     critical level {@code L_C = z_{1−α} σ₀} and detection limit {@code L_D = L_C + z_{1−β} σ₀}, with
 *     α = β = 0.05 ({@code L_C = 1.645 σ₀}, {@code L_D = 3.29 σ₀}), taking σ₀ = s, Currie's case of a
 *     well-known blank (for a single paired blank, σ₀ = √2·s);</li>
 * <li>US EPA method detection limit, 40 CFR Part 136 Appendix B: {@code MDL = t(n − 1, 0.99) · s}, from
 *     at least seven replicates.</li>
 * </ul>
 * Censored replicates carry no number for s, so only detected replicates are used and the count of the
 * others is reported.
 *
 * @param n detected replicates used
 * @param censored replicates left out because they were censored
 * @param mean mean of the replicates
 * @param sd their SD (divisor n − 1)
 * @param limits the estimates, in the order above
 */
public record BlankLimits(int n, int censored, double mean, double sd, List<LimitEstimate> limits) {

    /** One estimated limit with the rule and source it follows. */
    public record LimitEstimate(String name, Estimate value, String rule, String source) {
    }

    /** Replicates the EPA procedure asks for (40 CFR 136 App. B). */
    public static final int EPA_MIN_REPLICATES = 7;
    public static final double ALPHA = 0.05;

    public BlankLimits {
        limits = List.copyOf(limits);
    }

    public static BlankLimits of(Iterable<AssayValue> replicates) {
        List<Double> detected = new ArrayList<>();
        int censored = 0;
        for (AssayValue v : replicates) {
            if (v.isDetected()) {
                detected.add(v.value());
            } else if (v.isCensored()) {
                censored++;
            }
        }
        double[] x = detected.stream().mapToDouble(Double::doubleValue).toArray();
        int n = x.length;
        if (n < 2) {
            Estimate none = Estimate.unavailable("needs at least two detected replicates, found " + n);
            return new BlankLimits(n, censored, n == 1 ? x[0] : Double.NaN, Double.NaN, List.of(
                    new LimitEstimate("3·s", none, "", ""), new LimitEstimate("Currie L_C", none, "", ""),
                    new LimitEstimate("Currie L_D", none, "", ""), new LimitEstimate("EPA MDL", none, "", "")));
        }
        double s = Math.sqrt(StatUtils.variance(x));
        double z = new NormalDistribution(null, 0, 1).inverseCumulativeProbability(1 - ALPHA);
        double t = tQuantile(n - 1, 0.99);
        String mdlNote = n < EPA_MIN_REPLICATES
                ? "only " + n + " replicates; the procedure asks for at least " + EPA_MIN_REPLICATES : "";
        List<LimitEstimate> out = List.of(
                new LimitEstimate("3·s", Estimate.of(3 * s, ""), "3 × SD of the blank replicates",
                        "common practice"),
                new LimitEstimate("Currie L_C", Estimate.of(z * s, ""), "critical level 1.645·s (α = 0.05)",
                        "Currie 1968, Anal. Chem. 40"),
                new LimitEstimate("Currie L_D", Estimate.of(2 * z * s, ""), "detection limit 3.29·s (α = β = 0.05)",
                        "Currie 1968, Anal. Chem. 40"),
                new LimitEstimate("EPA MDL", Estimate.of(t * s, mdlNote), "t(n − 1, 0.99)·s, t = "
                        + org.cupel.assay.Numbers.compact(Math.round(t * 1000) / 1000.0),
                        "US EPA, 40 CFR Part 136 Appendix B"));
        return new BlankLimits(n, censored, StatUtils.mean(x), s, out);
    }

    /** The {@code p} quantile of Student's t with {@code df} degrees of freedom. */
    public static double tQuantile(int df, double p) {
        return new TDistribution(null, df).inverseCumulativeProbability(p);
    }
}
