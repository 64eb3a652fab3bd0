package org.cupel.recovery;

import java.util.Arrays;
import java.util.Comparator;

/**
 * Holm's (1979) step-down adjustment of p-values for family-wise error ("A simple sequentially rejective
 * multiple test procedure", Scand. J. Statist. 6): with p₍₁₎ ≤ … ≤ p₍ₘ₎,
 * p̃₍ᵢ₎ = max_{j ≤ i} min(1, (m − j + 1) p₍ⱼ₎). Same definition as R's {@code p.adjust(p, "holm")}.
 * Undefined ({@code NaN}) p-values are left out of the family and stay {@code NaN}.
 */
public final class Holm {
    private Holm() {
    }

    public static double[] adjust(double[] p) {
        Integer[] order = java.util.stream.IntStream.range(0, p.length).filter(i -> !Double.isNaN(p[i]))
                .boxed().sorted(Comparator.comparingDouble(i -> p[i])).toArray(Integer[]::new);
        double[] out = new double[p.length];
        Arrays.fill(out, Double.NaN);
        int m = order.length;
        double running = 0;
        for (int r = 0; r < m; r++) {
            running = Math.max(running, Math.min(1, (m - r) * p[order[r]]));
            out[order[r]] = running;
        }
        return out;
    }
}
