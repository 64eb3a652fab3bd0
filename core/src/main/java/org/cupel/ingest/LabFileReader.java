package org.cupel.ingest;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.cupel.assay.AssayValue;
import org.cupel.assay.Batch;
import org.cupel.assay.IdIndex;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.cupel.assay.Qualifier;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.cupel.project.MessageText;

/**
 * Reads one lab result file (docs/input-formats.md): the sample ID column, optional batch, date,
 * position, QC role and reference columns, and every analyte column the header grammar recognises.
 * Batch, lab and date default to the lab's header block, then the file name. Rows: a ragged row (a cell
 * count other than the header's), a row without an ID, a second row for an ID already in the file, or a
 * row whose cells are all unreadable or blank (with at least one unreadable) is excluded; a row with some
 * unreadable cells is kept and each such cell is listed (severity EXCLUDED: that value is left out). Blank
 * cells add no result. A file that reads one character both as thousands separator and as decimal mark
 * is refused ({@link ValueParser#checkDecimalMarks}).
 */
final class LabFileReader {
    private final IngestSettings settings;
    private final ValueConventions conventions;
    private final HeaderParser headers;

    /**
     * Per ASCII character, whether an ID ending with it may end with a repeat suffix (compared as
     * {@link ValueConventions#repeatOf} compares, ignoring case); null when a suffix is empty. Nearly every ID
     * ends with a digit, which no suffix does, and is then not compared with each suffix.
     */
    private final boolean[] repeatEnds;

    public LabFileReader(IngestSettings settings) {
        this.settings = settings;
        this.conventions = settings.valueConventions();
        this.headers = new HeaderParser(settings.columns());
        this.repeatEnds = repeatEnds(conventions);
    }

    private static boolean[] repeatEnds(ValueConventions conventions) {
        boolean[] ends = new boolean[128];
        for (String suffix : conventions.repeatSuffixes()) {
            if (suffix.isEmpty()) {
                return null;
            }
            for (char c = 0; c < ends.length; c++) {
                ends[c] |= String.valueOf(c).regionMatches(true, 0, suffix, suffix.length() - 1, 1);
            }
        }
        return ends;
    }

    /** Whether {@code id} may end with a repeat suffix: false only when its last character rules that out. */
    private boolean mayBeRepeat(String id) {
        char last = id.charAt(id.length() - 1);
        return repeatEnds == null || last >= repeatEnds.length || repeatEnds[last];
    }

    public LabFile read(Path path, String displayName) {
        FileRead[] read = new FileRead[1];
        long bytes = TableReader.sizeOf(path);
        TableReader.scan(path, displayName, TableReader::hasSampleIdColumn, settings.sheet(), head -> {
            read[0] = new FileRead(head, bytes);
            return read[0];
        });
        return read[0].finish();
    }

    /** The state of reading one file. */
    private final class FileRead implements TableAssembler.RowSink {
        private final RawTable t;
        private final int idCol;
        private final int batchCol;
        private final int dateCol;
        private final int positionCol;
        private final int roleCol;
        private final int refCol;
        /** One parser per file: it collects the evidence of the file's decimal mark. */
        private final ValueParser values = new ValueParser(conventions);
        private final List<LabColumn> columns = new ArrayList<>();
        /** Per analyte column, the largest value its unit allows (100 %). */
        private double[] ceilings;
        private final List<String> ignored = new ArrayList<>();
        private final List<DataIssue> issues = new ArrayList<>();
        private final Map<String, LocalDate> latestDate = new HashMap<>();
        /** Rows read so far per batch key: the position of a row that does not state one. */
        private int[] rowsOfBatch = new int[4];
        /** The IDs read so far, each with the line of its first row. */
        private final IdIndex idsRead = new IdIndex(512);
        private long[] lineOfId = new long[512];
        /** Batch texts in the order first read, each once, so rows share them. */
        private final Map<String, Integer> batchKeys = new LinkedHashMap<>();
        private final List<String> batchTexts = new ArrayList<>();
        private final Set<String> excludedIds = new HashSet<>();
        private final LabRows kept;
        private String lastBatch;
        private int lastBatchKey = -1;
        private String defaultBatch;
        private long rowsRead;
        private long rowsExcluded;

