package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.UnaryOperator;
import org.apache.poi.openxml4j.util.ZipSecureFile;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.cupel.project.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Guarantee 5 (issue 9): hostile workbooks. A zip bomb (a sheet part that inflates far beyond its
 * compressed size) and an XML entity expansion ("billion laughs") are refused with an input error naming
 * the file, quickly and without exhausting memory. The size cap and cached formula values are tested in
 * {@link XlsxTableTest}.
 */
class XlsxSafetyTest {
    private static final String SHEET = "xl/worksheets/sheet1.xml";

    @Test
    void aZipBombIsRefusedWithAMessageNamingTheFile(@TempDir Path dir) throws IOException {
        // 40 MB of one repeated character deflates about 1000:1, below POI's minimum inflate ratio of 1 %.
        Path bomb = rewriteSheet(dir.resolve("bomb.xlsx"), xml -> xml.replaceFirst("\\?>",
                "?><!--" + "a".repeat(40 << 20) + "-->"));
        InputException e = assertThrows(InputException.class, () -> TableReader.read(bomb));
        assertTrue(e.getMessage().startsWith(bomb.toString()), e.getMessage());
        assertTrue(e.getMessage().contains("CSV"), "says how to fix it: " + e.getMessage());
    }

    @Test
    void anEntityExpansionIsRefused(@TempDir Path dir) throws IOException {
        StringBuilder doctype = new StringBuilder("<!DOCTYPE worksheet [<!ENTITY l0 \"lol\">");
        for (int i = 1; i <= 9; i++) {
            doctype.append("<!ENTITY l").append(i).append(" \"").append(("&l" + (i - 1) + ";").repeat(10)).append("\">");
        }
        doctype.append("]>");
        Path laughs = rewriteSheet(dir.resolve("laughs.xlsx"), xml -> xml.replaceFirst("\\?>", "?>" + doctype)
                .replace("<v>", "<v>&l9;"));
        InputException e = assertThrows(InputException.class, () -> TableReader.read(laughs));
        assertTrue(e.getMessage().startsWith(laughs.toString()), e.getMessage());
    }

    @Test
    void theZipGuardsAreSetExplicitly(@TempDir Path dir) throws IOException {
        Path ok = rewriteSheet(dir.resolve("ok.xlsx"), UnaryOperator.identity());
        assertEquals(2, TableReader.read(ok).rows().size());
        assertEquals(XlsxSheetReader.MIN_INFLATE_RATIO, ZipSecureFile.getMinInflateRatio(), 0.0);
        assertEquals(XlsxSheetReader.MAX_ENTRY_BYTES, ZipSecureFile.getMaxEntrySize());
    }

    /** A small valid workbook (sample_id, Au_ppm; two rows) with its first sheet's XML rewritten. */
    private static Path rewriteSheet(Path file, UnaryOperator<String> edit) throws IOException {
        try (XSSFWorkbook wb = new XSSFWorkbook()) {
            Sheet s = wb.createSheet("Assays");
            Row h = s.createRow(0);
            h.createCell(0).setCellValue("sample_id");
            h.createCell(1).setCellValue("Au_ppm");
            for (int r = 1; r <= 2; r++) {
                Row row = s.createRow(r);
                row.createCell(0).setCellValue("S" + r);
                row.createCell(1).setCellValue(0.5 * r);
            }
            return Files.write(file, Workbooks.rewrite(Workbooks.bytes(wb), SHEET, edit));
        }
    }
}
