package org.cupel.report;

import com.lowagie.text.Document;
import com.lowagie.text.Element;
import com.lowagie.text.Phrase;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.ColumnText;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPageEventHelper;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;
import java.awt.Color;

/**
 * The running header (project and "QC appendix", with a rule) and the footer "Page n of m" of every page
 * after the title page. The total is written into a template once the document is closed.
 */
final class PdfPageFrame extends PdfPageEventHelper {
    private final String header;
    private final PdfFonts fonts;
    private PdfTemplate total;

    PdfPageFrame(String header, PdfFonts fonts) {
        this.header = header;
        this.fonts = fonts;
    }

    @Override
    public void onOpenDocument(PdfWriter writer, Document document) {
        total = writer.getDirectContent().createTemplate(40, 12);
    }

    @Override
    public void onEndPage(PdfWriter writer, Document document) {
        if (writer.getPageNumber() == 1) {
            return;
        }
        Rectangle page = document.getPageSize();
        PdfContentByte cb = writer.getDirectContent();
        float left = PdfReport.MARGIN_X;
        float right = page.getWidth() - PdfReport.MARGIN_X;
        float top = page.getHeight() - 38f;
        ColumnText.showTextAligned(cb, Element.ALIGN_LEFT, new Phrase(header, fonts.frame()), left, top, 0);
        cb.saveState();
        cb.setColorStroke(new Color(0, 114, 178));
        cb.setLineWidth(0.8f);
        cb.moveTo(left, top - 6f);
        cb.lineTo(right, top - 6f);
        cb.stroke();
        cb.restoreState();
        String pageText = "Page " + writer.getPageNumber() + " of ";
        float textWidth = fonts.regular().getWidthPoint(pageText, 8f);
        float y = 32f;
        ColumnText.showTextAligned(cb, Element.ALIGN_LEFT, new Phrase(pageText, fonts.frame()), right - 40f - textWidth,
                y, 0);
        cb.addTemplate(total, right - 40f, y);
    }

    @Override
    public void onCloseDocument(PdfWriter writer, Document document) {
        ColumnText.showTextAligned(total, Element.ALIGN_LEFT,
                new Phrase(String.valueOf(writer.getPageNumber() - 1), fonts.frame()), 0, 0, 0);
    }
}
