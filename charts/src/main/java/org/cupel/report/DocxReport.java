package org.cupel.report;

import com.lowagie.text.pdf.BaseFont;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.math.BigInteger;
import java.util.List;
import java.util.function.Function;
import java.util.stream.IntStream;
import org.apache.poi.common.usermodel.PictureType;
import org.apache.poi.openxml4j.exceptions.InvalidFormatException;
import org.apache.poi.wp.usermodel.HeaderFooterType;
import org.apache.poi.xwpf.usermodel.XWPFDocument;
import org.apache.poi.xwpf.usermodel.XWPFParagraph;
import org.apache.poi.xwpf.usermodel.XWPFPicture;
import org.apache.poi.xwpf.usermodel.XWPFRun;
import org.apache.xmlbeans.XmlException;
import org.cupel.charts.PngEncoder;
import org.openxmlformats.schemas.wordprocessingml.x2006.main.CTPageMar;
import org.openxmlformats.schemas.wordprocessingml.x2006.main.CTPageSz;
import org.openxmlformats.schemas.wordprocessingml.x2006.main.CTSectPr;
import org.openxmlformats.schemas.wordprocessingml.x2006.main.StylesDocument;

/**
 * Renders a {@link QcReport} as an editable Word document ({@code appendix.docx}) with Apache POI, for a
 * geologist to paste into the resource report: the cover (project, selection, generation time), a table of
 * contents field, one section per report section under a real "heading 1" (so Word's Navigation pane and
 * the contents find them), paragraphs, callouts as shaded paragraphs that begin with their level word,
 * tables as Word tables (header row repeated on each page, numbers right-aligned, numbered caption above,
 * note below, at most {@link TableLimit#SHOWN} rows as in the PDF; written as text, {@link DocxTables}) and
 * charts as the print PNGs at the text width with a numbered caption. Styles come from
 * {@code docx-styles.xml}; the bytes are fixed by the report ({@link DocxPackage}).
 */
public final class DocxReport {
    /** Word measures the page in twentieths of a point; pictures in EMU, 635 to a twip (12,700 to a point). */
    private static final int EMU_PER_TWIP = 635;
    private static final int MARGIN = 1440;
    /** A chart takes at most this share of the text height, so that its caption fits on the same page. */
    private static final double FIGURE_HEIGHT_SHARE = 0.6;
    private static final BaseFont HELVETICA = standardFont(BaseFont.HELVETICA);
    private static final BaseFont HELVETICA_BOLD = standardFont(BaseFont.HELVETICA_BOLD);

    private final QcReport report;
    private final ReportFiles files;
    private final Function<ReportBlock.Figure, byte[]> png;
    private final XWPFDocument doc = new XWPFDocument();
    private final DocxTables tableText = new DocxTables();
    private final int pageWidth;
    private final int pageHeight;
    private int tables;
    private int figures;

    private DocxReport(QcReport report, ReportFiles files, Function<ReportBlock.Figure, byte[]> png,
                       PdfReport.Paper paper) {
        this.report = report;
        this.files = files;
        this.png = png;
        // Word's own page sizes in twips: A4 is 210 x 297 mm, Letter 8.5 x 11 in.
        this.pageWidth = paper == PdfReport.Paper.LETTER ? 12240 : 11906;
        this.pageHeight = paper == PdfReport.Paper.LETTER ? 15840 : 16838;
    }

    /**
     * Writes the document to {@code out}.
     *
     * @param png the print-resolution PNG bytes of a figure
     */
    public static void write(QcReport report, ReportFiles files, Function<ReportBlock.Figure, byte[]> png,
                             PdfReport.Paper paper, OutputStream out) throws IOException {
        new DocxReport(report, files, png, paper).render(out);
    }

    private void render(OutputStream out) throws IOException {
        try {
            styles();
            page();
            cover();
            List<ReportSection> sections = report.sections();
            for (int i = 0; i < sections.size(); i++) {
                section(i + 1, sections.get(i));
            }
            DocxPackage.write(doc, title(), report.generated(), tableText::expand, out);
        } finally {
            // Not close(): POI closes a document made in memory by saving it once more, into a buffer of its
            // own, deflating every part (about 1.4 s of CPU for the 75 MB of parts of a million-sample report).
            doc.getPackage().revert();
        }
    }

