package org.cupel.report.control;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cupel.assay.Numbers;
import org.cupel.control.BatchInsertion;
import org.cupel.control.InsertionRate;
import org.cupel.control.InsertionRates;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportSection;
import org.cupel.report.ReportTable;
import org.cupel.report.Reference;

/** Insertion rates of CRMs, blanks and each duplicate type per batch and overall, against the targets. */
public final class InsertionRateSection {
    static final Reference ABZALOV = new Reference("Abzalov, M.", 2008, "Quality control of assay data: a review of "
            + "procedures for measuring and monitoring precision and accuracy", "Exploration and Mining Geology 17");

    private InsertionRateSection() {
    }

    public static ReportSection build(InsertionRates rates) {
        List<ReportBlock> blocks = new ArrayList<>();
        int below = rates.belowTarget().size();
        blocks.add(new ReportBlock.Callout(below > 0 ? ReportBlock.Level.WARN : ReportBlock.Level.PASS,
                below + " of " + rates.batches().size() + " batches have some QC type below its target rate."));
        blocks.add(new ReportBlock.Table(table(rates)));
        Map<String, Object> headlines = new LinkedHashMap<>();
        headlines.put("batchesBelowInsertionTarget", below);
        for (InsertionRate r : rates.overall().rates()) {
            headlines.put("insertionRate " + r.role(), r.rate());
        }
        return new ReportSection("insertion-rates", "Insertion rates", blocks, headlines, List.of(ABZALOV));
    }

    static ReportTable table(InsertionRates rates) {
        List<String> columns = new ArrayList<>(List.of("Batch", "Samples", "Routine"));
        for (InsertionRate r : rates.overall().rates()) {
            columns.add(capital(r.role()) + (r.target() > 0 ? " (target " + percent(r.target()) + ")" : ""));
        }
        columns.add("Below target");
        List<List<String>> rows = new ArrayList<>();
        for (BatchInsertion b : rates.batches()) {
            rows.add(row(b));
        }
        rows.add(row(rates.overall()));
        return new ReportTable("insertion-rates", "Insertion rates per batch and overall", columns, rows,
                "Rate = samples of the type ÷ routine samples of the batch (1 in 20 = one per 20 routine samples). Targets: about 1 in 20 each (common practice); "
                        + "Abzalov (2008, Exploration and Mining Geology 17) gives field duplicates 5–10 %, pulp "
                        + "duplicates 3–5 %, standards 3–5 % and about 5 % to an umpire lab.");
    }

    private static List<String> row(BatchInsertion b) {
        List<String> row = new ArrayList<>(List.of(b.batch(), Integer.toString(b.nSamples()),
                Integer.toString(b.nRoutine())));
        List<String> low = new ArrayList<>();
        for (InsertionRate r : b.rates()) {
            row.add(r.count() + " · " + (Double.isNaN(r.rate()) ? "–" : percent(r.rate())) + " (" + r.oneIn() + ")");
            if (r.belowTarget()) {
                low.add(r.role());
            }
        }
        row.add(low.isEmpty() ? "" : String.join(", ", low));
        return row;
    }

    static String percent(double fraction) {
        return Numbers.significant(100 * fraction, 2) + " %";
    }

    private static String capital(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
