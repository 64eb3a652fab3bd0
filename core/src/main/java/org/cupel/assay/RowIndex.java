package org.cupel.assay;

import java.util.Arrays;

/**
 * The table row of each sample ID. Most IDs of a project are already numbered by the register's
 * {@link IdIndex}; their rows are kept by that number, so a million-sample project holds one hash table of
 * IDs instead of two and the join finds a register ID once. IDs the shared index does not hold (lab
 * repeats, samples missing from the register) get an index of their own.
 */
final class RowIndex {
    private static final IdIndex NONE = new IdIndex(16);
    private final IdIndex known;
    private int[] rowOfKnown;
    private final IdIndex others;
    private int[] rowOfOther = new int[16];

    /** @param known IDs numbered elsewhere (never changed again), or null */
    RowIndex(IdIndex known) {
        this.known = known == null ? NONE : known;
        this.rowOfKnown = new int[this.known.size()];
        Arrays.fill(rowOfKnown, -1);
        this.others = new IdIndex(16);
    }

    /** The ID numbered {@code k} in the shared index. */
    String knownId(int k) {
        return known.get(k);
    }

    /** The row of the ID numbered {@code k} in the shared index, or -1 when it has none yet. */
    int rowOfKnown(int k) {
        return rowOfKnown[k];
    }

    /** Gives the ID numbered {@code k} in the shared index the row {@code row}; false when it already has one. */
    boolean putKnown(int k, int row) {
        if (rowOfKnown[k] >= 0) {
            return false;
        }
        rowOfKnown[k] = row;
        return true;
    }

    /** Gives {@code id} the row {@code row}; false when it already has one. */
    boolean put(String id, int row) {
        int k = known.indexOf(id);
        if (k >= 0) {
            return putKnown(k, row);
        }
        int n = others.add(id);
        if (n < 0) {
            return false;
        }
        if (n == rowOfOther.length) {
            rowOfOther = Arrays.copyOf(rowOfOther, n * 2);
        }
        rowOfOther[n] = row;
        return true;
    }

    /** The row of {@code id}, or -1. */
    int row(String id) {
        int k = known.indexOf(id);
        if (k >= 0) {
            return rowOfKnown[k];
        }
        int n = others.indexOf(id);
        return n < 0 ? -1 : rowOfOther[n];
    }
}
