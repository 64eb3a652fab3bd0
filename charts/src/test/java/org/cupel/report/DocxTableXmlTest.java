package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.StringWriter;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.apache.poi.xwpf.usermodel.ParagraphAlignment;
import org.apache.poi.xwpf.usermodel.XWPFDocument;
import org.apache.poi.xwpf.usermodel.XWPFParagraph;
import org.apache.poi.xwpf.usermodel.XWPFRun;
import org.apache.poi.xwpf.usermodel.XWPFTable;
import org.apache.poi.xwpf.usermodel.XWPFTableCell;
import org.apache.poi.xwpf.usermodel.XWPFTableRow;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;
import org.openxmlformats.schemas.wordprocessingml.x2006.main.CTTblGrid;
import org.openxmlformats.schemas.wordprocessingml.x2006.main.CTTblPr;
import org.openxmlformats.schemas.wordprocessingml.x2006.main.CTTblWidth;
import org.openxmlformats.schemas.wordprocessingml.x2006.main.STTblWidth;
import org.w3c.dom.Document;

/**
 * The tables of the Word copy, written as text ({@link DocxTableXml} in {@link DocxTables}' slots), against
 * the same tables built through POI's object model as {@code DocxReport} built them before (the oracle
 * below, kept as it was): the saved {@code document.xml} is the same XML, and the same bytes unless XMLBeans
 * chose to write a text as a CDATA section (it does for a text of more than 32 characters with more than 5
 * {@code <} or {@code &}, its default thresholds), which is the same character data.
 */
class DocxTableXmlTest {
    private static final String CELL_ALPHABET = "ab 0123456789.,-<>&]\t\n\r\"'";

    private record Input(List<String> columns, List<List<String>> rows, int shown, int[] widths, double points) {
        ReportTable table() {
            return new ReportTable("t", "T", columns, rows, "");
        }

        @Override
        public String toString() {
            return "columns " + columns + ", rows " + rows + ", shown " + shown + ", widths "
                    + java.util.Arrays.toString(widths) + ", points " + points;
        }
    }

    private static Gen<String> cells() {
        return Gen.frequency(
                Gen.weight(3, Gen.anyStrings(40)),
                Gen.weight(3, Gen.strings(CELL_ALPHABET, 0, 12)),
                Gen.weight(2, Gen.doubles(-1e6, 1e6).map(d -> String.format(java.util.Locale.ROOT, "%.3f", d))),
                Gen.weight(1, Gen.of("", " ", " lead", "trail ", "a]]>b", "<![CDATA[x]]>", "1,234", "<0.005",
                        "\u00A0nbsp\u00A0", "\u2003em", "x\u001Fy", "&lt;", "\t", "\n", "\r\n")),
                Gen.weight(1, Gen.strings("<&", 33, 45)));
    }

    private static Gen<Input> inputs() {
        return r -> {
            int columns = r.nextInt(1, 6);
            int rows = r.nextInt(0, 7);
            Gen<String> cell = cells();
            List<String> head = new ArrayList<>();
            for (int c = 0; c < columns; c++) {
                head.add(cell.next(r));
            }
            List<List<String>> body = new ArrayList<>();
            for (int i = 0; i < rows; i++) {
                List<String> row = new ArrayList<>();
                for (int c = 0; c < columns; c++) {
                    row.add(cell.next(r));
                }
                body.add(row);
            }
            int[] widths = new int[columns];
            for (int c = 0; c < columns; c++) {
                widths[c] = r.nextInt(200, 4000);
            }
            double points = Gen.of(6.0, 6.5, 7.0, 7.25, 7.5, 8.0, 8.75, 9.0).next(r);
            return new Input(head, body, r.nextInt(0, rows + 1), widths, points);
        };
    }

    @Test
    void aTableWrittenAsTextIsTheXmlPoiBuilt() {
        SeededTries.forAll(150, inputs(), in -> {
            String text = writtenAsText(in);
            String poi = documentXml(builtByPoi(in), (xml, out) -> out.write(xml));
            if (!poi.contains("<![CDATA[")) {
                assertEquals(poi, text);
            }
            assertTrue(dom(poi).isEqualNode(dom(text)), "same XML:\n" + poi + "\n" + text);
        });
    }

    /** Hand-worked: half-points, rounded half up (7.25 pt = 14.5 half-points, written 15). */
    @Test
    void theFontSizeIsInHalfPointsRoundedHalfUp() {
        assertEquals(16, DocxTableXml.halfPoints(8.0));
        assertEquals(15, DocxTableXml.halfPoints(7.5));
        assertEquals(15, DocxTableXml.halfPoints(7.25));
        assertEquals(14, DocxTableXml.halfPoints(7.2));
    }

    /** Hand-worked: only what XML 1.0 requires is escaped (section 2.4), so a > elsewhere stays as it is. */
    @Test
    void textIsEscapedAsCharacterData() {
        StringBuilder out = new StringBuilder();
        DocxTableXml.escape(out, "a<b & c > d ]]> ]>");
        assertEquals("a&lt;b &amp; c > d ]]&gt; ]>", out.toString());
    }

