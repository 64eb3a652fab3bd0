package org.cupel.report;

import com.lowagie.text.Chunk;
import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import java.awt.Color;
import java.util.ArrayList;
import java.util.List;

/**
 * A report table as PDF elements, set by its {@link PdfTableLayout}: one PDF table per part, each with its
 * caption and header row repeated on every page it runs over, rows not split mid-line, numbers right-aligned,
 * lines ending only where {@link TableBreaks} allows; then the table's note.
 */
final class PdfTableBlock {
    private static final Color HEAD_BAND = new Color(234, 236, 240);
    private static final Color RULE = new Color(205, 209, 215);

    private PdfTableBlock() {
    }

    static List<Element> elements(ReportTable t, PdfFonts fonts, float available, String note) {
        PdfTableLayout layout = PdfTableLayout.of(t, fonts.bold(), fonts.regular(), available);
        List<Element> out = new ArrayList<>();
        for (int i = 0; i < layout.parts().size(); i++) {
            out.add(part(t, layout, i, fonts));
        }
        if (!note.isEmpty()) {
            Paragraph p = new Paragraph(note, fonts.muted());
            p.setSpacingAfter(6f);
            out.add(p);
        }
        return out;
    }

    private static PdfPTable part(ReportTable t, PdfTableLayout layout, int index, PdfFonts fonts) {
        PdfTableLayout.Part part = layout.parts().get(index);
        int[] columns = part.columns();
        PdfPTable table = new PdfMeasuredTable(columns.length);
        // Narrow tables keep their natural width (left-aligned) rather than stretching across the page.
        table.setTotalWidth(part.widths());
        table.setLockedWidth(true);
        table.setHorizontalAlignment(Element.ALIGN_LEFT);
        // The caption is a header row too: it never strands at a page foot and repeats over each page.
        table.setHeaderRows(2);
        // A row that does not fit moves whole to the next page; only a row taller than a page is split.
        table.setSplitLate(true);
        table.setSplitRows(true);
        table.setSpacingBefore(10f);
        PdfPCell caption = new PdfPCell(new Phrase(caption(t, layout, index), fonts.bodyBold()));
        caption.setColspan(columns.length);
        caption.setBorder(Rectangle.NO_BORDER);
        caption.setPaddingLeft(0f);
        caption.setPaddingBottom(4f);
        table.addCell(caption);
        Font head = fonts.tableHead(layout.size());
        for (int c : columns) {
            PdfPCell cell = new PdfPCell(phrase(t.columns().get(c), head, TableBreaks.WORDS));
            cell.setBackgroundColor(HEAD_BAND);
            cell.setBorder(Rectangle.BOTTOM);
            cell.setBorderWidthBottom(1f);
            pad(cell, layout);
            table.addCell(cell);
        }
        Font body = fonts.tableBody(layout.size());
        List<List<String>> rows = t.rows();
        int shown = Math.min(rows.size(), TableLimit.SHOWN);
        for (int r = 0; r < shown; r++) {
            for (int c : columns) {
                String v = rows.get(r).get(c);
                PdfPCell cell = new PdfPCell(phrase(v, body, layout.breaks()));
                cell.setBorder(Rectangle.BOTTOM);
                cell.setBorderColor(RULE);
                cell.setBorderWidthBottom(0.5f);
                pad(cell, layout);
                cell.setHorizontalAlignment(TableLimit.isNumeric(v) ? Element.ALIGN_RIGHT : Element.ALIGN_LEFT);
                table.addCell(cell);
            }
        }
        if (rows.isEmpty()) {
            PdfPCell cell = new PdfPCell(new Phrase("No rows.", fonts.muted()));
            cell.setColspan(columns.length);
            cell.setBorder(Rectangle.NO_BORDER);
            table.addCell(cell);
        }
        return table;
    }

    /** The title, and for a table in parts which part this is and which columns it repeats. */
    static String caption(ReportTable t, PdfTableLayout layout, int index) {
        if (!layout.split()) {
            return t.title();
        }
        PdfTableLayout.Part part = layout.parts().get(index);
        String which = " (part " + (index + 1) + " of " + layout.parts().size();
        if (part.keys() == 0) {
            return t.title() + which + ")";
        }
        List<String> keys = new ArrayList<>();
        for (int i = 0; i < part.keys(); i++) {
            keys.add(t.columns().get(part.columns()[i]));
        }
        return t.title() + which + ", continued; " + String.join(", ", keys) + " repeated)";
    }

    private static void pad(PdfPCell cell, PdfTableLayout layout) {
        cell.setPadding(PdfTableLayout.PADDING);
        cell.setPaddingLeft(layout.padding());
        cell.setPaddingRight(layout.padding());
    }

    private static Phrase phrase(String text, Font font, TableBreaks breaks) {
        String set = TableBreaks.typeset(text);
        Chunk chunk = new Chunk(set, font);
        chunk.setSplitCharacter(breaks.splitter(set));
        return new Phrase(chunk);
    }
}
