package org.cupel.recovery;

/**
 * Effective degrees of freedom of a combined standard uncertainty, the Welch–Satterthwaite formula
 * (JCGM 100:2008, Evaluation of measurement data — Guide to the expression of uncertainty in measurement,
 * Annex G.4.1, eq. G.2b): ν_eff = u_c⁴ / Σ (uᵢ⁴/νᵢ), here written with the variance components vᵢ = uᵢ²
 * (Satterthwaite 1946, "An approximate distribution of estimates of variance components", Biometrics
 * Bulletin 2). Components with νᵢ = ∞ (type B from a stated precision) contribute nothing to the sum.
 */
final class WelchSatterthwaite {
    private WelchSatterthwaite() {
    }

    /** ν_eff for variance components {@code v} with degrees of freedom {@code nu}; ∞ when all νᵢ are ∞. */
    public static double effectiveDf(double[] v, double[] nu) {
        double total = 0;
        double denominator = 0;
        for (int i = 0; i < v.length; i++) {
            total += v[i];
            if (Double.isFinite(nu[i])) {
                denominator += v[i] * v[i] / nu[i];
            }
        }
        return denominator == 0 ? Double.POSITIVE_INFINITY : total * total / denominator;
    }
}
