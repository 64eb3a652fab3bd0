package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.zip.CRC32;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import java.util.zip.ZipInputStream;
import org.apache.poi.xwpf.usermodel.IBodyElement;
import org.apache.poi.xwpf.usermodel.ParagraphAlignment;
import org.apache.poi.xwpf.usermodel.XWPFDocument;
import org.apache.poi.xwpf.usermodel.XWPFParagraph;
import org.apache.poi.xwpf.usermodel.XWPFPicture;
import org.apache.poi.xwpf.usermodel.XWPFStyle;
import org.apache.poi.xwpf.usermodel.XWPFTable;
import org.apache.poi.xwpf.usermodel.XWPFTableRow;
import org.cupel.charts.PngWriter;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code appendix.docx} read back with POI as Word would read it: every section under a Word heading, every
 * table a Word table, every chart an embedded picture, the callouts with their level words, the cover, and
 * text from the inputs kept as text. The fixture report ({@link ReportFixture}) carries hostile IDs.
 */
class DocxReportTest {
    private static final String SOFFICE = "/usr/bin/soffice";
    private static final String PDFTOTEXT = "/usr/bin/pdftotext";
    private static final String PDFIMAGES = "/usr/bin/pdfimages";
    /** A4 (11,906 twips) less two 1-inch (1,440-twip) margins, in EMU (635 per twip). */
    private static final long A4_TEXT_WIDTH_EMU = (11906 - 2 * 1440) * 635L;

    @TempDir
    static Path dir;
    static QcReport report;
    static ReportFiles files;
    static XWPFDocument doc;
    static byte[] bytes;

    @BeforeAll
    static void writeReport() throws IOException {
        report = withSection(ReportFixture.report(), hostileSection());
        files = new ReportFiles(report);
        Path out = dir.resolve("qc");
        ReportWriter.write(report, out, ReportOptions.DEFAULTS, ReportProgress.NONE);
        bytes = Files.readAllBytes(out.resolve("appendix.docx"));
        doc = new XWPFDocument(new ByteArrayInputStream(bytes));
    }

    @Test
    void everySectionIsAWordHeadingInOrderAndTheHeadingStyleIsWordsOwn() {
        List<String> headings = new ArrayList<>();
        for (XWPFParagraph p : doc.getParagraphs()) {
            if ("Heading1".equals(p.getStyleID())) {
                headings.add(p.getText());
            }
        }
        List<String> expected = new ArrayList<>();
        for (int i = 0; i < report.sections().size(); i++) {
            expected.add((i + 1) + ". " + DocxText.clean(report.sections().get(i).title()));
        }
        assertEquals(expected, headings);
        XWPFStyle h1 = doc.getStyles().getStyle("Heading1");
        // "heading 1" is the name Word gives its built-in style; outline level 0 is what the Navigation pane
        // and the TOC field's \o switch look for.
        assertEquals("heading 1", h1.getName());
        assertEquals(0, h1.getCTStyle().getPPr().getOutlineLvl().getVal().intValue());
        assertTrue(report.sections().stream().anyMatch(s -> s.id().equals(CautionsSection.ID)),
                "the cautions are among the sections");
    }

    @Test
    void theCoverNamesProjectSelectionAndTimeAndATocFieldFollows() throws IOException {
        List<XWPFParagraph> ps = doc.getParagraphs();
        assertEquals("QC appendix", ps.get(0).getText());
        assertEquals(DocxText.clean(report.project()), ps.get(1).getText());
        assertEquals("Covers all batches.", ps.get(2).getText());
        // ReportFixture.GENERATED is 1767225600 s = 2026-01-01 00:00:00 UTC.
        assertEquals("Generated 2026-01-01 00:00 UTC by Cupel.", ps.get(3).getText());
        assertEquals("Contents", ps.get(4).getText());
        assertTrue(part("word/document.xml").contains("<w:instrText xml:space=\"preserve\">"
                + DocxFields.TOC + "</w:instrText>"), "TOC field instruction");
        String first = "1. " + report.sections().get(0).title();
        assertTrue(ps.get(5).getText().startsWith(first), "the TOC's result lists the sections from " + first
                + ": " + ps.get(5).getText());
        assertTrue(doc.isEnforcedUpdateFields(), "Word is asked to update the contents (page numbers) on opening");
        assertEquals("Cupel", doc.getProperties().getCoreProperties().getCreator());
        assertEquals(ReportFixture.GENERATED,
                doc.getProperties().getCoreProperties().getCreated().toInstant());
    }

