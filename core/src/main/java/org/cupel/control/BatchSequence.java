package org.cupel.control;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.Batch;
import org.cupel.assay.SampleTable;

/**
 * The rows of each lab batch in the order the lab ran them (position in batch; table order breaks ties),
 * which is the order carry-over and re-assay brackets are read in. A batch is its lab and batch ID: rows
 * of one job read from several files (a re-assay file, say) are one batch here, whatever file or date
 * the table recorded for them. Batches are in the order first met in the table.
 */
public final class BatchSequence {
    private final List<Batch> batches;
    private final int[][] rowsByBatch;
    private final int[] batchOfRow;
    private final int[] indexInBatch;

    private BatchSequence(List<Batch> batches, int[][] rowsByBatch, int[] batchOfRow, int[] indexInBatch) {
        this.batches = batches;
        this.rowsByBatch = rowsByBatch;
        this.batchOfRow = batchOfRow;
        this.indexInBatch = indexInBatch;
    }

    public static BatchSequence of(SampleTable table) {
        // Group the table's batch records, not its rows: a project has a few thousand batches and a
        // million rows. The table lists batches in the order their first row was read, so the first
        // record of each lab and ID is also the group's first row in the table.
        List<Batch> records = table.batches();
        Map<String, Integer> byKey = new HashMap<>();
        List<Batch> batches = new ArrayList<>();
        int[] groupOfRecord = new int[records.size()];
        for (int i = 0; i < groupOfRecord.length; i++) {
            Batch b = records.get(i);
            groupOfRecord[i] = byKey.computeIfAbsent(b.lab() + "\u0000" + b.id(), k -> {
                batches.add(b);
                return batches.size() - 1;
            });
        }
        int n = table.size();
        int[] all = new int[n];
        int[] batchOfRow = new int[n];
        for (int row = 0; row < n; row++) {
            all[row] = row;
            batchOfRow[row] = groupOfRecord[table.batchIndex(row)];
        }
        int[] start = new int[batches.size() + 1];
        int[] ordered = inRunOrder(table, all, batchOfRow, start);
        int[][] rows = new int[batches.size()][];
        int[] index = new int[n];
        for (int g = 0; g < rows.length; g++) {
            rows[g] = Arrays.copyOfRange(ordered, start[g], start[g + 1]);
            for (int k = 0; k < rows[g].length; k++) {
                index[rows[g][k]] = k;
            }
        }
        return new BatchSequence(List.copyOf(batches), rows, batchOfRow, index);
    }

    /**
     * {@code rows} grouped by {@code groupOfRow[row]} (groups ascending), each group in run order (position
     * in batch, then row): a counting sort on the group and a primitive sort within it, no boxing.
     *
     * @param groupOfRow group of every table row (only the entries of {@code rows} are read), from 0
     * @param start filled with the offset of each group in the result; length = number of groups + 1
     */
    public static int[] inRunOrder(SampleTable table, int[] rows, int[] groupOfRow, int[] start) {
        int groups = start.length - 1;
        Arrays.fill(start, 0);
        for (int row : rows) {
            start[groupOfRow[row] + 1]++;
        }
        for (int g = 0; g < groups; g++) {
            start[g + 1] += start[g];
        }
        int[] next = Arrays.copyOf(start, groups);
        long[] keys = new long[rows.length];
        for (int row : rows) {
            // position in the high half, row (never negative) in the low half: orders by position, then row.
            keys[next[groupOfRow[row]]++] = ((long) table.position(row) << 32) | row;
        }
        int[] out = new int[rows.length];
        for (int g = 0; g < groups; g++) {
            Arrays.sort(keys, start[g], start[g + 1]);
        }
        for (int k = 0; k < keys.length; k++) {
            out[k] = (int) keys[k];
        }
        return out;
    }

    /** Number of batches. */
    public int size() {
        return batches.size();
    }

    /** Batch {@code b} (the record first met for its lab and ID). */
    public Batch batch(int b) {
        return batches.get(b);
    }

    /** The batch {@code row} belongs to. */
    public int batchOf(int row) {
        return batchOfRow[row];
    }

    /** Rows of batch {@code b} in run order. */
    public int[] rows(int b) {
        return rowsByBatch[b].clone();
    }

    /** Row {@code k} of batch {@code b} in run order (0 = first), without copying the batch. */
    public int row(int b, int k) {
        return rowsByBatch[b][k];
    }

    /** {@code rows} in sequence order: batch by batch, each in run order. */
    public int[] inRunOrder(int[] rows) {
        long[] keys = new long[rows.length];
        for (int k = 0; k < rows.length; k++) {
            keys[k] = ((long) batchOfRow[rows[k]] << 32) | indexInBatch[rows[k]];
        }
        Arrays.sort(keys);
        int[] out = new int[rows.length];
        for (int k = 0; k < keys.length; k++) {
            out[k] = rowsByBatch[(int) (keys[k] >>> 32)][(int) keys[k]];
        }
        return out;
    }

    /** Samples in batch {@code b}. */
    public int batchSize(int b) {
        return rowsByBatch[b].length;
    }

    /** Where {@code row} sits in its batch's run order (0 = first). */
    public int indexInBatch(int row) {
        return indexInBatch[row];
    }

    /** The row run just before {@code row} in its batch, or -1 when it opens the batch. */
    public int preceding(int row) {
        int k = indexInBatch[row];
        return k == 0 ? -1 : rowsByBatch[batchOfRow[row]][k - 1];
    }
}
