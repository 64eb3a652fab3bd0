package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.cupel.assay.AssayValue;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CsvTablesTest {
    /** The trigger characters of OWASP Foundation, "CSV Injection": =, +, -, @, tab, carriage return. */
    @Test
    void neutralisesEachFormulaPrefix() {
        assertEquals("'=1+1", CsvTables.neutralise("=1+1"));
        assertEquals("'+1+1", CsvTables.neutralise("+1+1"));
        assertEquals("'-1+1", CsvTables.neutralise("-1+1"));
        assertEquals("'@SUM(A1:A2)", CsvTables.neutralise("@SUM(A1:A2)"));
        assertEquals("'\t=1", CsvTables.neutralise("\t=1"));
        assertEquals("'\r=1", CsvTables.neutralise("\r=1"));
        assertEquals("'-cmd|' /C calc'!A0", CsvTables.neutralise("-cmd|' /C calc'!A0"));
        assertEquals("'-", CsvTables.neutralise("-"));
    }

    @Test
    void plainNegativeNumbersStayNumbers() {
        for (String n : List.of("-0.12", "-12", "-1,234.5", "-3.4e-2", "-12%", "-7E+3")) {
            assertEquals(n, CsvTables.neutralise(n));
        }
        assertEquals("'-1e", CsvTables.neutralise("-1e"));
        assertEquals("'-1,23", CsvTables.neutralise("-1,23"), "not a well-formed grouping");
        assertEquals("<0.005", CsvTables.neutralise("<0.005"));
        assertEquals("S=1", CsvTables.neutralise("S=1"));
    }

    /** Quoting rules of RFC 4180 (Shafranovich 2005), section 2, items 5 to 7. */
    @Test
    void quotesPerRfc4180() {
        assertEquals("aaa", CsvTables.field("aaa"));
        assertEquals("\"b,bb\"", CsvTables.field("b,bb"));
        assertEquals("\"b\"\"bb\"", CsvTables.field("b\"bb"));
        assertEquals("\"b\r\nbb\"", CsvTables.field("b\r\nbb"));
        assertEquals("\"'=1,2\"", CsvTables.field("=1,2"), "neutralised first, then quoted");
    }

    @Test
    void writesHeaderAndRowsWithCrlf(@TempDir Path dir) throws Exception {
        ReportTable t = new ReportTable("t", "T", List.of("ID", "Bias (%)"),
                List.of(List.of("=evil()", "-4.2"), List.of("a,b", "3")), "");
        Path f = dir.resolve("t.csv");
        CsvTables.write(t, f);
        assertEquals("id,bias_percent\r\n'=evil(),-4.2\r\n\"a,b\",3\r\n", Files.readString(f, StandardCharsets.UTF_8),
                "a table of text rows: header names in the CSV style, text cells neutralised");
    }

    /** A table of every kind of column: text, count, interval with note, signed percentage, lab value. */
    static ReportTable typedTable() {
        return ReportTable.typed("p", "P", List.of(ReportColumn.text("Type"),
                        ReportColumn.count("Pairs", "pairs"),
                        ReportColumn.interval("RMS CV (95 % CI)", "rms_cv", "%").withNote(),
                        ReportColumn.number("Bias", "bias", "%"),
                        ReportColumn.assay("Original", "original", "g/t")),
                List.of(List.of(Cell.text("pulp duplicate"), Cell.count(1234),
                                Cell.interval(Cell.percentNumber(9.24, 2), 6.79, 11.72, x -> Cell.percentNumber(x, 2)),
                                Cell.signedPercent(-1.5, 2), Cell.assay(AssayValue.detected(0.07).withDecimals(3))),
                        List.of(Cell.text("-field"), Cell.count(5), Cell.notComputed("needs 2 pairs, has 1"),
                                Cell.blank(), Cell.assay(AssayValue.belowDetection(0.005).withDecimals(3)))), "");
    }

    /**
     * One number per CSV cell: an interval column becomes value, lower and upper columns with the unit in
     * the header; percentages lose their sign; a not computable number is empty with its reason in the note;
     * a lab value is its number and its qualifier; numbers (negative ones too) are never neutralised.
     */
    @Test
    void typedCellsAreOneNumberPerCell(@TempDir Path dir) throws Exception {
        ReportTable t = typedTable();
        assertEquals(List.of("pulp duplicate", "1,234", "9.24 % (6.79 % to 11.72 %)", "-1.50 %", "0.070"),
                t.rows().get(0), "the page shows the display text");
        Path f = dir.resolve("p.csv");
        CsvTables.write(t, f);
        assertEquals("type,pairs,rms_cv_percent,rms_cv_lower_percent,rms_cv_upper_percent,rms_cv_note,bias_percent,"
                        + "original_g_per_t,original_qualifier\r\n"
                        + "pulp duplicate,1234,9.24,6.79,11.72,,-1.50,0.070,\r\n"
                        + "'-field,5,,,,\"needs 2 pairs, has 1\",,0.005,<\r\n",
                Files.readString(f, StandardCharsets.UTF_8));
    }

    @Test
    void aCellMustFitItsColumn() {
        assertThrows(IllegalArgumentException.class, () -> ReportTable.typed("x", "X",
                List.of(ReportColumn.count("n", "n")), List.of(List.of(Cell.text("five"))), ""));
        assertThrows(IllegalArgumentException.class, () -> ReportTable.typed("x", "X",
                List.of(ReportColumn.count("n", "n")), List.of(List.of(Cell.fixed(2.5, 1))), ""),
                "a count column holds whole numbers");
        assertThrows(IllegalArgumentException.class, () -> new Cell.Number(1, "=1+1", "1"),
                "a number's CSV text is a plain decimal, never anything a spreadsheet would run");
    }

    @Test
    void headersBecomeCsvNames() {
        assertEquals("rms_cv_95_percent_ci", ReportColumn.slug("RMS CV (95 % CI)"));
        assertEquals("sigma0_ppm_95_percent_ci", ReportColumn.slug("σ₀ (ppm, 95 % CI)"));
        assertEquals("percent_within_limit", ReportColumn.slug("% within limit"));
        assertEquals("substitution_dl_over_2", ReportColumn.slug("Substitution DL/2"));
        assertEquals("substitution_dl_over_sqrt_2", ReportColumn.slug("Substitution DL/√2"));
        assertEquals("g_per_t", ReportColumn.unitSlug("g/t"));
        assertEquals("percent", ReportColumn.unitSlug("%"));
    }
}
