package org.cupel.demo;

/**
 * How one lab file is written: the conventions vary from batch to batch as they do in real deliveries.
 *
 * @param delimiter      field delimiter
 * @param byteOrderMark  start the file with a UTF-8 byte-order mark
 * @param crlf           Windows line endings
 * @param negativeBelowDetection write below-detection values as {@code -0.005} instead of {@code <0.005}
 * @param spacedHeaders  {@code Au g/t FA-AAS} instead of {@code Au_g/t_FA-AAS}
 * @param goldUnit       unit text of the gold column ({@code ppm} or {@code g/t}, the same quantity)
 * @param extension      file-name extension
 */
record LabFileStyle(char delimiter, boolean byteOrderMark, boolean crlf, boolean negativeBelowDetection,
                    boolean spacedHeaders, String goldUnit, String extension) {

    /** The batch delivered as a tab-separated text file. */
    static final int TSV_BATCH = 6;
    /** The batch delivered with a byte-order mark and Windows line endings. */
    static final int BOM_CRLF_BATCH = 11;

    /** Plain CSV: comma, LF, {@code <DL}, underscore headers. */
    static final LabFileStyle PLAIN = new LabFileStyle(',', false, false, false, false, "ppm", "csv");

    /** The style of primary-lab batch {@code b} (0-based). */
    static LabFileStyle forBatch(int b) {
        boolean tsv = b == TSV_BATCH;
        boolean windows = b == BOM_CRLF_BATCH;
        return new LabFileStyle(tsv ? '\t' : ',', windows, windows, usesNegativeBelowDetection(b), tsv,
                b % 5 == 2 ? "g/t" : "ppm", tsv ? "tsv" : "csv");
    }

    /** Three batches in 25 write below-detection values as negative numbers. */
    static boolean usesNegativeBelowDetection(int b) {
        return b % 8 == 3;
    }

    String lineEnd() {
        return crlf ? "\r\n" : "\n";
    }
}
