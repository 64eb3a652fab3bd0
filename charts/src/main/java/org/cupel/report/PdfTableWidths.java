package org.cupel.report;

import java.util.List;

/** Relative column widths from the longest text in each column, bounded so no column starves or hogs. */
final class PdfTableWidths {
    private PdfTableWidths() {
    }

    static float[] of(ReportTable t) {
        int n = t.columns().size();
        float[] w = new float[n];
        for (int c = 0; c < n; c++) {
            int longest = longestWord(t.columns().get(c)) + 2;
            int rows = Math.min(t.rows().size(), TableLimit.SHOWN);
            for (int r = 0; r < rows; r++) {
                longest = Math.max(longest, t.rows().get(r).get(c).length());
            }
            w[c] = Math.max(4, Math.min(longest, 42));
        }
        return w;
    }

    private static int longestWord(String s) {
        int best = 0;
        for (String part : List.of(s.split("\\s+"))) {
            best = Math.max(best, part.length());
        }
        return best;
    }
}
