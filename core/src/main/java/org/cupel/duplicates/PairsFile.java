package org.cupel.duplicates;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.cupel.assay.AssayValue;
import org.cupel.assay.QcRole;
import org.cupel.ingest.ParsedValue;
import org.cupel.ingest.RawRow;
import org.cupel.ingest.RawTable;
import org.cupel.ingest.TableReader;
import org.cupel.ingest.ValueParser;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.cupel.project.MessageText;

/**
 * Reads a plain pairs table without a project: columns {@code original} and {@code duplicate} (values as a
 * lab prints them, {@code <0.005} for below detection), optional {@code type} (field, coarse, pulp, repeat,
 * umpire), {@code batch}, {@code id} and {@code dl} (detection limit). Rows with an unreadable cell are left
 * out and listed as issues.
 */
public final class PairsFile {
    private static final String[] ORIGINAL = {"original", "orig", "primary", "original value", "a"};
    private static final String[] DUPLICATE = {"duplicate", "dup", "duplicate value", "check", "umpire", "b"};

    private PairsFile() {
    }

    /** Pairs read and the rows left out. */
    public record Result(List<DuplicatePair> pairs, List<DataIssue> issues) {
        public Result {
            pairs = List.copyOf(pairs);
            issues = List.copyOf(issues);
        }
    }

    /**
     * @param defaultType the type of pairs when the file has no {@code type} column
     * @throws InputException when the file cannot be read or lacks the original or duplicate column
     */
    public static Result read(Path file, QcRole defaultType) {
        RawTable table = TableReader.read(file, cells -> hasColumn(cells, ORIGINAL) && hasColumn(cells, DUPLICATE));
        int orig = table.column(ORIGINAL);
        int dup = table.column(DUPLICATE);
        if (orig < 0 || dup < 0) {
            throw new InputException(table.file() + ":" + table.headerLine() + ": a pairs file needs the columns "
                    + "'original' and 'duplicate' (found " + MessageText.list(table.columns()) + "); rename the two "
                    + "value columns, or give a project folder instead.");
        }
        int type = table.column("type", "duplicate type", "qc type", "role");
        int batch = table.column("batch", "job", "certificate", "batch id");
        int id = table.column("id", "sample id", "duplicate id", "sample");
        int dl = table.column("dl", "detection limit", "lod", "ldl");
        ValueParser parser = ValueParser.forPlainTable();
        List<DuplicatePair> pairs = new ArrayList<>();
        List<DataIssue> issues = new ArrayList<>(table.issues());
        for (RawRow row : table.rows()) {
            double limit = Double.NaN;
            if (dl >= 0 && !row.cell(dl).isEmpty()) {
                ParsedValue l = parser.parse(row.cell(dl), Double.NaN, table.at(row, dl));
                if (!l.usable() || !l.value().isDetected()) {
                    issues.add(issue(table, row, dl, row.cell(dl), "the detection limit is not a plain number",
                            "a number such as 0.005", "write the limit as a number in the unit of the values"));
                    continue;
                }
                limit = l.value().value();
            }
            ParsedValue a = parser.parse(row.cell(orig), limit, table.at(row, orig));
            ParsedValue b = parser.parse(row.cell(dup), limit, table.at(row, dup));
            if (!a.usable() || !b.usable()) {
                issues.add(!a.usable() ? a.issue() : b.issue());
                continue;
            }
            Optional<QcRole> role = type < 0 || row.cell(type).isEmpty() ? Optional.of(defaultType)
                    : QcRole.parse(row.cell(type)).filter(QcRole::isDuplicate);
            if (role.isEmpty()) {
                issues.add(issue(table, row, type, row.cell(type), "the duplicate type is not recognised",
                        "field, coarse, pulp, repeat or umpire", "correct the type or leave the cell empty"));
                continue;
            }
            String label = id >= 0 && !row.cell(id).isEmpty() ? row.cell(id) : "line " + row.line();
            pairs.add(new DuplicatePair(label, "", batch >= 0 ? row.cell(batch) : "", role.get(), withLimit(a.value(),
                    limit), withLimit(b.value(), limit)));
        }
        parser.checkDecimalMarks();
        return new Result(pairs, issues);
    }

    private static AssayValue withLimit(AssayValue v, double limit) {
        if (Double.isNaN(limit) || !Double.isNaN(v.limit()) || v.isMissing()) {
            return v;
        }
        return new AssayValue(v.qualifier(), v.value(), limit, v.missingReason(), v.decimals());
    }

    private static boolean hasColumn(List<String> cells, String[] aliases) {
        for (String c : cells) {
            for (String a : aliases) {
                if (RawTable.normalise(c).equals(RawTable.normalise(a))) {
                    return true;
                }
            }
        }
        return false;
    }

    private static DataIssue issue(RawTable table, RawRow row, int column, String found, String problem,
                                   String expected, String fix) {
        return new DataIssue(DataIssue.Severity.EXCLUDED, table.at(row, column), "", found, problem, expected, fix);
    }
}
