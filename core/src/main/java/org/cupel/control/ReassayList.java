package org.cupel.control;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.IntConsumer;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;

/**
 * The samples to re-assay, from control outcomes of any source (common practice):
 * <ul>
 *   <li>a failed CRM (or any non-blank control): the samples between the nearest passing CRMs before and after
 *       it in the batch, or the batch start / end when there is none. A blank is passed over: it shows that
 *       nothing was carried into the run at detection level, not that the samples around it were measured
 *       accurately at grade. ({@link ReassaySettings.CrmBracket#PASSING_CONTROL} lets a passing blank bound the
 *       bracket as well.)</li>
 *   <li>a failed blank: the samples after it up to the next passing blank, or the batch end: contamination
 *       (carry-over from a high-grade sample, a dirty pulveriser bowl or crucible) reaches forward in run order
 *       until a clean blank shows it has stopped; the sample before a blank is the likely source, not a victim.
 *       {@link ReassaySettings#blankFollowing()} caps the count where blanks are sparse;</li>
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
 * @param crmBracket what bounds the bracket of a failed CRM
 * @param blankFollowing the cap on samples after a failed blank, 0 for none
 */
public record ReassayList(List<ReassayEntry> entries, List<ReassayBracket> brackets,
                          ReassaySettings.Scope scope, ReassaySettings.CrmBracket crmBracket, int blankFollowing) {

    private static final Verdict[] VERDICTS = Verdict.values();

    public ReassayList {
        entries = entries instanceof ReassayEntries ? entries : List.copyOf(entries);
        brackets = List.copyOf(brackets);
    }

    /** Distinct samples on the list (an entry is one sample and analyte). */
    public long sampleCount() {
        if (entries instanceof ReassayEntries e) {
            return e.sampleCount();
        }
        return entries.stream().map(ReassayEntry::sampleId).distinct().count();
    }

    public static ReassayList build(SampleTable table, List<ControlOutcome> outcomes, ReassaySettings settings) {
        return build(table, BatchSequence.of(table), outcomes, settings);
    }

    /** As {@link #build(SampleTable, List, ReassaySettings)}, with the table's batch sequence already built. */
    public static ReassayList build(SampleTable table, BatchSequence seq, List<ControlOutcome> given,
                                    ReassaySettings settings) {
        ControlOutcomes outcomes = ControlOutcomes.of(given);
        List<String> analytes = BatchVerdicts.analyteNames(outcomes);
        Map<String, Integer> analyteIndex = new HashMap<>();
        analytes.forEach(a -> analyteIndex.put(a, analyteIndex.size()));
        int[] triggers = triggers(outcomes, seq);
        // Worst verdict of each row per analyte, as ordinal + 1 (0: no outcome), for the analytes that
        // trigger a re-assay (no other is ever read).
        byte[][] status = new byte[analytes.size()][];
        for (int i : triggers) {
            int a = analyteIndex.get(outcomes.analyte(i));
            status[a] = status[a] == null ? new byte[table.size()] : status[a];
        }
        for (int i = 0; i < outcomes.size(); i++) {
            byte[] st = status[analyteIndex.get(outcomes.analyte(i))];
            if (st != null) {
                int row = outcomes.row(i);
                Verdict v = st[row] == 0 ? outcomes.verdict(i) : VERDICTS[st[row] - 1].worst(outcomes.verdict(i));
                st[row] = (byte) (v.ordinal() + 1);
            }
        }
        long[] startOfBatch = new long[seq.size()];
        for (int b = 1; b < startOfBatch.length; b++) {
            startOfBatch[b] = startOfBatch[b - 1] + seq.batchSize(b - 1);
        }
        // Each listed sample and analyte keyed by place in the sequence, then analyte: sorting the keys gives
        // the list's order. One key, row and trigger per listing, in the order listed.
        ReassayEntries.Listings listed = new ReassayEntries.Listings();
        List<ReassayBracket> brackets = new ArrayList<>();
        String[] triggerIds = new String[triggers.length];
        String[] whys = new String[triggers.length];
        for (int t = 0; t < triggers.length; t++) {
            int i = triggers[t];
            int a = analyteIndex.get(outcomes.analyte(i));
            int control = outcomes.row(i);
            int trigger = t;
            triggerIds[t] = table.id(control);
            whys[t] = table.role(control).label() + " " + table.id(control) + " failed (" + outcomes.rule(i) + ")";
            brackets.add(bracket(table, seq, outcomes, i, status[a], settings, row -> listed.add(
                    (startOfBatch[seq.batchOf(row)] + seq.indexInBatch(row)) * analytes.size() + a, row, trigger)));
        }
        return new ReassayList(new ReassayEntries(table, analytes, listed, triggerIds, whys), brackets,
                settings.scope(), settings.crmBracket(), settings.blankFollowing());
    }

    /** The indices of the outcomes that trigger a re-assay, by batch, place in it, analyte and rule. */
    private static int[] triggers(ControlOutcomes outcomes, BatchSequence seq) {
        List<Integer> triggers = new ArrayList<>();
        for (int i = 0; i < outcomes.size(); i++) {
            if (outcomes.triggersReassay(i)) {
                triggers.add(i);
            }
        }
        triggers.sort(Comparator.comparingInt((Integer i) -> seq.batchOf(outcomes.row(i)))
                .thenComparingInt(i -> seq.indexInBatch(outcomes.row(i))).thenComparing(i -> outcomes.analyte(i))
                .thenComparing(i -> outcomes.rule(i)));
        return triggers.stream().mapToInt(Integer::intValue).toArray();
    }

    /** The bracket of trigger {@code i}; {@code listed} receives the row of each sample it puts on the list. */
    private static ReassayBracket bracket(SampleTable table, BatchSequence seq, ControlOutcomes outcomes, int i,
                                          byte[] status, ReassaySettings settings, IntConsumer listed) {
        int control = outcomes.row(i);
        int b = seq.batchOf(control);
        Range r = range(table, seq, control, status, settings);
        int n = 0;
        int to = r.to();
        for (int k = r.from(); k <= r.to() && n < r.cap(); k++) {
            int row = seq.row(b, k);
            if (isReassayed(table.role(row))) {
                n++;
                to = k;
                listed.accept(row);
            }
        }
        to = n == r.cap() ? to : r.to();
        int fromPosition = r.from() <= to ? table.position(seq.row(b, r.from())) : table.position(control);
        int toPosition = r.from() <= to ? table.position(seq.row(b, to)) : table.position(control);
        return new ReassayBracket(table.id(control), table.role(control).label(), seq.batch(b).id(),
                outcomes.analyte(i), outcomes.rule(i), fromPosition, toPosition, n, r.note());
    }

    /** Indices in the batch a failed control reaches, at most {@code cap} listed samples, and how it was bounded. */
    private record Range(int from, int to, int cap, String note) {
    }

    private static Range range(SampleTable table, BatchSequence seq, int failed, byte[] status,
                               ReassaySettings settings) {
        int b = seq.batchOf(failed);
        int size = seq.batchSize(b);
        int at = seq.indexInBatch(failed);
        if (settings.scope() == ReassaySettings.Scope.WHOLE_BATCH) {
            return new Range(0, size - 1, Integer.MAX_VALUE, "whole batch");
        }
        if (table.role(failed) == QcRole.BLANK) {
            int next = nextPassing(table, seq, b, at, +1, status, Bound.BLANK);
            int cap = settings.blankFollowing() > 0 ? settings.blankFollowing() : Integer.MAX_VALUE;
            return new Range(at + 1, next < 0 ? size - 1 : next - 1, cap, "after the blank, up to "
                    + (next < 0 ? "the end of the batch (no passing blank after it)"
                    : "passing blank " + table.id(seq.row(b, next)))
                    + (cap < Integer.MAX_VALUE ? ", at most " + cap + " samples (reassay.blankFollowing)" : ""));
        }
        Bound bound = settings.crmBracket() == ReassaySettings.CrmBracket.PASSING_CRM ? Bound.CRM : Bound.CONTROL;
        int prev = nextPassing(table, seq, b, at, -1, status, bound);
        int next = nextPassing(table, seq, b, at, +1, status, bound);
        return new Range(prev < 0 ? 0 : prev + 1, next < 0 ? size - 1 : next - 1, Integer.MAX_VALUE, "from "
                + (prev < 0 ? "the start of the batch (no " + bound.label + " before it)"
                : bound.label + " " + table.id(seq.row(b, prev))) + " to "
                + (next < 0 ? "the end of the batch (no " + bound.label + " after it)"
                : bound.label + " " + table.id(seq.row(b, next))));
    }

    /** Which controls end a bracket when they pass. */
    private enum Bound {
        CRM("passing CRM"), BLANK("passing blank"), CONTROL("passing control");

        private final String label;

        Bound(String label) {
            this.label = label;
        }

        boolean admits(QcRole role) {
            switch (this) {
                case CRM: return role == QcRole.CRM;
                case BLANK: return role == QcRole.BLANK;
                default: return isControl(role);
            }
        }
    }

    /** Index in batch {@code b} of the nearest passing control of kind {@code bound} in direction {@code step}, or -1. */
    private static int nextPassing(SampleTable table, BatchSequence seq, int b, int at, int step, byte[] status,
                                   Bound bound) {
        for (int k = at + step; k >= 0 && k < seq.batchSize(b); k += step) {
            int row = seq.row(b, k);
            if (!bound.admits(table.role(row))) {
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
}
