package org.cupel.project;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.function.Predicate;
import org.cupel.assay.Batch;

/**
 * Which batches a review covers: reported on or after {@code since}, on or before {@code until}, and,
 * when IDs are given, only those batches. The weekly batch review and the final appendix differ only in
 * this selection. A batch without a report date cannot be placed in a period, so any date bound leaves it
 * out (and {@link #describe()} says so).
 *
 * @param since first report date included, or {@code null} for no lower bound
 * @param until last report date included, or {@code null} for no upper bound
 * @param batchIds batch IDs to keep; empty keeps every batch
 */
public record BatchSelection(LocalDate since, LocalDate until, Set<String> batchIds) implements Predicate<Batch> {

    public static final BatchSelection ALL = new BatchSelection(null, null, Set.of());

    public BatchSelection {
        batchIds = Set.copyOf(batchIds);
        if (since != null && until != null && until.isBefore(since)) {
            throw new InputException("the period is empty: --until " + until + " is before --since " + since
                    + "; give an --until date on or after the --since date");
        }
    }

    public boolean selectsAll() {
        return since == null && until == null && batchIds.isEmpty();
    }

    @Override
    public boolean test(Batch b) {
        if (!batchIds.isEmpty() && !batchIds.contains(b.id())) {
            return false;
        }
        if (since == null && until == null) {
            return true;
        }
        LocalDate d = b.reported();
        if (d == null) {
            return false;
        }
        return (since == null || !d.isBefore(since)) && (until == null || !d.isAfter(until));
    }

    /** "all batches", or e.g. "batches reported 2025-03-01 to 2025-03-07 (undated batches left out)". */
    public String describe() {
        if (selectsAll()) {
            return "all batches";
        }
        List<String> parts = new ArrayList<>();
        if (!batchIds.isEmpty()) {
            parts.add("batches " + String.join(", ", batchIds.stream().sorted().toList()));
        }
        if (since != null || until != null) {
            String from = since == null ? "the start" : since.toString();
            String to = until == null ? "the end" : until.toString();
            parts.add("reported " + from + " to " + to + " (undated batches left out)");
        }
        return String.join(", ", parts);
    }
}
