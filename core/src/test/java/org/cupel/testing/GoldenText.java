package org.cupel.testing;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;

/**
 * Compares a test's text with a committed golden text under {@code testdata/golden/}, so that a change of
 * output shows as a reviewable diff of that file rather than as a changed digest. On a mismatch the failure
 * lists the first differing hunks (lines only in the golden text with {@code -}, lines only in the new text
 * with {@code +}, each with its line number) and says how to rewrite the file.
 *
 * <p>{@code -Dcupel.golden.update=true} rewrites every golden text a test run reaches instead of comparing
 * (for example {@code mvn -B -o -pl core test -Dtest=ControlOutputGoldenTest -Dcupel.golden.update=true});
 * review the diff ({@code git diff testdata/golden}) before committing it.
 */
public final class GoldenText {
    /** The system property that rewrites the golden texts instead of comparing with them. */
    public static final String UPDATE_PROPERTY = "cupel.golden.update";
    /** At most this many differing hunks are shown in a failure. */
    static final int MAX_HUNKS = 6;
    /** At most this many lines of one hunk side are shown. */
    static final int MAX_HUNK_LINES = 8;
    /** How far ahead (in lines, on each side) a hunk's end is looked for before the rest is called different. */
    static final int RESYNC_WINDOW = 200;

    private GoldenText() {
    }

    /** The committed golden text {@code testdata/golden/<name>}. */
    public static Path file(String name) {
        return Path.of(System.getProperty("cupel.testdata", "../testdata"), "golden", name);
    }

    /** The SHA-256 digest of {@code text} in UTF-8, in hex: a line of a golden text of digests. */
    public static String sha256(String text) {
        try {
            return java.util.HexFormat.of().formatHex(java.security.MessageDigest.getInstance("SHA-256")
                    .digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    /** Fails, showing the first differences, unless {@code actual} equals the golden text {@code name}. */
    public static void assertMatches(String name, String actual) {
        Path file = file(name);
        try {
            if (Boolean.getBoolean(UPDATE_PROPERTY)) {
                write(file, actual);
                return;
            }
            if (!Files.exists(file)) {
                fail("no golden text " + file + "; write it with -D" + UPDATE_PROPERTY + "=true and review it");
            }
            String expected = Files.readString(file, StandardCharsets.UTF_8);
            String diff = differences(expected, actual);
            if (diff != null) {
                fail("the text differs from the golden text " + file + "\n" + diff
                        + "If the change is intended, rewrite the file with -D" + UPDATE_PROPERTY
                        + "=true, review `git diff testdata/golden` and commit it.");
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * The first differing hunks of two texts, line by line, or null when they are equal. After a differing
     * line the two texts are brought back in step at the nearest pair of offsets (smallest sum) where two
     * lines in a row agree again, so an inserted or removed line shows as one hunk, not as every line after it.
     */
    static String differences(String expected, String actual) {
        if (expected.equals(actual)) {
            return null;
        }
        List<String> a = expected.lines().toList();
        List<String> b = actual.lines().toList();
        StringBuilder out = new StringBuilder();
        out.append("golden text ").append(a.size()).append(" lines, new text ").append(b.size()).append(" lines\n");
        int i = 0;
        int j = 0;
        int hunks = 0;
        while (hunks < MAX_HUNKS) {
            while (i < a.size() && j < b.size() && a.get(i).equals(b.get(j))) {
                i++;
                j++;
            }
            if (i == a.size() && j == b.size()) {
                break;
            }
            int[] step = resync(a, b, i, j);
            out.append("@@ golden line ").append(i + 1).append(", new line ").append(j + 1).append('\n');
            show(out, '-', a, i, i + step[0]);
            show(out, '+', b, j, j + step[1]);
            i += step[0];
            j += step[1];
            hunks++;
        }
        if (hunks == MAX_HUNKS && (i < a.size() || j < b.size())) {
            out.append("(further differences not shown)\n");
        }
        if (hunks == 0) {
            // Same lines, different line ends or final newline.
            out.append("the texts differ only in line ends or the final newline\n");
        }
        return out.toString();
    }

    /** Lines to skip on each side so that both texts agree again (or run to their ends). */
    private static int[] resync(List<String> a, List<String> b, int i, int j) {
        for (int sum = 1; sum <= 2 * RESYNC_WINDOW; sum++) {
            for (int da = Math.max(0, sum - RESYNC_WINDOW); da <= Math.min(sum, RESYNC_WINDOW); da++) {
                int db = sum - da;
                if (agreeFrom(a, b, i + da, j + db)) {
                    return new int[] {da, db};
                }
            }
        }
        return new int[] {a.size() - i, b.size() - j};
    }

    /** Whether both texts end here, or agree on two lines in a row (one when one line is left). */
    private static boolean agreeFrom(List<String> a, List<String> b, int i, int j) {
        if (i > a.size() || j > b.size()) {
            return false;
        }
        if (i == a.size() || j == b.size()) {
            return i == a.size() && j == b.size();
        }
        boolean second = i + 1 == a.size() || j + 1 == b.size() || a.get(i + 1).equals(b.get(j + 1));
        return a.get(i).equals(b.get(j)) && second;
    }

    private static void show(StringBuilder out, char mark, List<String> lines, int from, int to) {
        for (int k = from; k < Math.min(to, from + MAX_HUNK_LINES); k++) {
            out.append(mark).append(' ').append(k + 1).append(": ").append(lines.get(k)).append('\n');
        }
        if (to - from > MAX_HUNK_LINES) {
            out.append(mark).append(" ... ").append(to - from - MAX_HUNK_LINES).append(" more lines\n");
        }
    }

    /** Writes the text atomically (a temporary file moved into place), creating the folder. */
    private static void write(Path file, String text) throws IOException {
        Files.createDirectories(file.getParent());
        Path tmp = file.resolveSibling(file.getFileName() + ".tmp");
        Files.writeString(tmp, text, StandardCharsets.UTF_8);
        Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    }

}
