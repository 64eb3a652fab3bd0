package org.cupel.report;

import org.apache.poi.xwpf.usermodel.XWPFParagraph;
import org.apache.poi.xwpf.usermodel.XWPFRun;

/**
 * Text of the report (IDs, file names, captions, cell values) put into a Word paragraph. It goes in as the
 * text of runs ({@code w:t}) and nothing else, so it is never read as a field code, a hyperlink or markup:
 * "{ DDEAUTO ... }" or "&lt;w:p&gt;" from an input file stays visible text, which Word does not interpret
 * (fields exist only as {@code w:fldSimple} or {@code w:fldChar}/{@code w:instrText}, which this class never
 * writes).
 */
final class DocxText {
    private DocxText() {
    }

    /**
     * The text made storable in XML 1.0: characters outside its {@code Char} production (W3C, 2008,
     * "Extensible Markup Language (XML) 1.0 (Fifth Edition)", section 2.2: control characters other than
     * tab, line feed and carriage return, U+FFFE, U+FFFF, unpaired surrogates), and DEL, are replaced by
     * U+FFFD so that they show up rather than vanish, as in the HTML page ({@link Html#escape(String)}).
     * A document holding them would be refused as corrupt.
     */
    static String clean(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (Character.isHighSurrogate(c) && i + 1 < s.length() && Character.isLowSurrogate(s.charAt(i + 1))) {
                sb.append(c).append(s.charAt(++i));
            } else if (c < 0x20 && c != '\t' && c != '\n' && c != '\r' || c == 0x7f || c == 0xfffe || c == 0xffff
                    || Character.isSurrogate(c)) {
                sb.append('\uFFFD');
            } else {
                sb.append(c);
            }
        }
        return sb.toString();
    }

    /**
     * Adds {@code text} to the paragraph as runs: line breaks become Word line breaks and tabs Word tabs
     * (inside {@code w:t} Word would show them as spaces). Each piece is a run of its own, so the order of
     * text, breaks and tabs cannot be mixed up.
     */
    static void append(XWPFParagraph p, String text, boolean bold) {
        append(p, text, bold, 0);
    }

    /** As {@link #append(XWPFParagraph, String, boolean)}, in {@code points} (0: the paragraph style's size). */
    static void append(XWPFParagraph p, String text, boolean bold, double points) {
        String[] lines = clean(text).split("\r\n|\r|\n", -1);
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
                    if (bold) {
                        run.setBold(true);
                    }
                    if (points > 0) {
                        run.setFontSize(points);
                    }
                    run.setText(parts[t]);
                }
            }
        }
    }
}
