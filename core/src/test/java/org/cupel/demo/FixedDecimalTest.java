package org.cupel.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
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

    record Formatted(double v, int decimals) {
    }

    /** Reading the text back gives the value to within half a unit of the last decimal (plus rounding of doubles). */
    @Test
    void textReadsBackWithinHalfALastDecimal() {
        // Zeros of both signs, exact halves (ties in rounding) and the ends of the range, at 0 and 4 decimals.
        List<Gen<Formatted>> edges = new ArrayList<>();
        for (double v : new double[] {0.0, -0.0, 0.5, -0.5, 0.00005, -1e6, 1e6}) {
            edges.add(Gen.constant(new Formatted(v, 0)));
            edges.add(Gen.constant(new Formatted(v, 4)));
        }
        Gen<Double> values = Gen.doubles(-1e6, 1e6);
        Gen<Integer> places = Gen.ints(0, 4);
        SeededTries.forAll(1000, edges, r -> new Formatted(values.next(r), places.next(r)), in -> {
            double v = in.v();
            int decimals = in.decimals();
            String text = FixedDecimal.format(v, decimals);
            double back = Double.parseDouble(text);
            assertTrue(Math.abs(back - v) <= 0.5 * Math.pow(10, -decimals) * (1 + 1e-9) + 1e-9, text + " for " + v);
            int dot = text.indexOf('.');
            assertEquals(decimals, dot < 0 ? 0 : text.length() - dot - 1, text);
        });
    }
}
