package org.cupel.assay;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The reported values of one analyte for every row of a {@link SampleTable}, in primitive arrays.
 * A row with no result for this analyte holds a missing value ({@link MissingReason#NOT_ANALYSED}).
 * Rows with several results (re-assays, other finishes) keep every candidate; the reported one was
 * chosen by a {@link MethodSelector} and the reason is kept. Immutable once built.
 */
public final class AnalyteColumn {
    private static final Qualifier[] QUALIFIERS = Qualifier.values();
    private static final MissingReason[] REASONS = MissingReason.values();

    private final Analyte analyte;
    private final byte[] qualifiers;
    private final double[] values;
    private final double[] limits;
    private final byte[] missing;
    private final short[] methodIndex;
    private final List<String> methods;
    private final Map<Integer, List<MethodValue>> candidatesByRow;
    private final Map<Integer, String> selectionReasons;

    private AnalyteColumn(Analyte analyte, int size, List<String> methods) {
        this.analyte = analyte;
        this.qualifiers = new byte[size];
        this.values = new double[size];
        this.limits = new double[size];
        this.missing = new byte[size];
        this.methodIndex = new short[size];
        this.methods = methods;
        this.candidatesByRow = new HashMap<>();
        this.selectionReasons = new HashMap<>();
    }

    public Analyte analyte() {
        return analyte;
    }

    public int size() {
        return values.length;
    }

    public AssayValue value(int row) {
        return new AssayValue(QUALIFIERS[qualifiers[row]], values[row], limits[row], REASONS[missing[row]]);
    }

    public Qualifier qualifier(int row) {
        return QUALIFIERS[qualifiers[row]];
    }

    /** The number of {@link #value(int)}: measured value, censoring limit, or NaN when missing. */
    public double number(int row) {
        return values[row];
    }

    public double limit(int row) {
        return limits[row];
    }

    /** The method of the reported value; empty when the file did not name one. */
    public String method(int row) {
        return methods.get(methodIndex[row]);
    }

    /** Every result for this row, the reported one first. */
    public List<MethodValue> candidates(int row) {
        List<MethodValue> all = candidatesByRow.get(row);
        if (all != null) {
            return all;
        }
        return List.of(new MethodValue(method(row), value(row), null));
    }

    /** Why the reported value was chosen, for rows with more than one candidate; else empty. */
    public String selectionReason(int row) {
        return selectionReasons.getOrDefault(row, "");
    }

    /** Rows with more than one candidate result, ascending. */
    public int[] rowsWithSeveralResults() {
        return candidatesByRow.keySet().stream().mapToInt(Integer::intValue).sorted().toArray();
    }

    /** How many reported values came from each method (missing values not counted), in first-seen order. */
    public Map<String, Integer> reportedMethodCounts() {
        int[] counts = new int[methods.size()];
        for (int i = 0; i < values.length; i++) {
            if (qualifiers[i] != Qualifier.MISSING.ordinal()) {
                counts[methodIndex[i]]++;
            }
        }
        Map<String, Integer> out = new LinkedHashMap<>();
        for (int m = 0; m < counts.length; m++) {
            if (counts[m] > 0) {
                out.put(methods.get(m), counts[m]);
            }
        }
        return Collections.unmodifiableMap(out);
    }

    public static Builder builder(Analyte analyte) {
        return new Builder(analyte);
    }

    /** Collects results row by row; a row may receive several. */
    public static final class Builder {
        private final Analyte analyte;
        private final Map<Integer, Object> byRow = new HashMap<>();

        private Builder(Analyte analyte) {
            this.analyte = analyte;
        }

        public Analyte analyte() {
            return analyte;
        }

        @SuppressWarnings("unchecked")
        public void add(int row, MethodValue result) {
            Object prior = byRow.get(row);
            if (prior == null) {
                byRow.put(row, result);
            } else if (prior instanceof MethodValue) {
                List<MethodValue> list = new ArrayList<>(2);
                list.add((MethodValue) prior);
                list.add(result);
                byRow.put(row, list);
            } else {
                ((List<MethodValue>) prior).add(result);
            }
        }

        @SuppressWarnings("unchecked")
        public AnalyteColumn build(int rowCount, MethodSelector selector) {
            List<String> methods = new ArrayList<>();
            Map<String, Short> methodIdx = new HashMap<>();
            methods.add("");
            methodIdx.put("", (short) 0);
            AnalyteColumn col = new AnalyteColumn(analyte, rowCount, methods);
            Arrays.fill(col.qualifiers, (byte) Qualifier.MISSING.ordinal());
            Arrays.fill(col.values, Double.NaN);
            Arrays.fill(col.limits, Double.NaN);
            Arrays.fill(col.missing, (byte) MissingReason.NOT_ANALYSED.ordinal());
            for (Map.Entry<Integer, Object> e : byRow.entrySet()) {
                int row = e.getKey();
                MethodValue chosen;
                if (e.getValue() instanceof MethodValue) {
                    chosen = (MethodValue) e.getValue();
                } else {
                    List<MethodValue> all = (List<MethodValue>) e.getValue();
                    MethodSelector.Selection s = selector.select(analyte, all);
                    chosen = all.get(s.index());
                    List<MethodValue> ordered = new ArrayList<>(all.size());
                    ordered.add(chosen);
                    for (int i = 0; i < all.size(); i++) {
                        if (i != s.index()) {
                            ordered.add(all.get(i));
                        }
                    }
                    col.candidatesByRow.put(row, List.copyOf(ordered));
                    col.selectionReasons.put(row, s.reason());
                }
                AssayValue v = chosen.value();
                col.qualifiers[row] = (byte) v.qualifier().ordinal();
                col.values[row] = v.value();
                col.limits[row] = v.limit();
                col.missing[row] = (byte) v.missingReason().ordinal();
                col.methodIndex[row] = methodIdx.computeIfAbsent(chosen.method(), k -> {
                    methods.add(k);
                    return (short) (methods.size() - 1);
                });
            }
            return col;
        }
    }
}
