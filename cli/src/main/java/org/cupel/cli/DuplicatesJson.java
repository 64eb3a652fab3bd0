package org.cupel.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cupel.duplicates.DuplicateReport;
import org.cupel.duplicates.DuplicateSetResult;
import org.cupel.duplicates.OutlierPair;
import org.cupel.duplicates.PairGroups;
import org.cupel.duplicates.PrecisionModelResult;

/**
 * The JSON document of {@code cupel duplicates}, in proportion to what a reader can use: each set lists its
 * first {@code flaggedLimit} flagged pairs (largest HARD first; below the relative threshold, largest |d| first)
 * with the count of all of them, and the Thompson–Howarth group points are listed in full up to
 * {@link #GROUPS_LISTED} groups, beyond that every k-th group (k the smallest step that keeps the list within the
 * limit), so that a million pairs do not print 90,909 group points. Everything else is the records as they are.
 */
final class DuplicatesJson {
    /** Group points listed in full up to this many groups. */
    static final int GROUPS_LISTED = 1000;

    private DuplicatesJson() {
    }

    /**
     * @param flaggedCsv where every flagged pair was written, or null when nowhere
     */
    static Map<String, Object> of(String input, List<DuplicateReport> reports, List<String> issues, int flaggedLimit,
                                  String flaggedCsv) {
        Map<String, Object> doc = new LinkedHashMap<>();
        doc.put("input", input);
        List<Object> analytes = new ArrayList<>();
        for (DuplicateReport r : reports) {
            Map<String, Object> a = new LinkedHashMap<>();
            a.put("analyte", r.analyte());
            a.put("unit", r.unit());
            a.put("settings", r.settings());
            a.put("detectionLimits", r.detectionLimits());
            a.put("orphans", r.orphans());
            List<Object> sets = new ArrayList<>();
            for (DuplicateSetResult s : r.sets()) {
                sets.add(set(s, flaggedLimit, flaggedCsv));
            }
            a.put("sets", sets);
            analytes.add(a);
        }
        doc.put("analytes", analytes);
        doc.put("inputIssues", issues);
        return doc;
    }

    private static Map<String, Object> set(DuplicateSetResult s, int flaggedLimit, String flaggedCsv) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("analyte", s.analyte());
        m.put("unit", s.unit());
        m.put("type", s.type());
        m.put("precision", s.precision());
        m.put("model", model(s.model()));
        m.put("bias", s.bias());
        m.put("outliers", first(s.outliers(), flaggedLimit));
        m.put("outliersTotal", s.outliers().size());
        m.put("outliersBelowRelativeThreshold", first(s.outliersBelowRelativeThreshold(), flaggedLimit));
        m.put("outliersBelowRelativeThresholdTotal", s.outliersBelowRelativeThreshold().size());
        m.put("outliersNote", flaggedNote(s, flaggedLimit, flaggedCsv));
        m.put("batches", s.batches());
        return m;
    }

    /** Empty when every flagged pair is listed; otherwise how many are and where the rest are. */
    static String flaggedNote(DuplicateSetResult s, int flaggedLimit, String flaggedCsv) {
        int all = s.outliers().size();
        int low = s.outliersBelowRelativeThreshold().size();
        if (all <= flaggedLimit && low <= flaggedLimit) {
            return "";
        }
        String rest = flaggedCsv == null ? "; --flagged-csv FILE writes them all"
                : "; all of them are in " + flaggedCsv;
        return "the first " + flaggedLimit + " of " + all + " flagged pairs (largest HARD first) and of " + low
                + " below the relative threshold (largest |d| first) are listed (--flagged-limit)" + rest;
    }

    private static List<OutlierPair> first(List<OutlierPair> pairs, int limit) {
        return pairs.subList(0, Math.min(limit, pairs.size()));
    }

    private static Map<String, Object> model(PrecisionModelResult r) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("note", r.note());
        m.put("usedPairs", r.usedPairs());
        m.put("groups", r.groups() == null ? null : groups(r.groups()));
        m.put("thompsonHowarth", r.thompsonHowarth());
        m.put("rmsRegression", r.rmsRegression());
        m.put("line90", r.line90());
        m.put("line99", r.line99());
        m.put("atGrades", r.atGrades());
        m.put("fitNote", r.fitNote());
        return m;
    }

    /**
     * The group points: all of them up to {@link #GROUPS_LISTED} groups, else groups 0, k, 2k, ... with
     * {@code listedEvery} = k; {@code count} is the number of groups either way.
     */
    static Map<String, Object> groups(PairGroups g) {
        int n = g.groups();
        int every = Math.max(1, (n + GROUPS_LISTED - 1) / GROUPS_LISTED);
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("groupSize", g.groupSize());
        m.put("count", n);
        m.put("listedEvery", every);
        m.put("means", everyKth(g.means(), every));
        m.put("medianAbsDiff", everyKth(g.medianAbsDiff(), every));
        m.put("rmsSd", everyKth(g.rmsSd(), every));
        m.put("dropped", g.dropped());
        m.put("droppedFromMean", g.droppedFromMean());
        return m;
    }

    private static double[] everyKth(double[] values, int k) {
        if (k == 1) {
            return values;
        }
        double[] out = new double[(values.length + k - 1) / k];
        for (int i = 0; i < out.length; i++) {
            out[i] = values[i * k];
        }
        return out;
    }
}