    @Test
    void slotsThatAreNotTheTablesHeldAreABug() throws IOException {
        DocxTables tables = new DocxTables();
        Input in = new Input(List.of("A"), List.of(List.of("1")), 1, new int[] {1000}, 8);
        tables.add(new XWPFDocument(), in.table(), in.shown(), in.widths(), in.points());
        assertThrows(IllegalStateException.class, () -> tables.expand("<w:body></w:body>", new StringWriter()));
        assertThrows(IllegalStateException.class,
                () -> tables.expand("<w:body>" + DocxTables.SLOT + DocxTables.SLOT + "</w:body>", new StringWriter()));
        StringWriter one = new StringWriter();
        tables.expand("<w:body>" + DocxTables.SLOT + "</w:body>", one);
        assertTrue(one.toString().startsWith("<w:body><w:tbl>") && one.toString().endsWith("</w:tbl></w:body>"),
                one.toString());
    }

    private static String writtenAsText(Input in) throws IOException {
        XWPFDocument doc = new XWPFDocument();
        DocxTables tables = new DocxTables();
        tables.add(doc, in.table(), in.shown(), in.widths(), in.points());
        return documentXml(doc, tables::expand);
    }

    private static String documentXml(XWPFDocument doc, DocxPackage.MainPart main) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            DocxPackage.write(doc, "T", Instant.EPOCH, main, out);
        } finally {
            doc.getPackage().revert();
        }
        try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(out.toByteArray()))) {
            for (ZipEntry e = in.getNextEntry(); e != null; e = in.getNextEntry()) {
                if (e.getName().equals("word/document.xml")) {
                    return new String(in.readAllBytes(), StandardCharsets.UTF_8);
                }
            }
        }
        throw new AssertionError("no word/document.xml");
    }

    private static Document dom(String xml) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setCoalescing(true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        Document d = f.newDocumentBuilder().parse(new ByteArrayInputStream(xml.getBytes(StandardCharsets.UTF_8)));
        d.normalizeDocument();
        return d;
    }

    /** The oracle: the table as DocxReport built it with POI before it was written as text. */
    private static XWPFDocument builtByPoi(Input in) {
        XWPFDocument doc = new XWPFDocument();
        int columns = in.columns().size();
        XWPFTable table = doc.createTable(1 + in.shown(), columns);
        layout(table, in.widths());
        XWPFTableRow head = table.getRow(0);
        head.setRepeatHeader(true);
        head.setCantSplitRow(true);
        for (int c = 0; c < columns; c++) {
            XWPFTableCell cell = head.getCell(c);
            cell.setColor("EAECF0");
            cellText(cell, "TableHeading", in.columns().get(c), in.points(), false);
        }
        for (int r = 0; r < in.shown(); r++) {
            XWPFTableRow row = table.getRow(r + 1);
            row.setCantSplitRow(true);
            for (int c = 0; c < columns; c++) {
                String v = in.rows().get(r).get(c);
                cellText(row.getCell(c), "TableText", v, in.points(), TableLimit.isNumeric(v));
            }
        }
        return doc;
    }

    private static void layout(XWPFTable table, int[] widths) {
        table.setStyleID("CupelTable");
        CTTblPr pr = table.getCTTbl().getTblPr();
        if (pr.isSetTblBorders()) {
            pr.unsetTblBorders();
        }
        int total = 0;
        for (int w : widths) {
            total += w;
        }
        CTTblWidth width = pr.isSetTblW() ? pr.getTblW() : pr.addNewTblW();
        width.setType(STTblWidth.DXA);
        width.setW(BigInteger.valueOf(total));
        CTTblGrid grid = table.getCTTbl().getTblGrid() != null ? table.getCTTbl().getTblGrid()
                : table.getCTTbl().addNewTblGrid();
        while (grid.sizeOfGridColArray() > 0) {
            grid.removeGridCol(0);
        }
        for (int w : widths) {
            grid.addNewGridCol().setW(BigInteger.valueOf(w));
        }
        for (XWPFTableRow row : table.getRows()) {
            List<XWPFTableCell> cells = row.getTableCells();
            for (int c = 0; c < cells.size(); c++) {
                cells.get(c).setWidth(Integer.toString(widths[c]));
            }
        }
    }

    private static void cellText(XWPFTableCell cell, String style, String text, double points, boolean right) {
        XWPFParagraph p = cell.getParagraphs().get(0);
        p.setStyle(style);
        if (right) {
            p.setAlignment(ParagraphAlignment.RIGHT);
        }
        String[] lines = DocxText.clean(text).split("\r\n|\r|\n", -1);
        for (int l = 0; l < lines.length; l++) {
            if (l > 0) {
                p.createRun().addBreak();
            }
            String[] parts = lines[l].split("\t", -1);
            for (int t = 0; t < parts.length; t++) {
                if (t > 0) {
                    p.createRun().addTab();
                }
                if (!parts[t].isEmpty()) {
                    XWPFRun run = p.createRun();
                    run.setFontSize(points);
                    run.setText(parts[t]);
                }
            }
        }
    }
}
