package org.cupel.control;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import org.cupel.assay.SampleTable;

/**
 * The rows of each batch in the order the lab ran them (position in batch; table order breaks ties),
 * which is the order carry-over and re-assay brackets are read in.
 */
public final class BatchSequence {
    private final int[][] rowsByBatch;
    private final int[] indexInBatch;

    private BatchSequence(int[][] rowsByBatch, int[] indexInBatch) {
        this.rowsByBatch = rowsByBatch;
        this.indexInBatch = indexInBatch;
    }

    public static BatchSequence of(SampleTable table) {
        int nb = table.batches().size();
        List<List<Integer>> lists = new ArrayList<>(nb);
        for (int b = 0; b < nb; b++) {
            lists.add(new ArrayList<>());
        }
        for (int row = 0; row < table.size(); row++) {
            lists.get(table.batchIndex(row)).add(row);
        }
        int[][] rows = new int[nb][];
        int[] index = new int[table.size()];
        for (int b = 0; b < nb; b++) {
            List<Integer> l = lists.get(b);
            l.sort(Comparator.comparingInt(table::position).thenComparingInt(Integer::intValue));
            rows[b] = l.stream().mapToInt(Integer::intValue).toArray();
            for (int k = 0; k < rows[b].length; k++) {
                index[rows[b][k]] = k;
            }
        }
        return new BatchSequence(rows, index);
    }

    /** Rows of batch {@code batchIndex} in run order. */
    public int[] rows(int batchIndex) {
        return Arrays.copyOf(rowsByBatch[batchIndex], rowsByBatch[batchIndex].length);
    }

    /** Where {@code row} sits in its batch's run order (0 = first). */
    public int indexInBatch(int row) {
        return indexInBatch[row];
    }

    /** The row run just before {@code row} in its batch, or -1 when it opens the batch. */
    public int preceding(SampleTable table, int row) {
        int k = indexInBatch[row];
        return k == 0 ? -1 : rowsByBatch[table.batchIndex(row)][k - 1];
    }
}
