package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.cupel.assay.SourceLocation;
import org.cupel.project.DataIssue;
import org.cupel.project.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The same table as XLSX and as CSV gives the same parse. */
class XlsxTableTest {
    private static final String CSV = "Lab: Redgum Assay Services\nJob: RG-7\n\n"
            + "sample_id,date,Au_ppm,Ag_ppm\nS1,2025-03-14,0.005,12\nS2,2025-03-14,<0.005,BDL\n"
            + "S3,2025-03-15,1234.5,NR\n";

    @TempDir
    Path dir;

    @Test
    void xlsxAndCsvOfTheSameTableParseIdentically() throws IOException {
        Path csv = dir.resolve("t.csv");
        Files.writeString(csv, CSV);
        Path xlsx = dir.resolve("t.xlsx");
        writeWorkbook(xlsx, false);
        RawTable a = TableReader.read(csv, "t", TableReader::hasSampleIdColumn, null);
        RawTable b = TableReader.read(xlsx, "t", TableReader::hasSampleIdColumn, null);
        assertEquals(a.headerBlock(), b.headerBlock());
        assertEquals(a.columns(), b.columns());
        assertEquals(a.headerLine(), b.headerLine());
        assertEquals(a.rows(), b.rows(), "cells and line numbers");
        ValueParser p = new ValueParser(ValueConventions.DEFAULTS);
        for (int r = 0; r < a.rows().size(); r++) {
            for (int c = 2; c < 4; c++) {
                SourceLocation at = a.at(a.rows().get(r), c);
                assertEquals(p.parse(a.rows().get(r).cell(c), 0.5, at), p.parse(b.rows().get(r).cell(c), 0.5, at));
            }
        }
    }

    @Test
    void formulasAreReadAsCachedValuesWithAWarning() throws IOException {
        Path xlsx = dir.resolve("f.xlsx");
        writeWorkbook(xlsx, true);
        RawTable t = TableReader.read(xlsx);
        assertEquals("2.5", t.rows().get(0).cell(2));
        assertEquals(1, t.issues().size());
        assertEquals(DataIssue.Severity.WARNING, t.issues().get(0).severity());
        assertEquals(5, t.issues().get(0).where().line());
    }

    @Test
    void aNamedSheetThatDoesNotExistListsTheSheets() throws IOException {
        Path xlsx = dir.resolve("s.xlsx");
        writeWorkbook(xlsx, false);
        InputException e = assertThrows(InputException.class,
                () -> TableReader.read(xlsx, "s.xlsx", TableReader::hasSampleIdColumn, "Results"));
        assertTrue(e.getMessage().contains("[Assays]"), e.getMessage());
    }

    @Test
    void aDamagedWorkbookIsAnInputError() throws IOException {
        Path xlsx = dir.resolve("bad.xlsx");
        Files.writeString(xlsx, "not a zip");
        assertThrows(InputException.class, () -> TableReader.read(xlsx));
    }

    @Test
    void aWorkbookOverTheSizeCapIsRefusedWithTheFix() throws IOException {
        Path big = dir.resolve("big.xlsx");
        try (var f = new java.io.RandomAccessFile(big.toFile(), "rw")) {
            f.setLength(XlsxSheetReader.MAX_FILE_BYTES + 1);
        }
        InputException e = assertThrows(InputException.class, () -> TableReader.read(big));
        assertTrue(e.getMessage().contains("save the sheet as CSV"), e.getMessage());
    }

    private static void writeWorkbook(Path file, boolean withFormula) throws IOException {
        try (XSSFWorkbook wb = new XSSFWorkbook(); OutputStream out = Files.newOutputStream(file)) {
            Sheet s = wb.createSheet("Assays");
            CellStyle dateStyle = wb.createCellStyle();
            dateStyle.setDataFormat(wb.getCreationHelper().createDataFormat().getFormat("dd/mm/yyyy"));
            CellStyle twoDecimals = wb.createCellStyle();
            twoDecimals.setDataFormat(wb.getCreationHelper().createDataFormat().getFormat("0.00"));
            s.createRow(0).createCell(0).setCellValue("Lab: Redgum Assay Services");
            Row job = s.createRow(1);
            job.createCell(0).setCellValue("Job:");
            job.createCell(1).setCellValue("RG-7");
            Row h = s.createRow(3);
            String[] names = {"sample_id", "date", "Au_ppm", "Ag_ppm"};
            for (int i = 0; i < names.length; i++) {
                h.createCell(i).setCellValue(names[i]);
            }
            Object[][] data = {{"S1", LocalDate.of(2025, 3, 14), 0.005, 12.0},
                {"S2", LocalDate.of(2025, 3, 14), "<0.005", "BDL"}, {"S3", LocalDate.of(2025, 3, 15), 1234.5, "NR"}};
            for (int r = 0; r < data.length; r++) {
                Row row = s.createRow(4 + r);
                row.createCell(0).setCellValue((String) data[r][0]);
                row.createCell(1).setCellValue((LocalDate) data[r][1]);
                row.getCell(1).setCellStyle(dateStyle);
                for (int c = 2; c < 4; c++) {
                    Object v = data[r][c];
                    if (v instanceof Double) {
                        row.createCell(c).setCellValue((Double) v);
                        // A display format that would round 0.005: the reader must not use it.
                        row.getCell(c).setCellStyle(twoDecimals);
                    } else {
                        row.createCell(c).setCellValue((String) v);
                    }
                }
            }
            if (withFormula) {
                s.getRow(4).createCell(2).setCellFormula("5/2");
                wb.getCreationHelper().createFormulaEvaluator().evaluateAll();
            }
            wb.write(out);
        }
    }
}
