package org.cupel.censored;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.List;
import org.cupel.assay.AssayValue;
import org.junit.jupiter.api.Test;

class BlankLimitsTest {

    @Test
    void epaStudentTForSevenReplicates() {
        // 40 CFR Part 136 Appendix B, table of Student's t: t(6, 0.99) = 3.143. 5e-4: table to 3 decimals.
        assertEquals(3.143, BlankLimits.tQuantile(6, 0.99), 5e-4);
    }

    @Test
    void limitsFromSevenReplicates() {
        // Replicates 1..7: s = √(28/6) (closed form). Currie (1968): L_C = 1.645 s, L_D = 3.29 s for
        // α = β = 0.05 (z to 3 decimals, so 1e-3 s); 3·s common practice; MDL = 3.143 s (table, 5e-4 s).
        List<AssayValue> reps = List.of(AssayValue.detected(1), AssayValue.detected(2), AssayValue.detected(3),
                AssayValue.detected(4), AssayValue.detected(5), AssayValue.detected(6), AssayValue.detected(7),
                AssayValue.belowDetection(0.5));
        BlankLimits b = BlankLimits.of(reps);
        double s = Math.sqrt(28 / 6.0);
        assertEquals(7, b.n());
        assertEquals(1, b.censored());
        assertEquals(s, b.sd(), 1e-12);
        assertEquals(3 * s, b.limits().get(0).value().value(), 1e-12);
        assertEquals(1.645 * s, b.limits().get(1).value().value(), 1e-3 * s);
        assertEquals(3.29 * s, b.limits().get(2).value().value(), 1e-3 * s);
        assertEquals(3.143 * s, b.limits().get(3).value().value(), 5e-4 * s);
    }

    @Test
    void tooFewDetectedReplicatesSaySo() {
        BlankLimits b = BlankLimits.of(List.of(AssayValue.detected(1), AssayValue.belowDetection(0.5)));
        assertFalse(b.limits().get(3).value().isAvailable());
        assertFalse(b.limits().get(3).value().note().isEmpty());
    }
}
