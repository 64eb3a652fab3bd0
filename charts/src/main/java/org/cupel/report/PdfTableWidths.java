package org.cupel.report;

import com.lowagie.text.pdf.BaseFont;

/**
 * Column widths in points from the printed width of the text: never narrower than the longest word of
 * the header or a cell up to a cap (so IDs and headers do not break mid-word), otherwise as wide as the longest cell up to a cap; when
 * the total exceeds the text width, the room above each column's minimum is shrunk in proportion.
 */
final class PdfTableWidths {
    private static final float PADDING = 8f;
    private static final float CAP = 170f;
    /** Unbreakable tokens (IDs, file names) longer than this may wrap. */
    private static final float WORD_CAP = 62f;

    private PdfTableWidths() {
    }

    static float[] of(ReportTable t, BaseFont bold, BaseFont regular, float size, float available) {
        int n = t.columns().size();
        float[] min = new float[n];
        float[] want = new float[n];
        float[] full = new float[n];
        int rows = Math.min(t.rows().size(), TableLimit.SHOWN);
        for (int c = 0; c < n; c++) {
            String header = t.columns().get(c);
            for (String word : header.split("\\s+")) {
                min[c] = Math.max(min[c], bold.getWidthPoint(word, size) + PADDING);
            }
            float longest = bold.getWidthPoint(header, size) + PADDING;
            float word = 0;
            for (int r = 0; r < rows; r++) {
                String cell = t.rows().get(r).get(c);
                longest = Math.max(longest, regular.getWidthPoint(cell, size) + PADDING);
                for (String w : cell.split("\\s+")) {
                    word = Math.max(word, regular.getWidthPoint(w, size));
                }
            }
            min[c] = Math.max(min[c], Math.min(word, WORD_CAP) + PADDING);
            full[c] = Math.max(min[c], longest);
            want[c] = Math.max(min[c], Math.min(longest, CAP));
        }
        float total = 0;
        float minTotal = 0;
        for (int c = 0; c < n; c++) {
            total += want[c];
            minTotal += min[c];
        }
        if (total <= available) {
            return widenCapped(want, full, available - total);
        }
        if (total <= minTotal) {
            return want;
        }
        float keep = Math.max(0f, (available - minTotal) / (total - minTotal));
        float[] out = new float[n];
        for (int c = 0; c < n; c++) {
            out[c] = min[c] + (want[c] - min[c]) * keep;
        }
        return out;
    }

    /** Spare width goes to the capped (long-text) columns, in proportion to what they lack, so they wrap less. */
    private static float[] widenCapped(float[] want, float[] full, float spare) {
        float lacking = 0;
        for (int c = 0; c < want.length; c++) {
            lacking += full[c] - want[c];
        }
        if (lacking <= 0) {
            return want;
        }
        float share = Math.min(1f, spare / lacking);
        float[] out = new float[want.length];
        for (int c = 0; c < want.length; c++) {
            out[c] = want[c] + (full[c] - want[c]) * share;
        }
        return out;
    }
}
