package org.cupel.charts;

/** The small print every chart carries: n, thinning, limits. Kept uniform so readers learn where to look. */
public final class ChartNotes {
    private ChartNotes() {
    }

    /** "n = 412" or, when thinned, "n = 250 000 (8 000 drawn; points thinned evenly)". */
    public static String count(long n, long drawn) {
        if (drawn >= n) {
            return "n = " + String.format(java.util.Locale.US, "%,d", n);
        }
        return String.format(java.util.Locale.US, "n = %,d (%,d drawn; points thinned evenly)", n, drawn);
    }
}
