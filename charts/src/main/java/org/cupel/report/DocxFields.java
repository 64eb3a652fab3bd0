package org.cupel.report;

import java.util.List;
import org.apache.poi.xwpf.usermodel.XWPFDocument;
import org.apache.poi.xwpf.usermodel.XWPFParagraph;
import org.apache.xmlbeans.impl.xb.xmlschema.SpaceAttribute;
import org.openxmlformats.schemas.wordprocessingml.x2006.main.CTR;
import org.openxmlformats.schemas.wordprocessingml.x2006.main.CTSimpleField;
import org.openxmlformats.schemas.wordprocessingml.x2006.main.CTText;
import org.openxmlformats.schemas.wordprocessingml.x2006.main.STFldCharType;

/**
 * The Word fields of the appendix: the table of contents, the caption numbers and the page number. Their
 * instructions are constants of this class; text from the report only ever appears as their displayed
 * result, never in an instruction (see {@link DocxText}).
 *
 * <p>Each field carries its result as of writing (the contents list, "Table 3"), so the document reads
 * correctly before any field is updated, and the settings ask Word to update the fields on opening, which
 * adds the page numbers to the contents (ISO/IEC 29500-1:2008, "Office Open XML File Formats — Part 1",
 * 17.15.1.90 "updateFields"; the TOC, SEQ and PAGE fields are defined in the same part, under "Fields").
 */
final class DocxFields {
    /** Level-1 headings by outline level, as hyperlinks, without tab leaders in Web view, keeping outline levels. */
    static final String TOC = " TOC \\o \"1-1\" \\h \\z \\u ";

    private DocxFields() {
    }

    /**
     * The table of contents: a field spanning one paragraph per entry (style "toc 1"), its result the
     * numbered section titles. A report without sections still gets one (empty) paragraph, which holds the field.
     */
    static void tableOfContents(XWPFDocument doc, List<String> entries) {
        int n = Math.max(1, entries.size());
        for (int i = 0; i < n; i++) {
            XWPFParagraph p = doc.createParagraph();
            p.setStyle("TOC1");
            if (i == 0) {
                fieldChar(p, STFldCharType.BEGIN);
                CTText instruction = p.getCTP().addNewR().addNewInstrText();
                instruction.setStringValue(TOC);
                instruction.setSpace(SpaceAttribute.Space.PRESERVE);
                fieldChar(p, STFldCharType.SEPARATE);
            }
            if (i < entries.size()) {
                DocxText.append(p, entries.get(i), false);
            }
            if (i == n - 1) {
                fieldChar(p, STFldCharType.END);
            }
        }
        doc.enforceUpdateFields();
    }

    /** "Table 3" or "Figure 3": the label, then a SEQ field numbering that kind of caption, showing {@code number}. */
    static void captionNumber(XWPFParagraph p, String label, int number, boolean bold) {
        DocxText.append(p, label + " ", bold);
        CTSimpleField f = p.getCTP().addNewFldSimple();
        f.setInstr(" SEQ " + label + " \\* ARABIC ");
        CTR r = f.addNewR();
        if (bold) {
            r.addNewRPr().addNewB();
        }
        r.addNewT().setStringValue(Integer.toString(number));
    }

    /** The current page number, showing {@code 1} until Word or a converter lays out the pages. */
    static void pageNumber(XWPFParagraph p) {
        CTSimpleField f = p.getCTP().addNewFldSimple();
        f.setInstr(" PAGE ");
        f.addNewR().addNewT().setStringValue("1");
    }

    private static void fieldChar(XWPFParagraph p, STFldCharType.Enum type) {
        p.getCTP().addNewR().addNewFldChar().setFldCharType(type);
    }
}
