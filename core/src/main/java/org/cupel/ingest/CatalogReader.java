package org.cupel.ingest;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.cupel.assay.AssayValue;
import org.cupel.assay.SourceLocation;
import org.cupel.project.CrmCatalog;
import org.cupel.project.CrmCertificate;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.cupel.project.MessageText;
import org.cupel.units.GradeUnit;

/**
 * Reads the CRM catalog ({@code crm-catalog.csv}): one row per CRM and analyte with unit, certified
 * value and the certificate's between-lab 1 SD, optionally the 95 % interval and method. Values are
 * converted to the project's unit for the analyte when one is given. A row that cannot be used is
 * excluded with the reason.
 */
public final class CatalogReader {
    private static final String[] CODE = {"crm", "code", "crm code", "standard"};
    private static final String[] ANALYTE = {"analyte", "element"};
    private static final String[] UNIT = {"unit", "units"};
    private static final String[] VALUE = {"certified value", "certified", "value", "expected"};
    private static final String[] SD = {"sd", "1sd", "sd1", "std dev", "standard deviation"};
    private static final String[] CI_LOW = {"ci95 low", "ci low", "ci95 lower"};
    private static final String[] CI_HIGH = {"ci95 high", "ci high", "ci95 upper"};
    private static final String[] METHOD = {"method"};

    /** The catalog and what reading it found. */
    public record Result(CrmCatalog catalog, List<DataIssue> issues, long rowsRead, long rowsExcluded) {
    }

    private CatalogReader() {
    }

    /** @param units analyte → the project's reporting unit; certificates of other analytes keep their unit */
    public static Result read(Path path, String displayName, Map<String, GradeUnit> units) {
        RawTable t = TableReader.read(path, displayName, CatalogReader::isHeader, null);
        int[] cols = {t.column(CODE), t.column(ANALYTE), t.column(UNIT), t.column(VALUE), t.column(SD)};
        String[] names = {"crm", "analyte", "unit", "certified_value", "sd"};
        for (int i = 0; i < cols.length; i++) {
            if (cols[i] < 0) {
                throw new InputException(displayName + ":" + t.headerLine() + ": no '" + names[i] + "' column among "
                        + MessageText.list(t.columns()) + " (expected crm, analyte, unit, certified_value, sd); add or rename the column.");
            }
        }
        int lo = t.column(CI_LOW);
        int hi = t.column(CI_HIGH);
        int method = t.column(METHOD);
        List<CrmCertificate> certs = new ArrayList<>();
        Map<String, CatalogConflicts.Row> seen = new HashMap<>();
        List<DataIssue> issues = new ArrayList<>(t.issues());
        long excluded = 0;
        ValueParser parser = ValueParser.forPlainTable();
        for (RawRow row : t.rows()) {
            String code = row.cell(cols[0]);
            String analyte = row.cell(cols[1]);
            Optional<GradeUnit> unit = GradeUnit.parse(row.cell(cols[2]));
            GradeUnit u = unit.orElse(null);
            AssayValue valueRead = number(parser, t, row, cols[3], u);
            AssayValue sdRead = number(parser, t, row, cols[4], u);
            double value = valueRead == null ? Double.NaN : valueRead.value();
            double sd = sdRead == null ? Double.NaN : sdRead.value();
            String problem = null;
            int at = 0;
            if (code.isEmpty() || analyte.isEmpty()) {
                problem = "the row has no CRM code or analyte";
                at = code.isEmpty() ? cols[0] : cols[1];
            } else if (unit.isEmpty()) {
                problem = "unknown unit '" + row.cell(cols[2]) + "' (expected ppb, ppm, g/t, %, oz/st...)";
                at = cols[2];
            } else if (!Double.isFinite(value)) {
                problem = "the certified value '" + row.cell(cols[3]) + "' is not a number";
                at = cols[3];
            } else if (!(sd > 0)) {
                problem = "the SD '" + row.cell(cols[4]) + "' is not a positive number";
                at = cols[4];
            }
            if (problem != null) {
                // Row-level location: the whole row is left out; the problem names the column.
                SourceLocation where = t.at(row);
                issues.add(new DataIssue(DataIssue.Severity.EXCLUDED, where, code, row.cell(at), problem
                                + "; this certificate row is left out",
                        "crm, analyte, unit, certified value and a positive 1 SD", "correct the catalog row"));
                excluded++;
                continue;
            }
            CrmCertificate c = new CrmCertificate(code, analyte, unit.get(), value, sd,
                    lo >= 0 ? plain(number(parser, t, row, lo, u)) : Double.NaN,
                    hi >= 0 ? plain(number(parser, t, row, hi, u)) : Double.NaN,
                    method >= 0 ? row.cell(method) : "", valueRead.decimals(), sdRead.decimals());
            CatalogConflicts.Row here = new CatalogConflicts.Row(t.at(row), c);
            CatalogConflicts.Row first = seen.putIfAbsent(code + "\u0000" + analyte, here);
            if (first != null) {
                issues.addAll(CatalogConflicts.issues(first, here));
                excluded++;
                continue;
            }
            GradeUnit target = units.get(analyte);
            certs.add(target == null ? c : c.in(target));
        }
        parser.checkDecimalMarks();
        long leftOut = t.rowsLeftOut();
        return new Result(new CrmCatalog(certs), List.copyOf(issues), t.rows().size() + leftOut, excluded + leftOut);
    }

    private static boolean isHeader(List<String> cells) {
        for (String c : cells) {
            String n = RawTable.normalise(c);
            if (n.equals("crm") || n.equals("crm code")) {
                return true;
            }
        }
        return false;
    }

    /**
     * The cell as a plain number at most 100 % in {@code unit}, with the decimals it is written with; null
     * when it is none (the row is then left out).
     */
    private static AssayValue number(ValueParser parser, RawTable t, RawRow row, int column, GradeUnit unit) {
        String text = row.cell(column);
        if (text.isEmpty()) {
            return null;
        }
        ParsedValue p = parser.parse(text, Double.NaN, t.at(row, column), unit);
        return p.usable() && p.value().isDetected() ? p.value() : null;
    }

    private static double plain(AssayValue v) {
        return v == null ? Double.NaN : v.value();
    }
}
