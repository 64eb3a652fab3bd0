package org.cupel.censored;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.statistics.distribution.NormalDistribution;
import org.cupel.assay.Numbers;
import org.cupel.recovery.NoncentralT;

/**
 * Currie's critical level L_C and detection limit L_D from the SD s of n blank replicates, both as net levels
 * above the blank mean, with α = β = 0.05, in two forms:
 * <ul>
 * <li><b>t-based</b> (Currie 1995, "Nomenclature in evaluation of analytical methods including detection and
 *     quantification capabilities", IUPAC Recommendations 1995, Pure Appl. Chem. 67, 1699–1723; the form recalled
 *     from memory): with σ₀ estimated by s₀ on ν = n − 1 degrees of freedom, {@code L_C = t(ν, 1 − α)·s₀} and
 *     {@code L_D = δ(α, β, ν)·s₀}, δ the noncentrality of the noncentral t for which
 *     P(T'_ν,δ ≤ t(ν, 1 − α)) = β. Here s₀ = s·√(1 + 1/n), the SD of a result less the mean of the n blanks
 *     (derived: Var(x − x̄_B) = σ²(1 + 1/n)), so that a new blank exceeds the blank mean by more than L_C with
 *     probability exactly α under normal errors: L_C is the one-sided upper prediction limit of one blank. This
 *     is the form to use with a handful of replicates.</li>
 * <li><b>z-based</b> (Currie 1968, "Limits for qualitative detection and quantitative determination", Anal.
 *     Chem. 40, 586–593, the case of a well-known blank): σ₀ = s taken as known, {@code L_C = 1.645·s},
 *     {@code L_D = 3.29·s}; the limit of the t-based form as n → ∞, and low for few replicates.</li>
 * </ul>
 */
final class CurrieLimits {
    public static final double ALPHA = 0.05;
    public static final double BETA = 0.05;
    private static final String SOURCE_T = "Currie 1995, IUPAC Recommendations, Pure Appl. Chem. 67";
    private static final String SOURCE_Z = "Currie 1968, Anal. Chem. 40";

    private CurrieLimits() {
    }

    /** L_C and L_D, t-based then z-based; unavailable with the SD's note when s is not estimated. */
    public static List<BlankLimits.LimitEstimate> of(int n, Estimate sd) {
        String tRule = "t-based, s₀ = s·√(1 + 1/n) on n − 1 degrees of freedom";
        if (!sd.isAvailable() || n < 2) {
            Estimate none = Estimate.unavailable(sd.isAvailable() ? "needs at least two replicates" : sd.note());
            return List.of(new BlankLimits.LimitEstimate("Currie L_C (t)", none, tRule, SOURCE_T),
                    new BlankLimits.LimitEstimate("Currie L_D (t)", none, tRule, SOURCE_T),
                    new BlankLimits.LimitEstimate("Currie L_C (z)", none, "σ₀ = s taken as known", SOURCE_Z),
                    new BlankLimits.LimitEstimate("Currie L_D (z)", none, "σ₀ = s taken as known", SOURCE_Z));
        }
        double s = sd.value();
        int df = n - 1;
        double s0 = s * Math.sqrt(1 + 1.0 / n);
        double t = BlankLimits.tQuantile(df, 1 - ALPHA);
        double delta = noncentrality(df, t, BETA);
        double z = NormalDistribution.of(0, 1).inverseSurvivalProbability(ALPHA);
        return List.of(
                new BlankLimits.LimitEstimate("Currie L_C (t)", Estimate.of(t * s0, sd.note()), "critical level t(ν, 0.95)·s₀, "
                        + tRule + "; t = " + three(t), SOURCE_T),
                new BlankLimits.LimitEstimate("Currie L_D (t)", Estimate.of(delta * s0, sd.note()), "detection limit δ·s₀ "
                        + "(noncentral t, α = β = 0.05), " + tRule + "; δ = " + three(delta), SOURCE_T),
                new BlankLimits.LimitEstimate("Currie L_C (z)", Estimate.of(z * s, sd.note()), "critical level 1.645·s, σ₀ = s "
                        + "taken as known (α = 0.05)", SOURCE_Z),
                new BlankLimits.LimitEstimate("Currie L_D (z)", Estimate.of(2 * z * s, sd.note()), "detection limit 3.29·s, "
                        + "σ₀ = s taken as known (α = β = 0.05)", SOURCE_Z));
    }

    /** δ with P(T' ≤ {@code critical}) = β for T' noncentral t on {@code df} degrees of freedom. */
    public static double noncentrality(int df, double critical, double beta) {
        // P(T' ≤ c) falls from Φ(c) at δ = 0 towards 0 as δ grows; c + 10 is far enough for β ≥ 1e-6.
        return new BrentSolver(1e-12).solve(200, d -> NoncentralT.cdf(critical, df, d) - beta, 0,
                critical + 10 + 10 * critical);
    }

    private static String three(double v) {
        return Numbers.compact(Math.round(v * 1000) / 1000.0);
    }
}