    private String title() {
        return report.project() + " — " + QcReport.TITLE;
    }

    private void styles() throws IOException {
        try (InputStream in = DocxReport.class.getResourceAsStream("docx-styles.xml")) {
            if (in == null) {
                throw new IllegalStateException("docx-styles.xml is missing from the charts module");
            }
            doc.createStyles().setStyles(StylesDocument.Factory.parse(in).getStyles());
        } catch (XmlException e) {
            throw new IllegalStateException("docx-styles.xml is not valid WordprocessingML: " + e.getMessage(), e);
        }
    }

    private void page() {
        CTSectPr sect = doc.getDocument().getBody().isSetSectPr() ? doc.getDocument().getBody().getSectPr()
                : doc.getDocument().getBody().addNewSectPr();
        CTPageSz size = sect.addNewPgSz();
        size.setW(BigInteger.valueOf(pageWidth));
        size.setH(BigInteger.valueOf(pageHeight));
        CTPageMar mar = sect.addNewPgMar();
        mar.setTop(BigInteger.valueOf(MARGIN));
        mar.setBottom(BigInteger.valueOf(MARGIN));
        mar.setLeft(BigInteger.valueOf(MARGIN));
        mar.setRight(BigInteger.valueOf(MARGIN));
        mar.setHeader(BigInteger.valueOf(708));
        mar.setFooter(BigInteger.valueOf(708));
        mar.setGutter(BigInteger.ZERO);
        XWPFParagraph foot = doc.createFooter(HeaderFooterType.DEFAULT).createParagraph();
        foot.setStyle("Footer");
        DocxText.append(foot, title() + " · page ", false);
        DocxFields.pageNumber(foot);
    }

    private void cover() {
        paragraph("Subtitle", QcReport.TITLE);
        paragraph("Title", report.project());
        paragraph("Normal", "Covers " + report.selection() + ".");
        paragraph("CoverMeta", "Generated " + HtmlReport.STAMP.format(report.generated()) + " by Cupel.");
        paragraph("TOCHeading", "Contents");
        List<ReportSection> sections = report.sections();
        DocxFields.tableOfContents(doc, IntStream.range(0, sections.size())
                .mapToObj(i -> heading(i + 1, sections.get(i))).toList());
    }

    /** "3. CRM control", as the PDF numbers its chapters. */
    static String heading(int number, ReportSection s) {
        return number + ". " + s.title();
    }

    private void section(int number, ReportSection s) throws IOException {
        paragraph("Heading1", heading(number, s));
        for (ReportBlock b : s.blocks()) {
            if (b instanceof ReportBlock.Paragraph p) {
                paragraph("Normal", p.text());
            } else if (b instanceof ReportBlock.Callout c) {
                callout(c);
            } else if (b instanceof ReportBlock.Table t) {
                table(t.table());
            } else if (b instanceof ReportBlock.Figure f) {
                figure(f);
            }
        }
    }

    private XWPFParagraph paragraph(String style, String text) {
        XWPFParagraph p = doc.createParagraph();
        p.setStyle(style);
        DocxText.append(p, text, false);
        return p;
    }

    /** The level word in bold, then the text; the style gives the shading and the coloured left border. */
    private void callout(ReportBlock.Callout c) {
        XWPFParagraph p = doc.createParagraph();
        p.setStyle(calloutStyle(c.level()));
        DocxText.append(p, HtmlReport.label(c.level()) + " ", true);
        DocxText.append(p, HtmlReport.body(c), false);
    }

    static String calloutStyle(ReportBlock.Level level) {
        switch (level) {
            case PASS: return "CalloutPass";
            case WARN: return "CalloutWarning";
            case FAIL: return "CalloutFail";
            case CAUTION: return "CalloutCaution";
            case CANNOT_JUDGE: return "CalloutCannotJudge";
            default: return "CalloutNote";
        }
    }

