package org.cupel.report;

import org.cupel.charts.PngWriter;

/**
 * How the output folder is written.
 *
 * @param paper paper size of the PDF and of the Word copy
 * @param chartDpi resolution of {@code charts/*.png}: {@link PngWriter#PRINT_DPI} or
 *     {@link PngWriter#SCREEN_DPI}; the PDF always uses print resolution
 * @param force replace an existing output folder written by Cupel
 */
public record ReportOptions(PdfReport.Paper paper, int chartDpi, boolean force) {
    public static final ReportOptions DEFAULTS = new ReportOptions(PdfReport.Paper.A4, PngWriter.PRINT_DPI, false);

    public ReportOptions {
        if (chartDpi < 72 || chartDpi > 600) {
            throw new IllegalArgumentException("chart resolution must be 72 to 600 dpi, was " + chartDpi);
        }
    }
}
