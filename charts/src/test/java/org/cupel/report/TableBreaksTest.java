package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * Where a printed table cell may end a line. The expected pieces are hand-worked from the rules in the
 * class comment: spaces and the hyphen of a hyphenated word always; the joins of a long identifier (after a
 * slash; before a dot, underscore or hyphen; between a lower- and an upper-case letter, as The Chicago Manual
 * of Style, 15th ed., 17.11, breaks a URL) only in IDENTIFIERS mode.
 */
class TableBreaksTest {

    @Test
    void headersBreakOnlyBetweenWordsAndAfterTheHyphenOfAHyphenatedWord() {
        assertEquals(List.of("Certificate", "SD"), TableBreaks.WORDS.pieces("Certificate SD"));
        assertEquals(List.of("Coarse-", "reject", "duplicate"), TableBreaks.WORDS.pieces("Coarse-reject duplicate"));
        assertEquals(List.of("Games–Howell", "p"), TableBreaks.WORDS.pieces("Games–Howell p"));
        assertEquals(List.of("Mean", "bias", "%", "(95", "%", "CI)"), TableBreaks.WORDS.pieces("Mean bias % (95 % CI)"));
    }

    @Test
    void numbersIdsAndDatesNeverBreak() {
        // The default OpenPDF rule breaks after any '-': "(-|3.51" and "OAL-|00001" were printed so.
        assertEquals(List.of("-1.75", "(-3.51", "to", "+0.00)"), TableBreaks.WORDS.pieces("-1.75 (-3.51 to +0.00)"));
        assertEquals(List.of("OAL-00001"), TableBreaks.IDENTIFIERS.pieces("OAL-00001"));
        assertEquals(List.of("BFA-U0001"), TableBreaks.IDENTIFIERS.pieces("BFA-U0001"));
        assertEquals(List.of("2025-03-03"), TableBreaks.IDENTIFIERS.pieces("2025-03-03"));
        assertEquals(List.of("LIT60-1050-HALF"), TableBreaks.IDENTIFIERS.pieces("LIT60-1050-HALF"));
    }

    @Test
    void plusMinusStaysWithItsNumber() {
        String set = TableBreaks.typeset("0.412 ± 0.0311");
        assertEquals(List.of("0.412", "±\u00A00.0311"), TableBreaks.WORDS.pieces(set));
    }

    @Test
    void settingNamesStayWholeUnlessIdentifiersMayBreak() {
        String name = "duplicates.fieldHardLimitPercent";
        assertEquals(List.of(name), TableBreaks.WORDS.pieces(name));
        assertEquals(List.of("duplicates", ".field", "Hard", "Limit", "Percent"), TableBreaks.IDENTIFIERS.pieces(name));
        // Slash ends a piece; dot and hyphen start one (no hyphen is ever left at a line end in a path).
        assertEquals(List.of("tables/", "crm", "-drift", ".csv"), TableBreaks.IDENTIFIERS.pieces("tables/crm-drift.csv"));
        assertEquals(List.of("tables/crm-drift.csv"), TableBreaks.WORDS.pieces("tables/crm-drift.csv"));
    }

    @Test
    void shortTokensNeverBreakAsIdentifiers() {
        assertEquals(List.of("balance", "pH", "e.g.", "crm.cusumK"),
                TableBreaks.IDENTIFIERS.pieces("balance pH e.g. crm.cusumK"));
    }

    /** The pieces put back together (with the spaces that ended them) are the text: nothing lost or added. */
    @Test
    void piecesRebuildTheText() {
        Gen<String> text = Gen.strings("aZ.-/_ ±0", 0, 40);
        SeededTries.forAll(300, text, s -> {
            for (TableBreaks b : TableBreaks.values()) {
                String joined = String.join("", b.pieces(s)).replace(" ", "");
                assertEquals(s.replace(" ", ""), joined, b + " pieces of \"" + s + "\"");
            }
        });
    }

    /** IDENTIFIERS only adds break positions: its pieces are never longer than the WORDS pieces. */
    @Test
    void identifierModeOnlyAddsBreaks() {
        Gen<String> text = Gen.strings("aZ.-/_ 0", 0, 40);
        SeededTries.forAll(300, text, s -> {
            boolean[] words = TableBreaks.WORDS.breaksAfter(s);
            boolean[] ids = TableBreaks.IDENTIFIERS.breaksAfter(s);
            for (int i = 0; i < s.length(); i++) {
                assertFalse(words[i] && !ids[i], "position " + i + " of \"" + s + "\"");
            }
        });
    }

    /** OpenPDF asks about a cell through a suffix of its text (PdfChunk.split) or the whole (BidiLine). */
    @Test
    void theSplitterAnswersForTheWholeTextAndForWhatIsLeftOfIt() {
        String text = "-1.75 (-3.51 to +0.00)";
        var splitter = TableBreaks.WORDS.splitter(text);
        char[] whole = text.toCharArray();
        assertFalse(splitter.isSplitCharacter(0, 7, whole.length, whole, null), "not after the minus of (-3.51");
        assertTrue(splitter.isSplitCharacter(0, 5, whole.length, whole, null), "at the space");
        char[] rest = text.substring(6).toCharArray();
        assertFalse(splitter.isSplitCharacter(0, 1, rest.length, rest, null), "not after the minus, in the suffix");
        char[] space = {' '};
        assertTrue(splitter.isSplitCharacter(0, 0, 1, space, null), "OpenPDF's probe for a space");
    }
}
