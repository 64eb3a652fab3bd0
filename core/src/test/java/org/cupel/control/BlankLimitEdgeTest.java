package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.cupel.assay.AssayValue;
import org.junit.jupiter.api.Test;

/**
 * Blanks exactly on k × DL in their reported decimals (common practice: "fail above 5× DL", so a blank on the
 * level is not above it), compared by the shared {@link org.cupel.assay.LimitComparison}. Doubles checked in
 * Python 3: 5 × 0.005 = 0.025 exactly, 3 × 0.3 = 0.8999999999999999, 3 × 0.1 = 0.30000000000000004.
 */
class BlankLimitEdgeTest {

    private static Verdict judge(BlankSettings s, double dl, double value) {
        BlankThreshold t = s.thresholdFor("Au", dl).orElseThrow();
        return BlankVerdict.judge(AssayValue.detected(value, dl), t, "g/t").verdict();
    }

    @Test
    void exactlyFiveTimesTheDetectionLimitWarnsAndAHairAboveFails() {
        // DL 0.005: fail level 5 × 0.005 = 0.025, warn level 3 × 0.005 = 0.015. 0.025 is on the fail level
        // (above warn: WARN); 0.0251 is 0.4 % above it: FAIL.
        assertEquals(Verdict.WARN, judge(BlankSettings.DEFAULTS, 0.005, 0.025));
        assertEquals(Verdict.FAIL, judge(BlankSettings.DEFAULTS, 0.005, 0.0251));
    }

    @Test
    void aBlankOnALevelWhoseDoubleFallsShortIsNotAboveIt() {
        // DL 0.3, fail at 3 × DL: the level is 0.8999999999999999 as a double, the blank 0.9 is exactly on it.
        BlankSettings threeTimes = BlankSettings.withDefaults().failMultiple(3).warnMultiple(3).build();
        assertEquals(Verdict.PASS, judge(threeTimes, 0.3, 0.9));
        assertEquals(Verdict.FAIL, judge(threeTimes, 0.3, 0.901));
        // Warn level 3 × 0.1 = 0.30000000000000004: a blank of 0.3 is on it, 0.31 above it.
        assertEquals(Verdict.PASS, judge(BlankSettings.DEFAULTS, 0.1, 0.3));
        assertEquals(Verdict.WARN, judge(BlankSettings.DEFAULTS, 0.1, 0.31));
    }
}
