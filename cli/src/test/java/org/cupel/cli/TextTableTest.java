package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * The terminal table fitted to a width: unchanged when it fits, cells wrapped within their columns when it
 * does not, one row at a time when even the longest words do not fit side by side; never a word broken.
 * Expected layouts are worked by hand from the rules in the class comment.
 */
class TextTableTest {

    private static String print(TextTable t, int width) {
        StringWriter s = new StringWriter();
        PrintWriter out = width == 0 ? new PrintWriter(s) : new TerminalWriter(s, width);
        t.print(out);
        out.flush();
        return s.toString();
    }

    private static List<String> lines(String text) {
        return List.of(text.split("\n"));
    }

    @Test
    void aTableThatFitsPrintsOneLinePerRow() {
        TextTable t = new TextTable("CRM", "n", "95% CI").row("VHC-11", 32, "-1.48 to +1.29").row("VHC-23", 31,
                "+5.02 to +9.25");
        // Headers are set flush left, numbers flush right.
        String expected = String.join("\n",
                "CRM     n   95% CI",
                "------  --  --------------",
                "VHC-11  32  -1.48 to +1.29",
                "VHC-23  31  +5.02 to +9.25", "");
        assertEquals(expected, print(t, 120));
        assertEquals(expected, print(t, 0), "the same without a width");
    }

    @Test
    void longCellsWrapWithinTheirColumnAndShortOnesStayWhole() {
        TextTable t = new TextTable("Estimate", "Value", "Rule")
                .row("3·s", "10.73", "3 × SD of the replicates, a net level above their mean")
                .row("Currie L_C (z)", "5.882", "critical level 1.645·s, σ₀ = s taken as known (α = 0.05)");
        // Natural width 14 + 2 + 5 + 2 + 56 = 79 > 50. The short columns (14 and 5) get their whole width, the
        // Rule column the rest: 50 − 14 − 5 − 4 = 27; "critical level 1.645·s, σ₀ =" would be 28.
        String expected = String.join("\n",
                "Estimate        Value  Rule",
                "--------------  -----  ---------------------------",
                "3·s             10.73  3 × SD of the replicates, a",
                "                       net level above their mean",
                "Currie L_C (z)  5.882  critical level 1.645·s, σ₀",
                "                       = s taken as known (α =",
                "                       0.05)", "");
        assertEquals(expected, print(t, 50));
        assertTrue(lines(print(t, 0)).stream().anyMatch(l -> l.length() > 50), "--wide keeps each row on one line");
    }

    @Test
    void aRangeAndPlusMinusStayWholeWhenACellWraps() {
        TextTable t = new TextTable("Series", "Mean bias % (95 % CI)", "Project mean ± 2 SD")
                .row("VHC-11 Au", "-0.09 (-1.48 to +1.29)", "0.412 ± 0.0311");
        String out = print(t, 36);
        assertTrue(out.contains("(-1.48 to +1.29)"), out);
        assertTrue(out.contains("± 0.0311"), out);
        assertTrue(lines(out).stream().allMatch(l -> l.length() <= 36), out);
    }

    @Test
    void aTableWhoseWordsCannotFitSideBySidePrintsOneRowAtATime() {
        TextTable t = new TextTable("Analyte", "Pair", "Verdict")
                .row("Au", "LIT60-1050 − LIT90-1050", "different")
                .row("Ag", "LIT60-1050 − LIT60-1050-HALF", "cannot tell with this many replicates");
        // Longest words 7 + 15 + 10 and two one-space gaps make 34 > 30: stacked, labels 7 wide, values
        // 30 − 7 − 2 = 21 (the first pair, 23 characters, wraps).
        String expected = String.join("\n",
                "Analyte  Au",
                "Pair     LIT60-1050 −",
                "         LIT90-1050",
                "Verdict  different",
                "",
                "Analyte  Ag",
                "Pair     LIT60-1050 −",
                "         LIT60-1050-HALF",
                "Verdict  cannot tell with this",
                "         many replicates", "");
        assertEquals(expected, print(t, 30));
    }

    /**
     * Cells of single words under long headers: only the headers can wrap. The cells need no room beyond
     * their words (this divided by zero once); the room goes to the headers, the one lacking less first.
     */
    @Test
    void onlyTheHeadersWrapWhenTheCellsAreSingleWords() {
        TextTable t = new TextTable("Alpha beta gamma delta", "Epsilon zeta eta theta").row("1", "2");
        // Longest words 5 and 7 leave 30 − 14 = 16: the second header (lacking 15) gets 22, the first 5 + 1.
        String expected = String.join("\n",
                "Alpha   Epsilon zeta eta theta",
                "beta",
                "gamma",
                "delta",
                "------  ----------------------",
                "     1                       2", "");
        assertEquals(expected, print(t, 30));
    }

    /** Whatever the cells and the width, every line fits and every word is printed whole, in order. */
    @Test
    void everyLineFitsAndNoWordIsBroken() {
        Gen<String> word = Gen.strings("abcXYZ019.-", 1, 12);
        Gen<String> cell = r -> {
            int n = r.nextInt(6);
            List<String> words = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                words.add(word.next(r));
            }
            return String.join(" ", words);
        };
        record Case(int width, int columns, List<List<String>> rows) {
        }
        Gen<Case> cases = r -> {
            int columns = 1 + r.nextInt(8);
            List<List<String>> rows = new ArrayList<>();
            for (int i = 0; i < 1 + r.nextInt(5); i++) {
                List<String> row = new ArrayList<>();
                for (int c = 0; c < columns; c++) {
                    row.add(cell.next(r));
                }
                rows.add(row);
            }
            return new Case(30 + r.nextInt(100), columns, rows);
        };
        SeededTries.forAll(300, cases, k -> {
            String[] headers = new String[k.columns()];
            for (int c = 0; c < headers.length; c++) {
                headers[c] = "Column " + c;
            }
            TextTable t = new TextTable(headers);
            k.rows().forEach(r -> t.row(r.toArray()));
            String out = print(t, k.width());
            for (String line : lines(out)) {
                assertTrue(line.codePointCount(0, line.length()) <= k.width(), "line fits " + k.width() + ": "
                        + line + "\n" + out);
            }
            List<String> printed = List.of(out.split("\\s+"));
            for (List<String> row : k.rows()) {
                for (String c : row) {
                    for (String w : c.split(" ")) {
                        if (!w.isEmpty()) {
                            assertTrue(printed.contains(w), "word \"" + w + "\" printed whole:\n" + out);
                        }
                    }
                }
            }
        });
    }
}
