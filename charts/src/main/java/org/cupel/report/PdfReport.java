package org.cupel.report;

import com.lowagie.text.Chapter;
import com.lowagie.text.Chunk;
import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.ExceptionConverter;
import com.lowagie.text.Image;
import com.lowagie.text.PageSize;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.PdfDate;
import com.lowagie.text.pdf.PdfEncryption;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfWriter;
import java.awt.Color;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Arrays;
import java.util.Calendar;
import java.util.List;
import java.util.Locale;
import java.util.TimeZone;
import java.util.function.Function;

/**
 * Renders a {@link QcReport} as a paginated PDF with OpenPDF: a title page, one chapter per section (each
 * a PDF bookmark, starting on a new page), a running header (project, "QC appendix") and "page n of m"
 * footer, tables set by {@link PdfTableBlock} (no word broken, caption and header row repeated on every page
 * they run over, rows not split mid-line), and charts from print-resolution PNGs scaled to the text width.
 */
public final class PdfReport {

    /** Paper sizes offered. */
    public enum Paper {
        A4(PageSize.A4), LETTER(PageSize.LETTER);

        private final Rectangle size;

        Paper(Rectangle size) {
            this.size = size;
        }
    }

    static final float MARGIN_X = 54f;
    static final float MARGIN_TOP = 66f;
    static final float MARGIN_BOTTOM = 58f;
    /** Height to width beyond which a figure is a page of panels rather than a chart. */
    static final float TALL_FIGURE = 0.75f;

    private final QcReport report;
    private final ReportFiles files;
    private final Function<ReportBlock.Figure, byte[]> png;
    private final PdfFonts fonts = PdfFonts.load();
    private final Document doc;

    private PdfReport(QcReport report, ReportFiles files, Function<ReportBlock.Figure, byte[]> png, Paper paper) {
        this.report = report;
        this.files = files;
        this.png = png;
        this.doc = new Document(paper.size, MARGIN_X, MARGIN_X, MARGIN_TOP, MARGIN_BOTTOM);
    }

    /**
     * Writes the PDF to {@code out}.
     *
     * @param png the print-resolution PNG bytes of a figure
     */
    public static void write(QcReport report, ReportFiles files, Function<ReportBlock.Figure, byte[]> png,
                             Paper paper, OutputStream out) throws IOException {
        new PdfReport(report, files, png, paper).render(out);
    }

    private void render(OutputStream out) throws IOException {
        try {
            PdfWriter writer = PdfWriter.getInstance(doc, out);
            writer.setPageEvent(new PdfPageFrame(report.project() + " — " + QcReport.TITLE, fonts));
            PdfContents toc = new PdfContents(fonts);
            writer.setPageEvent(toc);
            writer.setViewerPreferences(PdfWriter.PageModeUseOutlines);
            doc.addTitle(report.project() + " — " + QcReport.TITLE);
            doc.addCreator("Cupel");
            doc.open();
            fixIdentity(writer);
            titlePage(writer, toc);
            List<ReportSection> sections = report.sections();
            for (int i = 0; i < sections.size(); i++) {
                doc.add(chapter(i + 1, sections.get(i)));
            }
            doc.close();
        } catch (DocumentException e) {
            // The layout refused an element Cupel built: a bug, not a problem of the output location.
            throw new IllegalStateException("could not lay out the PDF: " + e.getMessage(), e);
        } catch (ExceptionConverter e) {
            // OpenPDF wraps the output stream's I/O errors (a full disk) in this unchecked exception.
            if (e.getException() instanceof IOException io) {
                throw io;
            }
            throw e;
        }
    }

    /**
     * The creation date and the file identifier, which OpenPDF takes from the clock and from a hash of the
     * clock and free memory, are made to depend on the report alone: the date is the report's generation
     * time (fixed by {@code SOURCE_DATE_EPOCH}), the identifier a digest of the report's headline figures,
     * title, selection, generation time and paper size. Two runs on the same inputs then give the same bytes.
     * Called after {@code open()}, which stamps the clock's date into the information dictionary. OpenPDF
     * takes the trailer's identifier from a {@code FileId} entry of that dictionary, where it also stays.
     */
    private void fixIdentity(PdfWriter writer) throws IOException {
        Calendar when = Calendar.getInstance(TimeZone.getTimeZone("UTC"), Locale.ROOT);
        when.setTimeInMillis(report.generated().toEpochMilli());
        writer.getInfo().put(PdfName.CREATIONDATE, new PdfDate(when));
        byte[] id = digest(SummaryJson.toJson(report) + "\n" + report.generated() + "\n" + doc.getPageSize());
        writer.getInfo().put(PdfName.FILEID, PdfEncryption.createInfoId(id, id));
    }

