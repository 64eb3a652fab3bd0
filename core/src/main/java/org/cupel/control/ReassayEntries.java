package org.cupel.control;

import java.util.AbstractList;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.RandomAccess;
import java.util.Set;
import org.cupel.assay.SampleTable;

/**
 * The entries of a {@link ReassayList} as columns: per entry its row, analyte and the failed controls that
 * listed it; each {@link ReassayEntry} (IDs, batch, the joined reason) is made when read. A million-sample
 * project lists a quarter of a million samples, few of which are ever read one by one.
 */
final class ReassayEntries extends AbstractList<ReassayEntry> implements RandomAccess {
    private final SampleTable table;
    private final List<String> analytes;
    private final int[] rows;
    private final int[] analyteOf;
    /**
     * The triggers of entry {@code e} are {@code triggerOf[triggerStart[e] .. triggerStart[e + 1])}, in the order
     * listed.
     */
    private final int[] triggerStart;
    private final int[] triggerOf;
    /** Per trigger: the failed control's ID and the sentence saying why it lists samples. */
    private final String[] triggerIds;
    private final String[] whys;

    /**
     * @param listed every listing of a sample and analyte by a trigger, in the order listed
     * @param triggerIds the ID of each trigger's control sample
     * @param whys each trigger's reason
     */
    ReassayEntries(SampleTable table, List<String> analytes, Listings listed, String[] triggerIds, String[] whys) {
        this.table = table;
        this.analytes = analytes;
        this.triggerIds = triggerIds;
        this.whys = whys;
        int m = listed.size;
        long[] keys = Arrays.copyOf(listed.keys, m);
        Arrays.sort(keys);
        int n = 0;
        for (int j = 0; j < m; j++) {
            if (j == 0 || keys[j] != keys[j - 1]) {
                keys[n++] = keys[j];
            }
        }
        // Listings grouped by entry in the order listed (a stable counting sort), a trigger ID once per entry.
        int[] entryOf = new int[m];
        int[] count = new int[n + 1];
        this.rows = new int[n];
        this.analyteOf = new int[n];
        for (int j = 0; j < m; j++) {
            int e = Arrays.binarySearch(keys, 0, n, listed.keys[j]);
            entryOf[j] = e;
            count[e + 1]++;
            rows[e] = listed.rows[j];
            analyteOf[e] = (int) (listed.keys[j] % analytes.size());
        }
        for (int e = 0; e < n; e++) {
            count[e + 1] += count[e];
        }
        int[] grouped = new int[m];
        int[] next = Arrays.copyOf(count, n);
        for (int j = 0; j < m; j++) {
            grouped[next[entryOf[j]]++] = listed.triggers[j];
        }
        this.triggerStart = new int[n + 1];
        int kept = 0;
        for (int e = 0; e < n; e++) {
            triggerStart[e] = kept;
            for (int k = count[e]; k < count[e + 1]; k++) {
                if (!listedBefore(grouped, triggerStart[e], kept, triggerIds[grouped[k]])) {
                    grouped[kept++] = grouped[k];
                }
            }
        }
        triggerStart[n] = kept;
        this.triggerOf = Arrays.copyOf(grouped, kept);
    }

    private boolean listedBefore(int[] grouped, int from, int to, String id) {
        for (int k = from; k < to; k++) {
            if (triggerIds[grouped[k]].equals(id)) {
                return true;
            }
        }
        return false;
    }

    /** The entry; its batch ID is the table's batch record's, which has the lab and ID of its batch in the sequence. */
    @Override
    public ReassayEntry get(int e) {
        int row = rows[e];
        if (triggerStart[e + 1] - triggerStart[e] == 1) {
            // Most entries have one trigger: its ID and sentence as they are, nothing to join.
            int t = triggerOf[triggerStart[e]];
            return new ReassayEntry(table.id(row), table.batch(row).id(), table.position(row),
                    analytes.get(analyteOf[e]), List.of(triggerIds[t]), whys[t]);
        }
        List<String> ids = new ArrayList<>(triggerStart[e + 1] - triggerStart[e]);
        List<String> reasons = new ArrayList<>(ids.size());
        for (int k = triggerStart[e]; k < triggerStart[e + 1]; k++) {
            ids.add(triggerIds[triggerOf[k]]);
            reasons.add(whys[triggerOf[k]]);
        }
        return new ReassayEntry(table.id(row), table.batch(row).id(), table.position(row),
                analytes.get(analyteOf[e]), ids, String.join("; ", reasons));
    }

    @Override
    public int size() {
        return rows.length;
    }

    /** Distinct sample IDs among the entries. */
    long sampleCount() {
        Set<String> ids = new HashSet<>();
        for (int row : rows) {
            ids.add(table.id(row));
        }
        return ids.size();
    }

    /** Listings as they are made: key (place in the sequence and analyte), row and trigger, in growing arrays. */
    static final class Listings {
        private long[] keys = new long[64];
        private int[] rows = new int[64];
        private int[] triggers = new int[64];
        private int size;

        void add(long key, int row, int trigger) {
            if (size == keys.length) {
                keys = Arrays.copyOf(keys, 2 * size);
                rows = Arrays.copyOf(rows, 2 * size);
                triggers = Arrays.copyOf(triggers, 2 * size);
            }
            keys[size] = key;
            rows[size] = row;
            triggers[size++] = trigger;
        }
    }
}
