package org.cupel.ingest;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.function.Predicate;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;

/**
 * Turns a sequence of records (from text or a sheet) into a {@link RawTable}: finds the header row,
 * collects the lab's header block above it, and keeps the non-empty rows below it.
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

    /**
     * Finds the header, then hands every non-empty row below it to the consumer that {@code open} returns
     * for the table's head (a {@link RawTable} without rows). A problem {@code open} finds with the header
     * is thrown only after the rest of the file has been read, so that a problem in the text itself (an
     * unclosed quote, an invalid encoding) is reported first, as when the whole table is read first.
     */
    static void assemble(String file, Records records, Predicate<List<String>> isHeaderRow, List<DataIssue> warnings,
                         Function<RawTable, Consumer<CellRow>> open) {
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
        Consumer<CellRow> sink;
        try {
            sink = open.apply(head);
        } catch (InputException e) {
            while (records.next(row)) {
                // read to the end: a problem in the text outranks one in the header
            }
            throw e;
        }
        for (RawRow r : first) {
            row.set(r);
            sink.accept(row);
        }
        while (records.next(row)) {
            if (!row.isBlank()) {
                sink.accept(row);
            }
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
