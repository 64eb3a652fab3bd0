package org.cupel.report;

import java.util.AbstractList;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.RandomAccess;
import java.util.Set;
import tech.tablesaw.api.Table;

/**
 * A table of the report: typed cells ({@link Cell}) under typed columns ({@link ReportColumn}). The page
 * (HTML, PDF, Word) reads {@link #columns()} and {@link #rows()}, the display text; every table is also
 * available as a Tablesaw {@link Table} ({@link #toTablesaw()}), one typed column per CSV column, and is
 * written as {@code tables/<id>.csv} from that table, one number per CSV cell. Values are raw text: each
 * renderer escapes for its own format.
 *
 * <p>A table made from text rows ({@link #ReportTable(String, String, List, List, String)}) has text columns
 * only. Each column's type is fixed by its {@link ReportColumn}, so the typed table maps onto a data frame
 * with one typed column per CSV column.
 */
public final class ReportTable {
    private final String id;
    private final String title;
    private final List<ReportColumn> typedColumns;
    private final List<List<Cell>> cells;
    private final String note;
    private final List<String> columns;
    private final List<List<String>> rows;

    /**
     * A table of text cells.
     *
     * @param id stable identifier, used for the CSV file name (sanitised when written)
     * @param title caption shown above the table
     * @param columns column headers, with units where they apply ("Mean (g/t)")
     * @param rows the cells, one list per row, as many cells as columns
     * @param note a line under the table (source of thresholds, exclusions), may be empty
     */
    public ReportTable(String id, String title, List<String> columns, List<List<String>> rows, String note) {
        this(id, title, columns.stream().map(ReportColumn::text).toList(),
                rows.stream().map(r -> r.stream().map(Cell::text).toList()).toList(), note, false);
    }

    /** @param typed whether the cells came typed (else all text); the erasure of the text constructor needs it */
    private ReportTable(String id, String title, List<ReportColumn> columns, List<List<Cell>> cells, String note,
                        boolean typed) {
        this.id = id;
        this.title = title;
        this.typedColumns = List.copyOf(columns);
        this.cells = cells.stream().map(List::copyOf).toList();
        this.note = note == null ? "" : note;
        for (List<Cell> r : this.cells) {
            if (r.size() != typedColumns.size()) {
                throw new IllegalArgumentException("table " + id + ": row has " + r.size() + " cells, expected "
                        + typedColumns.size());
            }
            for (int c = 0; c < r.size(); c++) {
                if (!typedColumns.get(c).accepts(r.get(c))) {
                    throw new IllegalArgumentException("table " + id + ", column '" + typedColumns.get(c).header()
                            + "' (" + typedColumns.get(c).kind() + "): a " + r.get(c).getClass().getSimpleName()
                            + " cell cannot stand there");
                }
            }
        }
        this.columns = typedColumns.stream().map(ReportColumn::header).toList();
        this.rows = new DisplayRows(this.cells);
    }

    /**
     * The display text of the cells, read through rather than copied: a long table (the re-assay list of a
     * million-sample project) would otherwise hold every row twice.
     */
    private static final class DisplayRows extends AbstractList<List<String>> implements RandomAccess {
        private final List<List<Cell>> cells;

        DisplayRows(List<List<Cell>> cells) {
            this.cells = cells;
        }

        @Override
        public List<String> get(int row) {
            List<Cell> r = cells.get(row);
            return new AbstractList<>() {
                @Override
                public String get(int column) {
                    return r.get(column).display();
                }

                @Override
                public int size() {
                    return r.size();
                }
            };
        }

        @Override
        public int size() {
            return cells.size();
        }
    }

    /** A table of typed cells; each cell must fit its column ({@link ReportColumn.Kind}). */
    public static ReportTable typed(String id, String title, List<ReportColumn> columns, List<List<Cell>> rows,
                                    String note) {
        return new ReportTable(id, title, columns, rows, note, true);
    }

    public String id() {
        return id;
    }

    public String title() {
        return title;
    }

    /** Column headers as shown. */
    public List<String> columns() {
        return columns;
    }

    /** The cells as shown, one list per row. */
    public List<List<String>> rows() {
        return rows;
    }

    public String note() {
        return note;
    }

    public List<ReportColumn> typedColumns() {
        return typedColumns;
    }

    /** The typed cells, one list per row. */
    public List<List<Cell>> cells() {
        return cells;
    }

    /**
     * This table as a Tablesaw {@link Table} named by {@link #id()}: one typed column per {@link #csvColumns()}
     * entry under the same name (text a {@code StringColumn}, a number a {@code DoubleColumn}, a count a
     * {@code LongColumn}; an interval its estimate, lower and upper columns; not computable missing), holding
     * the numbers as {@code tables/<id>.csv} writes them. A new table on every call, the caller's to change.
     */
    public Table toTablesaw() {
        return ReportFrame.of(this).table();
    }

    /**
     * The CSV header: every column's typed CSV columns in order, names made unique within the table
     * regardless of case (a data frame, Tablesaw's among them, tells its columns apart without case).
     */
    public List<ReportColumn.CsvColumn> csvColumns() {
        List<ReportColumn.CsvColumn> out = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        Set<String> keys = new HashSet<>();
        for (ReportColumn col : typedColumns) {
            // Two columns with one key (two headers that read alike) keep their CSV columns together: key_2.
            ReportColumn c = col;
            for (int n = 2; !keys.add(c.key().toLowerCase(Locale.ROOT)); n++) {
                c = col.withKey(col.key() + "_" + n);
            }
            for (ReportColumn.CsvColumn x : c.csvColumns()) {
                String name = x.name();
                for (int n = 2; !seen.add(name.toLowerCase(Locale.ROOT)); n++) {
                    name = x.name() + "_" + n;
                }
                out.add(new ReportColumn.CsvColumn(name, x.type()));
            }
        }
        return out;
    }

    /** The CSV rows, field for field under {@link #csvColumns()}. */
    public List<List<ReportColumn.CsvField>> csvRows() {
        List<List<ReportColumn.CsvField>> out = new ArrayList<>(cells.size());
        for (List<Cell> r : cells) {
            List<ReportColumn.CsvField> fields = new ArrayList<>();
            for (int c = 0; c < r.size(); c++) {
                fields.addAll(typedColumns.get(c).csvFields(r.get(c)));
            }
            out.add(fields);
        }
        return out;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ReportTable t && id.equals(t.id) && title.equals(t.title)
                && typedColumns.equals(t.typedColumns) && cells.equals(t.cells) && note.equals(t.note);
    }

    @Override
    public int hashCode() {
        return Objects.hash(id, title, typedColumns, cells, note);
    }

    @Override
    public String toString() {
        return "ReportTable[" + id + ": " + title + ", " + columns + ", " + rows.size() + " rows]";
    }
}
