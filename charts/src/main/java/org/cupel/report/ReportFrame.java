package org.cupel.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.List;
import tech.tablesaw.api.DoubleColumn;
import tech.tablesaw.api.LongColumn;
import tech.tablesaw.api.StringColumn;
import tech.tablesaw.api.Table;
import tech.tablesaw.columns.numbers.DoubleColumnType;
import tech.tablesaw.columns.Column;

/**
 * A {@link ReportTable} as a Tablesaw {@link Table}, the tabular result layer: one typed column per CSV
 * column ({@link ReportTable#csvColumns()}), in order and under the same names. A {@link
 * ReportColumn.CsvType#TEXT} column is a {@link StringColumn}, a {@link ReportColumn.CsvType#DOUBLE} column a
 * {@link DoubleColumn}, a {@link ReportColumn.CsvType#LONG} column (a count) a {@link LongColumn}; an interval
 * is its estimate, lower and upper columns, a lab value its number and qualifier columns, and a number that
 * does not apply or could not be computed is missing (its reason, where the column has one, in the
 * {@code _note} text column). The numbers are those the report writes, not the unrounded ones: the table
 * and {@code tables/<id>.csv} say the same.
 *
 * <p>A double does not remember how it was written: the lab's {@code 0.070} and a computed {@code 0.07} are
 * one double. The frame therefore keeps, beside the table, the decimals each number was written with, and
 * {@link #csvNumber} writes a number from the table's double and those decimals. That is exact for any
 * plain decimal of at most 15 significant digits (a double holds 15.95 decimal digits, so the nearest double
 * to such a decimal is nearer to it than to any other decimal of that length); {@link #of} refuses a longer
 * one rather than write a different number.
 */
final class ReportFrame {
    /** Significant digits a double keeps exactly through parse and print (IEEE 754 binary64: 15). */
    static final int MAX_DIGITS = 15;

