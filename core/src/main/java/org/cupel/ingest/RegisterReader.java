package org.cupel.ingest;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.cupel.assay.QcRole;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.cupel.project.MessageText;

/**
 * Reads the sample register ({@code register.csv}): sample ID, QC role, reference, and optionally hole
 * and interval. A row without an ID, a second row for an ID, an unknown role code or a ragged row (cell count
 * other than the header's) is excluded; a CRM or duplicate without a reference is kept with a warning, since
 * the analyses then cannot pair it.
 */
final class RegisterReader {
    private static final String[] HOLE = {"hole id", "hole", "holeid", "bhid", "drillhole"};
    private static final String[] FROM = {"from m", "from", "depth from"};
    private static final String[] TO = {"to m", "to", "depth to"};

    private RegisterReader() {
    }

    public static SampleRegister read(Path path, String displayName) {
        Read[] read = new Read[1];
        long bytes = TableReader.sizeOf(path);
        TableReader.scan(path, displayName, TableReader::hasSampleIdColumn, null, head -> {
            read[0] = new Read(displayName, head, bytes);
            return read[0];
        });
        return read[0].finish();
    }

    /** The state of reading the register. */
    private static final class Read implements TableAssembler.RowSink {
        private static final NumberScanner PLAIN = new NumberScanner(false, false);
        private final RawTable t;
        private final int id;
        private final int role;
        private final int ref;
        private final int hole;
        private final int from;
        private final int to;
        private final SampleRegister.Builder entries;
        private final Set<String> rejected = new HashSet<>();
        private final List<DataIssue> issues;
        private long rowsRead;
        private long excluded;
        private String lastRoleText;
        private Optional<QcRole> lastRole;
        private String lastHole = "";

        /** Checks the header; a problem with it throws (after the rest of the file is read). */
        Read(String displayName, RawTable t, long bytes) {
            this.t = t;
            this.id = t.column(LabColumns.sampleId());
            if (id < 0) {
                throw new InputException(displayName + ":" + t.headerLine() + ": no sample ID column among "
                        + MessageText.list(t.columns()) + " (expected 'sample_id'); rename the column holding the submitted sample IDs.");
            }
            this.role = t.column(LabColumns.ROLE);
            this.ref = t.column(LabColumns.REFERENCE);
            this.hole = t.column(HOLE);
            this.from = t.column(FROM);
            this.to = t.column(TO);
            // About five bytes per cell (IDs, codes, depths): the ID index of a million entries is sized once
            // and kept by the sample table, so it is not overestimated much.
            int expected = TableReader.estimatedRows(bytes, t.columns().size(), 5);
            this.entries = new SampleRegister.Builder(displayName, expected);
            this.issues = new ArrayList<>(t.issues());
        }

        /**
         * A ragged register row is left out, and so are its sample's lab rows, as for an unknown role: its role
         * cannot be read, and analysing a CRM or blank as a routine sample would be wrong.
         */
        @Override
        public void ragged(CellRow row, DataIssue issue) {
            rowsRead++;
            excluded++;
            String sampleId = row.cell(id);
            if (!sampleId.isEmpty()) {
                rejected.add(sampleId);
            }
            issues.add(excluded(issue.where(), sampleId, issue.found(), issue.problem() + (sampleId.isEmpty() ? ""
                    : " with the sample's lab results"), issue.expected(), issue.fix()));
        }

        @Override
        public void row(CellRow row) {
            rowsRead++;
            String sampleId = row.cell(id);
            if (sampleId.isEmpty()) {
                issues.add(excluded(rowAt(row), "", String.join(",", row.cells()), "the register row has no sample ID",
                        "a sample ID", "fill in the sample ID or delete the row"));
                excluded++;
                return;
            }
            long firstLine = entries.lineOf(sampleId);
            if (firstLine >= 0) {
                issues.add(excluded(rowAt(row), sampleId, sampleId, "sample ID already registered on line "
                                + firstLine + "; this row is left out",
                        "each sample ID once", "give the sample a unique ID or delete the repeated row"));
                excluded++;
                return;
            }
            Optional<QcRole> qc = role(row);
            if (qc.isEmpty()) {
                issues.add(excluded(rowAt(row), sampleId, row.cell(role), "unknown QC role '" + row.cell(role) + "'; the sample is "
                                + "left out of the analyses",
                        "routine, CRM/STD, blank/BLK, field dup/FD, coarse dup/CD, pulp dup/PD, lab repeat/LR, umpire/UMP",
                        "correct the role code"));
                rejected.add(sampleId);
                excluded++;
                return;
            }
            String reference = row.cell(ref);
            if (reference.isEmpty() && (qc.get() == QcRole.CRM || qc.get().isDuplicate())) {
                issues.add(new DataIssue(DataIssue.Severity.WARNING, rowAt(row), sampleId, "",
                        "a " + qc.get().label() + " without a reference cannot be paired or checked",
                        qc.get() == QcRole.CRM ? "the CRM code in 'reference'" : "the original sample ID in 'reference'",
                        "fill in the reference column"));
            }
            if (!row.cellEquals(hole, lastHole)) {
                lastHole = row.cell(hole);
            }
            entries.add(sampleId, qc.get(), reference, lastHole, metres(row, from), metres(row, to), row.line());
        }

        /** Made only for a row with a problem: most rows have none. */
        private SourceLocation rowAt(CellRow row) {
            return new SourceLocation(t.file(), row.line(), 0);
        }

        /** Consecutive rows mostly repeat a role code: it is parsed when it changes. */
        private Optional<QcRole> role(CellRow row) {
            if (lastRoleText == null || !row.cellEquals(role, lastRoleText)) {
                lastRoleText = row.cell(role);
                lastRole = QcRole.parse(lastRoleText);
            }
            return lastRole;
        }

        SampleRegister finish() {
            return entries.build(rejected, issues, rowsRead, excluded);
        }
    }

    /** The cell as {@link Double#parseDouble} reads it, NaN when blank or not a number. */
    private static double metres(CellRow row, int column) {
        if (row.isEmpty(column)) {
            return Double.NaN;
        }
        double v = Read.PLAIN.scan(row.text(), row.start(column), row.end(column));
        if (!Double.isNaN(v)) {
            return v;
        }
        try {
            return Double.parseDouble(row.cell(column));
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    private static DataIssue excluded(SourceLocation where, String id, String found, String problem, String expected,
                                      String fix) {
        return new DataIssue(DataIssue.Severity.EXCLUDED, where, id, found, problem, expected, fix);
    }
}
