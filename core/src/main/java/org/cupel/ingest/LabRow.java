package org.cupel.ingest;

import java.util.List;
import org.cupel.assay.Batch;
import org.cupel.assay.MethodValue;
import org.cupel.assay.QcRole;
import org.cupel.assay.SourceLocation;
import org.cupel.units.GradeUnit;

/**
 * One sample row of a lab file with its usable results, in the file's units.
 *
 * @param role the role the lab file gives (a role column, or a repeat marker on the ID); null when it says
 *     nothing, so the register decides
 * @param reference CRM code or original ID given with {@code role}, else empty
 */
public record LabRow(String sampleId, Batch batch, int position, QcRole role, String reference,
                     SourceLocation source, List<Result> results) {

    public LabRow {
        reference = reference == null ? "" : reference;
        results = List.copyOf(results);
    }

    /** One usable cell: analyte, the column's unit, and the value with its method and cell. */
    public record Result(String analyte, GradeUnit unit, MethodValue value) {
    }
}
