package org.cupel.control;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
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

    public ReassayList {
        entries = List.copyOf(entries);
        brackets = List.copyOf(brackets);
    }

    public static ReassayList build(SampleTable table, List<ControlOutcome> outcomes, ReassaySettings settings) {
        BatchSequence seq = BatchSequence.of(table);
        Map<String, Map<Integer, Verdict>> status = new HashMap<>();
        for (ControlOutcome o : outcomes) {
            status.computeIfAbsent(o.analyte(), k -> new HashMap<>()).merge(o.row(), o.verdict(), Verdict::worst);
        }
        List<ControlOutcome> triggers = outcomes.stream().filter(ControlOutcome::triggersReassay)
                .sorted(java.util.Comparator.comparingInt((ControlOutcome o) -> seq.batchOf(o.row()))
                        .thenComparingInt(o -> seq.indexInBatch(o.row())).thenComparing(ControlOutcome::analyte)
                        .thenComparing(ControlOutcome::rule))
                .toList();
        Map<String, Builder> byKey = new LinkedHashMap<>();
        List<ReassayBracket> brackets = new ArrayList<>();
        for (ControlOutcome o : triggers) {
            brackets.add(bracket(table, seq, o, status.get(o.analyte()), settings.scope(), byKey));
        }
        List<Builder> sorted = new ArrayList<>(byKey.values());
        sorted.sort(java.util.Comparator.comparingInt((Builder x) -> seq.batchOf(x.row))
                .thenComparingInt(x -> seq.indexInBatch(x.row)).thenComparing(x -> x.analyte));
        return new ReassayList(sorted.stream().map(x -> x.build(table, seq)).toList(), brackets, settings.scope());
    }

    private static ReassayBracket bracket(SampleTable table, BatchSequence seq, ControlOutcome o,
                                          Map<Integer, Verdict> status, ReassaySettings.Scope scope,
                                          Map<String, Builder> byKey) {
        int[] rows = seq.rows(seq.batchOf(o.row()));
        int at = seq.indexInBatch(o.row());
        boolean blank = table.role(o.row()) == QcRole.BLANK;
        int from;
        int to;
        String note;
        if (scope == ReassaySettings.Scope.WHOLE_BATCH) {
            from = 0;
            to = rows.length - 1;
            note = "whole batch";
        } else if (blank) {
            int next = nextPassing(table, rows, at, +1, status, true);
            from = at + 1;
            to = next < 0 ? rows.length - 1 : next - 1;
            note = "after the blank, up to " + (next < 0 ? "the end of the batch (no passing blank after it)"
                    : "passing blank " + table.id(rows[next]));
        } else {
            int prev = nextPassing(table, rows, at, -1, status, false);
            int next = nextPassing(table, rows, at, +1, status, false);
            from = prev < 0 ? 0 : prev + 1;
            to = next < 0 ? rows.length - 1 : next - 1;
            note = "from " + (prev < 0 ? "the start of the batch (no passing control before it)"
                    : "passing control " + table.id(rows[prev])) + " to "
                    + (next < 0 ? "the end of the batch (no passing control after it)"
                    : "passing control " + table.id(rows[next]));
        }
        int n = 0;
        String why = table.role(o.row()).label() + " " + table.id(o.row()) + " failed (" + o.rule() + ")";
        for (int k = from; k <= to; k++) {
            int row = rows[k];
            if (!isReassayed(table.role(row))) {
                continue;
            }
            n++;
            byKey.computeIfAbsent(row + "\u0000" + o.analyte(), key -> new Builder(row, o.analyte()))
                    .add(table.id(o.row()), why);
        }
        int fromPosition = from <= to ? table.position(rows[from]) : table.position(o.row());
        int toPosition = from <= to ? table.position(rows[to]) : table.position(o.row());
        return new ReassayBracket(table.id(o.row()), table.role(o.row()).label(), seq.batch(seq.batchOf(o.row())).id(),
                o.analyte(), o.rule(), fromPosition, toPosition, n, note);
    }

    /** Index of the nearest passing control in direction {@code step}, or -1. */
    private static int nextPassing(SampleTable table, int[] rows, int at, int step, Map<Integer, Verdict> status,
                                   boolean blanksOnly) {
        for (int k = at + step; k >= 0 && k < rows.length; k += step) {
            QcRole role = table.role(rows[k]);
            if (blanksOnly ? role != QcRole.BLANK : !isControl(role)) {
                continue;
            }
            Verdict v = status.get(rows[k]);
            if (v == Verdict.PASS || v == Verdict.WARN) {
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
