package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import tech.tablesaw.api.DoubleColumn;
import tech.tablesaw.api.LongColumn;
import tech.tablesaw.api.StringColumn;
import tech.tablesaw.api.Table;

/** Report tables as Tablesaw tables, and the CSV written from them. */
class ReportFrameTest {
    /**
     * One typed column per CSV column under the CSV names: text a StringColumn, a count a LongColumn, numbers
     * DoubleColumns (an interval as estimate, lower and upper); a number not computed or not applying is
     * missing, its reason in the note column; the lab's 0.070 is the double 0.07.
     */
    @Test
    void aReportTableIsATablesawTableWithTypedColumns() {
        ReportTable rt = CsvTablesTest.typedTable();
        Table t = rt.toTablesaw();
        assertEquals("p", t.name());
        assertEquals(rt.csvColumns().stream().map(ReportColumn.CsvColumn::name).toList(), t.columnNames());
        assertEquals(2, t.rowCount());
        assertInstanceOf(StringColumn.class, t.column("type"));
        assertInstanceOf(LongColumn.class, t.column("pairs"));
        assertInstanceOf(DoubleColumn.class, t.column("rms_cv_percent"));
        assertInstanceOf(StringColumn.class, t.column("original_qualifier"));
        assertEquals("-field", t.stringColumn("type").get(1), "the table holds the text; the CSV neutralises it");
        assertEquals(1234L, t.longColumn("pairs").getLong(0));
        assertEquals(9.24, t.doubleColumn("rms_cv_percent").getDouble(0));
        assertEquals(6.79, t.doubleColumn("rms_cv_lower_percent").getDouble(0));
        assertEquals(11.72, t.doubleColumn("rms_cv_upper_percent").getDouble(0));
        assertTrue(t.doubleColumn("rms_cv_percent").isMissing(1), "not computed is missing");
        assertEquals("needs 2 pairs, has 1", t.stringColumn("rms_cv_note").get(1));
        assertEquals(-1.5, t.doubleColumn("bias_percent").getDouble(0));
        assertTrue(t.doubleColumn("bias_percent").isMissing(1), "a blank cell is missing");
        assertEquals(0.07, t.doubleColumn("original_g_per_t").getDouble(0));
        assertEquals(0.005, t.doubleColumn("original_g_per_t").getDouble(1));
        assertEquals("<", t.stringColumn("original_qualifier").get(1));
        assertFalse(t.doubleColumn("original_g_per_t").isMissing(1));
    }

    /** Each call gives a new table: a caller's change does not reach the report or the next caller. */
    @Test
    void eachCallGivesItsOwnTable() {
        ReportTable rt = CsvTablesTest.typedTable();
        Table a = rt.toTablesaw();
        a.doubleColumn("bias_percent").set(0, 99.0);
        a.removeColumns("type");
        Table b = rt.toTablesaw();
        assertEquals(-1.5, b.doubleColumn("bias_percent").getDouble(0));
        assertEquals("type", b.columnNames().get(0));
    }

    /** A table of text rows is all StringColumns, the text as given ("-4.2" stays text, as the CSV writes it). */
    @Test
    void aTextTableIsAllStringColumns() {
        Table t = new ReportTable("t", "T", List.of("ID", "Bias (%)"),
                List.of(List.of("=evil()", "-4.2"), List.of("a,b", "3")), "").toTablesaw();
        assertEquals(List.of("id", "bias_percent"), t.columnNames());
        assertInstanceOf(StringColumn.class, t.column(1));
        assertEquals("-4.2", t.stringColumn("bias_percent").get(0));
        assertEquals("=evil()", t.stringColumn("id").get(0));
    }

    /**
     * Two headers whose CSV names differ only in case are two columns for Tablesaw too (it tells names
     * apart without case, so the second gets the suffix {@code _2}).
     */
    @Test
    void namesDifferingInCaseOnlyAreMadeUnique() {
        ReportTable rt = ReportTable.typed("c", "C", List.of(ReportColumn.text("A", "Au"), ReportColumn.text("B", "au")),
                List.of(List.of(Cell.text("x"), Cell.text("y"))), "");
        assertEquals(List.of("Au", "au_2"), rt.toTablesaw().columnNames());
    }

    /**
     * The digits come back from the double: for a plain decimal of at most 15 significant digits,
     * {@code plain(parse(s), decimals(s))} is {@code s}, whether it has many decimals, none, or trailing
     * zeros before the point (a lognormal MLE of 2546000000000000000000000 on a one-batch selection).
     * Checked against java.math.BigDecimal, exact decimal arithmetic, which spells each drawn decimal
     * independently of doubles.
     */
    @Test
    void aWrittenDecimalComesBackFromItsDouble() {
        record Written(long unscaled, int scale) {
            String text() {
                return BigDecimal.valueOf(unscaled, scale).toPlainString();
            }

            int decimals() {
                return Math.max(scale, 0);
            }
        }
        Gen<Written> gen = r -> {
            int digits = r.nextInt(1, ReportFrame.MAX_DIGITS + 1);
            long bound = BigDecimal.TEN.pow(digits).longValueExact();
            long unscaled = r.nextLong(bound) * (r.nextBoolean() ? 1 : -1);
            return new Written(unscaled, r.nextInt(-25, 41));
        };
        List<Gen<Written>> edges = List.of(Gen.constant(new Written(0, 0)), Gen.constant(new Written(0, 3)),
                Gen.constant(new Written(999_999_999_999_999L, 0)), Gen.constant(new Written(-999_999_999_999_999L, 22)),
                Gen.constant(new Written(1, 22)), Gen.constant(new Written(1, 23)), Gen.constant(new Written(70, 3)),
                Gen.constant(new Written(-5, 1)), Gen.constant(new Written(2546, -21)),
                Gen.constant(new Written(999_999_999_999_999L, -10)));
        SeededTries.forAll(5000, edges, gen, w -> {
            String s = w.text();
            assertEquals(s, ReportFrame.plain(Double.parseDouble(s), w.decimals()), s);
        });
    }

