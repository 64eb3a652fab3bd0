package org.cupel.duplicates;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeMap;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Qualifier;

/**
 * The detection limit to test the limit multiple against when a lab file states limits only on its
 * below-detection values ({@code <0.005}) and not on detected ones: per method, the limit the lab reports most
 * often on that analyte's below-detection values (the smaller on a tie). These are already in the analyte's
 * reporting unit, unlike limits written in the config in a column's unit. Reports name the source.
 */
public final class DetectionLimits {
    private final Map<String, Double> byMethod;

    private DetectionLimits(Map<String, Double> byMethod) {
        this.byMethod = byMethod;
    }

    public static DetectionLimits of(AnalyteColumn column) {
        Map<String, TreeMap<Double, Integer>> counts = new HashMap<>();
        for (int row = 0; row < column.size(); row++) {
            if (column.qualifier(row) == Qualifier.BELOW_DETECTION && column.limit(row) > 0) {
                counts.computeIfAbsent(column.method(row), k -> new TreeMap<>()).merge(column.limit(row), 1,
                        Integer::sum);
            }
        }
        Map<String, Double> mode = new LinkedHashMap<>();
        counts.forEach((method, byLimit) -> {
            double best = Double.NaN;
            int bestCount = 0;
            for (Map.Entry<Double, Integer> e : byLimit.entrySet()) {
                if (e.getValue() > bestCount) {
                    best = e.getKey();
                    bestCount = e.getValue();
                }
            }
            mode.put(method, best);
        });
        return new DetectionLimits(mode);
    }

    /** The value in {@code row} of {@code column}, its limit filled in when it had none and one is known for its method. */
    AssayValue valueOf(AnalyteColumn column, int row) {
        double stated = column.limit(row);
        if (column.qualifier(row) == Qualifier.MISSING || !Double.isNaN(stated)) {
            return column.value(row);
        }
        Double limit = byMethod.get(column.method(row));
        if (limit == null || Double.isNaN(limit)) {
            return column.value(row);
        }
        return column.valueWithLimit(row, limit);
    }

    /** One sentence on where the limits come from, for reports. */
    public String describe() {
        if (byMethod.isEmpty()) {
            return "no detection limit known for values reported without one";
        }
        StringBuilder sb = new StringBuilder("detection limits of values reported without one taken from the lab's "
                + "below-detection values: ");
        boolean first = true;
        for (Map.Entry<String, Double> e : byMethod.entrySet()) {
            sb.append(first ? "" : ", ").append(e.getKey().isEmpty() ? "(no method)" : e.getKey()).append(' ')
                    .append(org.cupel.assay.Numbers.compact(e.getValue()));
            first = false;
        }
        return sb.toString();
    }
}
