package org.cupel.ingest;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * One record of a table as the readers scan it, reused from row to row: the trimmed cell texts live in
 * one shared character buffer as offset ranges, so reading a million rows creates a String only for
 * the cells a reader keeps (sample IDs, codes, problems), not for every cell. The buffer is the row's own,
 * or, for a record without quotes, the tokenizer's ({@link #borrow}), whose cells need no copying.
 */
final class CellRow {
    /** U+FEFF: a byte-order mark, or a zero-width no-break space; invisible, never part of a cell. */
    static final char BYTE_ORDER_MARK = '\uFEFF';
    /** U+200B: a zero-width space, invisible, never part of a cell. */
    private static final char ZERO_WIDTH_SPACE = '\u200B';

    private char[] owned = new char[256];
    private char[] text = owned;
    private int[] starts = new int[16];
    private int[] ends = new int[16];
    private int size;
    private int length;
    private long line;

    /** The 1-based physical line (CSV) or row number (XLSX) where the record starts. */
    long line() {
        return line;
    }

    /** The number of cells in the record (an empty line has one empty cell). */
    int size() {
        return size;
    }

    /** The shared buffer; a cell is {@code text()[start(c), end(c))}. */
    char[] text() {
        return text;
    }

    int start(int column) {
        return starts[column];
    }

    int end(int column) {
        return ends[column];
    }

    /** Whether {@code column} (0-based) is absent or empty. */
    boolean isEmpty(int column) {
        return column < 0 || column >= size || starts[column] == ends[column];
    }

    /** The text of {@code column}, or "" when the row is shorter or the column is absent. */
    String cell(int column) {
        return isEmpty(column) ? "" : new String(text, starts[column], ends[column] - starts[column]);
    }

    /** Whether {@code column}'s text equals {@code s}, without creating a String. */
    boolean cellEquals(int column, String s) {
        if (isEmpty(column)) {
            return s.isEmpty();
        }
        int from = starts[column];
        int n = ends[column] - from;
        if (n != s.length()) {
            return false;
        }
        for (int i = 0; i < n; i++) {
            if (text[from + i] != s.charAt(i)) {
                return false;
            }
        }
        return true;
    }

    /** Whether every cell is empty. */
    boolean isBlank() {
        for (int c = 0; c < size; c++) {
            if (starts[c] != ends[c]) {
                return false;
            }
        }
        return true;
    }

    List<String> cells() {
        List<String> out = new ArrayList<>(size);
        for (int c = 0; c < size; c++) {
            out.add(cell(c));
        }
        return out;
    }

    RawRow toRawRow() {
        return new RawRow(line, cells());
    }

    /** Loads a row read elsewhere (a sheet, or a record kept while looking for the header). */
    void set(RawRow row) {
        begin(row.line());
        for (String c : row.cells()) {
            int from = length;
            for (int i = 0; i < c.length(); i++) {
                append(c.charAt(i));
            }
            addCell(from, length);
        }
    }

    void begin(long recordLine) {
        line = recordLine;
        size = 0;
        length = 0;
        text = owned;
    }

    /**
     * Begins a record whose cells are ranges of {@code source} ({@link #addTrimmed}), read in place until the
     * next record begins; nothing is appended to a borrowed buffer.
     */
    void borrow(char[] source, long recordLine) {
        line = recordLine;
        size = 0;
        length = 0;
        text = source;
    }

    /** Text appended since the current cell began at {@code from}. */
    int cellLength(int from) {
        return length - from;
    }

    int length() {
        return length;
    }

    void append(char c) {
        if (length == text.length) {
            text = owned = Arrays.copyOf(text, length * 2);
        }
        text[length++] = c;
    }

    void append(char[] src, int from, int to) {
        int n = to - from;
        if (length + n > text.length) {
            text = owned = Arrays.copyOf(text, Math.max(length + n, length * 2));
        }
        System.arraycopy(src, from, text, length, n);
        length += n;
    }

    /**
     * Ends the cell whose text began at {@code from}, trimmed as {@link String#strip()} does and of
     * zero-width characters (a sample ID must not differ from the register's by an invisible character).
     */
    void endCell(int from) {
        addTrimmed(from, length);
    }

    /** Adds the cell {@code text()[from, to)}, trimmed as {@link #endCell} trims. */
    void addTrimmed(int from, int to) {
        int s = from;
        int e = to;
        while (s < e && isTrimmed(text[s])) {
            s++;
        }
        while (e > s && isTrimmed(text[e - 1])) {
            e--;
        }
        addCell(s, e);
    }

    private static boolean isTrimmed(char c) {
        // Printable ASCII, the first and last character of nearly every cell, is never trimmed: decided
        // without the Unicode tables.
        if (c > ' ' && c < 0x7F) {
            return false;
        }
        return Character.isWhitespace(c) || c == BYTE_ORDER_MARK || c == ZERO_WIDTH_SPACE;
    }

    private void addCell(int s, int e) {
        if (size == starts.length) {
            starts = Arrays.copyOf(starts, size * 2);
            ends = Arrays.copyOf(ends, size * 2);
        }
        starts[size] = s;
        ends[size] = e;
        size++;
    }
}