    private static byte[] digest(String text) {
        try {
            byte[] sha = MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8));
            return Arrays.copyOf(sha, 16);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }

    private void titlePage(PdfWriter writer, PdfContents toc) {
        Paragraph kicker = new Paragraph(QcReport.TITLE.toUpperCase(Locale.ROOT), fonts.kicker());
        kicker.setSpacingBefore(150f);
        doc.add(kicker);
        Paragraph title = new Paragraph(report.project(), fonts.title());
        title.setSpacingAfter(12f);
        doc.add(title);
        doc.add(new Paragraph("Covers " + report.selection() + ".", fonts.body()));
        doc.add(new Paragraph("Generated " + HtmlReport.STAMP.format(report.generated()) + " by Cupel.",
                fonts.muted()));
        Paragraph contents = new Paragraph("Contents", fonts.heading2());
        contents.setSpacingBefore(36f);
        contents.setSpacingAfter(4f);
        doc.add(contents);
        List<ReportSection> sections = report.sections();
        for (int i = 0; i < sections.size(); i++) {
            Paragraph p = toc.entry(writer, i + 1, sections.get(i).title());
            p.setIndentationLeft(8f);
            p.setIndentationRight(8f);
            doc.add(p);
        }
    }

    private Chapter chapter(int number, ReportSection s) throws IOException {
        Paragraph heading = new Paragraph();
        heading.setFont(fonts.heading1());
        Chunk title = new Chunk(s.title(), fonts.heading1());
        title.setLocalDestination(PdfContents.anchor(number));
        heading.add(title);
        heading.setSpacingAfter(8f);
        Chapter ch = new Chapter(heading, number);
        ch.setNumberDepth(1);
        ch.setBookmarkTitle(number + ". " + s.title());
        for (ReportBlock b : s.blocks()) {
            if (b instanceof ReportBlock.Paragraph p) {
                Paragraph para = new Paragraph(p.text(), fonts.body());
                para.setSpacingAfter(5f);
                ch.add(para);
            } else if (b instanceof ReportBlock.Callout c) {
                ch.add(callout(c));
            } else if (b instanceof ReportBlock.Table t) {
                addTable(ch, t.table());
            } else if (b instanceof ReportBlock.Figure f) {
                addFigure(ch, f);
            }
        }
        return ch;
    }

    private PdfPTable callout(ReportBlock.Callout c) {
        PdfPTable box = new PdfPTable(1);
        box.setWidthPercentage(100);
        box.setSpacingBefore(4f);
        box.setSpacingAfter(8f);
        Phrase text = new Phrase();
        text.add(new Chunk(HtmlReport.label(c.level()) + " ", fonts.bodyBold()));
        text.add(new Chunk(HtmlReport.body(c), fonts.body()));
        PdfPCell cell = new PdfPCell(text);
        cell.setBorder(Rectangle.LEFT);
        cell.setBorderWidthLeft(4f);
        cell.setBorderColorLeft(levelColour(c.level()));
        cell.setBackgroundColor(new Color(244, 245, 247));
        cell.setPadding(6f);
        cell.setPaddingLeft(9f);
        box.addCell(cell);
        return box;
    }

    private void addTable(Chapter ch, ReportTable t) {
        float available = doc.getPageSize().getWidth() - 2 * MARGIN_X;
        for (Element e : PdfTableBlock.elements(t, fonts, available, TableLimit.note(t, files.table(t)))) {
            ch.add(e);
        }
    }

    private void addFigure(Chapter ch, ReportBlock.Figure f) throws IOException {
        Image img = PdfPngImage.of(png.apply(f));
        float width = doc.getPageSize().getWidth() - 2 * MARGIN_X;
        // A chart takes at most half a page, so two share one; a figure of panels (higher than three quarters
        // of its width) a page, with room left for its caption.
        float share = img.getHeight() > img.getWidth() * TALL_FIGURE ? 0.86f : 0.55f;
        float height = (doc.getPageSize().getHeight() - MARGIN_TOP - MARGIN_BOTTOM) * share;
        img.scaleToFit(width, height);
        PdfPTable holder = new PdfPTable(1);
        holder.setTotalWidth(width);
        holder.setLockedWidth(true);
        holder.setKeepTogether(true);
        holder.setSpacingBefore(6f);
        holder.setSpacingAfter(10f);
        PdfPCell picture = new PdfPCell(img, false);
        picture.setBorder(Rectangle.NO_BORDER);
        picture.setHorizontalAlignment(Element.ALIGN_CENTER);
        picture.setPadding(0f);
        holder.addCell(picture);
        PdfPCell caption = new PdfPCell(new Phrase(f.caption(), fonts.muted()));
        caption.setBorder(Rectangle.NO_BORDER);
        caption.setPaddingTop(3f);
        holder.addCell(caption);
        ch.add(holder);
    }

    private static Color levelColour(ReportBlock.Level level) {
        switch (level) {
            case PASS: return new Color(0, 158, 115);
            case WARN: return new Color(230, 159, 0);
            case FAIL: return new Color(213, 94, 0);
            case CAUTION: return new Color(204, 121, 167);
            case CANNOT_JUDGE: return Color.BLACK;
            default: return new Color(86, 180, 233);
        }
    }
}
