package org.cupel.testing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

class GoldenTextTest {

    private static String numbered(int from, int to) {
        return IntStream.rangeClosed(from, to).mapToObj(k -> "line " + k).collect(Collectors.joining("\n", "", "\n"));
    }

    @Test
    void equalTextsHaveNoDifferences() {
        assertNull(GoldenText.differences("a\nb\n", "a\nb\n"));
    }

    @Test
    void aChangedLineShowsAsOneHunkWithItsLineNumbers() {
        String golden = "a\nb\nc\nd\n";
        String changed = "a\nB\nc\nd\n";
        assertEquals("golden text 4 lines, new text 4 lines\n"
                + "@@ golden line 2, new line 2\n"
                + "- 2: b\n"
                + "+ 2: B\n", GoldenText.differences(golden, changed));
    }

    @Test
    void anInsertedLineDoesNotMarkEveryLineAfterIt() {
        // 1..20 against 1..5, "new", 6..20: one hunk adding line 6 of the new text, nothing removed.
        String golden = numbered(1, 20);
        String inserted = numbered(1, 5) + "new\n" + numbered(6, 20);
        assertEquals("golden text 20 lines, new text 21 lines\n"
                + "@@ golden line 6, new line 6\n"
                + "+ 6: new\n", GoldenText.differences(golden, inserted));
    }

    @Test
    void removedTrailingLinesAreListed() {
        assertEquals("golden text 3 lines, new text 1 lines\n"
                + "@@ golden line 2, new line 2\n"
                + "- 2: b\n"
                + "- 3: c\n", GoldenText.differences("a\nb\nc\n", "a\n"));
    }

    @Test
    void onlyTheFinalNewlineDiffering() {
        assertTrue(GoldenText.differences("a\nb\n", "a\nb").contains("only in line ends"));
    }

    @Test
    void manyDifferencesAreCutShort() {
        // Every third line differs, two equal lines between: 33 hunks, of which MAX_HUNKS are shown.
        String golden = numbered(1, 100);
        String changed = IntStream.rangeClosed(1, 100).mapToObj(k -> k % 3 == 0 ? "changed " + k : "line " + k)
                .collect(Collectors.joining("\n", "", "\n"));
        String diff = GoldenText.differences(golden, changed);
        assertEquals(GoldenText.MAX_HUNKS, diff.lines().filter(l -> l.startsWith("@@")).count());
        assertTrue(diff.endsWith("(further differences not shown)\n"), diff);
    }

    @Test
    void aMismatchFailsNamingTheFileAndHowToRewriteIt() {
        // A rewriting run would write this file instead of failing.
        assumeFalse(Boolean.getBoolean(GoldenText.UPDATE_PROPERTY));
        AssertionError e = assertThrows(AssertionError.class,
                () -> GoldenText.assertMatches("no-such-golden.txt", "x\n"));
        assertTrue(e.getMessage().contains("no-such-golden.txt") && e.getMessage().contains("cupel.golden.update"),
                e.getMessage());
    }
}
