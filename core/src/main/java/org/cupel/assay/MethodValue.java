package org.cupel.assay;

/** One result for one analyte of one sample by one analytical method (FA-AAS, FA-GRAV, ...). */
public record MethodValue(String method, AssayValue value, SourceLocation source) {
    public MethodValue {
        method = method == null ? "" : method;
    }
}