    private void table(ReportTable t) {
        XWPFParagraph caption = doc.createParagraph();
        caption.setStyle("TableCaption");
        DocxFields.captionNumber(caption, "Table", ++tables, true);
        DocxText.append(caption, ". " + t.title(), true);

        int columns = t.columns().size();
        List<List<String>> rows = t.rows();
        PdfTableLayout set = PdfTableLayout.of(t, HELVETICA_BOLD, HELVETICA, textWidth() / 20f);
        tableText.add(doc, t, Math.min(rows.size(), TableLimit.SHOWN), columnWidths(set, columns), set.size());
        if (rows.isEmpty()) {
            paragraph("TableNote", "No rows.");
        }
        String note = TableLimit.note(t, files.table(t));
        if (!note.isEmpty()) {
            paragraph("TableNote", note);
        }
    }

    /**
     * Column widths in twips, laid out as the PDF lays out its tables ({@link PdfTableLayout}), measured in
     * Helvetica, whose advance widths Arial shares (the metrics are built into OpenPDF, so the widths do not
     * depend on the fonts installed). The document's text is set in Arial. A table the PDF prints in parts
     * is one Word table here (an editor can re-flow it): each column keeps the width of its first part, and
     * the widths are scaled to the text width.
     */
    private int[] columnWidths(PdfTableLayout set, int columns) {
        float[] w = new float[columns];
        for (PdfTableLayout.Part part : set.parts()) {
            for (int i = part.keys(); i < part.columns().length; i++) {
                w[part.columns()[i]] = part.widths()[i];
            }
        }
        float scale = set.split() ? (textWidth() / 20f) / PdfTableLayout.sum(w) : 1f;
        int[] twips = new int[columns];
        for (int c = 0; c < columns; c++) {
            twips[c] = (int) Math.floor(w[c] * scale * 20);
        }
        return twips;
    }

    private static BaseFont standardFont(String name) {
        try {
            return BaseFont.createFont(name, BaseFont.WINANSI, BaseFont.NOT_EMBEDDED);
        } catch (IOException e) {
            throw new IllegalStateException("OpenPDF lacks its built-in " + name + " metrics", e);
        }
    }

    private void figure(ReportBlock.Figure f) throws IOException {
        byte[] bytes = png.apply(f);
        PngEncoder.Size size = PngEncoder.size(bytes);
        if (size == null) {
            throw new IllegalStateException("chart " + files.chart(f) + " is not a PNG");
        }
        long width = (long) textWidth() * EMU_PER_TWIP;
        long height = width * size.height() / size.width();
        long maxHeight = (long) ((pageHeight - 2 * MARGIN) * FIGURE_HEIGHT_SHARE) * EMU_PER_TWIP;
        if (height > maxHeight) {
            width = width * maxHeight / height;
            height = maxHeight;
        }
        XWPFParagraph holder = doc.createParagraph();
        holder.setStyle("FigureParagraph");
        XWPFRun run = holder.createRun();
        String name = files.chart(f).substring(files.chart(f).lastIndexOf('/') + 1);
        try {
            XWPFPicture picture = run.addPicture(new ByteArrayInputStream(bytes), PictureType.PNG, name,
                    Math.toIntExact(width), Math.toIntExact(height));
            // The alternative text a screen reader speaks: the caption.
            picture.getCTPicture().getNvPicPr().getCNvPr().setDescr(DocxText.clean(f.caption()));
            run.getCTR().getDrawingArray(0).getInlineArray(0).getDocPr().setDescr(DocxText.clean(f.caption()));
        } catch (InvalidFormatException e) {
            throw new IllegalStateException("POI refused the PNG of " + files.chart(f) + ": " + e.getMessage(), e);
        }
        XWPFParagraph caption = doc.createParagraph();
        caption.setStyle("Caption");
        DocxFields.captionNumber(caption, "Figure", ++figures, false);
        DocxText.append(caption, ". " + f.caption(), false);
    }

    private int textWidth() {
        return pageWidth - 2 * MARGIN;
    }
}