    /** A huge estimate with trailing zeros before the point is written as the report wrote it. */
    @Test
    void aHugeNumberIsWrittenAsWritten(@TempDir Path dir) throws IOException {
        String plain = "2546000000000000000000000";
        ReportTable rt = ReportTable.typed("x", "X", List.of(ReportColumn.number("MLE", "mle", "g/t")),
                List.of(List.of(new Cell.Number(Double.parseDouble(plain), plain, plain))), "");
        assertEquals(2.546e24, rt.toTablesaw().doubleColumn("mle_g_per_t").getDouble(0));
        Path f = dir.resolve("x.csv");
        CsvTables.write(rt, f);
        assertEquals("mle_g_per_t\r\n" + plain + "\r\n", Files.readString(f, StandardCharsets.UTF_8));
    }

    /**
     * A p-value far below 0.001 keeps its three significant digits in the CSV, down to the smallest double:
     * a batch's chi-square test on 50,000 pairs gave 3.41e-160, whose 162 decimals once stopped the report
     * of a million-sample project. Checked against java.math.BigDecimal, which spells the same three digits (trailing zeros dropped, as the report writes them).
     */
    @Test
    void aTinyPValueIsWrittenWithItsThreeDigits(@TempDir Path dir) throws IOException {
        for (double p : new double[] {3.41e-160, 1e-300, Double.MIN_NORMAL, Double.MIN_VALUE, 0.000999, 1.5e-17}) {
            ReportTable rt = ReportTable.typed("p", "P", List.of(ReportColumn.number("p", "p", "")),
                    List.of(List.of(Cell.pValue(p))), "");
            Path f = dir.resolve("p.csv");
            CsvTables.write(rt, f);
            String expected = new BigDecimal(p).round(new java.math.MathContext(3)).stripTrailingZeros().toPlainString();
            assertEquals("p\r\n" + expected + "\r\n", Files.readString(f, StandardCharsets.UTF_8), "p = " + p);
        }
    }

    /**
     * A number a double cannot give back digit for digit is refused, never written differently: 17
     * significant digits (hand-checked: 2^50 < 1.23e15 < 2^51, so the doubles there are 2^-2 apart and
     * 1234567890123456.7 is stored as 1234567890123456.75), and a negative zero (the double keeps the
     * sign, a decimal does not).
     */
    @Test
    void aNumberADoubleCannotGiveBackIsRefused() {
        for (String plain : List.of("1234567890123456.7", "-0.00")) {
            ReportTable rt = ReportTable.typed("x", "X", List.of(ReportColumn.number("N", "n", "")),
                    List.of(List.of(new Cell.Number(Double.parseDouble(plain), plain, plain))), "");
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, rt::toTablesaw, plain);
            assertTrue(e.getMessage().contains("table x, column n: " + plain), e.getMessage());
        }
    }

    /**
     * Every table of the demo appendix: the Tablesaw table has the CSV's columns and rows, and the CSV
     * written from it is the one the typed cells spell field by field (text neutralised and quoted, numbers
     * as the report wrote them), which is how the CSV was written before the Tablesaw layer.
     */
    @Test
    void everyDemoTableWritesTheSameCsvThroughTablesaw(@TempDir Path dir) throws IOException {
        List<ReportTable> tables = DemoReport.build(dir).tables();
        assertTrue(tables.size() > 40, "the demo appendix has its tables: " + tables.size());
        for (ReportTable rt : tables) {
            Table t = rt.toTablesaw();
            assertEquals(rt.csvColumns().stream().map(ReportColumn.CsvColumn::name).toList(), t.columnNames(), rt.id());
            assertEquals(rt.cells().size(), t.rowCount(), rt.id());
            Path f = dir.resolve("t.csv");
            CsvTables.write(rt, f);
            assertEquals(spelled(rt), Files.readString(f, StandardCharsets.UTF_8), rt.id());
        }
    }

    private static String spelled(ReportTable rt) {
        StringBuilder out = new StringBuilder();
        out.append(String.join(",", rt.csvColumns().stream().map(c -> CsvTables.field(c.name())).toList())).append("\r\n");
        for (List<ReportColumn.CsvField> row : rt.csvRows()) {
            out.append(String.join(",", row.stream().map(f -> f.numeric() ? f.text() : CsvTables.field(f.text()))
                    .toList())).append("\r\n");
        }
        return out.toString();
    }
}
