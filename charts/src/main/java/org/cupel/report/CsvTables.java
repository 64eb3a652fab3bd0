package org.cupel.report;

import java.io.IOException;
import java.io.Writer;
import java.lang.invoke.MethodHandles;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;
import tech.tablesaw.api.StringColumn;
import tech.tablesaw.api.Table;
import tech.tablesaw.columns.Column;

/**
 * Writes report tables as CSV files that open safely in a spreadsheet: the header is the table's
 * {@link ReportTable#csvColumns()} (lower-case names with the unit last, see {@link ReportColumn}), and each
 * number is its own cell, written plain (no grouping, no {@code %}, no {@code +}); an empty cell is a number
 * that does not apply or could not be computed (the reason, where the column has one, in its {@code _note}).
 *
 * <p>Format: RFC 4180 (Shafranovich, 2005, "Common Format and MIME Type for Comma-Separated Values (CSV)
 * Files"): comma separated, CRLF line ends, a header row, fields holding a comma, double quote, CR or
 * LF enclosed in double quotes with inner quotes doubled. UTF-8 without a byte-order mark.
 *
 * <p>Spreadsheet safety, after OWASP Foundation, "CSV Injection" (owasp.org/www-community/attacks/
 * CSV_Injection): a spreadsheet runs a cell that begins with {@code =}, {@code +}, {@code -}, {@code @},
 * tab or carriage return as a formula, so such a cell is prefixed with a single quote, which makes the
 * spreadsheet show it as text. Only text cells are neutralised: a number cell is written as the number it is.
 * Among text cells the one exception is a plain negative number ({@code -0.12},
 * {@code -1,234.5}, {@code -3.4e-2}, {@code -12%}): a single numeric literal cannot call a function or
 * reference another cell, and quoting it would turn a measured value into text. A cell such as
 * {@code -2+3} or {@code -1;SUM(A1)} is not a plain number and is neutralised.
 */
public final class CsvTables {
    private static final Pattern NEGATIVE_NUMBER =
            Pattern.compile("-(\\d+|\\d{1,3}(,\\d{3})+)(\\.\\d+)?([eE][+-]?\\d+)?%?");

    private CsvTables() {
    }

    /**
     * Writes {@code table} (header row, then the rows) to {@code file}, from its Tablesaw form
     * ({@link ReportFrame}): the column names are the header, a text column's cells are neutralised and
     * quoted, a missing number is an empty cell, and a number is written with the decimals the report gave it.
     *
     * <p>Tablesaw's own CSV writer is not used: it formats a number column with one formatter for every row,
     * so a lab's {@code 0.070} beside a computed {@code 0.07} cannot both keep their decimals, and it knows
     * neither the formula guard nor its exception for a plain negative number.
     */
    public static void write(ReportTable table, Path file) throws IOException {
        write(ReportFrame.of(table), file);
    }

    static void write(ReportFrame frame, Path file) throws IOException {
        Table t = frame.table();
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            List<String> names = t.columnNames();
            for (int c = 0; c < names.size(); c++) {
                w.write(c > 0 ? "," : "");
                w.write(field(names.get(c)));
            }
            w.write("\r\n");
            List<Column<?>> columns = t.columns();
            for (int r = 0; r < t.rowCount(); r++) {
                for (int c = 0; c < columns.size(); c++) {
                    w.write(c > 0 ? "," : "");
                    Column<?> col = columns.get(c);
                    if (col instanceof StringColumn s) {
                        w.write(field(s.get(r)));
                    } else if (!col.isMissing(r)) {
                        // A number is a plain decimal (Cell.Number checks it): nothing to neutralise or quote.
                        w.write(frame.csvNumber(c, r));
                    }
                }
                w.write("\r\n");
            }
        }
    }

    /**
     * Starts initialising Tablesaw on a background thread. Tablesaw's {@link Table} class scans the class path
     * for Tablesaw's file readers when it is first used (about half a second, docs/performance.md); a command
     * that will write tables calls this first, so that the scan overlaps reading the project. The thread that
     * writes the first table waits for the initialisation if it is still running (the JVM initialises a class
     * once); should it fail, that thread meets the same error and reports it, so this one stays silent.
     */
    public static void prepare() {
        Thread init = new Thread(() -> {
            try {
                MethodHandles.lookup().ensureInitialized(Table.class);
            } catch (IllegalAccessException | LinkageError e) {
                // Reported by the thread that writes the first table.
            }
        }, "cupel-tablesaw-init");
        init.setDaemon(true);
        init.start();
    }

    /** One cell made spreadsheet-safe, then quoted per RFC 4180 when needed. */
    public static String field(String cell) {
        return quoted(neutralise(cell == null ? "" : cell));
    }

    /** {@code cell} with a leading single quote when a spreadsheet would read it as a formula. */
    public static String neutralise(String cell) {
        if (cell.isEmpty()) {
            return cell;
        }
        char c = cell.charAt(0);
        boolean trigger = c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r';
        if (!trigger || NEGATIVE_NUMBER.matcher(cell).matches()) {
            return cell;
        }
        return "'" + cell;
    }

    private static String quoted(String s) {
        boolean quote = s.indexOf(',') >= 0 || s.indexOf('"') >= 0 || s.indexOf('\n') >= 0 || s.indexOf('\r') >= 0;
        return quote ? '"' + s.replace("\"", "\"\"") + '"' : s;
    }
}