    @Test
    void everyTableIsAWordTableWithItsHeaderRowsCaptionAndNote() {
        List<ReportTable> expected = files.tables();
        List<XWPFTable> tables = doc.getTables();
        assertEquals(expected.size(), tables.size());
        int number = 0;
        for (int i = 0; i < expected.size(); i++) {
            ReportTable t = expected.get(i);
            XWPFTable w = tables.get(i);
            XWPFTableRow head = w.getRow(0);
            assertTrue(head.isRepeatHeader(), "header row repeats on each page: " + t.id());
            assertEquals(clean(t.columns()), texts(head), "header of " + t.id());
            int shown = Math.min(t.rows().size(), TableLimit.SHOWN);
            assertEquals(1 + shown, w.getNumberOfRows(), "rows of " + t.id());
            for (int r = 0; r < shown; r++) {
                assertEquals(clean(t.rows().get(r)), texts(w.getRow(r + 1)), t.id() + " row " + r);
                for (int c = 0; c < t.columns().size(); c++) {
                    boolean numeric = TableLimit.isNumeric(t.rows().get(r).get(c));
                    ParagraphAlignment a = w.getRow(r + 1).getCell(c).getParagraphs().get(0).getAlignment();
                    assertEquals(numeric, a == ParagraphAlignment.RIGHT, t.id() + " cell " + r + "," + c);
                }
            }
            XWPFParagraph caption = (XWPFParagraph) before(w);
            assertEquals("TableCaption", caption.getStyleID());
            assertEquals("Table " + (++number) + ". " + DocxText.clean(t.title()), caption.getText());
            String note = TableLimit.note(t, files.table(t));
            if (!note.isEmpty() || t.rows().isEmpty()) {
                XWPFParagraph under = (XWPFParagraph) after(w);
                assertEquals("TableNote", under.getStyleID());
                assertEquals(DocxText.clean(t.rows().isEmpty() ? "No rows." : note), under.getText());
            }
        }
    }

