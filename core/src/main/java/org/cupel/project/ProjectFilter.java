package org.cupel.project;

import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Predicate;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.Batch;
import org.cupel.assay.MethodSelector;
import org.cupel.assay.MethodValue;
import org.cupel.assay.SampleTable;

/**
 * Narrows a project to some of its batches, so that every analysis and the report see only the samples
 * under review. Nothing is recomputed: rows keep their values, every candidate result and the reason the
 * reported one was chosen.
 */
public final class ProjectFilter {
    private ProjectFilter() {
    }

    /**
     * The project restricted to batches that pass {@code keep}.
     *
     * <p>Input problems are kept when they concern a kept sample, no sample at all (file-level problems),
     * or a sample that never reached the sample table (its batch is unknown, so the reviewer must still
     * see it); problems of samples in batches left out are dropped. File row accounts describe the files
     * as read and are kept whole.
     */
    public static Project batches(Project project, Predicate<Batch> keep) {
        SampleTable t = project.samples();
        SampleTable.Builder b = SampleTable.builder();
        int[] newRowOf = new int[t.size()];
        Set<String> dropped = new HashSet<>();
        for (int row = 0; row < t.size(); row++) {
            if (keep.test(t.batch(row))) {
                newRowOf[row] = b.add(t.id(row), t.batch(row), t.position(row), t.role(row), t.reference(row),
                        t.source(row));
            } else {
                newRowOf[row] = -1;
                dropped.add(t.id(row));
            }
        }
        int n = b.size();
        Map<String, AnalyteColumn> columns = new LinkedHashMap<>();
        project.analytes().forEach((name, col) -> columns.put(name, copyRows(col, newRowOf, n)));
        ExceptionRegister issues = new ExceptionRegister();
        for (DataIssue i : project.exceptions().all()) {
            if (!dropped.contains(i.sampleId())) {
                issues.add(i);
            }
        }
        return new Project(project.name(), project.root(), project.config(), b.build(), columns, project.catalog(),
                issues, project.files(), project.units());
    }

    private static AnalyteColumn copyRows(AnalyteColumn col, int[] newRowOf, int newSize) {
        AnalyteColumn.Builder b = AnalyteColumn.builder(col.analyte());
        Map<List<MethodValue>, String> reasons = new HashMap<>();
        for (int row = 0; row < newRowOf.length; row++) {
            if (newRowOf[row] < 0) {
                continue;
            }
            List<MethodValue> candidates = col.candidates(row);
            for (MethodValue v : candidates) {
                b.add(newRowOf[row], v);
            }
            if (candidates.size() > 1) {
                reasons.put(candidates, col.selectionReason(row));
            }
        }
        // candidates() lists the reported result first, so choosing index 0 keeps every earlier choice.
        MethodSelector keepReported = (analyte, candidates) ->
                new MethodSelector.Selection(0, reasons.getOrDefault(candidates, "reported value kept"));
        return b.build(newSize, keepReported);
    }
}
