package org.cupel.report;

import java.util.List;

/**
 * A table of the report, already formatted as text cells. Every table is also written as
 * {@code tables/<id>.csv}. Values are raw text: each renderer escapes for its own format.
 *
 * @param id stable identifier, used for the CSV file name (sanitised when written)
 * @param title caption shown above the table
 * @param columns column headers, with units where they apply ("Mean (g/t)")
 * @param rows the cells, one list per row, as many cells as columns
 * @param note a line under the table (source of thresholds, exclusions), may be empty
 */
public record ReportTable(String id, String title, List<String> columns, List<List<String>> rows, String note) {
    public ReportTable {
        columns = List.copyOf(columns);
        rows = rows.stream().map(List::copyOf).toList();
        note = note == null ? "" : note;
        for (List<String> r : rows) {
            if (r.size() != columns.size()) {
                throw new IllegalArgumentException("table " + id + ": row has " + r.size() + " cells, expected "
                        + columns.size());
            }
        }
    }
}
