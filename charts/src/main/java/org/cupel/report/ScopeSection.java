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
        String units = unitsText(s);
        if (!units.isEmpty()) {
            blocks.add(new ReportBlock.Paragraph(units));
        }
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

    /**
     * The unit of each analyte and why, when any analyte's files disagree or a unit was set: values are
     * shown in the unit word of the lab files (g/t when they say g/t), so a reader must learn where that
     * does not hold for every file.
     */
    static String unitsText(ProjectSummary s) {
        boolean explain = s.units().stream().anyMatch(u -> u.filesDisagree()
                || u.basis() == org.cupel.units.UnitChoice.Basis.CONFIGURED);
        if (!explain) {
            return s.units().isEmpty() ? "" : "Units: every analyte is reported in the unit its lab files use.";
        }
        return "Units: " + s.units().stream().map(org.cupel.units.UnitChoice::sentence)
                .collect(Collectors.joining(" "));
    }

    private static ReportTable roles(ProjectSummary s) {
        List<List<Cell>> rows = new ArrayList<>();
        for (QcRole r : QcRole.values()) {
            rows.add(List.of(Cell.text(r.label()), Cell.count(s.samplesByRole().get(r))));
        }
        rows.add(List.of(Cell.text("all samples"), Cell.count(s.samples())));
        return ReportTable.typed("scope-samples-by-role", "Samples by QC role", List.of(ReportColumn.text("QC role",
                        "qc_role"), ReportColumn.count("Samples", "samples")), rows,
                "Roles as given in the sample register; insertion rates against targets follow in their own table.");
    }

    private static ReportTable batches(ProjectSummary s) {
        List<List<Cell>> rows = new ArrayList<>();
        for (ProjectSummary.BatchCount b : s.batches()) {
            rows.add(List.of(Cell.text(b.batch().id()), Cell.text(b.batch().lab()),
                    Cell.text(b.batch().reported() == null ? "unknown" : b.batch().reported().toString()),
                    Cell.text(b.batch().file()), Cell.count(b.samples())));
        }
        return ReportTable.typed("scope-batches", "Batches", List.of(ReportColumn.text("Batch", "batch"),
                        ReportColumn.text("Lab", "lab"), ReportColumn.text("Reported", "reported"),
                        ReportColumn.text("File", "file"), ReportColumn.count("Samples", "samples")),
                rows, "In the order the batches were read.");
    }

    private static ReportTable batchRoles(ProjectSummary s) {
        List<QcRole> shown = new ArrayList<>();
        for (QcRole r : QcRole.values()) {
            if (s.samplesByRole().get(r) > 0) {
                shown.add(r);
            }
        }
        List<ReportColumn> cols = new ArrayList<>(List.of(ReportColumn.text("Batch", "batch"),
                ReportColumn.text("File", "file")));
        shown.forEach(r -> cols.add(ReportColumn.count(capitalise(r.label()), r.name().toLowerCase(java.util.Locale.ROOT))));
        List<List<Cell>> rows = new ArrayList<>();
        for (ProjectSummary.BatchCount b : s.batches()) {
            List<Cell> row = new ArrayList<>(List.of(Cell.text(b.batch().id()), Cell.text(b.batch().file())));
            shown.forEach(r -> row.add(Cell.count(b.samplesByRole().get(r))));
            rows.add(row);
        }
        return ReportTable.typed("scope-batch-roles", "Samples per batch by QC role", cols, rows,
                "Roles that occur in the project; a batch is one lab job as read from one file.");
    }

    private static ReportTable analytes(ProjectSummary s) {
        List<List<Cell>> rows = new ArrayList<>();
        for (ProjectSummary.AnalyteSummary a : s.analytes()) {
            if (a.reportedByMethod().isEmpty()) {
                rows.add(List.of(Cell.text(a.name()), Cell.text(a.unit()), Cell.text("none"), Cell.count(0),
                        Cell.text(""), Cell.count(a.belowDetection()), Cell.count(a.missing())));
            }
            boolean first = true;
            for (Map.Entry<String, Integer> m : a.reportedByMethod().entrySet()) {
                List<Double> dl = a.detectionLimitsByMethod().getOrDefault(m.getKey(), List.of());
                rows.add(List.of(Cell.text(a.name()), Cell.text(a.unit()),
                        Cell.text(m.getKey().isEmpty() ? "not named" : m.getKey()), Cell.count(m.getValue()),
                        Cell.text(dl.isEmpty() ? "not given"
                                : dl.stream().map(Numbers::compact).collect(Collectors.joining(", "))),
                        first ? Cell.count(a.belowDetection()) : Cell.blank(),
                        first ? Cell.count(a.missing()) : Cell.blank()));
                first = false;
            }
        }
        return ReportTable.typed("scope-analytes", "Analytes, methods and detection limits",
                List.of(ReportColumn.text("Analyte", "analyte"), ReportColumn.text("Unit", "unit"),
                        ReportColumn.text("Method", "method"), ReportColumn.count("Reported values", "reported_values"),
                        ReportColumn.text("Detection limits", "detection_limits"),
                        ReportColumn.count("Below detection", "below_detection"),
                        ReportColumn.count("No value", "no_value")),
                rows, "Detection limits as reported by the lab with each value, in the analyte's unit. "
                        + "Below detection and no-value counts are per analyte, on its first line.");
    }

    private static String capitalise(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
