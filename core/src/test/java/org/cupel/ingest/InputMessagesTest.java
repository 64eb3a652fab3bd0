package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.cupel.project.InputException;
import org.cupel.project.MessageText;
import org.junit.jupiter.api.Test;

/**
 * Issue 15, item 10: messages point at the exact line, show invisible characters and stay short.
 */
class InputMessagesTest extends InFolderTest {

    /** Lines 1..n of a lab table; the bytes of {@code extra} appended to line {@code at}. */
    private static byte[] table(int lines, int at, byte[] extra) {
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        out.writeBytes("Sample ID,Au_ppm\n".getBytes(StandardCharsets.US_ASCII));
        for (int line = 2; line <= lines; line++) {
            out.writeBytes(String.format("S%05d,0.%03d", line, line % 1000).getBytes(StandardCharsets.US_ASCII));
            if (line == at) {
                out.writeBytes(extra);
            }
            out.write('\n');
        }
        return out.toByteArray();
    }

    /**
     * A Latin-1 é (byte 0xE9) at the end of line 5000 (after "S05000,0.000", 12 characters, so column 13) was
     * reported at line 4761: the decoder reads ahead of the line count. The file (about 78 KB) takes the
     * streaming path; a short one (line 150 of 200) the in-memory path.
     */
    @Test
    void anInvalidByteIsReportedAtItsExactLineAndColumn() {
        Path big = folder.write("big.csv", table(6000, 5000, new byte[] {(byte) 0xE9}));
        InputException e = assertThrows(InputException.class, () -> TableReader.read(big));
        assertTrue(e.getMessage().startsWith(big + ":5000:13: the text is not valid UTF-8 at byte(s) 0xE9"),
                e.getMessage());
        Path small = folder.write("small.csv", table(200, 150, new byte[] {(byte) 0xE9}));
        e = assertThrows(InputException.class, () -> TableReader.read(small));
        assertTrue(e.getMessage().startsWith(small + ":150:13:"), e.getMessage());
    }

    /** CRLF counts as one line end, a lone CR as one too, as the tokenizer counts them. */
    @Test
    void lineEndsAreCountedAsTheTokenizerCountsThem() {
        byte[] text = "Sample ID,Au_ppm\r\nS1,0.5\rS2,0.6\r\nS3,\u00e9\n".getBytes(StandardCharsets.ISO_8859_1);
        Path f = folder.write("crlf.csv", text);
        InputException e = assertThrows(InputException.class, () -> TableReader.read(f));
        assertTrue(e.getMessage().startsWith(f + ":4:4:"), e.getMessage());
    }

    /** A file saved twice with a byte-order mark carries one into its first cell; it is trimmed. */
    @Test
    void aDoubledByteOrderMarkIsTrimmedFromTheQuotedHeader() {
        byte[] bom = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};
        byte[] rest = "\"Sample ID\",Au_ppm\nS1,0.5\n".getBytes(StandardCharsets.UTF_8);
        byte[] text = new byte[6 + rest.length];
        System.arraycopy(bom, 0, text, 0, 3);
        System.arraycopy(bom, 0, text, 3, 3);
        System.arraycopy(rest, 0, text, 6, rest.length);
        RawTable t = TableReader.read(folder.write("bom.csv", text));
        assertEquals(List.of("Sample ID", "Au_ppm"), t.columns());
        assertEquals(1, t.rows().size());
    }

    /** An invisible character in an echoed header is shown as its code point. */
    @Test
    void invisibleCharactersAreShownInMessages() {
        assertEquals("<U+FEFF>Sample<U+00A0>ID<U+0009>", MessageText.visible("\uFEFFSample\u00A0ID\t"));
        assertEquals("[Au<U+200B>, Ag]", MessageText.list(List.of("Au\u200B", "Ag")));
        Path f = folder.write("lab.csv", "\u200BSample\u00A0ID,Au_ppm\nS1,0.5\n");
        InputException e = assertThrows(InputException.class,
                () -> new LabFileReader(IngestSettings.DEFAULTS).read(f, "lab.csv"));
        assertTrue(e.getMessage().contains("[Sample<U+00A0>ID, Au_ppm]"), e.getMessage());
    }

    /**
     * A 10,001-column header gave a 129 KB message. The echo of the columns stops after about 240 characters
     * and counts the rest.
     */
    @Test
    void aTenThousandColumnHeaderGivesAShortMessageWithTheCountLeftOut() {
        StringBuilder header = new StringBuilder("Sample");
        for (int i = 0; i < 10_000; i++) {
            header.append(",X").append(i);
        }
        Path f = folder.write("wide.csv", header + "\nS1" + ",".repeat(10_000) + "\n");
        InputException e = assertThrows(InputException.class,
                () -> new LabFileReader(IngestSettings.DEFAULTS).read(f, "wide.csv"));
        String m = e.getMessage();
        assertTrue(m.length() < 600, m.length() + " characters: " + m);
        assertTrue(m.matches("wide\\.csv:1: no analyte column among \\[Sample, X0, .*, … and [0-9,]+ more\\].*"), m);
    }

    /** Every message is bounded, whatever a source echoes: its beginning and its fix are kept. */
    @Test
    void anyInputMessageIsBoundedKeepingItsEnd() {
        String m = new InputException("f.csv: " + "x".repeat(200_000) + "; fix it.").getMessage();
        assertTrue(m.length() < 2100, Integer.toString(m.length()));
        assertTrue(m.startsWith("f.csv: xxx") && m.endsWith("; fix it.") && m.contains("characters left out"), m);
    }

    @Test
    void aLongFoundTextIsShortenedWithItsCount() {
        String found = "y".repeat(1000);
        String s = new org.cupel.project.DataIssue(org.cupel.project.DataIssue.Severity.WARNING,
                org.cupel.assay.SourceLocation.ofFile("f"), "", found, "p", "", "").found();
        assertTrue(s.endsWith("… (880 more characters)"), s);
    }
}
