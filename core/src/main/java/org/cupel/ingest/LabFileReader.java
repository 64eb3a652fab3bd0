package org.cupel.ingest;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.cupel.assay.Batch;
import org.cupel.assay.MethodValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;

/**
 * Reads one lab result file (docs/input-formats.md): the sample ID column, optional batch, date,
 * position, QC role and reference columns, and every analyte column the header grammar recognises.
 * Batch, lab and date default to the lab's header block, then the file name. Rows: a row without an ID,
 * a second row for an ID already in the file, or a row whose cells are all unreadable or blank (with at
 * least one unreadable) is excluded; a row with some unreadable cells is kept and each such cell is listed
 * (severity EXCLUDED: that value is left out). Blank cells add no result.
 */
public final class LabFileReader {
    private final IngestSettings settings;
    private final HeaderParser headers;
    private final ValueParser values;

    public LabFileReader(IngestSettings settings) {
        this.settings = settings;
        this.headers = new HeaderParser(settings.columns());
        this.values = new ValueParser(settings.valueConventions());
    }

    public LabFile read(Path path, String displayName) {
        RawTable t = TableReader.read(path, displayName, TableReader::hasSampleIdColumn, settings.sheet());
        return new FileRead(t).read();
    }

    /** The state of reading one file. */
    private final class FileRead {
        private final RawTable t;
        private final int idCol;
        private final int batchCol;
        private final int dateCol;
        private final int positionCol;
        private final int roleCol;
        private final int refCol;
        private final List<LabColumn> columns = new ArrayList<>();
        private final List<String> ignored = new ArrayList<>();
        private final List<DataIssue> issues = new ArrayList<>();
        private final Map<String, LocalDate> latestDate = new HashMap<>();
        private final Map<String, Integer> nextPosition = new HashMap<>();
        private final Map<String, Long> lineOfId = new HashMap<>();
        private final List<Pending> pending = new ArrayList<>();
        private final Set<String> excludedIds = new HashSet<>();
        private long rowsRead;
        private long rowsExcluded;

        FileRead(RawTable t) {
            this.t = t;
            this.idCol = t.column(LabColumns.sampleId());
            this.batchCol = t.column(LabColumns.BATCH);
            this.dateCol = t.column(LabColumns.DATE);
            this.positionCol = t.column(LabColumns.POSITION);
            this.roleCol = t.column(LabColumns.ROLE);
            this.refCol = t.column(LabColumns.REFERENCE);
            issues.addAll(t.warnings());
        }

        LabFile read() {
            if (idCol < 0) {
                throw new InputException(t.file() + ":" + t.headerLine() + ": no sample ID column among "
                        + t.columns() + " (expected a header such as 'sample_id' or 'Sample ID'); rename the "
                        + "column holding the sample IDs.");
            }
            findAnalyteColumns();
            for (RawRow row : t.rows()) {
                if (!readLimits(row)) {
                    readRow(row);
                }
            }
            return new LabFile(t.file(), batches(), columns, ignored, labRows(), issues, excludedIds, rowsRead,
                    rowsExcluded);
        }

        private void findAnalyteColumns() {
            Set<Integer> known = new HashSet<>(List.of(idCol, batchCol, dateCol, positionCol, roleCol, refCol));
            Map<String, String> seen = new HashMap<>();
            for (int c = 0; c < t.columns().size(); c++) {
                String h = t.columns().get(c);
                if (known.contains(c) && !headers.isOverridden(h)) {
                    continue;
                }
                Optional<AnalyteHeader> a = headers.parse(h);
                if (a.isEmpty()) {
                    if (!h.isEmpty()) {
                        ignored.add(h);
                    }
                    continue;
                }
                String key = a.get().analyte() + " " + a.get().method();
                String prior = seen.put(key, h);
                if (prior != null) {
                    throw new InputException(t.file() + ":" + t.headerLine() + ":" + (c + 1) + ": columns '" + prior
                            + "' and '" + h + "' both hold " + a.get().analyte() + " by method '" + a.get().method()
                            + "' (expected one column per analyte and method); rename one with its method, e.g. "
                            + a.get().analyte() + "_" + a.get().unit().symbol() + "_FA-GRAV, or map it in ingest.columns.");
                }
                double limit = settings.valueConventions().detectionLimit(a.get().analyte());
                columns.add(new LabColumn(c, h, a.get(), limit));
            }
            if (columns.isEmpty()) {
                throw new InputException(t.file() + ":" + t.headerLine() + ": no analyte column among " + t.columns()
                        + " (expected headers such as 'Au_ppm', 'Au (g/t)' or 'Cu %'); name the columns with analyte "
                        + "and unit, or map them in ingest.columns of cupel.yaml.");
            }
        }

