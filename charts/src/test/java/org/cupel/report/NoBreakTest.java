package org.cupel.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** A range of two numbers, and "±" with its number, stay on one line in a wrapping cell; other text is left. */
class NoBreakTest {
    private static final String NBSP = "\u00A0";

    @Test
    void theToOfANumericRangeIsBound() {
        assertEquals("-0.09 (-1.48" + NBSP + "to" + NBSP + "+1.29)", NoBreak.ranges("-0.09 (-1.48 to +1.29)"));
        assertEquals("90.76" + NBSP + "to" + NBSP + "93.71 †", NoBreak.ranges("90.76 to 93.71 †"));
        assertEquals("43.48%" + NBSP + "to" + NBSP + "48.13%", NoBreak.ranges("43.48% to 48.13%"));
    }

    @Test
    void wordsAndIdsAreLeftAlone() {
        for (String cell : new String[] {"from batch to batch", "LIT60 to LIT90", "OAL-00003 to OAL-00005",
            "cannot tell with this many replicates"}) {
            assertEquals(cell, NoBreak.ranges(cell));
        }
    }

    @Test
    void plusMinusKeepsItsNumber() {
        assertEquals("0.412 ±" + NBSP + "0.0311", NoBreak.plusMinus("0.412 ± 0.0311"));
        assertEquals("within ±2 SD", NoBreak.plusMinus("within ±2 SD"));
    }
}
