package org.cupel.report;

import com.lowagie.text.pdf.PdfPTable;
import java.util.Arrays;

/**
 * A PDF table that lays out its rows once. OpenPDF recomputes the height of every row of a table, by
 * laying out the text of every cell, each time the table continues on a new page
 * ({@code ColumnText.goComposite} calls {@code calculateHeights(true)} per page), so a table of n rows
 * over p pages costs n × p cell layouts: for the 500-row tables of a million-sample project about twelve
 * times the work of one pass, and most of the time spent writing the PDF. The heights depend only on the
 * rows and the column widths, so while neither has changed the heights already measured are reused;
 * the pages come out the same.
 */
final class PdfMeasuredTable extends PdfPTable {
    private int measuredRows = -1;
    private float[] measuredWidths;
    private float measuredHeight;

    PdfMeasuredTable(int columns) {
        super(columns);
    }

    @Override
    public float calculateHeights(boolean firstPass) {
        if (firstPass && measuredRows == rows.size() && Arrays.equals(measuredWidths, absoluteWidths)) {
            totalHeight = measuredHeight;
            return measuredHeight;
        }
        float height = super.calculateHeights(firstPass);
        if (firstPass && totalWidth > 0) {
            measuredRows = rows.size();
            measuredWidths = absoluteWidths.clone();
            measuredHeight = height;
        }
        return height;
    }
}
