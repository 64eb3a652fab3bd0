package org.cupel.control;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
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
        Set<String> analytes = new TreeSet<>();
        for (ControlOutcome o : outcomes) {
            analytes.add(o.analyte());
        }
        BatchSequence seq = BatchSequence.of(table);
        List<List<ControlOutcome>> byBatch = new ArrayList<>();
        for (int b = 0; b < seq.size(); b++) {
            byBatch.add(new ArrayList<>());
        }
        for (ControlOutcome o : outcomes) {
            byBatch.get(seq.batchOf(o.row())).add(o);
        }
        List<BatchVerdict> out = new ArrayList<>();
        for (int b = 0; b < byBatch.size(); b++) {
            out.add(batch(table, seq.batch(b), seq.batchSize(b), byBatch.get(b), analytes));
        }
        return out;
    }

    /** Whether any batch failed (the {@code --fail-on-qc} test). */
    public static boolean anyFailed(List<BatchVerdict> verdicts) {
        return verdicts.stream().anyMatch(v -> v.verdict() == Verdict.FAIL);
    }

    /** How many batches have verdict {@code v}. */
    public static int count(List<BatchVerdict> verdicts, Verdict v) {
        return (int) verdicts.stream().filter(b -> b.verdict() == v).count();
    }

    private static BatchVerdict batch(SampleTable table, org.cupel.assay.Batch batch, int size,
                                      List<ControlOutcome> outcomes, Set<String> analytes) {
        List<AnalyteVerdict> per = new ArrayList<>();
        Verdict batchVerdict = analytes.isEmpty() ? Verdict.CANNOT_JUDGE : Verdict.PASS;
        for (String analyte : analytes) {
            AnalyteVerdict av = analyte(table, analyte, outcomes);
            per.add(av);
            batchVerdict = batchVerdict.worst(av.verdict());
        }
        return new BatchVerdict(batch.id(), batch.lab(), size, batchVerdict, per);
    }

    private static AnalyteVerdict analyte(SampleTable table, String analyte, List<ControlOutcome> outcomes) {
        List<ControlOutcome> mine = new ArrayList<>();
        for (ControlOutcome o : outcomes) {
            if (o.analyte().equals(analyte)) {
                mine.add(o);
            }
        }
        if (mine.isEmpty()) {
            return new AnalyteVerdict(analyte, Verdict.CANNOT_JUDGE, 0, List.of(new VerdictReason("", 0, "",
                    analyte, Verdict.CANNOT_JUDGE, "no controls", "no control result for " + analyte
                    + " in this batch")));
        }
        // Sort so the result does not depend on the order the sources listed their outcomes.
        mine.sort(Comparator.comparingInt((ControlOutcome o) -> table.position(o.row()))
                .thenComparingInt(ControlOutcome::row).thenComparing(ControlOutcome::rule)
                .thenComparing(ControlOutcome::reason).thenComparing(o -> o.verdict().ordinal()));
        Verdict v = Verdict.PASS;
        Set<VerdictReason> reasons = new LinkedHashSet<>();
        for (ControlOutcome o : mine) {
            v = v.worst(o.verdict());
            if (o.verdict() != Verdict.PASS) {
                reasons.add(new VerdictReason(table.id(o.row()), table.position(o.row()), table.role(o.row()).label(),
                        analyte, o.verdict(), o.rule(), o.reason()));
            }
        }
        return new AnalyteVerdict(analyte, v, mine.size(), new ArrayList<>(reasons));
    }
}