        /**
         * Checks the header; a problem with it throws (after the rest of the file is read).
         *
         * @param bytes the file's size, from which the number of rows is estimated
         */
        FileRead(RawTable t, long bytes) {
            this.t = t;
            this.idCol = t.column(LabColumns.sampleId());
            this.batchCol = t.column(LabColumns.BATCH);
            this.dateCol = t.column(LabColumns.DATE);
            this.positionCol = t.column(LabColumns.POSITION);
            this.roleCol = t.column(LabColumns.ROLE);
            this.refCol = t.column(LabColumns.REFERENCE);
            issues.addAll(t.issues());
            if (idCol < 0) {
                throw new InputException(t.file() + ":" + t.headerLine() + ": no sample ID column among "
                        + MessageText.list(t.columns()) + " (expected a header such as 'sample_id' or 'Sample ID'); rename the "
                        + "column holding the sample IDs.");
            }
            findAnalyteColumns();
            // Three bytes per cell overestimates a lab file's rows by about a third: less than growing every
            // array once. A workbook's size says little about its rows, hence the cap.
            int expected = Math.min(1 << 16, TableReader.estimatedRows(bytes, t.columns().size(), 3));
            kept = new LabRows(columns.size(), expected);
        }

        LabFile finish() {
            values.checkDecimalMarks();
            if (rowsRead == 0) {
                issues.add(new DataIssue(DataIssue.Severity.WARNING, SourceLocation.ofFile(t.file()), "", "",
                        "the file has a header on line " + t.headerLine() + " but no data rows",
                        "one row per sample below the header", "check that the lab's export is complete"));
            }
            kept.trim();
            return new LabFile(t.file(), batches(), columns, ignored, kept, issues, excludedIds, rowsRead,
                    rowsExcluded);
        }

        @Override
        public void row(CellRow row) {
            if (!readLimits(row)) {
                readSample(row);
            }
        }

