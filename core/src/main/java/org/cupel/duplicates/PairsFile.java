package org.cupel.duplicates;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.cupel.assay.Qualifier;
import org.cupel.ingest.ParsedValue;
import org.cupel.ingest.RawTable;
import org.cupel.ingest.TableRows;
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
            pairs = PairList.of(pairs);
            issues = List.copyOf(issues);
        }
    }

    /**
     * @param defaultType the type of pairs when the file has no {@code type} column
     * @throws InputException when the file cannot be read or lacks the original or duplicate column
     */
    public static Result read(Path file, QcRole defaultType) {
        Reader reader = new Reader(defaultType, TableRows.estimatedRows(file, 3, 6));
        TableRows.scan(file, cells -> hasColumn(cells, ORIGINAL) && hasColumn(cells, DUPLICATE), reader::open);
        reader.parser.checkDecimalMarks();
        List<DataIssue> issues = new ArrayList<>(reader.head.issues());
        issues.addAll(reader.ragged);
        issues.addAll(reader.issues);
        return new Result(reader.pairs.build(), issues);
    }

    /**
     * Reads the rows of one pairs table into {@link PairColumns}. A cell that is a plain number is read in place
     * (no String, no value object); every other cell goes through {@link ValueParser#parse}, which reports it
     * with its line and column when it is not usable, and the row is then left out and listed.
     */
    private static final class Reader implements TableRows.Visitor {
        private final QcRole defaultType;
        private final ValueParser parser = ValueParser.forPlainTable();
        private final PairColumns.Builder pairs;
        private final List<DataIssue> ragged = new ArrayList<>();
        private final List<DataIssue> issues = new ArrayList<>();
        private RawTable head;
        private int orig;
        private int dup;
        private int type;
        private int batch;
        private int id;
        private int dl;
        /** The member just read: its value when plain ({@link #plain}), else its parsed value. */
        private boolean plain;
        private double plainValue;
        private int plainDecimals;

        Reader(QcRole defaultType, int expectedRows) {
            this.defaultType = defaultType;
            pairs = new PairColumns.Builder(expectedRows);
        }

        TableRows.Visitor open(RawTable table) {
            head = table;
            orig = table.column(ORIGINAL);
            dup = table.column(DUPLICATE);
            if (orig < 0 || dup < 0) {
                throw new InputException(table.file() + ":" + table.headerLine() + ": a pairs file needs the "
                        + "columns 'original' and 'duplicate' (found " + MessageText.list(table.columns()) + "); "
                        + "rename the two value columns, or give a project folder instead.");
            }
            type = table.column("type", "duplicate type", "qc type", "role");
            batch = table.column("batch", "job", "certificate", "batch id");
            id = table.column("id", "sample id", "duplicate id", "sample");
            dl = table.column("dl", "detection limit", "lod", "ldl");
            return this;
        }

        @Override
        public void ragged(DataIssue issue) {
            ragged.add(issue);
        }

        @Override
        public void row(TableRows.Row row) {
            double limit = Double.NaN;
            if (dl >= 0 && !row.isEmpty(dl)) {
                ParsedValue l = parser.parse(row.cell(dl), Double.NaN, row.at(dl));
                if (!l.usable() || !l.value().isDetected()) {
                    issues.add(issue(row, dl, row.cell(dl), "the detection limit is not a plain number",
                            "a number such as 0.005", "write the limit as a number in the unit of the values"));
                    return;
                }
                limit = l.value().value();
            }
            // One issue per row: the first unusable member (the other is not read).
            AssayValue a = member(row, orig, limit);
            boolean aPlain = plain;
            double aValue = plainValue;
            int aDecimals = plainDecimals;
            if (!aPlain && a == null) {
                return;
            }
            AssayValue b = member(row, dup, limit);
            if (!plain && b == null) {
                return;
            }
            QcRole role = defaultType;
            if (type >= 0 && !row.isEmpty(type)) {
                Optional<QcRole> r = QcRole.parse(row.cell(type)).filter(QcRole::isDuplicate);
                if (r.isEmpty()) {
                    issues.add(issue(row, type, row.cell(type), "the duplicate type is not recognised",
                            "field, coarse, pulp, repeat or umpire", "correct the type or leave the cell empty"));
                    return;
                }
                role = r.get();
            }
            pairs.add(role, row.line());
            // A plain number gets the row's limit as it is (withLimit keeps a limit that parse found invalid).
            if (aPlain) {
                pairs.setOriginal(Qualifier.DETECTED, aValue, limit, MissingReason.NONE, aDecimals);
            } else {
                AssayValue v = withLimit(a, limit);
                pairs.setOriginal(v.qualifier(), v.value(), v.limit(), v.missingReason(), v.decimals());
            }
            if (plain) {
                pairs.setDuplicate(Qualifier.DETECTED, plainValue, limit, MissingReason.NONE, plainDecimals);
            } else {
                AssayValue v = withLimit(b, limit);
                pairs.setDuplicate(v.qualifier(), v.value(), v.limit(), v.missingReason(), v.decimals());
            }
            if (id >= 0) {
                row.appendCell(id, pairs.labelBuffer());
                pairs.endLabel();
            }
            if (batch >= 0 && !row.isEmpty(batch)) {
                // A batch's pairs mostly come together: compared with the row before before hashing.
                if (row.cellEquals(batch, pairs.previousBatch())) {
                    pairs.sameBatchAsPrevious();
                } else {
                    pairs.batch(row.cell(batch));
                }
            }
        }

        /**
         * Reads one member: a plain number in place ({@link #plain} set, null returned), else the parsed value, or
         * null with the issue listed when it is not usable.
         */
        private AssayValue member(TableRows.Row row, int column, double limit) {
            double v = row.plainNumber(parser, column);
            plain = v <= ValueParser.UNIT_FREE_CEILING;
            if (plain) {
                plainValue = v;
                plainDecimals = row.plainDecimals(parser);
                return null;
            }
            ParsedValue p = parser.parse(row.cell(column), limit, row.at(column));
            if (!p.usable()) {
                issues.add(p.issue());
                return null;
            }
            return p.value();
        }

        private DataIssue issue(TableRows.Row row, int column, String found, String problem, String expected,
                                String fix) {
            return new DataIssue(DataIssue.Severity.EXCLUDED, row.at(column), "", found, problem, expected, fix);
        }
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
}
