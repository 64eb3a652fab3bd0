package org.cupel.ingest;

import org.cupel.units.GradeUnit;

/**
 * What an analyte column header says: {@code Au_g/t_FA-GRAV} is analyte Au, unit g/t, method FA-GRAV.
 *
 * @param method the analytical method, empty when the header names none
 */
public record AnalyteHeader(String analyte, GradeUnit unit, String method) {
    public AnalyteHeader {
        method = method == null ? "" : method;
    }
}
