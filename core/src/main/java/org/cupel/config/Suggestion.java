package org.cupel.config;

import java.util.Collection;
import java.util.Locale;
import java.util.Optional;

/**
 * "Did you mean" for a mistyped key: the known key nearest to the typed one, when it is near enough to be
 * a plausible typo. Distance is the optimal string alignment distance (Levenshtein's insertions, deletions
 * and substitutions plus Damerau's transposition of two adjacent letters; Damerau 1964, "A technique for
 * computer detection and correction of spelling errors") on the lower-cased keys, so {@code Ingest} and
 * {@code reprot} are one step from {@code ingest} and {@code report}.
 */
final class Suggestion {
    private Suggestion() {
    }

    /**
     * The known key closest to {@code typed}, if at most 2 edits away and fewer edits than half its length
     * (so that a short key is not "corrected" into an unrelated one).
     */
    public static Optional<String> closest(String typed, Collection<String> known) {
        String t = typed.toLowerCase(Locale.ROOT);
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String k : known) {
            int d = distance(t, k.toLowerCase(Locale.ROOT));
            if (d < bestDistance) {
                best = k;
                bestDistance = d;
            }
        }
        return best != null && bestDistance <= 2 && bestDistance * 2 < Math.max(t.length(), 1)
                ? Optional.of(best) : Optional.empty();
    }

    /** Optimal string alignment distance between {@code a} and {@code b}. */
    static int distance(String a, String b) {
        int[][] d = new int[a.length() + 1][b.length() + 1];
        for (int i = 0; i <= a.length(); i++) {
            d[i][0] = i;
        }
        for (int j = 0; j <= b.length(); j++) {
            d[0][j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                d[i][j] = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
                }
            }
        }
        return d[a.length()][b.length()];
    }
}