        /** A detection-limit row under the header sets each column's stated limit; it is not a sample row. */
        private boolean readLimits(RawRow row) {
            if (!LabColumns.DETECTION_LIMIT_ROW.contains(RawTable.normalise(row.cell(idCol)))) {
                return false;
            }
            for (int i = 0; i < columns.size(); i++) {
                LabColumn col = columns.get(i);
                ParsedValue p = values.parse(row.cell(col.index()), Double.NaN, t.at(row, col.index()));
                if (p.usable() && !p.value().isMissing()) {
                    columns.set(i, new LabColumn(col.index(), col.header(), col.analyte(), p.value().value()));
                }
            }
            return true;
        }

        private void readRow(RawRow row) {
            rowsRead++;
            String id = row.cell(idCol);
            SourceLocation where = t.at(row);
            if (id.isEmpty()) {
                exclude(where, "", String.join(",", row.cells()), "the row has no sample ID",
                        "a sample ID in column '" + t.columns().get(idCol) + "'", "fill in the sample ID or delete the row");
                return;
            }
            Long first = lineOfId.putIfAbsent(id, row.line());
            if (first != null) {
                exclude(where, id, id, "sample ID already on line " + first + " of this file",
                        "each sample once per file (re-assays by another method go in their own column or a later file)",
                        "remove the repeated row, or mark a lab repeat with a suffix such as '" + id + " R'");
                return;
            }
            String batch = batchCol >= 0 && !row.cell(batchCol).isEmpty() ? row.cell(batchCol) : defaultBatch();
            noteDate(row, batch, id);
            int position = position(row, batch, id);
            QcRole role = role(row, id);
            String reference = refCol >= 0 ? row.cell(refCol) : "";
            if (role == null) {
                Optional<String> original = settings.valueConventions().repeatOf(id);
                if (original.isPresent()) {
                    role = QcRole.LAB_REPEAT;
                    reference = original.get();
                }
            }
            int issuesBefore = issues.size();
            List<LabRow.Result> results = results(row, id);
            if (results.isEmpty() && issues.size() > issuesBefore) {
                exclude(where, id, "", "no analyte value in the row can be used (see the cells listed)",
                        "at least one readable value", "correct the cells listed for this sample");
                return;
            }
            pending.add(new Pending(id, batch, position, role, reference, where, results));
        }

        private List<LabRow.Result> results(RawRow row, String id) {
            List<LabRow.Result> out = new ArrayList<>(columns.size());
            // One location per row, shared by its values; a cell's own column is set only on an issue.
            SourceLocation rowAt = t.at(row);
            for (LabColumn col : columns) {
                ParsedValue p = values.parse(row.cell(col.index()), col.detectionLimit(), rowAt);
                if (p.issue() != null) {
                    DataIssue i = p.issue();
                    issues.add(new DataIssue(i.severity(), rowAt.atColumn(col.index() + 1), id, i.found(),
                            col.header() + ": " + i.problem(), i.expected(), i.fix()));
                }
                // A blank cell is no result by that method, not a result: it adds no candidate.
                if (p.usable() && p.value().missingReason() != MissingReason.BLANK_CELL) {
                    AnalyteHeader a = col.analyte();
                    out.add(new LabRow.Result(a.analyte(), a.unit(), new MethodValue(a.method(), p.value(), rowAt)));
                }
            }
            return out;
        }

