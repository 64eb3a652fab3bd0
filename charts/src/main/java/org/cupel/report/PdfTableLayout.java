package org.cupel.report;

import com.lowagie.text.pdf.BaseFont;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * How a table is set on the page, decided as a typesetter would: no word of a header or a cell is broken
 * mid-word, and the table is made more compact in steps until it fits the text width.
 *
 * <ol>
 *   <li>Every column is at least as wide as its widest unbreakable piece ({@link TableBreaks#pieces}): each
 *       word of its header, and each word, number or ID of its cells.</li>
 *   <li>The type is {@value #TABLE_FONT} pt; tables of {@value #WIDE_TABLE_COLUMNS} or more columns start at
 *       {@value #WIDE_TABLE_FONT} pt, so that their cells wrap less on a portrait page.</li>
 *   <li>When the columns do not fit at a size, long identifiers (setting names, paths) may break where
 *       their parts join ({@link TableBreaks#IDENTIFIERS}); then the type goes down to
 *       {@value #WIDE_TABLE_FONT} pt, below which a table is hard to read in print; then the space between
 *       columns narrows from {@value #PADDING} pt each side of a cell to {@value #TIGHT_PADDING} pt.</li>
 *   <li>When even that does not fit, the table is printed in parts, one under the other, each repeating the
 *       key columns that name a row (the fewest leading columns whose values tell the rows apart, at most
 *       {@value #MAX_KEY_COLUMNS}), as a wide table is continued in a book; the columns are shared out so
 *       that the parts are about equally wide, and the caption of each part says which part it is.</li>
 * </ol>
 *
 * A page turned to landscape would also hold a wider table, but it changes the running head, the page frame
 * and the reading direction in the middle of a section; parts keep every page upright and still print a table
 * of any width. An unbreakable piece wider than {@value #LONGEST_PIECE_SHARE} of the text width (a long hash,
 * say) is the only text that may break between letters.
 *
 * @param size the type size in points
 * @param padding the space left and right of the text in each cell, in points
 * @param breaks where lines may end
 * @param parts the parts, each printed as a table of its own; one part for a table that fits
 */
record PdfTableLayout(float size, float padding, TableBreaks breaks, List<Part> parts) {
    static final float TABLE_FONT = 7.8f;
    static final float WIDE_TABLE_FONT = 6.6f;
    static final int WIDE_TABLE_COLUMNS = 8;
    static final float PADDING = 3f;
    static final float TIGHT_PADDING = 2f;
    /** Kept free in every column, so that a piece never meets the edge through rounding in OpenPDF's line fitting. */
    static final float SLACK = 1f;
    static final float LONGEST_PIECE_SHARE = 0.4f;
    static final int MAX_KEY_COLUMNS = 3;

    /**
     * One part of a table.
     *
     * @param columns indices of the table's columns in this part, key columns first
     * @param widths width of each, in points
     * @param keys how many of {@code columns} are key columns repeated from the first part (0 in the first)
     */
    record Part(int[] columns, float[] widths, int keys) {
    }

    /** One step of the ladder: a type size, a cell padding and where lines may end. */
    private record Setting(float size, float padding, TableBreaks breaks) {
    }

    static PdfTableLayout of(ReportTable t, BaseFont bold, BaseFont regular, float available) {
        ColumnMeasures m = ColumnMeasures.of(t, bold, regular);
        List<Setting> ladder = new ArrayList<>();
        if (t.columns().size() < WIDE_TABLE_COLUMNS) {
            ladder.add(new Setting(TABLE_FONT, PADDING, TableBreaks.WORDS));
            ladder.add(new Setting(TABLE_FONT, PADDING, TableBreaks.IDENTIFIERS));
        }
        ladder.add(new Setting(WIDE_TABLE_FONT, PADDING, TableBreaks.WORDS));
        ladder.add(new Setting(WIDE_TABLE_FONT, PADDING, TableBreaks.IDENTIFIERS));
        ladder.add(new Setting(WIDE_TABLE_FONT, TIGHT_PADDING, TableBreaks.IDENTIFIERS));
        for (Setting s : ladder) {
            float[] min = m.min(s, available);
            if (sum(min) <= available) {
                int[] all = range(0, t.columns().size());
                return new PdfTableLayout(s.size(), s.padding(), s.breaks(), List.of(part(m, s, all, 0, available)));
            }
        }
        return inParts(t, m, new Setting(WIDE_TABLE_FONT, PADDING, TableBreaks.IDENTIFIERS), available);
    }

    /** Whether the table is printed in more than one part. */
    boolean split() {
        return parts.size() > 1;
    }

    private static PdfTableLayout inParts(ReportTable t, ColumnMeasures m, Setting s, float available) {
        float[] min = m.min(s, available);
        int keys = keyColumns(t);
        while (keys > 1 && sum(min, 0, keys) > available / 2) {
            keys--;
        }
        float[] rest = Arrays.copyOfRange(min, keys, min.length);
        float room = available - sum(min, 0, keys);
        List<int[]> groups = pack(rest, balancedCapacity(rest, room));
        List<Part> parts = new ArrayList<>();
        for (int[] g : groups) {
            int[] columns = new int[keys + g[1] - g[0]];
            System.arraycopy(range(0, keys), 0, columns, 0, keys);
            System.arraycopy(range(keys + g[0], keys + g[1]), 0, columns, keys, g[1] - g[0]);
            parts.add(part(m, s, columns, parts.isEmpty() ? 0 : keys, available));
        }
        return new PdfTableLayout(s.size(), s.padding(), s.breaks(), parts);
    }

    /**
     * The smallest width per part that still needs no more parts than filling each part to {@code room} does:
     * packing to it shares the columns out evenly (the linear partition problem, solved by bisection on the
     * capacity, since the number of parts a greedy packing needs only falls as the capacity grows).
     */
    private static float balancedCapacity(float[] widths, float room) {
        int parts = pack(widths, room).size();
        float lo = 0;
        for (float w : widths) {
            lo = Math.max(lo, w);
        }
        float hi = room;
        for (int i = 0; i < 40 && hi - lo > 0.01f; i++) {
            float mid = (lo + hi) / 2;
            if (pack(widths, mid).size() <= parts) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return hi;
    }

    /** Consecutive runs {from, to} of columns, each as many as fit in {@code capacity}, at least one each. */
    private static List<int[]> pack(float[] widths, float capacity) {
        List<int[]> out = new ArrayList<>();
        int from = 0;
        while (from < widths.length) {
            int to = from + 1;
            float used = widths[from];
            while (to < widths.length && used + widths[to] <= capacity) {
                used += widths[to];
                to++;
            }
            out.add(new int[] {from, to});
            from = to;
        }
        return out;
    }

    private static Part part(ColumnMeasures m, Setting s, int[] columns, int keys, float available) {
        float[] allMin = m.min(s, available);
        float[] min = new float[columns.length];
        float[] full = new float[columns.length];
        for (int i = 0; i < columns.length; i++) {
            min[i] = allMin[columns[i]];
            full[i] = m.full(columns[i], s);
        }
        return new Part(columns, PdfTableWidths.of(min, full, available), keys);
    }

    /**
     * The fewest leading columns (at most {@value #MAX_KEY_COLUMNS}, and fewer than all) whose values together
     * tell the printed rows apart: the stub a reader needs to know which row a continued part continues. When
     * none does (rows that repeat), the first column.
     */
    static int keyColumns(ReportTable t) {
        List<List<String>> rows = t.rows().subList(0, Math.min(t.rows().size(), TableLimit.SHOWN));
        int most = Math.min(MAX_KEY_COLUMNS, t.columns().size() - 1);
        for (int k = 1; k <= most; k++) {
            Set<List<String>> seen = new HashSet<>();
            boolean unique = true;
            for (List<String> r : rows) {
                unique &= seen.add(r.subList(0, k));
            }
            if (unique) {
                return k;
            }
        }
        return 1;
    }

    private static int[] range(int from, int to) {
        int[] out = new int[to - from];
        for (int i = 0; i < out.length; i++) {
            out[i] = from + i;
        }
        return out;
    }

    static float sum(float[] w) {
        return sum(w, 0, w.length);
    }

    private static float sum(float[] w, int from, int to) {
        float s = 0;
        for (int i = from; i < to; i++) {
            s += w[i];
        }
        return s;
    }

    /**
     * Printed widths of each column at a type size of 1 pt (widths scale with the size): its widest
     * unbreakable piece in each mode, and its widest unwrapped line. Headers are bold, cells regular.
     */
    private record ColumnMeasures(float[] headerPiece, float[][] cellPiece, float[] full) {
        static ColumnMeasures of(ReportTable t, BaseFont bold, BaseFont regular) {
            int n = t.columns().size();
            int shown = Math.min(t.rows().size(), TableLimit.SHOWN);
            float[] header = new float[n];
            float[][] cell = new float[TableBreaks.values().length][n];
            float[] full = new float[n];
            for (int c = 0; c < n; c++) {
                String h = t.columns().get(c);
                header[c] = widest(TableBreaks.WORDS.pieces(h), bold);
                full[c] = bold.getWidthPoint(h, 1f);
                for (int r = 0; r < shown; r++) {
                    String v = TableBreaks.typeset(t.rows().get(r).get(c));
                    full[c] = Math.max(full[c], regular.getWidthPoint(v, 1f));
                    for (TableBreaks b : TableBreaks.values()) {
                        cell[b.ordinal()][c] = Math.max(cell[b.ordinal()][c], widest(b.pieces(v), regular));
                    }
                }
            }
            return new ColumnMeasures(header, cell, full);
        }

        private static float widest(List<String> pieces, BaseFont font) {
            float w = 0;
            for (String p : pieces) {
                w = Math.max(w, font.getWidthPoint(p, 1f));
            }
            return w;
        }

        /** The narrowest each column may be: its widest piece (capped) at the size, plus padding and slack. */
        float[] min(Setting s, float available) {
            float cap = LONGEST_PIECE_SHARE * available;
            float[] out = new float[headerPiece.length];
            for (int c = 0; c < out.length; c++) {
                float piece = Math.max(headerPiece[c], cellPiece[s.breaks().ordinal()][c]) * s.size();
                out[c] = Math.min(piece, cap) + 2 * s.padding() + SLACK;
            }
            return out;
        }

        float full(int column, Setting s) {
            return full[column] * s.size() + 2 * s.padding() + SLACK;
        }
    }
}
