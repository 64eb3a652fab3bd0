package org.cupel.ingest;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import org.cupel.assay.MissingReason;
import org.cupel.assay.Numbers;
import org.cupel.assay.QcRole;
import org.cupel.assay.Qualifier;

/**
 * The rows kept from one lab file, column-wise: per row the sample fields, per row and analyte column
 * the usable result as primitives (a file's cells cost a few arrays, not an object each).
 */
final class LabRows {
    /** {@link #qualifier} of a cell that adds no result (blank, or left out with an issue). */
    static final byte NO_RESULT = -1;
    private static final Qualifier[] QUALIFIERS = Qualifier.values();
    private static final MissingReason[] REASONS = MissingReason.values();
    private static final QcRole[] ROLES = QcRole.values();

    private final int width;
    private int size;
    private String[] ids;
    private int[] batches;
    private int[] positions;
    private byte[] roles;
    private String[] references;
    private long[] lines;
    private byte[] qualifiers;
    private double[] values;
    private double[] limits;
    private byte[] missing;
    /** The lab's code of a missing result ("IS", "NR"), by cell; few cells have one. */
    private final Map<Integer, String> codes = new HashMap<>();
    /** The decimals each value was written with (a byte a cell), or {@link Numbers#UNKNOWN_DECIMALS}. */
    private byte[] decimals;

    /**
     * @param width the number of analyte columns
     * @param expectedRows rows expected (a hint: a lab file is read once, so growing it would copy every array)
     */
    LabRows(int width, int expectedRows) {
        this.width = width;
        int rows = Math.max(16, expectedRows);
        ids = new String[rows];
        batches = new int[rows];
        positions = new int[rows];
        roles = new byte[rows];
        references = new String[rows];
        lines = new long[rows];
        qualifiers = new byte[rows * width];
        values = new double[rows * width];
        limits = new double[rows * width];
        missing = new byte[rows * width];
        decimals = new byte[rows * width];
    }

    public int size() {
        return size;
    }

    public String sampleId(int row) {
        return ids[row];
    }

    /** Index into the file's batches. */
    public int batch(int row) {
        return batches[row];
    }

    public int position(int row) {
        return positions[row];
    }

    /** The role the file gives, or null when it says nothing. */
    public QcRole role(int row) {
        return roles[row] < 0 ? null : ROLES[roles[row]];
    }

    public String reference(int row) {
        return references[row];
    }

    public long line(int row) {
        return lines[row];
    }

    /** Whether analyte column {@code column} (index into the file's columns) of {@code row} has a result. */
    public boolean hasResult(int row, int column) {
        return qualifiers[row * width + column] != NO_RESULT;
    }

    public Qualifier qualifier(int row, int column) {
        return QUALIFIERS[qualifiers[row * width + column]];
    }

    public double value(int row, int column) {
        return values[row * width + column];
    }

    public double limit(int row, int column) {
        return limits[row * width + column];
    }

    public MissingReason missingReason(int row, int column) {
        return REASONS[missing[row * width + column]];
    }

    /** The text the lab wrote for a missing result ("IS", "NR"); empty when the cell has none. */
    public String code(int row, int column) {
        return codes.isEmpty() ? "" : codes.getOrDefault(row * width + column, "");
    }

    /** How many decimals the lab wrote for the value, or {@link Numbers#UNKNOWN_DECIMALS}. */
    public int decimals(int row, int column) {
        return decimals[row * width + column];
    }

    /** Clears the cells of the row being read (row {@link #size()}) to no result. */
    void startRow() {
        if (size == ids.length) {
            grow();
        }
        Arrays.fill(qualifiers, size * width, (size + 1) * width, NO_RESULT);
    }

    /**
     * Keeps the lab's code of the missing result just set in {@code column} of the row being read. A row
     * with a result set is always kept, so a code never outlives its row.
     */
    void setCode(int column, String code) {
        codes.put(size * width + column, code);
    }

    /** @param written the decimals the value was written with (0 to 127), or {@link Numbers#UNKNOWN_DECIMALS} */
    void setResult(int column, Qualifier q, double value, double limit, MissingReason reason, int written) {
        int k = size * width + column;
        qualifiers[k] = (byte) q.ordinal();
        values[k] = value;
        limits[k] = limit;
        missing[k] = (byte) reason.ordinal();
        decimals[k] = (byte) written;
    }

    /** Keeps the row being read, with the results set since {@link #startRow()}. */
    void keepRow(String id, int batch, int position, QcRole role, String reference, long line) {
        ids[size] = id;
        batches[size] = batch;
        positions[size] = position;
        roles[size] = role == null ? -1 : (byte) role.ordinal();
        references[size] = reference == null ? "" : reference;
        lines[size] = line;
        size++;
    }

    /** Renumbers the batch of every row through {@code map} (old index → new index). */
    void remapBatches(int[] map) {
        for (int r = 0; r < size; r++) {
            batches[r] = map[batches[r]];
        }
    }

    /**
     * Frees the room reserved for rows beyond those kept (the estimate from the file's size errs high): a parsed
     * file may wait in memory for the join while the register is read.
     */
    void trim() {
        if (size * 5L >= ids.length * 4L) {
            return;
        }
        resize(size);
    }

    private void grow() {
        resize(Math.max(16, ids.length * 2));
    }

    private void resize(int cap) {
        ids = Arrays.copyOf(ids, cap);
        batches = Arrays.copyOf(batches, cap);
        positions = Arrays.copyOf(positions, cap);
        roles = Arrays.copyOf(roles, cap);
        references = Arrays.copyOf(references, cap);
        lines = Arrays.copyOf(lines, cap);
        qualifiers = Arrays.copyOf(qualifiers, cap * width);
        values = Arrays.copyOf(values, cap * width);
        limits = Arrays.copyOf(limits, cap * width);
        missing = Arrays.copyOf(missing, cap * width);
        decimals = Arrays.copyOf(decimals, cap * width);
    }
}