        private void noteDate(RawRow row, String batch, String id) {
            if (dateCol < 0 || row.cell(dateCol).isEmpty()) {
                return;
            }
            Optional<LocalDate> d = DateCells.parse(row.cell(dateCol), settings.dateFormat());
            if (d.isEmpty()) {
                issues.add(new DataIssue(DataIssue.Severity.WARNING, t.at(row, dateCol), id, row.cell(dateCol),
                        "the date cannot be read; the batch date is taken from other rows or the header block",
                        "a date as " + settings.dateFormat() + " (ISO is 2025-03-14)",
                        "write the date as YYYY-MM-DD, or set ingest.dateFormat to DMY or MDY"));
                return;
            }
            latestDate.merge(batch, d.get(), (a, b) -> a.isAfter(b) ? a : b);
        }

        private int position(RawRow row, String batch, String id) {
            int inOrder = nextPosition.merge(batch, 1, Integer::sum);
            if (positionCol < 0 || row.cell(positionCol).isEmpty()) {
                return inOrder;
            }
            try {
                int p = Integer.parseInt(row.cell(positionCol));
                if (p > 0) {
                    return p;
                }
            } catch (NumberFormatException e) {
                // reported below
            }
            issues.add(new DataIssue(DataIssue.Severity.WARNING, t.at(row, positionCol), id, row.cell(positionCol),
                    "the position is not a whole number above 0; the row order is used (" + inOrder + ")",
                    "a positive whole number", "correct the position or leave the column out"));
            return inOrder;
        }

        private QcRole role(RawRow row, String id) {
            if (roleCol < 0 || row.cell(roleCol).isEmpty()) {
                return null;
            }
            Optional<QcRole> r = QcRole.parse(row.cell(roleCol));
            if (r.isEmpty()) {
                issues.add(new DataIssue(DataIssue.Severity.WARNING, t.at(row, roleCol), id, row.cell(roleCol),
                        "unknown QC role; the register decides, else the sample is routine",
                        "routine, CRM/STD, blank/BLK, FD, CD, PD, LR or UMP", "correct the role code"));
                return null;
            }
            return r.get();
        }

        private String defaultBatch() {
            String job = first(LabColumns.HB_JOB);
            if (!job.isEmpty()) {
                return job;
            }
            String name = Path.of(t.file()).getFileName().toString();
            int dot = name.lastIndexOf('.');
            return dot > 0 ? name.substring(0, dot) : name;
        }

        private String first(String[] keys) {
            for (String k : keys) {
                String v = t.headerBlock().get(k);
                if (v != null && !v.isEmpty()) {
                    return v;
                }
            }
            return "";
        }

        private void exclude(SourceLocation where, String id, String found, String problem, String expected, String fix) {
            rowsExcluded++;
            if (!id.isEmpty()) {
                excludedIds.add(id);
            }
            issues.add(new DataIssue(DataIssue.Severity.EXCLUDED, where, id, found, problem, expected, fix));
        }

        private Map<String, Batch> batchMap() {
            Map<String, Batch> out = new LinkedHashMap<>();
            LocalDate blockDate = DateCells.parse(first(LabColumns.HB_DATE), settings.dateFormat()).orElse(null);
            String lab = first(LabColumns.HB_LAB);
            for (Pending p : pending) {
                out.computeIfAbsent(p.batch, b -> new Batch(b, lab,
                        blockDate != null ? blockDate : latestDate.get(b), t.file()));
            }
            return out;
        }

        private List<Batch> batches() {
            return new ArrayList<>(batchMap().values());
        }

        private List<LabRow> labRows() {
            Map<String, Batch> batches = batchMap();
            List<LabRow> out = new ArrayList<>(pending.size());
            for (Pending p : pending) {
                out.add(new LabRow(p.id, batches.get(p.batch), p.position, p.role, p.reference, p.where, p.results));
            }
            return out;
        }
    }

    private record Pending(String id, String batch, int position, QcRole role, String reference,
                           SourceLocation where, List<LabRow.Result> results) {
    }
}