    /** Powers of ten a double holds exactly (up to 10^22 = 5^22 * 2^22, and 5^22 < 2^53). */
    private static final double[] POWERS = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12,
        1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};

    private final Table table;
    /**
     * Per column, the decimals of each row's number; null for text and count columns. A short, not a byte: a
     * p-value of 3.41e-160 (a batch's chi-square test on 50,000 pairs) is written with 162 decimals.
     */
    private final short[][] decimals;

    private ReportFrame(Table table, short[][] decimals) {
        this.table = table;
        this.decimals = decimals;
    }

    /** The frame of {@code t}; a number the CSV could not write back exactly is refused (a bug in the table). */
    static ReportFrame of(ReportTable t) {
        List<ReportColumn.CsvColumn> columns = t.csvColumns();
        List<List<ReportColumn.CsvField>> rows = t.csvRows();
        Table table = Table.create(t.id());
        short[][] decimals = new short[columns.size()][];
        for (int c = 0; c < columns.size(); c++) {
            ReportColumn.CsvColumn col = columns.get(c);
            switch (col.type()) {
                case TEXT -> table.addColumns(text(col.name(), rows, c));
                case DOUBLE -> {
                    decimals[c] = new short[rows.size()];
                    table.addColumns(doubles(t.id(), col.name(), rows, c, decimals[c]));
                }
                case LONG -> table.addColumns(longs(t.id(), col.name(), rows, c));
                default -> throw new IllegalStateException(col.type().name());
            }
        }
        return new ReportFrame(table, decimals);
    }

    /** The table. */
    Table table() {
        return table;
    }

    /**
     * The CSV text of the number in {@code column}, {@code row} (not missing): the table's value with the
     * decimals the report wrote it with.
     */
    String csvNumber(int column, int row) {
        Column<?> col = table.column(column);
        if (col instanceof LongColumn l) {
            return Long.toString(l.getLong(row));
        }
        return plain(((DoubleColumn) col).getDouble(row), decimals[column][row]);
    }

    /**
     * {@code v} written with {@code decimals} decimals, for a {@code v} read from such a plain decimal of at
     * most {@link #MAX_DIGITS} significant digits. Two paths, one result:
     * <ul>
     * <li>below 10^15 once scaled (nearly every number of a report), {@code v * 10^decimals} ({@code
     * 10^decimals} exact) is within 0.25 of the integer the digits spell (two roundings of at most 2^-53
     * relative each), so rounding it recovers the digits without a BigDecimal per cell;</li>
     * <li>otherwise (2546000000000000000000000, or more than 22 decimals) the exact binary value of {@code v}
     * rounded to {@link #MAX_DIGITS} significant digits is the written number: a double lies within 2^-53
     * (relative) of the decimal it was read from, less than half a unit in the 15th digit; a subnormal
     * double, which holds fewer digits, is its exact value rounded at the written place.</li>
     * </ul>
     */
    static String plain(double v, int decimals) {
        double scaled = decimals < POWERS.length ? v * POWERS[decimals] : Double.POSITIVE_INFINITY;
        if (!(Math.abs(scaled) < 1e15)) {
            BigDecimal exact = new BigDecimal(v);
            BigDecimal written = exact.round(new MathContext(MAX_DIGITS, RoundingMode.HALF_EVEN));
            if (written.stripTrailingZeros().scale() > decimals) {
                // A subnormal double (below 2.2e-308) holds fewer than 15 digits; the report wrote its exact
                // value rounded at the written place (Numbers.significant rounds half up), so that is rounded.
                return exact.setScale(decimals, RoundingMode.HALF_UP).toPlainString();
            }
            return written.setScale(decimals, RoundingMode.UNNECESSARY).toPlainString();
        }
        long digits = Math.round(scaled);
        String s = Long.toString(Math.abs(digits));
        StringBuilder out = new StringBuilder(s.length() + decimals + 3);
        if (digits < 0) {
            out.append('-');
        }
        if (decimals == 0) {
            return out.append(s).toString();
        }
        for (int pad = decimals + 1 - s.length(); pad > 0; pad--) {
            out.append('0');
        }
        out.append(s);
        return out.insert(out.length() - decimals, '.').toString();
    }

    private static StringColumn text(String name, List<List<ReportColumn.CsvField>> rows, int c) {
        // Appended, not set into a column of empty cells: a set first takes the empty value out of the column's
        // dictionary, which made building the text columns of a million-sample report 40 % slower.
        StringColumn col = StringColumn.create(name);
        for (List<ReportColumn.CsvField> row : rows) {
            col.append(row.get(c).text());
        }
        return col;
    }

    private static DoubleColumn doubles(String table, String name, List<List<ReportColumn.CsvField>> rows, int c,
                                        short[] decimals) {
        double[] values = new double[rows.size()];
        for (int r = 0; r < rows.size(); r++) {
            String s = number(table, name, rows.get(r).get(c));
            if (s.isEmpty()) {
                values[r] = DoubleColumnType.missingValueIndicator();
                continue;
            }
            decimals[r] = (short) checkedDecimals(table, name, s);
            values[r] = Double.parseDouble(s);
        }
        return DoubleColumn.create(name, values);
    }

    private static LongColumn longs(String table, String name, List<List<ReportColumn.CsvField>> rows, int c) {
        LongColumn col = LongColumn.create(name, rows.size());
        for (int r = 0; r < rows.size(); r++) {
            String s = number(table, name, rows.get(r).get(c));
            if (s.isEmpty()) {
                col.setMissing(r);
            } else if (s.indexOf('.') >= 0 || s.length() > 18) {
                throw new IllegalArgumentException("table " + table + ", column " + name + ": a count column holds "
                        + s);
            } else {
                col.set(r, Long.parseLong(s));
            }
        }
        return col;
    }

    private static String number(String table, String name, ReportColumn.CsvField f) {
        if (!f.numeric()) {
            throw new IllegalArgumentException("table " + table + ", column " + name + ": text '" + f.text()
                    + "' in a number column");
        }
        return f.text();
    }

    /**
     * The decimals of the plain decimal {@code s} ({@link Cell.Number} guarantees the form), refusing one
     * that a double cannot give back digit for digit: more than {@link #MAX_DIGITS} significant digits (from
     * the first non-zero digit to the last), or a negative zero ({@code -0.00}, whose sign a double keeps but
     * a decimal does not).
     */
    private static int checkedDecimals(String table, String name, String s) {
        int point = s.indexOf('.');
        int decimals = point < 0 ? 0 : s.length() - point - 1;
        int first = -1;
        int last = -1;
        for (int i = 0; i < s.length(); i++) {
            char ch = s.charAt(i);
            if (ch >= '1' && ch <= '9') {
                first = first < 0 ? i : first;
                last = i;
            }
        }
        int significant = first < 0 ? 0 : last - first + 1 - (first < point && point < last ? 1 : 0);
        if (significant > MAX_DIGITS || decimals > Short.MAX_VALUE || significant == 0 && s.charAt(0) == '-') {
            throw new IllegalArgumentException("table " + table + ", column " + name + ": " + s
                    + " cannot be written back exactly from a double");
        }
        return decimals;
    }
}
