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
        List<List<String>> rows = new ArrayList<>();
        for (FileAccount f : files) {
            rows.add(List.of(f.file(), f.kind(), count(f.rowsRead()), count(f.rowsAnalysed()), count(f.rowsExcluded()),
                    f.balances() ? "yes" : "NO"));
        }
        return new ReportTable("file-row-accounts", "Rows read, analysed and excluded, per input file",
                List.of("File", "Kind", "Rows read", "Analysed", "Excluded", "Balances"), rows,
                "Header lines are not counted. Rows read = analysed + excluded for every file that balances.");
    }

    private static ReportTable issues(List<DataIssue> all) {
        List<List<String>> rows = new ArrayList<>();
        for (DataIssue i : all) {
            rows.add(List.of(severity(i.severity()), i.where().file(), i.where().line() > 0 ? count(i.where().line())
                    : "", i.where().column() > 0 ? count(i.where().column()) : "", i.sampleId(), i.found(), i.problem(),
                    i.expected(), i.fix()));
        }
        return new ReportTable("data-exceptions", "Exceptions register",
                List.of("Severity", "File", "Line", "Column", "Sample", "Found", "Problem", "Expected", "Fix"), rows,
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

    private static String count(long n) {
        return String.format(Locale.US, "%d", n);
    }
}
