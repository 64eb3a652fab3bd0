package org.cupel.control.crm;

import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.DoubleList;

/**
 * Exponentially weighted moving average chart (NIST/SEMATECH e-Handbook of Statistical Methods,
 * section 6.3.2.4, "EWMA Control Charts"): Eᵢ = λxᵢ + (1 − λ)Eᵢ₋₁ with E₀ = μ₀, and the exact
 * time-varying limits μ₀ ± Lσ√(λ/(2 − λ)·[1 − (1 − λ)^{2i}]). Defaults λ = 0.2 and L = 3 (common
 * choices for detecting shifts of about 1σ). On z-scores μ₀ = 0, σ = 1. A signal is a value strictly
 * outside its limits.
 *
 * @param values Eᵢ for each observation
 * @param lowerLimits lower limit for each observation
 * @param upperLimits upper limit for each observation
 * @param lambda weight of the newest observation
 * @param width L, the limit width in σ of the EWMA statistic
 * @param firstSignal 0-based index of the first signal, −1 when none
 * @param signals every index outside the limits
 */
public record Ewma(List<Double> values, List<Double> lowerLimits, List<Double> upperLimits, double lambda,
                   double width, int firstSignal, List<Integer> signals) {
    public Ewma {
        values = DoubleList.copyOf(values);
        lowerLimits = DoubleList.copyOf(lowerLimits);
        upperLimits = DoubleList.copyOf(upperLimits);
        signals = List.copyOf(signals);
    }

    public static Ewma of(double[] x, double mu0, double sigma, double lambda, double width) {
        if (!(lambda > 0 && lambda <= 1) || !(sigma > 0) || !(width > 0)) {
            throw new IllegalArgumentException("EWMA needs 0 < lambda <= 1, sigma > 0 and L > 0");
        }
        double[] e = new double[x.length];
        double[] lo = new double[x.length];
        double[] hi = new double[x.length];
        List<Integer> signals = new ArrayList<>();
        double prev = mu0;
        for (int i = 0; i < x.length; i++) {
            double cur = lambda * x[i] + (1 - lambda) * prev;
            double half = width * sigma
                    * Math.sqrt(lambda / (2 - lambda) * (1 - Math.pow(1 - lambda, 2.0 * (i + 1))));
            e[i] = cur;
            lo[i] = mu0 - half;
            hi[i] = mu0 + half;
            if (cur > mu0 + half || cur < mu0 - half) {
                signals.add(i);
            }
            prev = cur;
        }
        return new Ewma(DoubleList.of(e), DoubleList.of(lo), DoubleList.of(hi), lambda, width,
                signals.isEmpty() ? -1 : signals.get(0), signals);
    }

    public int n() {
        return values.size();
    }
}
