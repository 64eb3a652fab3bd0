package org.cupel.ingest;

import java.util.List;
import org.cupel.assay.Batch;
import org.cupel.project.DataIssue;

/**
 * One lab result file, read: its batches, analyte columns, the rows kept and the problems found.
 *
 * @param file file name used in messages
 * @param batches batches in the order first seen
 * @param columns the analyte columns found
 * @param ignoredColumns headers that are neither known columns nor analytes (listed by {@code cupel check})
 * @param rows rows kept for the analyses
 * @param issues problems found, rows excluded and cells left out
 * @param excludedIds sample IDs of rows excluded here (so the register does not call them "not received")
 * @param rowsRead data rows below the header
 * @param rowsExcluded rows listed as exceptions instead of being kept
 */
public record LabFile(String file, List<Batch> batches, List<LabColumn> columns, List<String> ignoredColumns,
                      List<LabRow> rows, List<DataIssue> issues, java.util.Set<String> excludedIds, long rowsRead,
                      long rowsExcluded) {
    public LabFile {
        batches = List.copyOf(batches);
        columns = List.copyOf(columns);
        ignoredColumns = List.copyOf(ignoredColumns);
        rows = List.copyOf(rows);
        issues = List.copyOf(issues);
        excludedIds = java.util.Set.copyOf(excludedIds);
    }
}
