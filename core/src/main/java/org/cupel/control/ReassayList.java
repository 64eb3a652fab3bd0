package org.cupel.control;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.IntFunction;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;

/**
 * The samples to re-assay, from control outcomes of any source (common practice):
 * <ul>
 *   <li>a failed CRM (or any non-blank control): the samples between the nearest passing control samples
 *       (CRM or blank) before and after it in the batch, or the batch start / end when there is none;</li>
 *   <li>a failed blank: the samples after it up to the next passing blank, or the batch end;</li>
 *   <li>with {@link ReassaySettings.Scope#WHOLE_BATCH}: every sample of the batch.</li>
 * </ul>
 * "Passing" is per analyte: a control whose outcomes for that analyte are all PASS or WARN (a warning
 * does not fail the result). Failed controls inside a bracket are passed over, so consecutive failures
 * share one bracket. Control samples (CRMs, blanks) are never on the list themselves; field, coarse and
 * pulp duplicates are samples of the ground and are; lab repeats and umpire checks are not (the lab
 * repeats the listed original; umpire checks belong to the umpire lab's batches).
 *
 * @param entries one per sample and analyte, in batch, position and analyte order
 * @param brackets one per triggering outcome, in the order of the entries
 * @param scope the scope in force
 */
public record ReassayList(List<ReassayEntry> entries, List<ReassayBracket> brackets,
                          ReassaySettings.Scope scope) {

    private static final Verdict[] VERDICTS = Verdict.values();

    public ReassayList {
        entries = List.copyOf(entries);
        brackets = List.copyOf(brackets);
    }

    public static ReassayList build(SampleTable table, List<ControlOutcome> outcomes, ReassaySettings settings) {
        return build(table, BatchSequence.of(table), outcomes, settings);
    }

    /** As {@link #build(SampleTable, List, ReassaySettings)}, with the table's batch sequence already built. */
    public static ReassayList build(SampleTable table, BatchSequence seq, List<ControlOutcome> outcomes,
                                    ReassaySettings settings) {
        List<String> analytes = BatchVerdicts.analyteNames(outcomes);
        Map<String, Integer> analyteIndex = new HashMap<>();
        analytes.forEach(a -> analyteIndex.put(a, analyteIndex.size()));
        List<ControlOutcome> triggers = outcomes.stream().filter(ControlOutcome::triggersReassay)
                .sorted(Comparator.comparingInt((ControlOutcome o) -> seq.batchOf(o.row()))
                        .thenComparingInt(o -> seq.indexInBatch(o.row())).thenComparing(ControlOutcome::analyte)
                        .thenComparing(ControlOutcome::rule))
                .toList();
        // Worst verdict of each row per analyte, as ordinal + 1 (0: no outcome), for the analytes that
        // trigger a re-assay (no other is ever read).
        byte[][] status = new byte[analytes.size()][];
        for (ControlOutcome o : triggers) {
            int a = analyteIndex.get(o.analyte());
            status[a] = status[a] == null ? new byte[table.size()] : status[a];
        }
        for (ControlOutcome o : outcomes) {
            byte[] st = status[analyteIndex.get(o.analyte())];
            if (st != null) {
                Verdict v = st[o.row()] == 0 ? o.verdict() : VERDICTS[st[o.row()] - 1].worst(o.verdict());
                st[o.row()] = (byte) (v.ordinal() + 1);
            }
        }
        long[] startOfBatch = new long[seq.size()];
        for (int b = 1; b < startOfBatch.length; b++) {
            startOfBatch[b] = startOfBatch[b - 1] + seq.batchSize(b - 1);
        }
        // Entries keyed by place in the sequence, then analyte name: sorting the keys gives the list's order.
        Map<Long, Builder> byKey = new HashMap<>();
        List<ReassayBracket> brackets = new ArrayList<>();
        for (ControlOutcome o : triggers) {
            int a = analyteIndex.get(o.analyte());
            brackets.add(bracket(table, seq, o, status[a], settings.scope(), row -> byKey.computeIfAbsent(
                    (startOfBatch[seq.batchOf(row)] + seq.indexInBatch(row)) * analytes.size() + a,
                    key -> new Builder(row, o.analyte()))));
        }
        long[] keys = byKey.keySet().stream().mapToLong(Long::longValue).sorted().toArray();
        List<ReassayEntry> entries = new ArrayList<>(keys.length);
        for (long key : keys) {
            entries.add(byKey.get(key).build(table, seq));
        }
        return new ReassayList(entries, brackets, settings.scope());
    }

    private static ReassayBracket bracket(SampleTable table, BatchSequence seq, ControlOutcome o, byte[] status,
                                          ReassaySettings.Scope scope, IntFunction<Builder> entry) {
        int b = seq.batchOf(o.row());
        int size = seq.batchSize(b);
        int at = seq.indexInBatch(o.row());
        boolean blank = table.role(o.row()) == QcRole.BLANK;
        int from;
        int to;
        String note;
        if (scope == ReassaySettings.Scope.WHOLE_BATCH) {
            from = 0;
            to = size - 1;
            note = "whole batch";
        } else if (blank) {
            int next = nextPassing(table, seq, b, at, +1, status, true);
            from = at + 1;
            to = next < 0 ? size - 1 : next - 1;
            note = "after the blank, up to " + (next < 0 ? "the end of the batch (no passing blank after it)"
                    : "passing blank " + table.id(seq.row(b, next)));
        } else {
            int prev = nextPassing(table, seq, b, at, -1, status, false);
            int next = nextPassing(table, seq, b, at, +1, status, false);
            from = prev < 0 ? 0 : prev + 1;
            to = next < 0 ? size - 1 : next - 1;
            note = "from " + (prev < 0 ? "the start of the batch (no passing control before it)"
                    : "passing control " + table.id(seq.row(b, prev))) + " to "
                    + (next < 0 ? "the end of the batch (no passing control after it)"
                    : "passing control " + table.id(seq.row(b, next)));
        }
        int n = 0;
        String why = table.role(o.row()).label() + " " + table.id(o.row()) + " failed (" + o.rule() + ")";
        for (int k = from; k <= to; k++) {
            int row = seq.row(b, k);
            if (!isReassayed(table.role(row))) {
                continue;
            }
            n++;
            entry.apply(row).add(table.id(o.row()), why);
        }
        int fromPosition = from <= to ? table.position(seq.row(b, from)) : table.position(o.row());
        int toPosition = from <= to ? table.position(seq.row(b, to)) : table.position(o.row());
        return new ReassayBracket(table.id(o.row()), table.role(o.row()).label(), seq.batch(b).id(),
                o.analyte(), o.rule(), fromPosition, toPosition, n, note);
    }

    /** Index in batch {@code b} of the nearest passing control in direction {@code step}, or -1. */
    private static int nextPassing(SampleTable table, BatchSequence seq, int b, int at, int step, byte[] status,
                                   boolean blanksOnly) {
        for (int k = at + step; k >= 0 && k < seq.batchSize(b); k += step) {
            int row = seq.row(b, k);
            QcRole role = table.role(row);
            if (blanksOnly ? role != QcRole.BLANK : !isControl(role)) {
                continue;
            }
            int v = status[row] - 1;
            if (v == Verdict.PASS.ordinal() || v == Verdict.WARN.ordinal()) {
                return k;
            }
        }
        return -1;
    }

    static boolean isControl(QcRole role) {
        return role == QcRole.CRM || role == QcRole.BLANK;
    }

    /**
     * Samples of the ground: routine samples and field, coarse-reject and pulp duplicates. Lab repeats are
     * the lab's own second reading of a listed sample and umpire checks belong to another lab's batch.
     */
    static boolean isReassayed(QcRole role) {
        return role == QcRole.ROUTINE || role == QcRole.FIELD_DUPLICATE || role == QcRole.COARSE_DUPLICATE
                || role == QcRole.PULP_DUPLICATE;
    }

    private static final class Builder {
        final int row;
        final String analyte;
        final List<String> triggers = new ArrayList<>();
        final List<String> reasons = new ArrayList<>();

        Builder(int row, String analyte) {
            this.row = row;
            this.analyte = analyte;
        }

        void add(String trigger, String reason) {
            if (!triggers.contains(trigger)) {
                triggers.add(trigger);
                reasons.add(reason);
            }
        }

        ReassayEntry build(SampleTable table, BatchSequence seq) {
            return new ReassayEntry(table.id(row), seq.batch(seq.batchOf(row)).id(), table.position(row), analyte, triggers,
                    String.join("; ", reasons));
        }
    }
}
