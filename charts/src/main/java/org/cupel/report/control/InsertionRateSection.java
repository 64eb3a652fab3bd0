package org.cupel.report.control;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.cupel.assay.Numbers;
import org.cupel.control.BatchInsertion;
import org.cupel.control.InsertionRate;
import org.cupel.control.InsertionRates;
import org.cupel.report.Cell;
import org.cupel.report.ReportBlock;
import org.cupel.report.ReportColumn;
import org.cupel.report.ReportSection;
import org.cupel.report.ReportTable;

/** Insertion rates of CRMs, blanks and each duplicate type per batch and overall, against the targets. */
public final class InsertionRateSection {
    private InsertionRateSection() {
    }

    public static ReportSection build(InsertionRates rates) {
        List<ReportBlock> blocks = new ArrayList<>();
        int below = rates.belowTarget().size();
        blocks.add(new ReportBlock.Callout(below > 0 ? ReportBlock.Level.WARN
                : rates.batches().isEmpty() ? ReportBlock.Level.CANNOT_JUDGE : ReportBlock.Level.PASS,
                below + " of " + rates.batches().size() + " batches have some QC type below its target rate."));
        blocks.add(new ReportBlock.Table(table(rates)));
        Map<String, Object> headlines = new LinkedHashMap<>();
        headlines.put("batchesBelowInsertionTarget", below);
        List<InsertionRate> overall = rates.overall().rates();
        for (int i = 0; i < overall.size(); i++) {
            InsertionRate r = overall.get(i);
            if (!Double.isNaN(r.rate())) {
                // A rate is a percentage of the routine samples, at the precision of the table.
                headlines.put("insertionRatePercent." + InsertionRates.ROLES.get(i).name().toLowerCase(Locale.ROOT),
                        Math.round(1000 * r.rate()) / 10.0);
            }
        }
        return new ReportSection("insertion-rates", "Insertion rates", blocks, headlines);
    }

    /** Column names of {@link InsertionRates#ROLES}, in that order. */
    public static final List<String> SHORT_NAMES = List.of("CRM", "Blank", "Field dup.", "Coarse dup.", "Pulp dup.",
            "Lab repeat", "Umpire");

    static ReportTable table(InsertionRates rates) {
        List<ReportColumn> columns = new ArrayList<>(List.of(ReportColumn.text("Batch", "batch"),
                ReportColumn.count("Samples", "samples"), ReportColumn.count("Routine", "routine")));
        for (int i = 0; i < SHORT_NAMES.size(); i++) {
            columns.add(ReportColumn.parts(SHORT_NAMES.get(i), InsertionRates.ROLES.get(i).name().toLowerCase(Locale.ROOT),
                    new ReportColumn.Part("", "", ReportColumn.CsvType.LONG),
                    new ReportColumn.Part("rate", "%", ReportColumn.CsvType.DOUBLE)));
        }
        columns.add(ReportColumn.text("Below target", "below_target"));
        List<List<Cell>> rows = new ArrayList<>();
        for (BatchInsertion b : rates.batches()) {
            rows.add(row(b));
        }
        rows.add(row(rates.overall()));
        return ReportTable.typed("insertion-rates", "Insertion rates per batch and overall", columns, rows,
                "Count (rate): rate = samples of the type ÷ routine samples of the batch (1 in 20 = 5.0 %). Targets: "
                        + targets(rates) + "; about 1 in 20 each is common practice; "
                        + "Abzalov (2008, Exploration and Mining Geology 17) gives field duplicates 5–10 %, pulp "
                        + "duplicates 3–5 %, standards 3–5 % and about 5 % to an umpire lab.");
    }

    private static List<Cell> row(BatchInsertion b) {
        List<Cell> row = new ArrayList<>(List.of(Cell.text(b.batch()), Cell.count(b.nSamples()),
                Cell.count(b.nRoutine())));
        List<String> low = new ArrayList<>();
        for (int i = 0; i < b.rates().size(); i++) {
            InsertionRate r = b.rates().get(i);
            Cell.Number count = Cell.fixedNumber(r.count(), 0);
            row.add(Double.isNaN(r.rate()) ? new Cell.Parts(java.util.Arrays.asList(count, null), count.display())
                    : new Cell.Parts(List.of(count, Cell.fixedNumber(100 * r.rate(), 1)),
                    r.count() + " (" + percent(r.rate()) + ")"));
            if (r.belowTarget()) {
                low.add(SHORT_NAMES.get(i));
            }
        }
        row.add(Cell.text(low.isEmpty() ? "" : String.join(", ", low)));
        return row;
    }

    /** A rate as a percentage with one decimal: {@code 5.0 %}, not 0.05 (common practice). */
    public static String percent(double fraction) {
        return Numbers.fixed(100 * fraction, 1) + " %";
    }

    /** "CRM 5 %, Blank 5 %, ..." for the roles with a target. */
    public static String targets(InsertionRates rates) {
        List<String> out = new ArrayList<>();
        List<InsertionRate> overall = rates.overall().rates();
        for (int i = 0; i < overall.size(); i++) {
            if (overall.get(i).target() > 0) {
                out.add(SHORT_NAMES.get(i) + " " + percent(overall.get(i).target()));
            }
        }
        return out.isEmpty() ? "none" : String.join(", ", out);
    }
}
