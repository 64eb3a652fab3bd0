package org.cupel.control;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Map;
import org.cupel.assay.AssayValue;
import org.junit.jupiter.api.Test;

/**
 * The blank threshold rules at their edges. Source: common practice in assay QC (blank fails above 5×
 * the detection limit, warns above 3×; a censored blank passes at its limit; a blank whose detection
 * limit is above the failure threshold cannot show a pass).
 */
class BlankVerdictTest {
    private static final double DL = 0.01;
    private final BlankThreshold multiples = BlankSettings.DEFAULTS.thresholdFor("Au", DL).orElseThrow();

    private Verdict judge(AssayValue v) {
        return BlankVerdict.judge(v, multiples, "g/t").verdict();
    }

    @Test
    void exactlyFiveTimesTheLimitIsNotAFailure() {
        // Common practice: "fail above 5× DL" — a result at the level is not above it.
        assertEquals(Verdict.WARN, judge(AssayValue.detected(0.05, DL)));
        assertEquals(Verdict.FAIL, judge(AssayValue.detected(0.051, DL)));
    }

    @Test
    void exactlyThreeTimesTheLimitIsAPass() {
        assertEquals(Verdict.PASS, judge(AssayValue.detected(0.03, DL)));
        assertEquals(Verdict.WARN, judge(AssayValue.detected(0.031, DL)));
    }

    @Test
    void atTheDetectionLimitPasses() {
        assertEquals(Verdict.PASS, judge(AssayValue.detected(0.01, DL)));
    }

    @Test
    void censoredBlankPassesAtItsLimit() {
        assertEquals(Verdict.PASS, judge(AssayValue.belowDetection(DL)));
    }

    @Test
    void censoredBlankWithLimitAboveTheThresholdCannotBeJudged() {
        BlankSettings s = BlankSettings.withDefaults()
                .absolute(Map.of("Au", new BlankSettings.AbsoluteLimits(0.02, 0.015))).build();
        BlankThreshold t = s.thresholdFor("Au", 0.05).orElseThrow();
        assertEquals(Verdict.CANNOT_JUDGE, BlankVerdict.judge(AssayValue.belowDetection(0.05), t, "g/t").verdict());
        // A limit exactly at the absolute failure level still shows the blank is not above it.
        assertEquals(Verdict.PASS, BlankVerdict.judge(AssayValue.belowDetection(0.02), t, "g/t").verdict());
    }

    @Test
    void absoluteThresholdReplacesTheMultiples() {
        BlankSettings s = BlankSettings.withDefaults()
                .absolute(Map.of("Au", new BlankSettings.AbsoluteLimits(0.02, null))).build();
        BlankThreshold t = s.thresholdFor("Au", DL).orElseThrow();
        assertEquals(0.02, t.fail(), 0);
        assertEquals(Verdict.PASS, BlankVerdict.judge(AssayValue.detected(0.02, DL), t, "g/t").verdict());
        assertEquals(Verdict.FAIL, BlankVerdict.judge(AssayValue.detected(0.021, DL), t, "g/t").verdict());
    }

    @Test
    void unknownDetectionLimitWithoutAbsoluteCannotBeJudged() {
        assertEquals(true, BlankSettings.DEFAULTS.thresholdFor("Au", Double.NaN).isEmpty());
        assertEquals(Verdict.CANNOT_JUDGE, BlankVerdict.judge(AssayValue.detected(0.2), null, "g/t").verdict());
    }

    @Test
    void aboveUpperLimitBlankFails() {
        assertEquals(Verdict.FAIL, judge(AssayValue.aboveUpperLimit(10)));
    }

    @Test
    void tenTimesRuleIsASetting() {
        // Some practitioners fail blanks above 10× DL (common practice); the multiple is configurable.
        BlankThreshold ten = BlankSettings.withDefaults().failMultiple(10).build().thresholdFor("Au", DL)
                .orElseThrow();
        assertEquals(Verdict.WARN, BlankVerdict.judge(AssayValue.detected(0.08, DL), ten, "g/t").verdict());
        assertEquals(Verdict.FAIL, BlankVerdict.judge(AssayValue.detected(0.11, DL), ten, "g/t").verdict());
    }
}
