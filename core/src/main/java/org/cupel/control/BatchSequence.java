package org.cupel.control;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
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
        Map<String, Integer> byKey = new LinkedHashMap<>();
        List<Batch> batches = new ArrayList<>();
        List<List<Integer>> lists = new ArrayList<>();
        int[] batchOfRow = new int[table.size()];
        for (int row = 0; row < table.size(); row++) {
            Batch b = table.batch(row);
            int g = byKey.computeIfAbsent(b.lab() + "\u0000" + b.id(), k -> {
                batches.add(b);
                lists.add(new ArrayList<>());
                return batches.size() - 1;
            });
            batchOfRow[row] = g;
            lists.get(g).add(row);
        }
        int[][] rows = new int[batches.size()][];
        int[] index = new int[table.size()];
        for (int g = 0; g < rows.length; g++) {
            List<Integer> l = lists.get(g);
            l.sort(Comparator.comparingInt(table::position).thenComparingInt(Integer::intValue));
            rows[g] = l.stream().mapToInt(Integer::intValue).toArray();
            for (int k = 0; k < rows[g].length; k++) {
                index[rows[g][k]] = k;
            }
        }
        return new BatchSequence(List.copyOf(batches), rows, batchOfRow, index);
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
