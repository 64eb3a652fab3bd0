package org.cupel.report;

/**
 * Column widths in points, given each column's narrowest width (its widest unbreakable piece, from
 * {@link PdfTableLayout}) and its full width (its widest line unwrapped). A column wants its full width up
 * to a cap of {@value #CAP} pt, so that one long text column does not starve the others; when the wanted
 * widths exceed the text width, the room above each column's minimum is shrunk in proportion, and never
 * below it; when they leave room, it goes to the capped (long-text) columns, so that they wrap less.
 */
final class PdfTableWidths {
    private static final float CAP = 170f;

    private PdfTableWidths() {
    }

    /** The widths; their sum is at most {@code available} whenever the minimums fit in it. */
    static float[] of(float[] min, float[] full, float available) {
        int n = min.length;
        float[] want = new float[n];
        float[] whole = new float[n];
        for (int c = 0; c < n; c++) {
            whole[c] = Math.max(min[c], full[c]);
            want[c] = Math.max(min[c], Math.min(whole[c], CAP));
        }
        float total = PdfTableLayout.sum(want);
        float minTotal = PdfTableLayout.sum(min);
        if (total <= available) {
            return widenCapped(want, whole, available - total);
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
