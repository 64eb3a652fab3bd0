package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
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
        assertEquals("ID,Bias (%)\r\n'=evil(),-4.2\r\n\"a,b\",3\r\n", Files.readString(f, StandardCharsets.UTF_8));
    }
}
