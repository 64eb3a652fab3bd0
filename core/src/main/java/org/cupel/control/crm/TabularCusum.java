package org.cupel.control.crm;

import java.util.List;
import org.cupel.assay.DoubleList;

/**
 * Tabular (algorithmic) CUSUM, after Montgomery, <i>Introduction to Statistical Quality Control</i>
 * (section "The tabular or algorithmic CUSUM"):
 * C⁺ᵢ = max(0, xᵢ − (μ₀ + K) + C⁺ᵢ₋₁), C⁻ᵢ = max(0, (μ₀ − K) − xᵢ + C⁻ᵢ₋₁), C⁺₀ = C⁻₀ = 0,
 * K = kσ, H = hσ; the process signals when C⁺ᵢ &gt; H or C⁻ᵢ &gt; H. Defaults k = 0.5 (detects a 1σ
 * shift quickly) and h = 5 (Montgomery's recommendation for k = 0.5). On z-scores μ₀ = 0, σ = 1.
 *
 * @param upper C⁺ for each observation
 * @param lower C⁻ for each observation
 * @param k reference value in σ units
 * @param h decision interval in σ units
 * @param firstSignal 0-based index of the first observation with C⁺ or C⁻ above H; −1 when none
 * @param signals every index where C⁺ or C⁻ is above H
 */
public record TabularCusum(List<Double> upper, List<Double> lower, double k, double h, int firstSignal,
                           List<Integer> signals) {
    public TabularCusum {
        upper = DoubleList.copyOf(upper);
        lower = DoubleList.copyOf(lower);
        signals = List.copyOf(signals);
    }

    public static TabularCusum of(double[] x, double mu0, double sigma, double k, double h) {
        if (!(sigma > 0) || !(k >= 0) || !(h > 0)) {
            throw new IllegalArgumentException("CUSUM needs sigma > 0, k >= 0 and h > 0");
        }
        double[] up = new double[x.length];
        double[] lo = new double[x.length];
        java.util.ArrayList<Integer> signals = new java.util.ArrayList<>();
        double cPlus = 0;
        double cMinus = 0;
        double bigK = k * sigma;
        double bigH = h * sigma;
        for (int i = 0; i < x.length; i++) {
            cPlus = Math.max(0, x[i] - (mu0 + bigK) + cPlus);
            cMinus = Math.max(0, (mu0 - bigK) - x[i] + cMinus);
            up[i] = cPlus;
            lo[i] = cMinus;
            if (cPlus > bigH || cMinus > bigH) {
                signals.add(i);
            }
        }
        int first = signals.isEmpty() ? -1 : signals.get(0);
        return new TabularCusum(DoubleList.of(up), DoubleList.of(lo), k, h, first, signals);
    }

    public int n() {
        return upper.size();
    }
}
