package org.cupel.control;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.QcRole;
import org.cupel.assay.SampleTable;

/**
 * The batches of a review split by what they are for. An umpire-lab batch holds umpire checks and nothing
 * else but control samples (CRMs, blanks): its samples are pulps of the primary lab's batches sent to a
 * second lab, so it is no batch of the drilling programme and a missing CRM in it is no gap in the
 * programme's control. Every other batch is a primary batch, judged by its control samples.
 *
 * @param primary verdicts of the primary batches, in table order
 * @param umpireLabs umpire-lab batches grouped by lab, labs in the order first met
 */
public record BatchGroups(List<BatchVerdict> primary, List<UmpireLab> umpireLabs) {
    public BatchGroups {
        primary = List.copyOf(primary);
        umpireLabs = List.copyOf(umpireLabs);
    }

    /**
     * @param verdicts one per batch of {@code seq}, in its order (as {@link BatchVerdicts#judge} returns them)
     */
    public static BatchGroups of(SampleTable table, BatchSequence seq, List<BatchVerdict> verdicts) {
        if (verdicts.size() != seq.size()) {
            throw new IllegalArgumentException(verdicts.size() + " verdicts for " + seq.size() + " batches");
        }
        List<BatchVerdict> primary = new ArrayList<>();
        Map<String, List<BatchVerdict>> umpire = new LinkedHashMap<>();
        Map<String, Integer> checks = new LinkedHashMap<>();
        for (int b = 0; b < seq.size(); b++) {
            int n = umpireChecks(table, seq, b);
            if (n < 0) {
                primary.add(verdicts.get(b));
            } else {
                String lab = seq.batch(b).lab();
                umpire.computeIfAbsent(lab, k -> new ArrayList<>()).add(verdicts.get(b));
                checks.merge(lab, n, Integer::sum);
            }
        }
        List<UmpireLab> labs = new ArrayList<>();
        umpire.forEach((lab, batches) -> labs.add(new UmpireLab(lab, batches, checks.get(lab))));
        return new BatchGroups(primary, labs);
    }

    /** The umpire checks of batch {@code b} when it is an umpire-lab batch, else -1. */
    private static int umpireChecks(SampleTable table, BatchSequence seq, int b) {
        int n = 0;
        for (int k = 0; k < seq.batchSize(b); k++) {
            QcRole role = table.role(seq.row(b, k));
            if (role == QcRole.UMPIRE) {
                n++;
            } else if (role != QcRole.CRM && role != QcRole.BLANK) {
                return -1;
            }
        }
        return n > 0 ? n : -1;
    }

    /** Umpire-lab batches over all umpire labs. */
    public int umpireBatches() {
        return umpireLabs.stream().mapToInt(u -> u.batches().size()).sum();
    }
}
