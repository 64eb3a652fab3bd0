package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.UnaryOperator;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 15, item 5: a formula without a calculated value is an exception with its cell address (it was read
 * as 0 and counted as detected); sheets not read are listed; a workbook POI refuses gives one sentence of
 * Cupel's own.
 */
class XlsxWorkbookTest {
    @TempDir
    Path tmp;

    /**
     * A workbook with sheets "Sheet1" (Sample ID, Au_ppm, Ag_ppm; S1..S6, C7 a formula), "Batch2" (a second
     * table) and "Notes"; {@code edit} rewrites the XML of the parts whose names it is given.
     */
    private Path workbook(String name, String part, UnaryOperator<String> edit) throws IOException {
        try (XSSFWorkbook wb = new XSSFWorkbook()) {
            Sheet s = wb.createSheet("Sheet1");
            Row h = s.createRow(0);
            h.createCell(0).setCellValue("Sample ID");
            h.createCell(1).setCellValue("Au_ppm");
            h.createCell(2).setCellValue("Ag_ppm");
            for (int r = 1; r <= 6; r++) {
                Row row = s.createRow(r);
                row.createCell(0).setCellValue("S" + r);
                row.createCell(1).setCellValue(0.1 * r);
                row.createCell(2).setCellValue(r);
            }
            s.getRow(6).getCell(2).setCellFormula("B7*10");
            Sheet b = wb.createSheet("Batch2");
            b.createRow(0).createCell(0).setCellValue("Sample ID");
            b.getRow(0).createCell(1).setCellValue("Au_ppm");
            b.createRow(1).createCell(0).setCellValue("T1");
            b.getRow(1).createCell(1).setCellValue(0.3);
            wb.createSheet("Notes").createRow(0).createCell(0).setCellValue("nothing here");
            return Files.write(tmp.resolve(name), Workbooks.rewrite(Workbooks.bytes(wb), part, edit));
        }
    }

    /** The formula in C7 without its cached {@code <v>} (as a program that does not calculate writes it). */
    @Test
    void aFormulaWithoutACalculatedValueIsAnExceptionWithItsCell() throws IOException {
        Path xlsx = workbook("nocache.xlsx", "xl/worksheets/sheet1.xml",
                xml -> xml.replaceAll("(<f>B7\\*10</f>)<v>[^<]*</v>", "$1"));
        RawTable t = TableReader.read(xlsx);
        assertEquals("", t.rows().get(5).cell(2), "not read as 0");
        DataIssue i = t.issues().stream().filter(x -> x.severity() == DataIssue.Severity.EXCLUDED).findFirst()
                .orElseThrow();
        assertEquals(7, i.where().line());
        assertEquals(3, i.where().column());
        assertTrue(i.problem().contains("Sheet1!C7") && i.found().equals("=B7*10"), i.toString());

        LabFile lab = new LabFileReader(IngestSettings.DEFAULTS).read(xlsx, "nocache.xlsx");
        assertFalse(lab.table().hasResult(5, 1), "Ag of S6 is not a result");
    }

    /** A formula with its cached value is read as before (XlsxTableTest), with one warning. */
    @Test
    void everySheetNotReadIsListedAndOneHoldingATableIsSaidSo() throws IOException {
        Path xlsx = workbook("sheets.xlsx", "", UnaryOperator.identity());
        RawTable t = TableReader.read(xlsx);
        DataIssue sheets = t.issues().stream().filter(i -> i.problem().startsWith("only sheet")).findFirst()
                .orElseThrow();
        assertEquals(DataIssue.Severity.WARNING, sheets.severity());
        assertEquals("only sheet 'Sheet1' of the 3 sheets was read; not read, though they hold a table with a "
                + "sample-ID column: 'Batch2'; not read, without a recognised table: 'Notes'", sheets.problem());
        assertTrue(sheets.fix().contains("ingest.sheet"), sheets.fix());
    }

    /** POI refuses a document type declaration; the message is one sentence of Cupel's own, whichever part. */
    @Test
    void aDoctypeGivesOneSentenceNamingTheFile() throws IOException {
        for (String part : List.of("xl/worksheets/sheet1.xml", "[Content_Types].xml", "xl/workbook.xml")) {
            Path xlsx = workbook("doctype.xlsx", part, xml -> xml.replaceFirst("\\?>", "?><!DOCTYPE x>"));
            InputException e = assertThrows(InputException.class, () -> TableReader.read(xlsx));
            String m = e.getMessage();
            assertTrue(m.startsWith(xlsx + ": the workbook contains an XML document type declaration (DOCTYPE)"),
                    part + ": " + m);
            assertFalse(m.contains("http://") || m.contains("\n") || m.contains("Exception"), m);
        }
    }

    /** POI's zip-bomb advice spans several lines and names its own settings; Cupel says it in one sentence. */
    @Test
    void aZipBombGivesOneSentenceOfOurOwn() throws IOException {
        Path bomb = workbook("bomb.xlsx", "xl/worksheets/sheet1.xml",
                xml -> xml.replaceFirst("\\?>", "?><!--" + "a".repeat(40 << 20) + "-->"));
        InputException e = assertThrows(InputException.class, () -> TableReader.read(bomb));
        assertEquals(bomb + ": the workbook expands to far more data than its size (a possible zip bomb), so it was "
                + "not opened; open it in a spreadsheet and save it again as .xlsx, or save the sheet as CSV UTF-8.",
                e.getMessage());
    }
}
