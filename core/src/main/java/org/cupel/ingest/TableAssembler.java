package org.cupel.ingest;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Locale;
import java.util.function.Function;
import java.util.function.Predicate;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.cupel.project.MessageText;

/**
 * Turns a sequence of records (from text or a sheet) into a {@link RawTable}: finds the header row,
 * collects the lab's header block above it, and hands on the non-empty rows below it, each checked
 * against the header's width.
 *
 * <p>A row of delimited text whose cell count differs from the header's is ragged: a cell holding an
 * unquoted delimiter ({@code 1,234.5}, a decimal comma) or a missing cell shifts every later value into
 * the wrong column, so the row cannot be read and is handed on as ragged, with the issue that says so.
 * Two cases are not ragged: empty cells after the last header column (spreadsheets export a trailing
 * {@code ,,} when a column further right once held something; nothing can be shifted by them), and, in a
 * sheet, a row shorter than the header (a sheet stores each cell at its column, and omits empty trailing
 * cells). The header's own trailing empty cells do not count as columns.
 */
final class TableAssembler {
    /** A header further down than this is not a lab header block; the file is something else. */
    static final int MAX_ROWS_BEFORE_HEADER = 200;

    private TableAssembler() {
    }

    /** A source of records: fills {@code row} with the next one, false at the end. */
    interface Records {
        boolean next(CellRow row);
    }

    /** Receives the rows below the header; the row passed is reused for the next one. */
    interface RowSink {
        /** A row whose cells line up with the header. */
        void row(CellRow row);

        /** A ragged row: it is not read, and {@code issue} (severity EXCLUDED, the whole row) says why. */
        void ragged(CellRow row, DataIssue issue);
    }

    /**
     * Finds the header, then hands every non-empty row below it to the consumer that {@code open} returns
     * for the table's head (a {@link RawTable} without rows). A problem {@code open} finds with the header
     * is thrown only after the rest of the file has been read, so that a problem in the text itself (an
     * unclosed quote, an invalid encoding) is reported first, as when the whole table is read first.
     *
     * @param positional whether the records come from a sheet, whose cells keep their columns (a short row
     *     is not ragged there)
     */
    static void assemble(String file, Records records, boolean positional, Predicate<List<String>> isHeaderRow,
                         List<DataIssue> warnings, Function<RawTable, RowSink> open) {
        CellRow row = new CellRow();
        List<RawRow> before = new ArrayList<>();
        RawRow header = null;
        while (before.size() <= MAX_ROWS_BEFORE_HEADER && records.next(row)) {
            if (row.isBlank()) {
                continue;
            }
            RawRow r = row.toRawRow();
            if (isHeaderRow.test(r.cells())) {
                header = r;
                break;
            }
            before.add(r);
        }
        List<RawRow> first = List.of();
        if (header == null) {
            int h = firstTableRow(before);
            if (h < 0) {
                throw new InputException(file + ": no header row found (expected a row of column names such as "
                        + "'sample_id, Au_ppm'); add a header row above the data.");
            }
            header = before.get(h);
            first = before.subList(h + 1, before.size());
            before = before.subList(0, h);
        }
        RawTable head = new RawTable(file, headerBlock(before), header.cells(), header.line(), List.of(), warnings);
        RowSink sink;
        try {
            sink = open.apply(head);
        } catch (InputException e) {
            while (records.next(row)) {
                // read to the end: a problem in the text outranks one in the header
            }
            throw e;
        }
        Width width = new Width(file, header, positional);
        for (RawRow r : first) {
            row.set(r);
            width.pass(row, sink);
        }
        while (records.next(row)) {
            if (!row.isBlank()) {
                width.pass(row, sink);
            }
        }
    }

    /** The header's width, against which each row is checked before it is handed on. */
    private static final class Width {
        private final String file;
        private final long headerLine;
        private final int columns;
        private final boolean positional;

        Width(String file, RawRow header, boolean positional) {
            this.file = file;
            this.headerLine = header.line();
            this.positional = positional;
            int w = header.cells().size();
            while (w > 0 && header.cells().get(w - 1).isEmpty()) {
                w--;
            }
            this.columns = w;
        }

        void pass(CellRow row, RowSink sink) {
            int n = row.size();
            if (n == columns) {
                sink.row(row);
                return;
            }
            int used = n;
            while (used > columns && row.isEmpty(used - 1)) {
                used--;
            }
            if (used > columns) {
                sink.ragged(row, issue(row, used, "more", "quote any cell that holds the delimiter (\"1,234.5\"), "
                        + "set ingest.decimalComma: true if the lab writes decimal commas (0,512), or give the extra "
                        + "column a header"));
            } else if (n < columns && !positional) {
                sink.ragged(row, issue(row, n, "fewer", "add the missing cells (an empty cell keeps its "
                        + "delimiter: S1,0.5,,) or join a row that was split over two lines"));
            } else {
                sink.row(row);
            }
        }

        private DataIssue issue(CellRow row, int cells, String moreOrFewer, String fix) {
            String count = String.format(Locale.ROOT, "%,d", cells);
            String header = String.format(Locale.ROOT, "%,d", columns);
            return new DataIssue(DataIssue.Severity.EXCLUDED, new SourceLocation(file, row.line(), 0), "",
                    MessageText.clip(String.join(",", row.cells())), "the row has " + count + " cells, " + moreOrFewer
                    + " than the " + header + " columns of the header on line " + headerLine + ", so its values "
                    + "cannot be matched to their columns; the row is left out",
                    "one cell per header column (" + header + ")", fix);
        }
    }

    /**
     * Without a recognised header: the first of the widest rows, so that {@code key,value} lines of a
     * header block are not taken for the table's header; -1 when there are no rows.
     */
    private static int firstTableRow(List<RawRow> rows) {
        int best = -1;
        int width = 0;
        for (int i = 0; i < rows.size(); i++) {
            int n = nonEmpty(rows.get(i));
            if (n > width) {
                width = n;
                best = i;
            }
        }
        return best;
    }

    private static int nonEmpty(RawRow r) {
        int n = 0;
        for (String c : r.cells()) {
            if (!c.isEmpty()) {
                n++;
            }
        }
        return n;
    }

    /** {@code key: value} in one cell, or {@code key,value} (first two non-empty cells). */
    static Map<String, String> headerBlock(List<RawRow> lines) {
        Map<String, String> block = new LinkedHashMap<>();
        for (RawRow r : lines) {
            List<String> cells = new ArrayList<>();
            for (String c : r.cells()) {
                if (!c.isEmpty()) {
                    cells.add(c);
                }
            }
            String key;
            String value;
            int colon = cells.get(0).indexOf(':');
            if (colon > 0 && (cells.size() == 1 || colon < cells.get(0).length() - 1)) {
                key = cells.get(0).substring(0, colon);
                value = cells.get(0).substring(colon + 1).strip();
            } else if (cells.size() >= 2) {
                key = colon > 0 ? cells.get(0).substring(0, colon) : cells.get(0);
                value = cells.get(1);
            } else {
                continue;
            }
            String k = RawTable.normalise(key);
            if (!k.isEmpty()) {
                block.putIfAbsent(k, value);
            }
        }
        return block;
    }
}
