package org.cupel.assay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class AssayValueTest {

    @Test
    void censoredValueCarriesItsLimitAsValue() {
        AssayValue v = AssayValue.belowDetection(0.005);
        assertEquals(Qualifier.BELOW_DETECTION, v.qualifier());
        assertEquals(0.005, v.value());
        assertEquals(0.005, v.limit());
        assertTrue(v.isCensored());
        assertEquals("<0.005", v.display());
        assertEquals(">10", AssayValue.aboveUpperLimit(10).display());
    }

    @Test
    void missingValueIsNaNWhateverIsPassed() {
        AssayValue v = new AssayValue(Qualifier.MISSING, 3.0, Double.NaN, MissingReason.INSUFFICIENT_SAMPLE);
        assertTrue(Double.isNaN(v.value()));
        assertEquals("insufficient sample", v.display());
    }

    @Test
    void nonFiniteMeasuredValueIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> AssayValue.detected(Double.POSITIVE_INFINITY));
    }

    @Test
    void scalingChangesValueAndLimitTogether() {
        AssayValue v = AssayValue.detected(1.5, 0.005).scaled(1000);
        assertEquals(1500, v.value(), 1e-12);
        assertEquals(5, v.limit(), 1e-12);
    }
}
