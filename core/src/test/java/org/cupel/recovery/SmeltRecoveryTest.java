package org.cupel.recovery;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cupel.assay.AssayValue;
import org.junit.jupiter.api.Test;

class SmeltRecoveryTest {

    private static HeadGrade head(double gpt) {
        return HeadGrade.of("F1", "Au", List.of(AssayValue.detected(gpt)), RecoverySettings.DEFAULTS);
    }

    /**
     * Worked by hand (common practice, no source): a 100 g charge of a head grading 863 g/t Au holds
     * 100 × 863 × 10⁻⁶ = 0.0863 g Au; 260 g of slag at 1.31 g/t holds 0.0003406 g; recovery by loss to slag
     * = 1 − 0.0003406/0.0863 = 99.61%. Tolerances 1e-12 g: exact products of decimals; 0.005 %: the hand
     * figure is rounded to two decimals.
     */
    @Test
    void handWorkedFireAssayBalance() {
        assertEquals(0.0863, MetalContent.grams(100, 863), 1e-12);
        assertEquals(0.0003406, MetalContent.grams(260, 1.31), 1e-12);
        Smelt s = Fixtures.smelt("T1", "A", 100, Fixtures.button(40, 2148),
                Fixtures.slag(260, AssayValue.detected(1.31)));
        SmeltRecovery r = SmeltRecovery.compute(s, "Au", head(863), CensoredAs.LIMIT, 0.05);
        assertEquals(0.0863, r.metalInCharge(), 1e-12);
        assertEquals(0.0003406, r.lossMetal(), 1e-12);
        assertEquals(99.61, r.byLoss(), 0.005);
        assertEquals(100 * (1 - 0.0003406 / 0.0863), r.byLoss(), 1e-9);
    }

    /**
     * Direct and calculated-head recovery and accountability by hand (common practice): button 40 g at
     * 2148 g/t holds 0.08592 g; products 0.0862606 g; calculated head 862.606 g/t; accountability 0.999543.
     */
    @Test
    void directCalculatedAndAccountability() {
        Smelt s = Fixtures.smelt("T1", "A", 100, Fixtures.button(40, 2148),
                Fixtures.slag(260, AssayValue.detected(1.31)));
        SmeltRecovery r = SmeltRecovery.compute(s, "Au", head(863), CensoredAs.LIMIT, 0.05);
        assertEquals(100 * 0.08592 / 0.0863, r.direct(), 1e-9);
        assertEquals(100 * 0.08592 / 0.0862606, r.calculated(), 1e-9);
        assertEquals(862.606, r.calculatedHeadGpt(), 1e-9);
        assertEquals(862.606 / 863, r.accountability(), 1e-12);
        assertTrue(r.balanceCloses());
        SmeltRecovery tight = SmeltRecovery.compute(s, "Au", head(900), CensoredAs.LIMIT, 0.02);
        assertFalse(tight.balanceCloses(), "accountability 0.958 is outside ±2%");
    }

    /**
     * Slag below detection (derived here): R ∈ [1 − m_slag·DL/M, 1]; 260 g at &lt;0.5 g/t against 0.0863 g
     * gives [1 − 0.00013/0.0863, 1] = [99.8494%, 100%].
     */
    @Test
    void censoredSlagBoundsTheRecovery() {
        Smelt s = Fixtures.smelt("T1", "A", 100, Fixtures.button(40, 2150), Fixtures.slag(260,
                AssayValue.belowDetection(0.5)));
        SmeltRecovery atLimit = SmeltRecovery.compute(s, "Au", head(863), CensoredAs.LIMIT, 0.05);
        SmeltRecovery atZero = SmeltRecovery.compute(s, "Au", head(863), CensoredAs.ZERO, 0.05);
        assertEquals(100 * (1 - 0.00013 / 0.0863), atLimit.lowerBound(), 1e-9);
        assertEquals(100, atLimit.upperBound(), 1e-12);
        assertEquals(atLimit.lowerBound(), atLimit.byLoss(), 1e-12);
        assertEquals(100, atZero.byLoss(), 1e-12);
        assertTrue(atLimit.lossCensored());
    }

    @Test
    void missingProductAssayIsExplained() {
        Smelt s = Fixtures.smelt("T9", "A", 100, Fixtures.button(40, 2150),
                Fixtures.slag(260, AssayValue.missing(org.cupel.assay.MissingReason.NOT_RECEIVED)));
        SmeltRecovery r = SmeltRecovery.compute(s, "Au", head(863), CensoredAs.LIMIT, 0.05);
        assertFalse(r.usable());
        assertTrue(r.note().contains("slag"), r.note());
        assertTrue(Double.isNaN(r.byLoss()));
    }
}
