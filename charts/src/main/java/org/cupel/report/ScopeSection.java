package org.cupel.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.cupel.assay.Numbers;
import org.cupel.assay.QcRole;
import org.cupel.project.ProjectSummary;

/**
 * Section 1, "Scope": what the report covers. Formats a {@link ProjectSummary}; counts nothing itself.
 */
public final class ScopeSection {
    public static final String ID = "scope";

    private ScopeSection() {
    }

    public static ReportSection build(ProjectSummary s, String selection) {
        List<ReportBlock> blocks = new ArrayList<>();
        blocks.add(new ReportBlock.Paragraph(overview(s, selection)));
        blocks.add(new ReportBlock.Table(roles(s)));
        blocks.add(new ReportBlock.Table(batches(s)));
        blocks.add(new ReportBlock.Table(batchRoles(s)));
        blocks.add(new ReportBlock.Table(analytes(s)));
        Map<String, Object> h = new LinkedHashMap<>();
        h.put("samples", s.samples());
        h.put("batches", s.batches().size());
        h.put("labs", s.labs().size());
        h.put("analytes", s.analytes().size());
        h.put("firstReported", s.firstReported().map(Object::toString).orElse("unknown"));
        h.put("lastReported", s.lastReported().map(Object::toString).orElse("unknown"));
        h.put("undatedBatches", s.undatedBatches());
        Map<String, Object> byRole = new LinkedHashMap<>();
        s.samplesByRole().forEach((role, n) -> byRole.put(role.name().toLowerCase(java.util.Locale.ROOT), n));
        h.put("samplesByRole", byRole);
        return new ReportSection(ID, "Scope", blocks, h);
    }

    private static String overview(ProjectSummary s, String selection) {
        String period = s.firstReported().isPresent()
                ? "reported from " + s.firstReported().get() + " to " + s.lastReported().get()
                : "with no report dates";
        String undated = s.undatedBatches() == 0 ? "" : " (" + s.undatedBatches() + " without a report date)";
        String labs = s.labs().isEmpty() ? "no lab named" : String.join(", ", s.labs());
        return String.format(java.util.Locale.US, "This appendix covers %s of project %s: %,d samples in %d batches%s, "
                + "%s; labs: %s; analytes: %s.", selection, s.name(), s.samples(), s.batches().size(), undated,
                period, labs, s.analytes().stream().map(a -> a.name() + " (" + a.unit() + ")")
                        .collect(Collectors.joining(", ")));
    }

    private static ReportTable roles(ProjectSummary s) {
        List<List<String>> rows = new ArrayList<>();
        for (QcRole r : QcRole.values()) {
            rows.add(List.of(r.label(), count(s.samplesByRole().get(r))));
        }
        rows.add(List.of("all samples", count(s.samples())));
        return new ReportTable("scope-samples-by-role", "Samples by QC role", List.of("QC role", "Samples"), rows,
                "Roles as given in the sample register; insertion rates against targets follow in their own table.");
    }

    private static ReportTable batches(ProjectSummary s) {
        List<List<String>> rows = new ArrayList<>();
        for (ProjectSummary.BatchCount b : s.batches()) {
            rows.add(List.of(b.batch().id(), b.batch().lab(),
                    b.batch().reported() == null ? "unknown" : b.batch().reported().toString(), b.batch().file(),
                    count(b.samples())));
        }
        return new ReportTable("scope-batches", "Batches", List.of("Batch", "Lab", "Reported", "File", "Samples"),
                rows, "In the order the batches were read.");
    }

    private static ReportTable batchRoles(ProjectSummary s) {
        List<QcRole> shown = new ArrayList<>();
        for (QcRole r : QcRole.values()) {
            if (s.samplesByRole().get(r) > 0) {
                shown.add(r);
            }
        }
        List<String> cols = new ArrayList<>(List.of("Batch", "File"));
        shown.forEach(r -> cols.add(capitalise(r.label())));
        List<List<String>> rows = new ArrayList<>();
        for (ProjectSummary.BatchCount b : s.batches()) {
            List<String> row = new ArrayList<>(List.of(b.batch().id(), b.batch().file()));
            shown.forEach(r -> row.add(count(b.samplesByRole().get(r))));
            rows.add(row);
        }
        return new ReportTable("scope-batch-roles", "Samples per batch by QC role", cols, rows,
                "Roles that occur in the project; a batch is one lab job as read from one file.");
    }

    private static ReportTable analytes(ProjectSummary s) {
        List<List<String>> rows = new ArrayList<>();
        for (ProjectSummary.AnalyteSummary a : s.analytes()) {
            if (a.reportedByMethod().isEmpty()) {
                rows.add(List.of(a.name(), a.unit(), "none", "0", "", count(a.belowDetection()), count(a.missing())));
            }
            boolean first = true;
            for (Map.Entry<String, Integer> m : a.reportedByMethod().entrySet()) {
                List<Double> dl = a.detectionLimitsByMethod().getOrDefault(m.getKey(), List.of());
                rows.add(List.of(a.name(), a.unit(), m.getKey().isEmpty() ? "not named" : m.getKey(),
                        count(m.getValue()), dl.isEmpty() ? "not given"
                                : dl.stream().map(Numbers::compact).collect(Collectors.joining(", ")),
                        first ? count(a.belowDetection()) : "", first ? count(a.missing()) : ""));
                first = false;
            }
        }
        return new ReportTable("scope-analytes", "Analytes, methods and detection limits",
                List.of("Analyte", "Unit", "Method", "Reported values", "Detection limits", "Below detection",
                        "No value"),
                rows, "Detection limits as reported by the lab with each value, in the analyte's unit. "
                        + "Below detection and no-value counts are per analyte, on its first line.");
    }

    private static String count(int n) {
        return String.format(java.util.Locale.US, "%,d", n);
    }

    private static String capitalise(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
