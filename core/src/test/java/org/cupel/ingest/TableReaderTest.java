package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.cupel.project.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Text table reading: RFC 4180 (Shafranovich, 2005, "Common Format and MIME Type for CSV Files") and lab file habits. */
class TableReaderTest {
    @TempDir
    Path dir;

    @ParameterizedTest(name = "delimiter ''{0}''")
    @CsvSource(delimiter = '|', value = {"','", "';'", "'\t'"})
    void delimiterIsSniffed(String delimiter) throws IOException {
        String d = delimiter;
        Path f = write("t.csv", "sample_id" + d + "Au_ppm" + d + "Ag_ppm\nS1" + d + "0.5" + d + "3\nS2" + d + "<0.01"
                + d + "4\n");
        RawTable t = TableReader.read(f);
        assertEquals(List.of("sample_id", "Au_ppm", "Ag_ppm"), t.columns());
        assertEquals(2, t.rows().size());
        assertEquals("<0.01", t.rows().get(1).cell(1));
    }

    @Test
    void semicolonFileWithDecimalCommasIsSplitOnSemicolons() throws IOException {
        RawTable t = TableReader.read(write("dc.csv", "sample;Au ppm;Cu %\nS1;0,52;1,3\nS2;1,1;0,2\n"));
        assertEquals(3, t.columns().size());
        assertEquals("0,52", t.rows().get(0).cell(1));
    }

