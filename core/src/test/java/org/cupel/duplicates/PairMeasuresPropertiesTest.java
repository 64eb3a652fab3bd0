package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

class PairMeasuresPropertiesTest {
    // Relative tolerance 1e-12: the identities are exact, only floating-point rounding differs.
    private static void close(double expected, double actual) {
        assertEquals(expected, actual, 1e-12 * Math.max(1.0, Math.abs(expected)));
    }

    @Property
    void measuresAreSymmetric(@ForAll @DoubleRange(min = 1e-4, max = 1e4) @Scale(8) double a,
                              @ForAll @DoubleRange(min = 1e-4, max = 1e4) @Scale(8) double b) {
        close(PairMeasures.hard(a, b), PairMeasures.hard(b, a));
        close(PairMeasures.rpd(a, b), PairMeasures.rpd(b, a));
        close(PairMeasures.cv(a, b), PairMeasures.cv(b, a));
    }

    @Property
    void relativeMeasuresAreScaleInvariant(@ForAll @DoubleRange(min = 1e-4, max = 1e4) @Scale(8) double a,
                                           @ForAll @DoubleRange(min = 1e-4, max = 1e4) @Scale(8) double b,
                                           @ForAll @DoubleRange(min = 1e-3, max = 1e3) @Scale(8) double scale) {
        close(PairMeasures.hard(a, b), PairMeasures.hard(a * scale, b * scale));
        close(PairMeasures.rpd(a, b), PairMeasures.rpd(a * scale, b * scale));
        close(PairMeasures.cv(a, b), PairMeasures.cv(a * scale, b * scale));
    }

    @Property
    void rpdIsTwiceHardAndCvIsRootTwoHard(@ForAll @DoubleRange(min = 1e-4, max = 1e4) @Scale(8) double a,
                                          @ForAll @DoubleRange(min = 1e-4, max = 1e4) @Scale(8) double b) {
        close(2 * PairMeasures.hard(a, b), PairMeasures.rpd(a, b));
        close(Math.sqrt(2) * PairMeasures.hard(a, b), PairMeasures.cv(a, b));
    }
}
