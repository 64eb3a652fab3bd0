package org.cupel.ingest;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.QcRole;
import org.cupel.assay.Qualifier;
import org.cupel.project.FileAccount;
import org.cupel.project.Project;

/**
 * What a project holds, for {@code cupel check}: the row accounting of each file, samples per QC role,
 * and per analyte its unit, methods, detection limits seen and counts by qualifier.
 */
public record ProjectSummary(String project, int samples, int batches, List<FileAccount> files,
                             Map<String, Integer> roles, List<AnalyteSummary> analytes) {

    /**
     * @param methods reported values per method ("" when the file named none)
     * @param detectionLimits distinct limits of detected and below-detection values, ascending
     * @param qualifiers reported values per qualifier
     * @param rowsWithSeveralResults samples with more than one result (re-assays, other finishes)
     */
    public record AnalyteSummary(String analyte, String unit, Map<String, Integer> methods,
                                 List<Double> detectionLimits, Map<String, Integer> qualifiers,
                                 int rowsWithSeveralResults) {
    }

    public static ProjectSummary of(Project p) {
        Map<String, Integer> roles = new LinkedHashMap<>();
        for (QcRole r : QcRole.values()) {
            int n = p.samples().rowsWithRole(r).length;
            if (n > 0) {
                roles.put(r.label(), n);
            }
        }
        List<AnalyteSummary> analytes = new ArrayList<>();
        p.analytes().values().forEach(c -> analytes.add(summarise(c)));
        return new ProjectSummary(p.name(), p.samples().size(), p.samples().batches().size(), p.files(), roles,
                analytes);
    }

    private static AnalyteSummary summarise(AnalyteColumn c) {
        TreeSet<Double> limits = new TreeSet<>();
        Map<Qualifier, Integer> q = new EnumMap<>(Qualifier.class);
        for (int r = 0; r < c.size(); r++) {
            Qualifier qual = c.qualifier(r);
            q.merge(qual, 1, Integer::sum);
            double limit = c.limit(r);
            if (Double.isFinite(limit) && qual != Qualifier.ABOVE_UPPER_LIMIT) {
                limits.add(limit);
            }
        }
        Map<String, Integer> qualifiers = new LinkedHashMap<>();
        q.forEach((k, v) -> qualifiers.put(k.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' '), v));
        return new AnalyteSummary(c.analyte().name(), c.analyte().unit().symbol(), c.reportedMethodCounts(),
                List.copyOf(limits), qualifiers, c.rowsWithSeveralResults().length);
    }
}