        /** A ragged row is read and left out; its ID, if it has one where expected, names the sample. */
        @Override
        public void ragged(CellRow row, DataIssue issue) {
            rowsRead++;
            String id = row.cell(idCol);
            exclude(issue.where(), id, issue.found(), issue.problem(), issue.expected(), issue.fix());
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
                    throw new InputException(t.file() + ":" + t.headerLine() + ":" + (c + 1) + ": columns '"
                            + MessageText.clip(prior) + "' and '" + MessageText.clip(h) + "' both hold "
                            + a.get().analyte() + " by method '" + a.get().method()
                            + "' (expected one column per analyte and method); rename one with its method, e.g. "
                            + a.get().analyte() + "_" + a.get().unit().symbol() + "_FA-GRAV, or map it in ingest.columns.");
                }
                double limit = conventions.detectionLimit(a.get().analyte());
                columns.add(new LabColumn(c, h, a.get(), limit));
            }
            ceilings = new double[columns.size()];
            for (int i = 0; i < ceilings.length; i++) {
                ceilings[i] = ValueParser.ceiling(columns.get(i).analyte().unit());
            }
            if (columns.isEmpty()) {
                throw new InputException(t.file() + ":" + t.headerLine() + ": no analyte column among " + MessageText.list(t.columns())
                        + " (expected headers such as 'Au_ppm', 'Au (g/t)' or 'Cu %'); name the columns with analyte "
                        + "and unit, or map them in ingest.columns of cupel.yaml.");
            }
        }

        /** A detection-limit row under the header sets each column's stated limit; it is not a sample row. */
        private boolean readLimits(CellRow row) {
            if (!mayNameLimitRow(row) || !LabColumns.DETECTION_LIMIT_ROW.contains(RawTable.normalise(row.cell(idCol)))) {
                return false;
            }
            for (int i = 0; i < columns.size(); i++) {
                LabColumn col = columns.get(i);
                ParsedValue p = values.parse(row.cell(col.index()), Double.NaN,
                        new SourceLocation(t.file(), row.line(), col.index() + 1), col.analyte().unit());
                if (p.usable() && !p.value().isMissing()) {
                    columns.set(i, new LabColumn(col.index(), col.header(), col.analyte(), p.value().value()));
                }
            }
            return true;
        }

        /**
         * Whether the ID cell may normalise to a detection-limit row name: those all begin with d or l, and
         * {@link RawTable#normalise} drops leading {@code _ -} and space and lower-cases (only D, d, L and l
         * lower-case to d or l). Spares normalising the ID of every sample row.
         */
        private boolean mayNameLimitRow(CellRow row) {
            if (row.isEmpty(idCol)) {
                return false;
            }
            char[] s = row.text();
            for (int i = row.start(idCol); i < row.end(idCol); i++) {
                char c = s[i];
                if (c != '_' && c != '-' && !Character.isWhitespace(c)) {
                    return c == 'd' || c == 'D' || c == 'l' || c == 'L';
                }
            }
            return false;
        }

        private void readSample(CellRow row) {
            rowsRead++;
            String id = row.cell(idCol);
            if (id.isEmpty()) {
                exclude(rowAt(row), "", String.join(",", row.cells()), "the row has no sample ID",
                        "a sample ID in column '" + t.columns().get(idCol) + "'", "fill in the sample ID or delete the row");
                return;
            }
            int n = idsRead.add(id);
            if (n < 0) {
                exclude(rowAt(row), id, id, "sample ID already on line " + lineOfId[-1 - n] + " of this file",
                        "each sample once per file (re-assays by another method go in their own column or a later file)",
                        "remove the repeated row, or mark a lab repeat with a suffix such as '" + id + " R'");
                return;
            }
            if (n == lineOfId.length) {
                lineOfId = Arrays.copyOf(lineOfId, n * 2);
            }
            lineOfId[n] = row.line();
            int batchKey = batchKey(row);
            String batch = batchTexts.get(batchKey);
            noteDate(row, batch, id);
            int position = position(row, batchKey, id);
            QcRole role = role(row, id);
            String reference = refCol >= 0 ? row.cell(refCol) : "";
            if (role == null && mayBeRepeat(id)) {
                Optional<String> original = conventions.repeatOf(id);
                if (original.isPresent()) {
                    role = QcRole.LAB_REPEAT;
                    reference = original.get();
                }
            }
            int issuesBefore = issues.size();
            boolean any = results(row, id);
            if (!any && issues.size() > issuesBefore) {
                exclude(rowAt(row), id, "", "no analyte value in the row can be used (see the cells listed)",
                        "at least one readable value", "correct the cells listed for this sample");
                return;
            }
            kept.keepRow(id, batchKey, position, role, reference, row.line());
        }

        /** The row's batch (its batch cell, else the file's default) as an index into {@link #batchTexts}. */
        private int batchKey(CellRow row) {
            boolean own = batchCol >= 0 && !row.isEmpty(batchCol);
            if (lastBatch != null && (own ? row.cellEquals(batchCol, lastBatch) : lastBatch.equals(defaultBatch()))) {
                return lastBatchKey;
            }
            String batch = own ? row.cell(batchCol) : defaultBatch();
            Integer key = batchKeys.get(batch);
            if (key == null) {
                key = batchTexts.size();
                batchKeys.put(batch, key);
                batchTexts.add(batch);
            }
            lastBatch = batchTexts.get(key);
            lastBatchKey = key;
            return key;
        }

        /** Sets the row's usable results in {@link #kept}; whether there is any. */
        private boolean results(CellRow row, String id) {
            kept.startRow();
            boolean any = false;
            char[] text = row.text();
            // Made at the row's first cell that is not a plain number: most rows have none.
            SourceLocation rowAt = null;
            for (int c = 0; c < columns.size(); c++) {
                LabColumn col = columns.get(c);
                int k = col.index();
                // A blank cell is no result by that method, not a result: it adds no candidate.
                if (row.isEmpty(k)) {
                    continue;
                }
                double v = values.plainNumber(text, row.start(k), row.end(k));
                if (v <= ceilings[c]) {
                    kept.setResult(c, Qualifier.DETECTED, v, ValueParser.validLimit(col.detectionLimit()),
                            MissingReason.NONE, values.plainDecimals());
                    any = true;
                    continue;
                }
                if (rowAt == null) {
                    rowAt = rowAt(row);
                }
                SourceLocation at = rowAt.atColumn(k + 1);
                ParsedValue p = values.parse(row.cell(k), col.detectionLimit(), at, col.analyte().unit());
                if (p.issue() != null) {
                    DataIssue i = p.issue();
                    issues.add(new DataIssue(i.severity(), at, id, i.found(),
                            col.header() + ": " + i.problem(), i.expected(), i.fix()));
                }
                if (p.usable() && p.value().missingReason() != MissingReason.BLANK_CELL) {
                    AssayValue a = p.value();
                    kept.setResult(c, a.qualifier(), a.value(), a.limit(), a.missingReason(), a.decimals());
                    if (a.isMissing()) {
                        kept.setCode(c, row.cell(k).strip());
                    }
                    any = true;
                }
            }
            return any;
        }

        private SourceLocation rowAt(CellRow row) {
            return new SourceLocation(t.file(), row.line(), 0);
        }

        private void noteDate(CellRow row, String batch, String id) {
            if (dateCol < 0 || row.cell(dateCol).isEmpty()) {
                return;
            }
            Optional<LocalDate> d = DateCells.parse(row.cell(dateCol), settings.dateFormat());
            if (d.isEmpty()) {
                issues.add(new DataIssue(DataIssue.Severity.WARNING, new SourceLocation(t.file(), row.line(), dateCol + 1), id, row.cell(dateCol),
                        "the date cannot be read; the batch date is taken from other rows or the header block",
                        "a date as " + settings.dateFormat() + " (ISO is 2025-03-14)",
                        "write the date as YYYY-MM-DD, or set ingest.dateFormat to DMY or MDY"));
                return;
            }
            latestDate.merge(batch, d.get(), (a, b) -> a.isAfter(b) ? a : b);
        }

        private int position(CellRow row, int batchKey, String id) {
            if (batchKey >= rowsOfBatch.length) {
                rowsOfBatch = Arrays.copyOf(rowsOfBatch, Math.max(batchKey + 1, rowsOfBatch.length * 2));
            }
            int inOrder = ++rowsOfBatch[batchKey];
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
            issues.add(new DataIssue(DataIssue.Severity.WARNING, new SourceLocation(t.file(), row.line(), positionCol + 1), id, row.cell(positionCol),
                    "the position is not a whole number above 0; the row order is used (" + inOrder + ")",
                    "a positive whole number", "correct the position or leave the column out"));
            return inOrder;
        }

        private QcRole role(CellRow row, String id) {
            if (roleCol < 0 || row.cell(roleCol).isEmpty()) {
                return null;
            }
            Optional<QcRole> r = QcRole.parse(row.cell(roleCol));
            if (r.isEmpty()) {
                issues.add(new DataIssue(DataIssue.Severity.WARNING, new SourceLocation(t.file(), row.line(), roleCol + 1), id, row.cell(roleCol),
                        "unknown QC role; the register decides, else the sample is routine",
                        "routine, CRM/STD, blank/BLK, FD, CD, PD, LR or UMP", "correct the role code"));
                return null;
            }
            return r.get();
        }

        private String defaultBatch() {
            if (defaultBatch == null) {
                defaultBatch = fileBatch();
            }
            return defaultBatch;
        }

        private String fileBatch() {
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

        /** The batches of the rows kept, in the order first kept; the kept rows are renumbered to them. */
        private List<Batch> batches() {
            LocalDate blockDate = DateCells.parse(first(LabColumns.HB_DATE), settings.dateFormat()).orElse(null);
            String lab = first(LabColumns.HB_LAB);
            int[] map = new int[batchTexts.size()];
            Arrays.fill(map, -1);
            List<Batch> out = new ArrayList<>();
            for (int r = 0; r < kept.size(); r++) {
                int key = kept.batch(r);
                if (map[key] < 0) {
                    String b = batchTexts.get(key);
                    map[key] = out.size();
                    out.add(new Batch(b, lab, blockDate != null ? blockDate : latestDate.get(b), t.file()));
                }
            }
            kept.remapBatches(map);
            return out;
        }
    }
}
