package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.lowagie.text.Document;
import com.lowagie.text.Element;
import com.lowagie.text.PageSize;
import com.lowagie.text.pdf.PdfReader;
import com.lowagie.text.pdf.PdfWriter;
import com.lowagie.text.pdf.parser.PdfTextExtractor;
import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The PDF table layout: no header word or cell word narrower than its column, compact steps before parts,
 * parts that repeat the key columns and share the rest evenly. Widths are checked against the font's own
 * advance widths; the printed text is read back with OpenPDF's text extractor.
 */
class PdfTableLayoutTest {
    private static final PdfFonts FONTS = PdfFonts.load();
    /** A4 less the report's side margins, as PdfReport lays tables out. */
    private static final float AVAILABLE = PageSize.A4.getWidth() - 2 * PdfReport.MARGIN_X;

    /** The header of the CRM summary, whose "Certificate SD" was printed "Certificat / e SD". */
    private static final List<String> CRM_HEADER = List.of("CRM", "Analyte", "Unit", "Certified", "Certificate SD", "n",
            "Mean", "SD of results", "Mean bias % (95 % CI)", "Median bias % (95 % CI)", "Certified inside CI",
            "Failures", "Warnings", "Swaps", "Project mean ± 2 SD");

    private static ReportTable crmLike() {
        List<List<String>> rows = new ArrayList<>();
        for (String crm : List.of("VHC-11", "VHC-23")) {
            for (String a : List.of("Au", "Ag")) {
                rows.add(List.of(crm, a, "ppm", "0.412", "0.018", "31", "0.412", "0.0156", "-0.09 (-1.48 to +1.29)",
                        "-1.75 (-3.51 to +0.00)", "yes (mean), yes (median)", "0", "1", "1", "0.412 ± 0.0311"));
            }
        }
        return new ReportTable("crm-summary", "CRM results per CRM and analyte", CRM_HEADER, rows, "");
    }

    /** 30 columns: CRM and analyte name a row together, so both are repeated in each continued part. */
    private static ReportTable tooWide() {
        List<String> header = new ArrayList<>(List.of("CRM", "Analyte"));
        for (int i = 1; i <= 28; i++) {
            header.add("Measurement " + i);
        }
        List<List<String>> rows = new ArrayList<>();
        for (String crm : List.of("VHC-11", "VHC-23")) {
            for (String a : List.of("Au", "Ag")) {
                List<String> r = new ArrayList<>(List.of(crm, a));
                for (int i = 1; i <= 28; i++) {
                    r.add("12.345");
                }
                rows.add(r);
            }
        }
        return new ReportTable("wide", "A wide table", header, rows, "");
    }

    @Test
    void everyHeaderWordAndCellWordFitsItsColumn() {
        ReportTable t = crmLike();
        PdfTableLayout layout = PdfTableLayout.of(t, FONTS.bold(), FONTS.regular(), AVAILABLE);
        assertFalse(layout.split(), "the CRM table fits the portrait page in one part");
        assertWordsFit(t, layout);
        assertTrue(PdfTableLayout.sum(layout.parts().get(0).widths()) <= AVAILABLE + 0.01f);
    }

    @Test
    void settingNamesPrintWholeAtTheNormalSize() {
        List<List<String>> rows = List.of(
                List.of("duplicates.fieldHardLimitPercent", "30", "HARD limit of field duplicates, %", "common practice"),
                List.of("duplicates.limitMultipleOfDetection", "10", "pairs whose mean is below this × DL are left out",
                        "Schuirmann 1987 (test); margin: common practice"));
        ReportTable t = new ReportTable("thresholds", "Thresholds in force",
                List.of("Setting", "Value", "What it decides", "Origin"), rows, "");
        PdfTableLayout layout = PdfTableLayout.of(t, FONTS.bold(), FONTS.regular(), AVAILABLE);
        assertEquals(PdfTableLayout.TABLE_FONT, layout.size());
        assertEquals(TableBreaks.WORDS, layout.breaks(), "the names need no break at their joins");
        assertWordsFit(t, layout);
    }

