package org.cupel.report;

import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.apache.poi.xwpf.usermodel.XWPFDocument;

/**
 * The tables of the Word copy, kept out of POI's object model: while POI builds the rest of the document,
 * each table holds its place as a slot (an empty paragraph in a style nothing else uses), and when the main
 * document part is saved each slot is replaced by the table's text ({@link DocxTableXml}). Report text can
 * never look like a slot: it is stored as escaped character data, so a {@code <} from it is never markup.
 */
final class DocxTables {
    private static final String SLOT_STYLE = "CupelTableSlot";
    /** A slot as XMLBeans saves it in {@code document.xml}. */
    static final String SLOT = "<w:p><w:pPr><w:pStyle w:val=\"" + SLOT_STYLE + "\"/></w:pPr></w:p>";

    private final List<Held> held = new ArrayList<>();

    private record Held(ReportTable table, int shown, int[] widths, double points) {
    }

    /** Holds a place for {@code t} (its header and first {@code shown} rows) at the end of the document. */
    void add(XWPFDocument doc, ReportTable t, int shown, int[] widths, double points) {
        doc.createParagraph().setStyle(SLOT_STYLE);
        held.add(new Held(t, shown, widths.clone(), points));
    }

    /**
     * Writes the main document part {@code xml} (as POI saved it) to {@code out} with each slot replaced
     * by its table, in order.
     *
     * @throws IllegalStateException when the slots found are not the tables held (a bug, or a POI that saves
     *                               a paragraph differently)
     */
    void expand(String xml, Writer out) throws IOException {
        int from = 0;
        StringBuilder table = new StringBuilder(1 << 16);
        for (int i = 0; i < held.size(); i++) {
            int at = xml.indexOf(SLOT, from);
            if (at < 0) {
                throw new IllegalStateException("the Word document holds " + i + " table slots, not " + held.size()
                        + ": POI saved a slot as something other than " + SLOT);
            }
            out.write(xml, from, at - from);
            Held h = held.get(i);
            table.setLength(0);
            DocxTableXml.append(table, h.table(), h.shown(), h.widths(), h.points());
            out.append(table);
            from = at + SLOT.length();
        }
        if (xml.indexOf(SLOT, from) >= 0) {
            throw new IllegalStateException("the Word document holds more table slots than its " + held.size()
                    + " tables");
        }
        out.write(xml, from, xml.length() - from);
    }
}