    @Test
    void emptyFileAndBomOnlyFileSayThereIsNoHeader() throws IOException {
        // Small files are decoded whole and tokenized in place; an empty text must end the read at once.
        Path empty = write("empty.csv", "");
        InputException e = assertThrows(InputException.class, () -> TableReader.read(empty));
        assertTrue(e.getMessage().contains("no header row found"), e.getMessage());
        Path bomOnly = dir.resolve("bom.csv");
        Files.write(bomOnly, new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF});
        InputException b = assertThrows(InputException.class, () -> TableReader.read(bomOnly));
        assertTrue(b.getMessage().contains("no header row found"), b.getMessage());
    }

    @Test
    void byteOrderMarkIsSkipped() throws IOException {
        byte[] body = "sample_id,Au_ppm\nS1,1\n".getBytes(StandardCharsets.UTF_8);
        byte[] bytes = new byte[body.length + 3];
        bytes[0] = (byte) 0xEF;
        bytes[1] = (byte) 0xBB;
        bytes[2] = (byte) 0xBF;
        System.arraycopy(body, 0, bytes, 3, body.length);
        Path f = dir.resolve("bom.csv");
        Files.write(f, bytes);
        RawTable t = TableReader.read(f);
        assertEquals("sample_id", t.columns().get(0));
        assertEquals(0, t.column("sample id"));
    }

    @Test
    void utf16WithByteOrderMarkIsRead() throws IOException {
        Path f = dir.resolve("u16.txt");
        Files.write(f, "\uFEFFsample\tAu_ppm\nS1\t2.5\n".getBytes(StandardCharsets.UTF_16LE));
        RawTable t = TableReader.read(f);
        assertEquals(List.of("sample", "Au_ppm"), t.columns());
        assertEquals("2.5", t.rows().get(0).cell(1));
    }

    @Test
    void windowsLineEndingsAndLineNumbers() throws IOException {
        RawTable t = TableReader.read(write("crlf.csv", "sample_id,Au_ppm\r\nS1,1\r\n\r\nS2,2\r\n"));
        assertEquals(2, t.rows().size());
        assertEquals(2, t.rows().get(0).line());
        assertEquals(4, t.rows().get(1).line(), "the blank line 3 is skipped but counted");
        assertEquals("1", t.rows().get(0).cell(1));
    }

    @Test
    void headerBlockAboveTheTableIsCollected() throws IOException {
        String text = "Laboratory: Redgum Assay Services\nJob,RG-2025-0117\nDate Reported: 2025-03-14\n"
                + "Certificate of Analysis\n\nSample ID,Au ppm FA-AAS\nS1,0.5\n";
        RawTable t = TableReader.read(write("block.csv", text));
        assertEquals(Map.of("laboratory", "Redgum Assay Services", "job", "RG-2025-0117",
                "date reported", "2025-03-14"), t.headerBlock());
        assertEquals(6, t.headerLine());
        assertEquals(7, t.rows().get(0).line());
    }

    @Test
    void quotesWithDelimitersDoubledQuotesAndLineBreaks() throws IOException {
        String text = "sample_id,comment,Au_ppm\nS1,\"wet, bagged\",1\nS2,\"said \"\"high\"\"\",2\n"
                + "S3,\"two\r\nlines\",3\nS4,  \"padded\"  ,4\n";
        RawTable t = TableReader.read(write("q.csv", text));
        assertEquals("wet, bagged", t.rows().get(0).cell(1));
        assertEquals("said \"high\"", t.rows().get(1).cell(1));
        assertEquals("two\nlines", t.rows().get(2).cell(1));
        assertEquals(4, t.rows().get(2).line());
        assertEquals(6, t.rows().get(3).line(), "the row after a quoted line break keeps its physical line");
        assertEquals("padded", t.rows().get(3).cell(1));
        assertEquals("4", t.rows().get(3).cell(2));
    }

    @Test
    void cellsAreTrimmedAndAShortRowIsListedNotPadded() throws IOException {
        RawTable t = TableReader.read(write("s.csv", "sample_id , Au_ppm ,Ag_ppm\n  S1 ,  0.5, \n  S2 ,  0.5\n"));
        assertEquals(1, t.column("AU-PPM"));
        assertEquals("S1", t.rows().get(0).cell(0));
        assertEquals("", t.rows().get(0).cell(2));
        assertEquals("", t.rows().get(0).cell(99));
        assertEquals(-1, t.column("Cu_ppm"));
        assertEquals(3, t.at(t.rows().get(0), 2).column());
        // S2 has 2 cells under 3 columns: it is ragged (issue 15), not read with a blank Ag.
        assertEquals(1, t.rows().size());
        assertEquals(1, t.rowsLeftOut());
        assertEquals(3, t.issues().get(0).where().line());
    }

    @Test
    void withoutAnIdColumnTheWidestEarlyRowIsTheHeader() throws IOException {
        RawTable t = TableReader.read(write("x.csv", "Lab,Somewhere\ncode,analyte,value\nA,Au,1\n"));
        assertEquals(List.of("code", "analyte", "value"), t.columns());
        assertEquals(Map.of("lab", "Somewhere"), t.headerBlock());
    }

    @Test
    void customHeaderPredicate() throws IOException {
        RawTable t = TableReader.read(write("c.csv", "title,x\ncrm,analyte,unit\nK1,Au,g/t\n"),
                cells -> cells.contains("crm"));
        assertEquals(1, t.rows().size());
    }

    @Test
    void unclosedQuoteNamesTheLineWhereItOpened() throws IOException {
        InputException e = assertThrows(InputException.class,
                () -> TableReader.read(write("open.csv", "sample_id,Au_ppm\nS1,\"0.5\nS2,1\n")));
        assertTrue(e.getMessage().startsWith(dir.resolve("open.csv") + ":2:2:"), e.getMessage());
        assertTrue(e.getMessage().contains("never closed"));
    }

    @Test
    void binaryContentIsRefused() throws IOException {
        Path f = dir.resolve("bin.csv");
        Files.write(f, new byte[] {'s', 'a', 0, 1, 2, 3});
        assertTrue(assertThrows(InputException.class, () -> TableReader.read(f)).getMessage().contains("binary"));
    }

    @Test
    void aWorkbookWithACsvNameIsRefusedWithTheFix() throws IOException {
        Path f = dir.resolve("book.csv");
        Files.write(f, new byte[] {'P', 'K', 3, 4, 0, 0});
        assertTrue(assertThrows(InputException.class, () -> TableReader.read(f)).getMessage().contains(".xlsx"));
    }

    @Test
    void emptyFileHasNoHeader() throws IOException {
        InputException e = assertThrows(InputException.class, () -> TableReader.read(write("e.csv", "\n\n")));
        assertTrue(e.getMessage().contains("no header row"));
    }

    @Test
    void missingFileIsAnInputError() {
        assertThrows(InputException.class, () -> TableReader.read(dir.resolve("nope.csv")));
    }

    @Test
    void invalidUtf8IsAnInputErrorNotGarbage() throws IOException {
        Path f = dir.resolve("latin1.csv");
        Files.write(f, "sample_id,comment\nS1,caf\u00e9\n".getBytes(StandardCharsets.ISO_8859_1));
        InputException e = assertThrows(InputException.class, () -> TableReader.read(f));
        assertTrue(e.getMessage().contains("UTF-8"), e.getMessage());
    }

    @Test
    void aHugeFieldStopsWithAClearMessageInsteadOfFillingMemory() throws IOException {
        Path f = dir.resolve("huge.csv");
        StringBuilder sb = new StringBuilder("sample_id,Au_ppm\nS1,\"");
        sb.append("x".repeat(DelimitedTokenizer.MAX_FIELD_CHARS + 10)).append("\"\n");
        Files.writeString(f, sb);
        InputException e = assertThrows(InputException.class, () -> TableReader.read(f));
        assertTrue(e.getMessage().contains("longer than 1 MB"), e.getMessage());
    }

    @Test
    void oldExcelFormatIsRefusedWithTheFix() throws IOException {
        Path f = write("old.xls", "x");
        assertTrue(assertThrows(InputException.class, () -> TableReader.read(f)).getMessage().contains(".xlsx"));
    }

    private Path write(String name, String text) throws IOException {
        Path f = dir.resolve(name);
        Files.writeString(f, text, StandardCharsets.UTF_8);
        return f;
    }
}
