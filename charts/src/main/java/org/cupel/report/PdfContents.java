package org.cupel.report;

import com.lowagie.text.Chunk;
import com.lowagie.text.Document;
import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.Image;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.ColumnText;
import com.lowagie.text.pdf.PdfPageEventHelper;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;
import com.lowagie.text.pdf.draw.DottedLineSeparator;
import java.util.ArrayList;
import java.util.List;

/**
 * The contents list of the title page with the page on which each section starts. The pages are not known
 * when the title page is laid out, so each entry ends in a small template, a placeholder drawn like an
 * image, and the template is written when the section's chapter starts (the {@code onChapter} event, fired
 * after the chapter's new page has begun): one pass, and the numbers are those of the "Page n of m" footer.
 * Each entry also links to its chapter.
 */
final class PdfContents extends PdfPageEventHelper {
    private static final float NUMBER_WIDTH = 28f;

    private final PdfFonts fonts;
    private final List<PdfTemplate> pages = new ArrayList<>();
    private int started;

    PdfContents(PdfFonts fonts) {
        this.fonts = fonts;
    }

    /** The anchor of section {@code number} (1-based), which its chapter heading carries. */
    static String anchor(int number) {
        return "section-" + number;
    }

    /** One contents line: number and title (linked to the chapter), dotted leader, page number to come. */
    Paragraph entry(PdfWriter writer, int number, String title) {
        Font font = fonts.body();
        float size = font.getSize();
        float descent = -fonts.regular().getFontDescriptor(BaseFont.DESCENT, size);
        float ascent = fonts.regular().getFontDescriptor(BaseFont.ASCENT, size);
        PdfTemplate page = writer.getDirectContent().createTemplate(NUMBER_WIDTH, ascent + descent);
        pages.add(page);
        Paragraph p = new Paragraph();
        p.setFont(font);
        Chunk text = new Chunk(number + "   " + title, font);
        text.setLocalGoto(anchor(number));
        p.add(text);
        p.add(new Chunk(new DottedLineSeparator()));
        // The template's baseline sits at its descent, so the number lines up with the title's text.
        p.add(new Chunk(Image.getInstance(page), 0, -descent, true));
        return p;
    }

    @Override
    public void onChapter(PdfWriter writer, Document document, float paragraphPosition, Paragraph title) {
        if (started < pages.size()) {
            PdfTemplate page = pages.get(started);
            float descent = -fonts.regular().getFontDescriptor(BaseFont.DESCENT,
                    fonts.body().getSize());
            ColumnText.showTextAligned(page, Element.ALIGN_RIGHT, new Phrase(String.valueOf(writer.getPageNumber()),
                    fonts.body()), NUMBER_WIDTH, descent, 0);
        }
        started++;
    }
}
