package org.cupel.ingest;

/**
 * An analyte column of a lab file.
 *
 * @param index 0-based column index in the file
 * @param header the column header as written
 * @param analyte what the header says
 * @param detectionLimit the limit stated for the column (a detection-limit row under the header, else
 *     {@code ingest.detectionLimits}), in the column's unit; NaN when unknown
 */
record LabColumn(int index, String header, AnalyteHeader analyte, double detectionLimit) {
}
