package org.cupel.charts;

import java.util.Locale;

/** The small print every chart carries: n, thinning, limits. Kept uniform so readers learn where to look. */
public final class ChartNotes {
    private ChartNotes() {
    }

    /** "n = 412" or, when thinned, "n = 250 000 (8 000 drawn; points thinned evenly)". */
    public static String count(long n, long drawn) {
        if (drawn >= n) {
            return "n = " + String.format(Locale.US, "%,d", n);
        }
        return String.format(Locale.US, "n = %,d (%,d drawn; points thinned evenly)", n, drawn);
    }

    /**
     * The count of a chart thinned by {@link PointBudget#thinned}: "n = 50,000 (4,000 drawn: all 312
     * beyond the limit, the rest thinned evenly)".
     *
     * @param what what the flagged points are, as in "beyond the HARD limit"
     */
    public static String count(long n, long drawn, long flagged, long flaggedDrawn, String what) {
        if (drawn >= n) {
            return count(n, drawn);
        }
        if (flaggedDrawn < flagged) {
            return String.format(Locale.US, "n = %,d (%,d drawn: %,d of the %,d %s and %,d of the %,d others, "
                    + "each thinned evenly)", n, drawn, flaggedDrawn, flagged, what, drawn - flaggedDrawn, n - flagged);
        }
        return String.format(Locale.US, "n = %,d (%,d drawn: all %,d %s, the rest thinned evenly)", n, drawn,
                flagged, what);
    }

    /**
     * {@code text} broken into lines of at most about {@code width} characters, preferably at its "; "
     * separators, else (for a part longer than a line) between words.
     */
    public static String wrap(String text, int width) {
        StringBuilder out = new StringBuilder();
        int col = 0;
        for (String part : text.split("; ")) {
            if (col > 0 && col + part.length() + 2 > width) {
                out.append('\n');
                col = 0;
            } else if (col > 0) {
                out.append("; ");
                col += 2;
            }
            for (String word : part.split(" ")) {
                if (col > 0 && col + word.length() + 1 > width && out.charAt(out.length() - 1) != ' ') {
                    out.append('\n');
                    col = 0;
                } else if (col > 0 && out.charAt(out.length() - 1) != ' ') {
                    out.append(' ');
                    col++;
                }
                out.append(word);
                col += word.length();
            }
        }
        return out.toString();
    }
}
