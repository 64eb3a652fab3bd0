package org.cupel.project;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.TreeSet;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.Batch;
import org.cupel.assay.QcRole;
import org.cupel.assay.Qualifier;
import org.cupel.assay.SampleTable;
import org.cupel.units.UnitChoice;

/**
 * What a project holds, counted once for the scope of a report: the period covered, the batches and
 * labs, each analyte's methods and detection limits, and the number of samples in each QC role.
 *
 * @param name project name
 * @param firstReported earliest batch report date; empty when no batch has a date
 * @param lastReported latest batch report date; empty when no batch has a date
 * @param batches one line per batch, in the order first read
 * @param labs distinct lab names, sorted; unnamed labs are left out
 * @param analytes one line per analyte, in project order
 * @param samplesByRole sample count for every QC role (zero included), in {@link QcRole} order
 * @param samples total number of samples
 * @param undatedBatches batches without a report date
 * @param units each analyte's reporting unit and why it was chosen (empty for a project built in memory)
 */
public record ProjectSummary(String name, Optional<LocalDate> firstReported, Optional<LocalDate> lastReported,
                             List<BatchCount> batches, List<String> labs, List<AnalyteSummary> analytes,
                             Map<QcRole, Integer> samplesByRole, int samples, int undatedBatches,
                             List<UnitChoice> units) {

    public ProjectSummary {
        units = List.copyOf(units);
        batches = List.copyOf(batches);
        labs = List.copyOf(labs);
        analytes = List.copyOf(analytes);
        samplesByRole = Collections.unmodifiableMap(new EnumMap<>(samplesByRole));
    }

    /**
     * One batch and its samples by role.
     *
     * @param batch the batch
     * @param samplesByRole sample count for every QC role (zero included)
     * @param samples total samples in the batch
     */
    public record BatchCount(Batch batch, Map<QcRole, Integer> samplesByRole, int samples) {
        public BatchCount {
            samplesByRole = Collections.unmodifiableMap(new EnumMap<>(samplesByRole));
        }
    }

    /**
     * One analyte: its unit, the methods of its reported values, and the detection limits met.
     *
     * @param name analyte name
     * @param unit unit symbol of the analyte's values
     * @param reportedByMethod reported (non-missing) values per method, in first-seen order; the empty
     *     string stands for results whose file named no method
     * @param detectionLimitsByMethod distinct detection limits per method, ascending, from detected and
     *     below-detection values that carry a limit (upper limits of over-range values are not detection
     *     limits and are left out)
     * @param belowDetection values reported below detection
     * @param missing rows without a value
     */
    public record AnalyteSummary(String name, String unit, Map<String, Integer> reportedByMethod,
                                 Map<String, List<Double>> detectionLimitsByMethod, int belowDetection,
                                 int missing) {
        public AnalyteSummary {
            reportedByMethod = Collections.unmodifiableMap(new LinkedHashMap<>(reportedByMethod));
            Map<String, List<Double>> copy = new LinkedHashMap<>();
            detectionLimitsByMethod.forEach((k, v) -> copy.put(k, List.copyOf(v)));
            detectionLimitsByMethod = Collections.unmodifiableMap(copy);
        }
    }

    /** Counts everything in one pass over the sample table and one pass per analyte column. */
    public static ProjectSummary of(Project project) {
        SampleTable t = project.samples();
        List<Batch> all = t.batches();
        int[][] byBatchRole = new int[all.size()][QcRole.values().length];
        for (int row = 0; row < t.size(); row++) {
            byBatchRole[t.batchIndex(row)][t.role(row).ordinal()]++;
        }
        List<BatchCount> batches = new ArrayList<>();
        int[] totals = new int[QcRole.values().length];
        for (int b = 0; b < all.size(); b++) {
            int n = 0;
            for (int r = 0; r < totals.length; r++) {
                totals[r] += byBatchRole[b][r];
                n += byBatchRole[b][r];
            }
            batches.add(new BatchCount(all.get(b), roleMap(byBatchRole[b]), n));
        }
        TreeSet<String> labs = new TreeSet<>();
        LocalDate first = null;
        LocalDate last = null;
        int undated = 0;
        for (Batch b : all) {
            if (!b.lab().isBlank()) {
                labs.add(b.lab());
            }
            LocalDate d = b.reported();
            if (d == null) {
                undated++;
                continue;
            }
            first = first == null || d.isBefore(first) ? d : first;
            last = last == null || d.isAfter(last) ? d : last;
        }
        List<AnalyteSummary> analytes = new ArrayList<>();
        for (AnalyteColumn c : project.analytes().values()) {
            analytes.add(summarise(c));
        }
        return new ProjectSummary(project.name(), Optional.ofNullable(first), Optional.ofNullable(last), batches,
                new ArrayList<>(labs), analytes, roleMap(totals), t.size(), undated,
                List.copyOf(project.units().values()));
    }

    private static Map<QcRole, Integer> roleMap(int[] counts) {
        Map<QcRole, Integer> m = new EnumMap<>(QcRole.class);
        for (QcRole r : QcRole.values()) {
            m.put(r, counts[r.ordinal()]);
        }
        return m;
    }

    private static AnalyteSummary summarise(AnalyteColumn c) {
        Map<String, TreeSet<Double>> limits = new LinkedHashMap<>();
        int below = 0;
        int missing = 0;
        for (int row = 0; row < c.size(); row++) {
            Qualifier q = c.qualifier(row);
            if (q == Qualifier.MISSING) {
                missing++;
                continue;
            }
            if (q == Qualifier.BELOW_DETECTION) {
                below++;
            }
            double dl = c.limit(row);
            if (q != Qualifier.ABOVE_UPPER_LIMIT && Double.isFinite(dl)) {
                limits.computeIfAbsent(c.method(row), k -> new TreeSet<>()).add(dl);
            }
        }
        Map<String, List<Double>> dl = new TreeMap<>();
        limits.forEach((k, v) -> dl.put(k, new ArrayList<>(v)));
        return new AnalyteSummary(c.analyte().name(), c.analyte().unit().symbol(), c.reportedMethodCounts(), dl,
                below, missing);
    }
}
