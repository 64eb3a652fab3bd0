package org.cupel.report;

import java.util.regex.Pattern;
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
    private static final Pattern LINE_BREAK = Pattern.compile("\r\n|\r|\n");

    private DocxText() {
    }

    /** What a text is made of in Word: pieces of run text, line breaks and tabs, met in reading order. */
    interface Pieces {
        void text(String s);

        void lineBreak();

        void tab();
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
        if (storable(s)) {
            return s;
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

    /** Whether {@link #clean(String)} would leave {@code s} as it is (most texts: no copy made). */
    private static boolean storable(String s) {
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c < 0x20 && c != '\t' && c != '\n' && c != '\r' || c >= 0x7f && (c == 0x7f || c == 0xfffe
                    || c == 0xffff || Character.isSurrogate(c))) {
                return false;
            }
        }
        return true;
    }

    /**
     * Walks {@code text}, made storable ({@link #clean(String)}), as Word holds it: line breaks become Word
     * line breaks and tabs Word tabs (inside {@code w:t} Word would show them as spaces), the text between
     * them pieces of run text (empty pieces are skipped).
     */
    static void pieces(String text, Pieces to) {
        String[] lines = LINE_BREAK.split(clean(text), -1);
        for (int l = 0; l < lines.length; l++) {
            if (l > 0) {
                to.lineBreak();
            }
            String line = lines[l];
            int from = 0;
            for (int tab = line.indexOf('\t'); ; tab = line.indexOf('\t', from)) {
                int end = tab < 0 ? line.length() : tab;
                if (end > from) {
                    to.text(line.substring(from, end));
                }
                if (tab < 0) {
                    break;
                }
                to.tab();
                from = tab + 1;
            }
        }
    }

    /**
     * Adds {@code text} to the paragraph as runs ({@link #pieces}). Each piece is a run of its own, so the
     * order of text, breaks and tabs cannot be mixed up.
     */
    static void append(XWPFParagraph p, String text, boolean bold) {
        pieces(text, new Pieces() {
            @Override
            public void text(String s) {
                XWPFRun run = p.createRun();
                if (bold) {
                    run.setBold(true);
                }
                run.setText(s);
            }

            @Override
            public void lineBreak() {
                p.createRun().addBreak();
            }

            @Override
            public void tab() {
                p.createRun().addTab();
            }
        });
    }
}
