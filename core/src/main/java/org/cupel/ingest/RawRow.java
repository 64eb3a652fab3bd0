package org.cupel.ingest;

import java.util.List;

/**
 * One data row of a table as read, before any interpretation: trimmed cell texts.
 *
 * @param line the 1-based physical line (CSV) or row number (XLSX) where the row starts
 * @param cells cell texts, trimmed; a row may be shorter than the header
 */
public record RawRow(long line, List<String> cells) {
    public RawRow {
        cells = List.copyOf(cells);
    }

    /** The text of {@code column} (0-based), or "" when the row is shorter or the column is absent. */
    public String cell(int column) {
        return column >= 0 && column < cells.size() ? cells.get(column) : "";
    }

    /** Whether every cell is empty. */
    public boolean isBlank() {
        for (String c : cells) {
            if (!c.isEmpty()) {
                return false;
            }
        }
        return true;
    }
}
