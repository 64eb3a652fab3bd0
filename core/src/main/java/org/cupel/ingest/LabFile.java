package org.cupel.ingest;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.MethodValue;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;

/**
 * One lab result file, read: its batches, analyte columns, the rows kept and the problems found.
 *
 * @param file file name used in messages
 * @param batches batches in the order first seen
 * @param columns the analyte columns found
 * @param ignoredColumns headers that are neither known columns nor analytes (listed by {@code cupel check})
 * @param table rows kept for the analyses, column-wise
 * @param issues problems found, rows excluded and cells left out
 * @param excludedIds sample IDs of rows excluded here (so the register does not call them "not received")
 * @param rowsRead data rows below the header
 * @param rowsExcluded rows listed as exceptions instead of being kept
 */
record LabFile(String file, List<Batch> batches, List<LabColumn> columns, List<String> ignoredColumns,
                      LabRows table, List<DataIssue> issues, Set<String> excludedIds, long rowsRead,
                      long rowsExcluded) {
    public LabFile {
        batches = List.copyOf(batches);
        columns = List.copyOf(columns);
        ignoredColumns = List.copyOf(ignoredColumns);
        issues = List.copyOf(issues);
        excludedIds = Set.copyOf(excludedIds);
    }

    /** The rows kept, one object per row and result (for inspection; the join reads {@link #table()}). */
    public List<LabRow> rows() {
        List<LabRow> out = new ArrayList<>(table.size());
        for (int r = 0; r < table.size(); r++) {
            SourceLocation at = new SourceLocation(file, table.line(r), 0);
            List<LabRow.Result> results = new ArrayList<>();
            for (int c = 0; c < columns.size(); c++) {
                if (table.hasResult(r, c)) {
                    AnalyteHeader a = columns.get(c).analyte();
                    AssayValue v = new AssayValue(table.qualifier(r, c), table.value(r, c), table.limit(r, c),
                            table.missingReason(r, c), table.decimals(r, c));
                    results.add(new LabRow.Result(a.analyte(), a.unit(), new MethodValue(a.method(), v, at)));
                }
            }
            out.add(new LabRow(table.sampleId(r), batches.get(table.batch(r)), table.position(r), table.role(r),
                    table.reference(r), at, results));
        }
        return out;
    }
}
