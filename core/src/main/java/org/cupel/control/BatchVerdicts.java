package org.cupel.control;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.cupel.assay.Batch;
import org.cupel.assay.SampleTable;

/**
 * Batch verdicts from control outcomes of any source (CRM review, blank review): each batch gets, per
 * analyte, the worst verdict of its control results (FAIL over WARN over CANNOT_JUDGE over PASS, see
 * {@link Verdict#worst}), and the batch the worst over analytes. A batch with no control result for an
 * analyte cannot be judged for it (common practice: a batch without controls is not a passing batch).
 */
public final class BatchVerdicts {
    private BatchVerdicts() {
    }

    /**
     * @param table the sample table the outcome rows refer to
     * @param outcomes control outcomes in any order, from any number of sources
     * @return one verdict per batch (lab and batch ID, see {@link BatchSequence}), in the table's order
     */
    public static List<BatchVerdict> judge(SampleTable table, List<ControlOutcome> outcomes) {
        return judge(table, BatchSequence.of(table), outcomes);
    }

    /** As {@link #judge(SampleTable, List)}, with the table's batch sequence already built. */
    public static List<BatchVerdict> judge(SampleTable table, BatchSequence seq, List<ControlOutcome> given) {
        ControlOutcomes outcomes = ControlOutcomes.of(given);
        List<String> analytes = analyteNames(outcomes);
        Map<String, Integer> analyteIndex = new HashMap<>();
        analytes.forEach(a -> analyteIndex.put(a, analyteIndex.size()));
        // One bucket per batch and analyte, filled by a counting sort: no scan of a batch per analyte.
        int na = analytes.size();
        int[] bucket = new int[outcomes.size()];
        int[] start = new int[seq.size() * na + 1];
        // Each outcome's row read once: the sorts below and the tie check read it again by index.
        int[] rows = new int[outcomes.size()];
        for (int i = 0; i < bucket.length; i++) {
            rows[i] = outcomes.row(i);
            bucket[i] = seq.batchOf(rows[i]) * na + analyteIndex.get(outcomes.analyte(i));
            start[bucket[i] + 1]++;
        }
        for (int k = 1; k < start.length; k++) {
            start[k] += start[k - 1];
        }
        int[] next = Arrays.copyOf(start, start.length - 1);
        long[] keys = new long[bucket.length];
        for (int i = 0; i < bucket.length; i++) {
            // Run order within the batch (= position, then row), then the order given.
            keys[next[bucket[i]]++] = ((long) seq.indexInBatch(rows[i]) << 32) | i;
        }
        List<BatchVerdict> out = new ArrayList<>(seq.size());
        for (int b = 0; b < seq.size(); b++) {
            List<AnalyteVerdict> per = new ArrayList<>(na);
            Verdict batchVerdict = na == 0 ? Verdict.CANNOT_JUDGE : Verdict.PASS;
            for (int a = 0; a < na; a++) {
                int from = start[b * na + a];
                int to = start[b * na + a + 1];
                Arrays.sort(keys, from, to);
                AnalyteVerdict av = analyte(table, analytes.get(a), outcomes, rows,
                        inOrder(outcomes, rows, keys, from, to));
                per.add(av);
                batchVerdict = batchVerdict.worst(av.verdict());
            }
            Batch batch = seq.batch(b);
            out.add(new BatchVerdict(batch.id(), batch.lab(), seq.batchSize(b), batchVerdict, per));
        }
        return out;
    }

    /**
     * The indices of the outcomes of one bucket in run order. Several outcomes of one row (rare) are put in
     * order of rule, reason and verdict, so the result does not depend on the order the sources listed them.
     */
    private static int[] inOrder(ControlOutcomes outcomes, int[] rows, long[] keys, int from, int to) {
        int[] mine = new int[to - from];
        for (int k = from; k < to; k++) {
            mine[k - from] = (int) keys[k];
        }
        Comparator<Integer> ties = Comparator.comparing((Integer i) -> outcomes.rule(i))
                .thenComparing(i -> outcomes.reason(i)).thenComparing(i -> outcomes.verdict(i).ordinal());
        for (int i = 0; i < mine.length; ) {
            int j = i + 1;
            while (j < mine.length && rows[mine[j]] == rows[mine[i]]) {
                j++;
            }
            if (j - i > 1) {
                Integer[] tied = new Integer[j - i];
                for (int k = i; k < j; k++) {
                    tied[k - i] = mine[k];
                }
                Arrays.sort(tied, ties);
                for (int k = i; k < j; k++) {
                    mine[k] = tied[k - i];
                }
            }
            i = j;
        }
        return mine;
    }

    /** The analytes of the outcomes in name order (a hash set first: a million outcomes name ten analytes). */
    static List<String> analyteNames(ControlOutcomes outcomes) {
        Set<String> names = new HashSet<>();
        for (int i = 0; i < outcomes.size(); i++) {
            names.add(outcomes.analyte(i));
        }
        return List.copyOf(new TreeSet<>(names));
    }

    /** Whether any batch failed (the {@code --fail-on-qc} test). */
    public static boolean anyFailed(List<BatchVerdict> verdicts) {
        return verdicts.stream().anyMatch(v -> v.verdict() == Verdict.FAIL);
    }

    /** How many batches have verdict {@code v}. */
    public static int count(List<BatchVerdict> verdicts, Verdict v) {
        return (int) verdicts.stream().filter(b -> b.verdict() == v).count();
    }

    private static AnalyteVerdict analyte(SampleTable table, String analyte, ControlOutcomes outcomes, int[] rows,
                                          int[] mine) {
        if (mine.length == 0) {
            return new AnalyteVerdict(analyte, Verdict.CANNOT_JUDGE, 0, List.of(new VerdictReason("", 0, "",
                    analyte, Verdict.CANNOT_JUDGE, "no controls", "no control result for " + analyte
                    + " in this batch")));
        }
        Verdict v = Verdict.PASS;
        Set<VerdictReason> reasons = new LinkedHashSet<>();
        for (int i : mine) {
            Verdict vi = outcomes.verdict(i);
            v = v.worst(vi);
            if (vi != Verdict.PASS) {
                int row = rows[i];
                reasons.add(new VerdictReason(table.id(row), table.position(row), table.role(row).label(),
                        analyte, vi, outcomes.rule(i), outcomes.reason(i)));
            }
        }
        return new AnalyteVerdict(analyte, v, mine.length, new ArrayList<>(reasons));
    }
}
