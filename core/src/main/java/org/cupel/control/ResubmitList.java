package org.cupel.control;

import java.util.ArrayList;
import java.util.Collection;
import java.util.EnumMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.cupel.assay.AnalyteColumn;
import org.cupel.assay.Batch;
import org.cupel.assay.MissingReason;
import org.cupel.assay.Qualifier;
import org.cupel.assay.SampleTable;

/**
 * The samples to re-submit: every sample whose reported result for some analyte is missing because the lab
 * reported the material insufficient ({@link MissingReason#INSUFFICIENT_SAMPLE}) or not received
 * ({@link MissingReason#NOT_RECEIVED}). Results missing for other reasons (not analysed: the lab ran a shorter
 * suite; a blank cell) are not a request to the lab and are not listed. A sample re-assayed with a result
 * reported is not listed either: the reported result is the one judged. Every QC role is listed, control
 * samples included (a CRM not received gave no control).
 *
 * @param entries one per sample and reason, in batch and run order
 */
public record ResubmitList(List<ResubmitEntry> entries) {
    public ResubmitList {
        entries = List.copyOf(entries);
    }

    /**
     * @param columns the analyte columns, in project order, row-aligned with {@code table}
     */
    public static ResubmitList of(SampleTable table, BatchSequence seq, Collection<AnalyteColumn> columns) {
        List<ResubmitEntry> out = new ArrayList<>();
        for (int b = 0; b < seq.size(); b++) {
            for (int k = 0; k < seq.batchSize(b); k++) {
                addRow(table, seq.row(b, k), columns, out);
            }
        }
        return new ResubmitList(out);
    }

    private static void addRow(SampleTable table, int row, Collection<AnalyteColumn> columns,
                               List<ResubmitEntry> out) {
        // Made at the first missing value only: a million rows with none made two maps each (0.4 GB at 1M).
        Map<MissingReason, List<String>> analytes = null;
        Map<MissingReason, Set<String>> codes = null;
        for (AnalyteColumn c : columns) {
            if (c.qualifier(row) != Qualifier.MISSING) {
                continue;
            }
            MissingReason reason = c.value(row).missingReason();
            if (reason == MissingReason.INSUFFICIENT_SAMPLE || reason == MissingReason.NOT_RECEIVED) {
                if (analytes == null) {
                    analytes = new EnumMap<>(MissingReason.class);
                    codes = new EnumMap<>(MissingReason.class);
                }
                analytes.computeIfAbsent(reason, r -> new ArrayList<>()).add(c.analyte().name());
                Set<String> mine = codes.computeIfAbsent(reason, r -> new LinkedHashSet<>());
                if (!c.missingCode(row).isEmpty()) {
                    mine.add(c.missingCode(row));
                }
            }
        }
        if (analytes == null) {
            return;
        }
        Map<MissingReason, Set<String>> codesOf = codes;
        Batch batch = table.batch(row);
        analytes.forEach((reason, names) -> out.add(new ResubmitEntry(table.id(row), batch.id(), batch.lab(),
                table.position(row), table.role(row).label(), reason, new ArrayList<>(codesOf.get(reason)), names,
                table.source(row))));
    }

    /** Samples listed for {@code reason}. */
    public long count(MissingReason reason) {
        return entries.stream().filter(e -> e.reason() == reason).count();
    }
}
