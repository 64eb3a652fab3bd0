package org.cupel.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.cupel.project.DataIssue;
import org.cupel.project.ExceptionRegister;
import org.cupel.project.FileAccount;
import org.cupel.project.Project;

/**
 * Section "Data exceptions": every input problem of the exceptions register, and the row accounting of
 * each input file (rows read = rows analysed + rows excluded), so a reviewer sees that no row was lost.
 */
public final class DataExceptionsSection {
    public static final String ID = "data-exceptions";

    private DataExceptionsSection() {
    }

    public static ReportSection build(Project project) {
        ExceptionRegister reg = project.exceptions();
        int warnings = reg.withSeverity(DataIssue.Severity.WARNING).size();
        int excluded = reg.withSeverity(DataIssue.Severity.EXCLUDED).size();
        int fatal = reg.withSeverity(DataIssue.Severity.FATAL).size();
        List<FileAccount> unbalanced = project.files().stream().filter(f -> !f.balances()).toList();
        List<ReportBlock> blocks = new ArrayList<>();
        blocks.add(new ReportBlock.Paragraph("Input problems found: " + reg.size() + ". Left out of the analyses "
                + "(rows or values): " + excluded + "; warnings on rows still analysed: " + warnings
                + "; files that could not be used: " + fatal + ". Each is listed with its file, line and column, what "
                + "was found, what was expected, and how to fix it."));
        if (fatal > 0) {
            blocks.add(new ReportBlock.Callout(ReportBlock.Level.FAIL, fatal + " input file(s) could not be used; "
                    + "their rows are missing from every analysis until the files are fixed."));
        }
        for (FileAccount f : unbalanced) {
            blocks.add(new ReportBlock.Callout(ReportBlock.Level.FAIL, String.format(Locale.US,
                    "%s: %,d rows read but %,d analysed and %,d excluded; the accounting does not balance.",
                    f.file(), f.rowsRead(), f.rowsAnalysed(), f.rowsExcluded())));
        }
        blocks.add(new ReportBlock.Table(accounts(project.files())));
        blocks.add(new ReportBlock.Table(issues(reg.all())));
        Map<String, Object> h = new LinkedHashMap<>();
        h.put("issues", reg.size());
        h.put("excluded", excluded);
        h.put("warnings", warnings);
        h.put("fatal", fatal);
        h.put("files", project.files().size());
        h.put("filesNotBalanced", unbalanced.size());
        return new ReportSection(ID, "Data exceptions", blocks, h);
    }

    private static ReportTable accounts(List<FileAccount> files) {
        List<List<Cell>> rows = new ArrayList<>();
        for (FileAccount f : files) {
            rows.add(List.of(Cell.text(f.file()), Cell.text(f.kind()), Cell.count(f.rowsRead()),
                    Cell.count(f.rowsAnalysed()), Cell.count(f.rowsExcluded()), Cell.text(f.balances() ? "yes" : "NO")));
        }
        return ReportTable.typed("file-row-accounts", "Rows read, analysed and excluded, per input file",
                List.of(ReportColumn.text("File", "file"), ReportColumn.text("Kind", "kind"),
                        ReportColumn.count("Rows read", "rows_read"), ReportColumn.count("Analysed", "rows_analysed"),
                        ReportColumn.count("Excluded", "rows_excluded"), ReportColumn.text("Balances", "balances")), rows,
                "Header lines are not counted. Rows read = analysed + excluded for every file that balances.");
    }

    private static ReportTable issues(List<DataIssue> all) {
        List<List<Cell>> rows = new ArrayList<>();
        for (DataIssue i : all) {
            rows.add(List.of(Cell.text(severity(i.severity())), Cell.text(i.where().file()),
                    i.where().line() > 0 ? plain(i.where().line()) : Cell.blank(),
                    i.where().column() > 0 ? plain(i.where().column()) : Cell.blank(), Cell.text(i.sampleId()),
                    Cell.text(i.found()), Cell.text(i.problem()), Cell.text(i.expected()), Cell.text(i.fix())));
        }
        return ReportTable.typed("data-exceptions", "Exceptions register",
                List.of(ReportColumn.text("Severity", "severity"), ReportColumn.text("File", "file"),
                        ReportColumn.count("Line", "line"), ReportColumn.count("Column", "column"),
                        ReportColumn.text("Sample", "sample"), ReportColumn.text("Found", "found"),
                        ReportColumn.text("Problem", "problem"), ReportColumn.text("Expected", "expected"),
                        ReportColumn.text("Fix", "fix")), rows,
                "In the order found. Excluded: left out of the analyses. Warning: analysed, but check. "
                        + "Fatal: the file was not used.");
    }

    private static String severity(DataIssue.Severity s) {
        switch (s) {
            case EXCLUDED: return "excluded";
            case FATAL: return "fatal";
            default: return "warning";
        }
    }

    /** A line or column number: a whole number shown without grouping, as an editor shows it. */
    private static Cell plain(long n) {
        return new Cell.Number(n, Long.toString(n), Long.toString(n));
    }
}
