package org.cupel.ingest;

import org.cupel.assay.AssayValue;
import org.cupel.project.DataIssue;

/**
 * The outcome of reading one analyte cell.
 *
 * @param value the value, or null when the cell cannot be used (then {@code issue} says why)
 * @param issue null when the cell read cleanly; a warning when {@code value} is present; an exclusion when
 *     {@code value} is null
 */
public record ParsedValue(AssayValue value, DataIssue issue) {

    public boolean usable() {
        return value != null;
    }
}
