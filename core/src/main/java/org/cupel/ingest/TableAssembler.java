package org.cupel.ingest;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
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

    static RawTable assemble(String file, Iterator<RawRow> records, Predicate<List<String>> isHeaderRow,
                             List<DataIssue> warnings) {
        List<RawRow> before = new ArrayList<>();
        RawRow header = null;
        while (records.hasNext() && before.size() <= MAX_ROWS_BEFORE_HEADER) {
            RawRow r = records.next();
            if (r.isBlank()) {
                continue;
            }
            if (isHeaderRow.test(r.cells())) {
                header = r;
                break;
            }
            before.add(r);
        }
        List<RawRow> rows = new ArrayList<>();
        if (header == null) {
            int h = firstTableRow(before);
            if (h < 0) {
                throw new InputException(file + ": no header row found (expected a row of column names such as "
                        + "'sample_id, Au_ppm'); add a header row above the data.");
            }
            header = before.get(h);
            rows.addAll(before.subList(h + 1, before.size()));
            before = before.subList(0, h);
        }
        while (records.hasNext()) {
            RawRow r = records.next();
            if (!r.isBlank()) {
                rows.add(r);
            }
        }
        return new RawTable(file, headerBlock(before), header.cells(), header.line(), rows, warnings);
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
