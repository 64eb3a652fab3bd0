package org.cupel.report;

import com.lowagie.text.SplitCharacter;
import com.lowagie.text.pdf.PdfChunk;
import java.util.ArrayList;
import java.util.List;

/**
 * Where the text of a printed table cell may end a line, decided as a typesetter would: at a space, and
 * after the hyphen of a hyphenated word ("coarse-|reject"); never inside a word, a number ("−1.48",
 * "0.0311"), an ID ("OAL-00001", "VHC-11"), a date or a setting name, and never between "±" and the number it qualifies
 * (the space after "±" is made non-breaking by {@link #typeset}).
 *
 * <p>{@link #IDENTIFIERS} also lets a long identifier break where its parts join, when a column cannot hold
 * it whole, by the rules for breaking a URL in print (The Chicago Manual of Style, 15th ed., 2003, 17.11):
 * after a slash, before a dot, underscore or hyphen, never with an added hyphen, which would read as part of
 * the name; and between a lower-case and an upper-case letter, the join of the words of a camel-case name
 * ("duplicates|.field|Hard|Limit|Percent", "tables/|crm|-drift|.csv"). Only tokens of
 * {@value #LONG_IDENTIFIER} or more characters break so: a short token such as "pH" or "e.g." stays whole.
 * Inside an identifier or a path a hyphen never ends a line, in either mode.
 *
 * <p>The same positions serve the column widths ({@link #pieces}: a column at least as wide as its widest
 * piece never breaks a word) and the PDF ({@link #splitter}: OpenPDF ends a line only there), so what is
 * measured is what is printed. A piece wider than the column it is given still breaks between letters, as
 * the last resort of the layout; the widths give no column less than its widest piece up to a cap.
 */
enum TableBreaks {
    /** Spaces and hyphens of hyphenated words only. */
    WORDS,
    /** As {@link #WORDS}, and at the joins of long identifiers. */
    IDENTIFIERS;

    /** The shortest token (characters between spaces) that may break as an identifier. */
    static final int LONG_IDENTIFIER = 16;

    /** The cell as printed: a space after "±" becomes a no-break space, keeping the sign with its number. */
    static String typeset(String cell) {
        return NoBreak.plusMinus(cell);
    }

    /**
     * Where a line may end: {@code result[i]} is true when a line may end after character {@code i}.
     * A space is such a place (it is dropped at the line end); so is a hyphen between two lower-case letters.
     */
    boolean[] breaksAfter(String text) {
        int n = text.length();
        boolean[] after = new boolean[n];
        int tokenStart = 0;
        for (int i = 0; i <= n; i++) {
            if (i == n || text.charAt(i) == ' ') {
                markToken(text, tokenStart, i, after);
                if (i < n) {
                    after[i] = true;
                }
                tokenStart = i + 1;
            }
        }
        return after;
    }

    private void markToken(String text, int from, int to, boolean[] after) {
        boolean identifier = isIdentifier(text, from, to);
        boolean joins = this == IDENTIFIERS && identifier && to - from >= LONG_IDENTIFIER;
        for (int i = from + 1; i < to - 1; i++) {
            char prev = text.charAt(i - 1);
            char c = text.charAt(i);
            char next = text.charAt(i + 1);
            if (!identifier && isHyphen(c) && Character.isLowerCase(prev) && Character.isLowerCase(next)) {
                after[i] = true;
            } else if (joins && c == '/' && Character.isLetterOrDigit(next)) {
                after[i] = true;
            } else if (joins && (c == '.' || c == '_' || isHyphen(c)) && Character.isLetterOrDigit(prev)
                    && Character.isLetter(next)) {
                after[i - 1] = true;
            } else if (joins && Character.isLowerCase(c) && Character.isUpperCase(next)) {
                after[i] = true;
            }
        }
    }

    /** A setting name, a path or a camel-case name: a slash or underscore, a dot inside a word, or a camel join. */
    private static boolean isIdentifier(String text, int from, int to) {
        for (int i = from; i < to; i++) {
            char c = text.charAt(i);
            boolean inside = i > from && i < to - 1;
            if (c == '/' || c == '_' || inside && c == '.' && Character.isLetter(text.charAt(i + 1))
                    || inside && Character.isLowerCase(c) && Character.isUpperCase(text.charAt(i + 1))) {
                return true;
            }
        }
        return false;
    }

    private static boolean isHyphen(char c) {
        return c == '-' || c == '\u2010';
    }

    /** The unbreakable pieces of {@code text}, each without the space that ends it: what a line cannot split. */
    List<String> pieces(String text) {
        boolean[] after = breaksAfter(text);
        List<String> out = new ArrayList<>();
        int start = 0;
        for (int i = 0; i <= text.length(); i++) {
            if (i == text.length() || after[i]) {
                String piece = text.substring(start, Math.min(i + 1, text.length())).strip();
                if (!piece.isEmpty()) {
                    out.add(piece);
                }
                start = i + 1;
            }
        }
        return out;
    }

    /** OpenPDF's line breaker for one cell whose whole text is {@code text}. */
    SplitCharacter splitter(String text) {
        return new CellSplitter(text, breaksAfter(text));
    }

    /**
     * Answers OpenPDF for one cell. A cell's lines are set by {@code BidiLine}, which passes the whole text
     * of the cell; {@code PdfChunk.split} passes what is left of it (a suffix). Either way the array ends where
     * the cell's text ends, so position {@code current} of the array is position
     * {@code current + text.length() - end} of the text. When the two do not agree (text OpenPDF built itself),
     * only a space breaks.
     */
    private record CellSplitter(String text, boolean[] after) implements SplitCharacter {
        @Override
        public boolean isSplitCharacter(int start, int current, int end, char[] cc, PdfChunk[] ck) {
            char c = cc[current];
            if (c == ' ') {
                return true;
            }
            int i = current + text.length() - end;
            return i >= 0 && i < text.length() && text.charAt(i) == c && after[i];
        }
    }
}
