package org.cupel.recovery;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Deportment: the share of the metal found in each product, 100 · m_p g_p / Σ products (common practice),
 * per smelt and as the mean over a condition's smelts.
 *
 * @param condition the condition (or the smelt's test ID for a single smelt)
 * @param analyte the analyte
 * @param n smelts averaged
 * @param sharePercent product name → mean share of the metal (%), in the order the products were first seen
 */
public record Deportment(String condition, String analyte, int n, Map<String, Double> sharePercent) {
    public Deportment {
        sharePercent = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(sharePercent));
    }

    static Deportment ofSmelt(SmeltRecovery s) {
        double total = s.collectedMetal() + s.lossMetal();
        Map<String, Double> share = new LinkedHashMap<>();
        for (ProductMetal p : s.products()) {
            share.merge(p.product(), total > 0 ? 100 * p.metalGrams() / total : Double.NaN, Double::sum);
        }
        return new Deportment(s.smelt().testId(), s.analyte(), 1, share);
    }

    static Deportment ofCondition(String condition, String analyte, List<SmeltRecovery> smelts) {
        List<Deportment> each = smelts.stream().filter(SmeltRecovery::usable).map(Deportment::ofSmelt).toList();
        Map<String, Double> sum = new LinkedHashMap<>();
        for (Deportment d : each) {
            d.sharePercent().forEach((k, v) -> sum.merge(k, v, Double::sum));
        }
        sum.replaceAll((k, v) -> v / each.size());
        return new Deportment(condition, analyte, each.size(), sum);
    }
}
