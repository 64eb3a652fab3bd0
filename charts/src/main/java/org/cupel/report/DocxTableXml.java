package org.cupel.report;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;

/**
 * One report table as WordprocessingML text: the {@code w:tbl} element, with the markup POI used to build
 * for it (ISO/IEC 29500-1:2008, 17.4 "Tables"): table style "CupelTable", table width and grid in twips, the
 * header row repeated on each page ({@code w:tblHeader}) and shaded, no row split across pages
 * ({@code w:cantSplit}), each cell its column's width and one paragraph in style "TableHeading" or
 * "TableText", right-aligned ({@code w:jc}) when the value is a number, its runs ({@link DocxText#pieces})
 * at the table's font size.
 *
 * <p>Written as text because a table of {@link TableLimit#SHOWN} rows is tens of thousands of XML
 * elements: at a million samples the tables make 26 MB of {@code document.xml}, and building them as
 * XMLBeans objects through POI and saving those took 330 of the Word copy's 366 Java execution samples
 * (JFR) and most of its 1.7-3 s of GC pauses. Cell text goes
 * in as character data only, escaped as XML 1.0 requires (W3C, 2008, "Extensible Markup Language (XML) 1.0
 * (Fifth Edition)", section 2.4: {@code <} and {@code &} always, {@code >} after {@code ]]}), so it can never
 * become markup or a field ({@link DocxText}).
 */
final class DocxTableXml {
    private static final String HEADER_FILL = "EAECF0";

    private DocxTableXml() {
    }

    /**
     * Appends the table: its header and first {@code shown} rows, column {@code i} {@code widths[i]} twips
     * wide, text at {@code points} (0: the paragraph style's size).
     */
    static void append(StringBuilder out, ReportTable t, int shown, int[] widths, double points) {
        int total = 0;
        for (int w : widths) {
            total += w;
        }
        out.append("<w:tbl><w:tblPr><w:tblStyle w:val=\"CupelTable\"/><w:tblW w:w=\"").append(total)
                .append("\" w:type=\"dxa\"/></w:tblPr><w:tblGrid>");
        for (int w : widths) {
            out.append("<w:gridCol w:w=\"").append(w).append("\"/>");
        }
        out.append("</w:tblGrid>");
        String size = points > 0 ? "<w:rPr><w:sz w:val=\"" + halfPoints(points) + "\"/></w:rPr>" : "";
        out.append("<w:tr><w:trPr><w:tblHeader w:val=\"on\"/><w:cantSplit w:val=\"on\"/></w:trPr>");
        for (int c = 0; c < widths.length; c++) {
            out.append("<w:tc><w:tcPr><w:tcW w:w=\"").append(widths[c])
                    .append("\" w:type=\"dxa\"/><w:shd w:color=\"auto\" w:val=\"clear\" w:fill=\"")
                    .append(HEADER_FILL).append("\"/></w:tcPr>");
            paragraph(out, "TableHeading", t.columns().get(c), false, size);
            out.append("</w:tc>");
        }
        out.append("</w:tr>");
        for (int r = 0; r < shown; r++) {
            List<String> row = t.rows().get(r);
            out.append("<w:tr><w:trPr><w:cantSplit w:val=\"on\"/></w:trPr>");
            for (int c = 0; c < widths.length; c++) {
                String v = row.get(c);
                out.append("<w:tc><w:tcPr><w:tcW w:w=\"").append(widths[c]).append("\" w:type=\"dxa\"/></w:tcPr>");
                paragraph(out, "TableText", v, TableLimit.isNumeric(v), size);
                out.append("</w:tc>");
            }
            out.append("</w:tr>");
        }
        out.append("</w:tbl>");
    }

    /**
     * Word's font size: half-points ({@code ST_HpsMeasure}, ISO/IEC 29500-1:2008, 17.18.43), rounded half up
     * as POI's {@code XWPFRun.setFontSize(double)} does.
     */
    static int halfPoints(double points) {
        return BigDecimal.valueOf(points).multiply(BigDecimal.valueOf(2)).setScale(0, RoundingMode.HALF_UP)
                .intValueExact();
    }

    private static void paragraph(StringBuilder out, String style, String text, boolean right, String size) {
        out.append("<w:p><w:pPr><w:pStyle w:val=\"").append(style).append("\"/>");
        if (right) {
            out.append("<w:jc w:val=\"right\"/>");
        }
        out.append("</w:pPr>");
        DocxText.pieces(text, new DocxText.Pieces() {
            @Override
            public void text(String s) {
                out.append("<w:r>").append(size).append(preservesSpace(s) ? "<w:t xml:space=\"preserve\">" : "<w:t>");
                escape(out, s);
                out.append("</w:t></w:r>");
            }

            @Override
            public void lineBreak() {
                out.append("<w:r><w:br/></w:r>");
            }

            @Override
            public void tab() {
                out.append("<w:r><w:tab/></w:r>");
            }
        });
        out.append("</w:p>");
    }

    /**
     * Word drops the white space at either end of a run's text unless it is marked to be kept
     * ({@code xml:space="preserve"}, ISO/IEC 29500-1:2008, 17.3.3.31 "t"); POI's {@code XWPFRun.setText}
     * marks a text that begins or ends with a {@link Character#isWhitespace} character, and so does this.
     */
    private static boolean preservesSpace(String s) {
        return Character.isWhitespace(s.charAt(0)) || Character.isWhitespace(s.charAt(s.length() - 1));
    }

    /** Character data: {@code <} and {@code &} as entities, and {@code >} where it would close "]]>". */
    static void escape(StringBuilder out, String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '<') {
                out.append("&lt;");
            } else if (c == '&') {
                out.append("&amp;");
            } else if (c == '>' && i >= 2 && s.charAt(i - 1) == ']' && s.charAt(i - 2) == ']') {
                out.append("&gt;");
            } else {
                out.append(c);
            }
        }
    }
}
