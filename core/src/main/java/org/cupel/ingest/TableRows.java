package org.cupel.ingest;

import java.nio.file.Path;
import java.util.List;
import java.util.function.Function;
import java.util.function.Predicate;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;

/**
 * Reads a table as {@link TableReader#read(Path, Predicate)} does (same formats, encodings, delimiters, header
 * search and ragged-row issues) but hands each data row to a visitor instead of keeping it: a reader of a
 * million-row table then creates a String only for the cells it keeps, and reads plain numbers straight from
 * the row's characters.
 */
public final class TableRows {
    private TableRows() {
    }

    /** Receives the rows below the header of one table. */
    public interface Visitor {
        /** A row whose cells line up with the header; {@code row} is reused for the next one. */
        void row(Row row);

        /** A row that could not be read (its cells do not line up with the header); {@code issue} says why. */
        void ragged(DataIssue issue);
    }

    /**
     * Reads {@code file}; {@code open} receives the table's head (a {@link RawTable} without rows: file, columns,
     * header line and the issues found with the header) and returns the visitor of its rows. An exception thrown
     * by {@code open} is thrown after the rest of the file has been read for problems of the text itself.
     */
    public static void scan(Path file, Predicate<List<String>> isHeaderRow, Function<RawTable, Visitor> open) {
        Row view = new Row();
        TableReader.scan(file, file.toString(), isHeaderRow, null, head -> {
            Visitor v = open.apply(head);
            view.file = head.file();
            return new TableAssembler.RowSink() {
                @Override
                public void row(CellRow row) {
                    view.row = row;
                    v.row(view);
                }

                @Override
                public void ragged(CellRow row, DataIssue issue) {
                    v.ragged(issue);
                }
            };
        });
    }

    /**
     * An estimate of the data rows of {@code file} with {@code cells} cells of about {@code bytesPerCell} bytes
     * (delimiter included) per row, to size arrays before reading; 0 when the file cannot be read.
     */
    public static int estimatedRows(Path file, int cells, int bytesPerCell) {
        return TableReader.estimatedRows(TableReader.sizeOf(file), cells, bytesPerCell);
    }

    /** One data row, read in place; valid only during the visitor's call. */
    public static final class Row {
        private String file;
        private CellRow row;

        private Row() {
        }

        /** The 1-based physical line (CSV) or row number (XLSX) where the row starts. */
        public long line() {
            return row.line();
        }

        /** Whether {@code column} (0-based) is absent or empty. */
        public boolean isEmpty(int column) {
            return row.isEmpty(column);
        }

        /** The text of {@code column}, "" when absent. */
        public String cell(int column) {
            return row.cell(column);
        }

        /** Whether {@code column}'s text equals {@code s}, without creating a String. */
        public boolean cellEquals(int column, String s) {
            return row.cellEquals(column, s);
        }

        /** Appends {@code column}'s text to {@code out} without creating a String. */
        public void appendCell(int column, StringBuilder out) {
            if (!row.isEmpty(column)) {
                out.append(row.text(), row.start(column), row.end(column) - row.start(column));
            }
        }

        /**
         * {@link ValueParser#plainNumber}: the value of a cell that is a plain non-negative number (the hot path,
         * no objects), else NaN, in which case the caller parses {@link #cell} with {@link ValueParser#parse}.
         * After a number, {@link ValueParser#plainDecimals} gives its written decimals.
         */
        public double plainNumber(ValueParser parser, int column) {
            return row.isEmpty(column) ? Double.NaN : parser.plainNumber(row.text(), row.start(column), row.end(column));
        }

        /** The decimals of the number {@link #plainNumber} just read. */
        public int plainDecimals(ValueParser parser) {
            return parser.plainDecimals();
        }

        /** Where {@code column}'s cell (0-based) is; the location's column is 1-based. */
        public SourceLocation at(int column) {
            return new SourceLocation(file, row.line(), column + 1);
        }
    }
}