    @Test
    void aTableTooWideForThePageIsPrintedInEvenPartsRepeatingTheKeyColumns() {
        ReportTable t = tooWide();
        assertEquals(2, PdfTableLayout.keyColumns(t), "CRM alone repeats; CRM and analyte tell the rows apart");
        PdfTableLayout layout = PdfTableLayout.of(t, FONTS.bold(), FONTS.regular(), AVAILABLE);
        assertTrue(layout.split(), "30 columns do not fit a portrait page");
        assertEquals(PdfTableLayout.WIDE_TABLE_FONT, layout.size());
        List<Integer> seen = new ArrayList<>();
        int smallest = Integer.MAX_VALUE;
        int largest = 0;
        for (int p = 0; p < layout.parts().size(); p++) {
            PdfTableLayout.Part part = layout.parts().get(p);
            assertArrayEquals(new int[] {0, 1}, java.util.Arrays.copyOf(part.columns(), 2), "part " + p);
            assertEquals(p == 0 ? 0 : 2, part.keys());
            assertTrue(PdfTableLayout.sum(part.widths()) <= AVAILABLE + 0.01f, "part " + p + " fits the page");
            for (int i = 2; i < part.columns().length; i++) {
                seen.add(part.columns()[i]);
            }
            smallest = Math.min(smallest, part.columns().length - 2);
            largest = Math.max(largest, part.columns().length - 2);
        }
        List<Integer> expected = new ArrayList<>();
        for (int c = 2; c < 30; c++) {
            expected.add(c);
        }
        assertEquals(expected, seen, "each other column once, in order");
        // Equal columns shared evenly: the parts differ by at most one column.
        assertTrue(largest - smallest <= 1, "parts of " + smallest + " to " + largest + " columns");
        assertWordsFit(t, layout);
        assertEquals("A wide table (part 2 of " + layout.parts().size() + ", continued; CRM, Analyte repeated)",
                PdfTableBlock.caption(t, layout, 1));
    }

    @Test
    void thePrintedTextKeepsEveryWordWhole() throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        Document doc = new Document(PageSize.A4, PdfReport.MARGIN_X, PdfReport.MARGIN_X, 60, 60);
        PdfWriter.getInstance(doc, bytes);
        doc.open();
        for (ReportTable t : List.of(crmLike(), tooWide())) {
            for (Element e : PdfTableBlock.elements(t, FONTS, AVAILABLE, "")) {
                doc.add(e);
            }
        }
        doc.close();
        PdfReader reader = new PdfReader(bytes.toByteArray());
        StringBuilder text = new StringBuilder();
        for (int p = 1; p <= reader.getNumberOfPages(); p++) {
            text.append(new PdfTextExtractor(reader).getTextFromPage(p)).append('\n');
        }
        List<String> words = List.of(text.toString().split("\\s+"));
        for (String w : List.of("Certificate", "Warnings", "(-3.51", "(-1.48", "VHC-23", "Measurement", "28")) {
            assertTrue(words.contains(w), "\"" + w + "\" printed whole in:\n" + text);
        }
        assertTrue(text.toString().contains("A wide table (part 2 of"), text.toString());
    }

    /** Each header word, and each word of a cell, is no wider than its column less the cell padding. */
    private static void assertWordsFit(ReportTable t, PdfTableLayout layout) {
        for (PdfTableLayout.Part part : layout.parts()) {
            for (int i = 0; i < part.columns().length; i++) {
                int c = part.columns()[i];
                float inner = part.widths()[i] - 2 * layout.padding();
                for (String w : words(t.columns().get(c))) {
                    float width = FONTS.bold().getWidthPoint(w, layout.size());
                    assertTrue(width <= inner, "header word \"" + w + "\" (" + width + " pt) fits column " + c
                            + " (" + inner + " pt)");
                }
                for (List<String> row : t.rows()) {
                    for (String w : words(TableBreaks.typeset(row.get(c)))) {
                        float width = FONTS.regular().getWidthPoint(w, layout.size());
                        assertTrue(width <= inner, "cell word \"" + w + "\" (" + width + " pt) fits column " + c
                                + " (" + inner + " pt)");
                    }
                }
            }
        }
    }

    /** Words as a reader sees them: between spaces, a hyphenated word ("Coarse-reject") counting as two. */
    static List<String> words(String text) {
        List<String> out = new ArrayList<>();
        for (String w : text.split(" +")) {
            out.addAll(List.of(w.split("(?<=\\p{Ll}-)(?=\\p{Ll})")));
        }
        out.removeIf(String::isEmpty);
        return out;
    }
}