    @Test
    void aLongTableIsBoundedAsInThePdfAndPointsToItsCsv() throws IOException {
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < 620; i++) {
            rows.add(List.of("S-" + i, Integer.toString(i)));
        }
        ReportTable long620 = new ReportTable("long", "Every sample", List.of("Sample", "Rank"), rows, "");
        QcReport r = new QcReport("P", "all batches", ReportFixture.GENERATED, List.of(new ReportSection("s", "S",
                List.of(new ReportBlock.Table(long620)), Map.of())));
        XWPFDocument d = read(render(r));
        XWPFTable w = d.getTables().get(0);
        assertEquals(1 + TableLimit.SHOWN, w.getNumberOfRows());
        assertEquals(List.of("S-499", "499"), texts(w.getRow(TableLimit.SHOWN)));
        assertEquals("First 500 of 620 rows shown; every row is in tables/long.csv.",
                ((XWPFParagraph) after(w)).getText());
    }

    @Test
    void everyFigureIsAnEmbeddedPictureAtTheTextWidthWithItsCaption() throws IOException {
        List<ReportBlock.Figure> figures = files.figures();
        List<XWPFPicture> pictures = new ArrayList<>();
        List<String> captions = new ArrayList<>();
        List<IBodyElement> body = doc.getBodyElements();
        for (int i = 0; i < body.size(); i++) {
            if (body.get(i) instanceof XWPFParagraph p && !p.getRuns().isEmpty()
                    && !p.getRuns().get(0).getEmbeddedPictures().isEmpty()) {
                pictures.add(p.getRuns().get(0).getEmbeddedPictures().get(0));
                captions.add(((XWPFParagraph) body.get(i + 1)).getText());
            }
        }
        assertEquals(figures.size(), pictures.size());
        for (int i = 0; i < figures.size(); i++) {
            ReportBlock.Figure f = figures.get(i);
            XWPFPicture pic = pictures.get(i);
            assertArrayEquals(Files.readAllBytes(dir.resolve("qc").resolve(files.chart(f))),
                    pic.getPictureData().getData(), "the 300 dpi PNG of " + files.chart(f) + " is embedded");
            assertTrue(pic.getWidth() > 0 && Math.round(pic.getWidth() * 12700) <= A4_TEXT_WIDTH_EMU,
                    "scaled to at most the text width: " + pic.getWidth() + " pt");
            assertEquals("Figure " + (i + 1) + ". " + DocxText.clean(f.caption()), captions.get(i));
            assertEquals(DocxText.clean(f.caption()), pic.getDescription(), "alternative text");
        }
    }

    @Test
    void calloutsAreStyledParagraphsThatBeginWithTheLevelWord() {
        List<String> expected = new ArrayList<>();
        for (ReportSection s : report.sections()) {
            for (ReportBlock b : s.blocks()) {
                if (b instanceof ReportBlock.Callout c) {
                    expected.add(DocxReport.calloutStyle(c.level()) + "|" + HtmlReport.label(c.level()) + " "
                            + DocxText.clean(HtmlReport.body(c)));
                }
            }
        }
        List<String> found = new ArrayList<>();
        for (XWPFParagraph p : doc.getParagraphs()) {
            if (p.getStyleID() != null && p.getStyleID().startsWith("Callout")) {
                found.add(p.getStyleID() + "|" + p.getText());
                assertTrue(p.getRuns().get(0).isBold(), "the level word is bold: " + p.getText());
            }
        }
        assertEquals(expected, found);
        assertTrue(found.stream().anyMatch(s -> s.startsWith("CalloutFail|Fail. Batch ")), "a failure callout");
        XWPFStyle fail = doc.getStyles().getStyle("CalloutFail");
        assertNotNull(fail.getCTStyle().getPPr() == null ? null : fail.getCTStyle().getPPr().getPBdr(),
                "the callout style draws a border");
    }

    /**
     * Text from the inputs is run text only: the one field instructions are Cupel's own (contents, caption
     * numbers, page number), markup stays visible text, and characters XML cannot hold become U+FFFD.
     */
    @Test
    void textFromTheInputsStaysTextAndNeverBecomesAFieldOrMarkup() throws IOException {
        String xml = part("word/document.xml") + part("word/footer1.xml");
        Matcher m = Pattern.compile("<w:instrText[^>]*>([^<]*)</w:instrText>|w:instr=\"([^\"]*)\"").matcher(xml);
        List<String> instructions = new ArrayList<>();
        while (m.find()) {
            String i = (m.group(1) != null ? m.group(1) : m.group(2)).replace("&quot;", "\"");
            if (!instructions.contains(i)) {
                instructions.add(i);
            }
        }
        assertEquals(List.of(DocxFields.TOC, " SEQ Table \\* ARABIC ", " SEQ Figure \\* ARABIC ", " PAGE "),
                instructions);
        List<String> texts = doc.getParagraphs().stream().map(XWPFParagraph::getText).toList();
        assertTrue(texts.contains("Hostile { DDEAUTO c:\\cmd.exe \"/c calc\" } \uFFFD\uFFFD end"), "" + texts);
        assertTrue(texts.contains("Tab\tand\nbreak"), "tab and line break kept as Word's own");
        assertTrue(texts.contains("Batch " + ReportFixture.SCRIPT + " fails.")
                || texts.stream().anyMatch(t -> t.contains("Batch " + ReportFixture.SCRIPT + " fails.")),
                "markup from an ID is visible text");
        assertTrue(texts.contains(report.sections().size() + ". Hostile <w:r> text"), "markup in a title is its text");
        assertTrue(xml.contains("<w:t>" + report.sections().size() + ". Hostile &lt;w:r> text</w:t>"),
                "... stored escaped inside the run's text, not as an element");
        for (String t : texts) {
            assertFalse(t.contains("&lt;") || t.contains("&amp;"), "no escape shows as text: " + t);
        }
    }

    /**
     * Two runs give the same bytes, dated by the report: the ZIP entries carry the generation time, not the
     * clock (Commons Compress would stamp the clock's time), and the core properties the same time.
     */
    @Test
    void twoRunsAreByteIdenticalAndDatedByTheReport() throws IOException {
        // The charts of the first run stand in for a second drawing (ReportWriterTest shows they are the same
        // bytes run after run), so the document is rendered again without drawing them again.
        Path charts = dir.resolve("qc");
        byte[] one = render(report, f -> bytesOf(charts.resolve(files.chart(f))));
        byte[] two = render(report, f -> bytesOf(charts.resolve(files.chart(f))));
        assertArrayEquals(one, two);
        assertArrayEquals(bytes, one, "the same as the document ReportWriter wrote");
        for (LocalDateTime t : entryTimes(one)) {
            assertEquals(LocalDateTime.of(2026, 1, 1, 0, 0), t);
        }
        // MS-DOS dates begin in 1980: a generation time before it is written as 1980-01-01 00:00.
        QcReport early = new QcReport("P", "all batches", Instant.ofEpochSecond(0), List.of(hostileSection()));
        for (LocalDateTime t : entryTimes(render(early))) {
            assertEquals(LocalDateTime.of(1980, 1, 1, 0, 0), t);
        }
        assertFalse(part("word/settings.xml").contains("rsid"), "no revision-save IDs");
    }

    /**
     * The pictures are stored as they are (a PNG is deflated already), each with its size and a CRC-32 that
     * matches its bytes, and is the chart's print PNG; every other part is deflated.
     */
    @Test
    void picturesAreStoredWithTheirCrcAndTheOtherPartsDeflated() throws IOException {
        Path docx = dir.resolve("qc").resolve("appendix.docx");
        Set<ByteBuffer> charts = new HashSet<>();
        for (ReportBlock.Figure f : files.figures()) {
            charts.add(ByteBuffer.wrap(Files.readAllBytes(dir.resolve("qc").resolve(files.chart(f)))));
        }
        int pictures = 0;
        try (ZipFile zip = new ZipFile(docx.toFile())) {
            for (ZipEntry e : Collections.list(zip.entries())) {
                byte[] data = zip.getInputStream(e).readAllBytes();
                if (e.getName().startsWith("word/media/")) {
                    pictures++;
                    assertEquals(ZipEntry.STORED, e.getMethod(), e.getName());
                    assertEquals(data.length, e.getSize(), e.getName());
                    assertEquals(data.length, e.getCompressedSize(), e.getName());
                    CRC32 crc = new CRC32();
                    crc.update(data);
                    assertEquals(crc.getValue(), e.getCrc(), "CRC-32 of " + e.getName());
                    assertTrue(charts.contains(ByteBuffer.wrap(data)),
                            e.getName() + " is one of the charts' PNGs");
                } else {
                    assertEquals(ZipEntry.DEFLATED, e.getMethod(), e.getName());
                }
            }
        }
        // POI keeps one part for pictures with the same bytes: one per distinct chart.
        assertEquals(charts.size(), pictures);
    }

    /** Hand-worked: each character XML 1.0 cannot hold becomes one U+FFFD; a valid surrogate pair is kept. */
    @Test
    void cleanReplacesWhatXmlCannotHoldAndKeepsEverythingElse() throws IOException {
        String sigma = new String(Character.toChars(0x1D70E)); // MATHEMATICAL ITALIC SMALL SIGMA, a surrogate pair
        assertEquals("a\uFFFDb\tc\nd\re\uFFFD\uFFFD\uFFFD\uFFFD " + sigma + " \u00B1 \uFFFD",
                DocxText.clean("a\u0000b\tc\nd\re\u001F\u007F\uFFFE\uFFFF " + sigma + " \u00B1 \uDC00"));
        assertEquals("\uFFFDx", DocxText.clean("\uD800x"), "an unpaired high surrogate");
        assertEquals("", DocxText.clean(null));
        // A document holding them opens: POI reads it back (an unstorable character would make it refuse).
        QcReport r = new QcReport("P\u0002", "all batches", ReportFixture.GENERATED, List.of(new ReportSection("s",
                "S\uD800", List.of(new ReportBlock.Paragraph("x\u0000y " + sigma)), Map.of())));
        XWPFDocument d = read(render(r));
        assertTrue(d.getParagraphs().stream().anyMatch(p -> p.getText().equals("x\uFFFDy " + sigma)));
        assertTrue(d.getParagraphs().stream().anyMatch(p -> p.getText().equals("1. S\uFFFD")));
    }

    /**
     * The Word copy as a reader meets it: converted to PDF by LibreOffice (Debian package libreoffice-writer,
     * which CI installs), every section heading is on a page in order after the contents, and every chart is
     * drawn as a picture at the text width. Skipped, with a message, when LibreOffice or Poppler is absent.
     */
    @Test
    void libreOfficeConvertsItWithEverySectionInOrderAndEveryChartAtTheTextWidth() throws Exception {
        assumeTrue(ExternalTool.installed(SOFFICE), "LibreOffice is not installed at " + SOFFICE
                + " (Debian package libreoffice-writer); skipping the Word-copy conversion test");
        assumeTrue(ExternalTool.installed(PDFTOTEXT) && ExternalTool.installed(PDFIMAGES), "pdftotext/pdfimages are "
                + "not installed (Debian package poppler-utils); skipping the Word-copy conversion test");
        Path lo = Files.createDirectory(dir.resolve("libreoffice"));
        // A private profile: no state shared with another run or a user's LibreOffice.
        ExternalTool.run(List.of(SOFFICE, "-env:UserInstallation=" + lo.resolve("profile").toUri(), "--headless",
                "--norestore", "--convert-to", "pdf", "--outdir", lo.toString(),
                dir.resolve("qc").resolve("appendix.docx").toString()), lo, 600);
        Path pdf = lo.resolve("appendix.pdf");
        assertTrue(Files.isRegularFile(pdf), "LibreOffice wrote " + pdf);
        String text = ExternalTool.run(List.of(PDFTOTEXT, pdf.toString(), "-"), lo, 120);
        int last = -1;
        for (int i = 0; i < report.sections().size(); i++) {
            String heading = (i + 1) + ". " + DocxText.clean(report.sections().get(i).title());
            int at = text.lastIndexOf(heading);
            assertTrue(at > text.indexOf(heading), "listed in the contents and then heading its section: " + heading);
            assertTrue(at > last, "sections in order: " + heading);
            last = at;
        }
        // pdfimages lists every image drawn, one line per drawing after two header lines: "page num type width
        // height color comp bpc enc interp object ID x-ppi y-ppi size ratio".
        List<String> images = ExternalTool.run(List.of(PDFIMAGES, "-list", pdf.toString()), lo, 120).lines()
                .skip(2).filter(l -> !l.isBlank()).toList();
        assertEquals(files.figures().size(), images.size(), "one picture per figure: " + images);
        for (String line : images) {
            String[] f = line.trim().split("\\s+");
            double inches = Double.parseDouble(f[3]) / Double.parseDouble(f[12]);
            // A4 less two 1-inch margins is 6.27 in; LibreOffice resamples to at most 300 dpi, rounding the
            // pixel width, so the printed width is known to about a pixel (1/300 in): 0.02 in is ample.
            assertEquals((11906 - 2 * 1440) / 1440.0, inches, 0.02, "printed at the text width: " + line);
        }
    }

    static ReportSection hostileSection() {
        List<ReportBlock> blocks = List.of(
                new ReportBlock.Paragraph("Hostile { DDEAUTO c:\\cmd.exe \"/c calc\" } \u0001\uFFFF end"),
                new ReportBlock.Paragraph("Tab\tand\nbreak"),
                new ReportBlock.Callout(ReportBlock.Level.CANNOT_JUDGE, "Nothing to judge in <w:p/> \u0007."));
        return new ReportSection("hostile", "Hostile <w:r> text", blocks, Map.of());
    }

    static QcReport withSection(QcReport r, ReportSection s) {
        List<ReportSection> sections = new ArrayList<>(r.sections());
        sections.add(s);
        return new QcReport(r.project(), r.selection(), r.generated(), sections);
    }

    private static byte[] render(QcReport r) throws IOException {
        return render(r, f -> {
            throw new AssertionError("no figure in this report");
        });
    }

    private static byte[] render(QcReport r, java.util.function.Function<ReportBlock.Figure, byte[]> png)
            throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        DocxReport.write(r, new ReportFiles(r), png, PdfReport.Paper.A4, out);
        return out.toByteArray();
    }

    private static byte[] bytesOf(Path file) {
        try {
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private static XWPFDocument read(byte[] docx) throws IOException {
        return new XWPFDocument(new ByteArrayInputStream(docx));
    }

    private static List<LocalDateTime> entryTimes(byte[] zip) throws IOException {
        List<LocalDateTime> times = new ArrayList<>();
        try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(zip))) {
            for (ZipEntry e = in.getNextEntry(); e != null; e = in.getNextEntry()) {
                times.add(e.getTimeLocal());
            }
        }
        assertFalse(times.isEmpty());
        return times;
    }

    private static String part(String name) throws IOException {
        try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(bytes))) {
            for (ZipEntry e = in.getNextEntry(); e != null; e = in.getNextEntry()) {
                if (e.getName().equals(name)) {
                    return new String(in.readAllBytes(), StandardCharsets.UTF_8);
                }
            }
        }
        throw new AssertionError("no part " + name);
    }

    private static List<String> texts(XWPFTableRow row) {
        return row.getTableCells().stream().map(c -> c.getText()).toList();
    }

    private static List<String> clean(List<String> cells) {
        return cells.stream().map(DocxText::clean).toList();
    }

    private static IBodyElement before(XWPFTable t) {
        List<IBodyElement> body = t.getBody().getBodyElements();
        return body.get(body.indexOf(t) - 1);
    }

    private static IBodyElement after(XWPFTable t) {
        List<IBodyElement> body = t.getBody().getBodyElements();
        return body.get(body.indexOf(t) + 1);
    }
}
