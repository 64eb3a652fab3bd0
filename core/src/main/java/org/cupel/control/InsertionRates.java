package org.cupel.control;

import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.LimitComparison;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;

/**
 * Insertion rates of CRMs, blanks and each duplicate type per batch and overall: rate = count of the role
 * ÷ routine samples of the batch, so "1 in 20" is one control per 20 routine samples (common practice),
 * compared with the targets of {@link InsertionSettings}. A rate strictly below a positive target is
 * flagged; a batch without routine samples has no rate (NaN) and is not flagged.
 *
 * @param batches one per batch (lab and batch ID, see {@link BatchSequence}), in table order
 * @param overall the whole project
 * @param settings targets in force
 */
public record InsertionRates(List<BatchInsertion> batches, BatchInsertion overall, InsertionSettings settings) {

    /** Roles reported, in this order. */
    public static final List<QcRole> ROLES = List.of(QcRole.CRM, QcRole.BLANK, QcRole.FIELD_DUPLICATE,
            QcRole.COARSE_DUPLICATE, QcRole.PULP_DUPLICATE, QcRole.LAB_REPEAT, QcRole.UMPIRE);

    public InsertionRates {
        batches = List.copyOf(batches);
    }

    public static InsertionRates compute(SampleTable table, InsertionSettings settings) {
        return compute(table, BatchSequence.of(table), settings);
    }

    /** As {@link #compute(SampleTable, InsertionSettings)}, with the table's batch sequence already built. */
    public static InsertionRates compute(SampleTable table, BatchSequence seq, InsertionSettings settings) {
        int nb = seq.size();
        int[][] counts = new int[nb][QcRole.values().length];
        int[] all = new int[QcRole.values().length];
        for (QcRole role : QcRole.values()) {
            int[] rows = table.rowsWithRole(role);
            for (int row : rows) {
                counts[seq.batchOf(row)][role.ordinal()]++;
            }
            all[role.ordinal()] = rows.length;
        }
        List<BatchInsertion> batches = new ArrayList<>(nb);
        for (int b = 0; b < nb; b++) {
            batches.add(of(seq.batch(b).id(), counts[b], settings));
        }
        return new InsertionRates(batches, of("all batches", all, settings), settings);
    }

    /** Batches with some role below target. */
    public List<BatchInsertion> belowTarget() {
        return batches.stream().filter(BatchInsertion::belowTarget).toList();
    }

    static BatchInsertion of(String batch, int[] countsByRole, InsertionSettings settings) {
        int total = 0;
        for (int c : countsByRole) {
            total += c;
        }
        int routine = countsByRole[QcRole.ROUTINE.ordinal()];
        List<InsertionRate> rates = new ArrayList<>();
        boolean below = false;
        for (QcRole role : ROLES) {
            int c = countsByRole[role.ordinal()];
            double rate = routine == 0 ? Double.NaN : (double) c / routine;
            double target = settings.target(role);
            boolean low = target > 0 && routine > 0 && LimitComparison.below(rate, target);
            below |= low;
            rates.add(new InsertionRate(role.label(), c, routine, rate, target, low));
        }
        return new BatchInsertion(batch, total, routine, rates, below);
    }
}
