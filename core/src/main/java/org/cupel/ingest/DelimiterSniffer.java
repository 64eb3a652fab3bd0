package org.cupel.ingest;

import java.util.List;
import java.util.function.Predicate;
import org.cupel.project.InputException;

/**
 * Chooses the delimiter of a text table from its first lines: the candidate (tab, semicolon, comma)
 * that splits the header row into the most cells; when no row looks like a header, the one that gives
 * the widest row. Ties go to tab, then semicolon, because a comma also appears inside decimal-comma
 * numbers while tabs and semicolons rarely appear in cell text.
 */
final class DelimiterSniffer {
    private static final char[] CANDIDATES = {'\t', ';', ','};
    private static final int SAMPLE_ROWS = 200;

    private DelimiterSniffer() {
    }

    /** @param text the first lines of the file, {@code text[0, length)} */
    static char sniff(char[] text, int length, Predicate<List<String>> isHeaderRow) {
        char best = ',';
        int bestHeaderWidth = 0;
        int bestWidth = 0;
        char widest = ',';
        for (char d : CANDIDATES) {
            int[] widths = widths(text, length, d, isHeaderRow);
            if (widths[0] > bestHeaderWidth) {
                bestHeaderWidth = widths[0];
                best = d;
            }
            if (widths[1] > bestWidth) {
                bestWidth = widths[1];
                widest = d;
            }
        }
        return bestHeaderWidth > 1 ? best : widest;
    }

    /** {header row width (0 when none), widest row width} when split on {@code d}. */
    private static int[] widths(char[] text, int length, char d, Predicate<List<String>> isHeaderRow) {
        DelimitedTokenizer t = new DelimitedTokenizer(text, length, d, "");
        CellRow r = new CellRow();
        int header = 0;
        int widest = 0;
        try {
            for (int i = 0; i < SAMPLE_ROWS && t.next(r); i++) {
                widest = Math.max(widest, r.size());
                if (r.size() > 1 && isHeaderRow.test(r.cells())) {
                    // A header decides the delimiter whatever the widest row is (see sniff): stop here.
                    return new int[] {r.size(), widest};
                }
            }
        } catch (InputException cutOff) {
            // The prefix may end inside a quoted cell; the rows before it are enough to decide.
        }
        return new int[] {header, widest};
    }
}
