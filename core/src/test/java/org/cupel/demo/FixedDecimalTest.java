package org.cupel.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;
import org.junit.jupiter.api.Test;

class FixedDecimalTest {

    @Test
    void writesFixedDecimalsWithADot() {
        assertEquals("0.005", FixedDecimal.format(0.005, 3));
        assertEquals("12.30", FixedDecimal.format(12.3, 2));
        assertEquals("7", FixedDecimal.format(7.4, 0));
        assertEquals("-0.5", FixedDecimal.format(-0.5, 1));
        assertEquals("0.000", FixedDecimal.format(-0.0001, 3));
        assertEquals("10", FixedDecimal.plain(10.0));
        assertEquals("0.005", FixedDecimal.plain(0.005));
    }

    /** Reading the text back gives the value to within half a unit of the last decimal (plus rounding of doubles). */
    @Property(tries = 1000)
    void textReadsBackWithinHalfALastDecimal(@ForAll @DoubleRange(min = -1e6, max = 1e6) double v,
                                             @ForAll @IntRange(min = 0, max = 4) int decimals) {
        String text = FixedDecimal.format(v, decimals);
        double back = Double.parseDouble(text);
        assertTrue(Math.abs(back - v) <= 0.5 * Math.pow(10, -decimals) * (1 + 1e-9) + 1e-9, text + " for " + v);
        int dot = text.indexOf('.');
        assertEquals(decimals, dot < 0 ? 0 : text.length() - dot - 1, text);
    }
}
