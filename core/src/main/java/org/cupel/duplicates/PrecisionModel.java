package org.cupel.duplicates;

/**
 * The linear error model σ_c = σ₀ + k·c of Thompson and Howarth (1976, "Duplicate analysis in geochemical
 * practice, Part I. Theoretical approach and estimation of analytical reproducibility", Analyst 101,
 * 690–698): the SD of one measurement at concentration c, with precision P_c = 2σ_c / c (two relative SDs,
 * about a 95 % half-width).
 *
 * @param sigma0 σ₀, the SD at zero concentration, in the analyte's unit
 * @param k the proportional part of the SD (dimensionless)
 */
public record PrecisionModel(double sigma0, double k) {

    public double sigmaAt(double c) {
        return sigma0 + k * c;
    }

    /** P_c = 2σ_c / c, as a fraction. */
    public double precisionAt(double c) {
        return 2.0 * sigmaAt(c) / c;
    }
}
