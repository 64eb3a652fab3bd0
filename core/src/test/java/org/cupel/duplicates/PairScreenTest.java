package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.cupel.assay.AssayValue;
import org.cupel.assay.MissingReason;
import org.cupel.assay.QcRole;
import org.junit.jupiter.api.Test;

class PairScreenTest {
    private static DuplicatePair pair(AssayValue a, AssayValue b) {
        return new DuplicatePair("D", "S", "B", QcRole.PULP_DUPLICATE, a, b);
    }

    // The rules are common practice (no single source): censored members out of ratio measures, and pairs
    // with mean below 10x the detection limit out of relative measures.
    private static final List<DuplicatePair> PAIRS = List.of(
            pair(AssayValue.detected(1.0, 0.01), AssayValue.detected(1.1, 0.01)),
            pair(AssayValue.detected(0.05, 0.01), AssayValue.detected(0.06, 0.01)),
            pair(AssayValue.belowDetection(0.01), AssayValue.detected(0.02, 0.01)),
            pair(AssayValue.missing(MissingReason.NOT_RECEIVED), AssayValue.detected(2.0, 0.01)),
            pair(AssayValue.aboveUpperLimit(100), AssayValue.detected(120, 0.01)),
            pair(AssayValue.detected(3.0), AssayValue.detected(3.3)));

    @Test
    void countsEveryExclusionByReason() {
        ScreenedPairs s = PairScreen.screen(PAIRS, DuplicateSettings.DEFAULTS);
        assertEquals(3, s.absolute().size());
        assertEquals(2, s.relative().size());
        assertEquals(1, s.excludedRelative().get(ExclusionReason.BELOW_LIMIT_MULTIPLE));
        assertEquals(1, s.excludedRelative().get(ExclusionReason.BELOW_DETECTION));
        assertEquals(1, s.excludedRelative().get(ExclusionReason.MISSING_VALUE));
        assertEquals(1, s.excludedRelative().get(ExclusionReason.ABOVE_UPPER_LIMIT));
        assertEquals(1, s.limitUnknown());
        assertEquals(4, s.excludedRelativeCount());
        assertEquals(3, s.excludedAbsoluteCount());
    }

    @Test
    void theMultipleIsASetting() {
        ScreenedPairs s = PairScreen.screen(PAIRS, DuplicateSettings.withDefaults().limitMultipleOfDetection(5).build());
        // mean 0.055 is above 5 x 0.01, so that pair comes back.
        assertEquals(3, s.relative().size());
        assertEquals(null, s.excludedRelative().get(ExclusionReason.BELOW_LIMIT_MULTIPLE));
    }

    @Test
    void aPairBelowTheMultipleKeepsItsValuesInAbsoluteMeasures() {
        // Pairs 0, 1 and 5 (1.0/1.1, 0.05/0.06, 3.0/3.3) have two detected positive values; pair 1's mean 0.055 is
        // below 10 × 0.01, so it is out of the relative measures only, and enters the absolute ones as 0.05/0.06.
        ScreenedPairs s = PairScreen.screen(PAIRS, DuplicateSettings.DEFAULTS);
        assertArrayEquals(new int[] {0, 1, 5}, s.absolute().rows());
        assertArrayEquals(new double[] {1.0, 0.05, 3.0}, s.absolute().a());
        assertArrayEquals(new double[] {1.1, 0.06, 3.3}, s.absolute().b());
        assertArrayEquals(new int[] {0, 5}, s.relative().rows());
        assertArrayEquals(new double[] {1.0, 3.0}, s.relative().a());
    }
}
