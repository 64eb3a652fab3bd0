package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.AssayValue;
import org.cupel.assay.QcRole;
import org.junit.jupiter.api.Test;

/**
 * Pairs whose HARD is exactly the type's limit in their reported decimals are within it ("≤ 10 %"), whatever
 * the last bit of the double, and a Thompson–Howarth control line is compared the same way. Doubles checked
 * in Python 3: |1.1 − 0.9| / 2.0 = 0.10000000000000003, |2.2 − 1.8| / 4.0 = 0.10000000000000003,
 * |11 − 9| / 20 = 0.1, |1.3 − 0.7| / 2.0 = 0.30000000000000004, 3 × 0.7 = 2.0999999999999996.
 */
class HardLimitEdgeTest {

    @Test
    void pairsAtExactlyTenPercentAreWithinThePulpLimit() {
        double[] a = {1.1, 2.2, 11, 1.1001};
        double[] b = {0.9, 1.8, 9, 0.9};
        // Three of four on the limit (within), the fourth 0.2001 / 2.0001 = 10.004 % (outside): 75 %.
        assertEquals(75.0, PrecisionMeasures.percentWithin(a, b, 0.10).value(), 1e-12);
        // Field limit 30 %: 1.3 / 0.7 is exactly 30 %.
        assertEquals(100.0, PrecisionMeasures.percentWithin(new double[] {1.3}, new double[] {0.7}, 0.30).value(), 0);
    }

    @Test
    void onlyThePairBeyondTheLimitIsFlagged() {
        List<DuplicatePair> pairs = new ArrayList<>();
        double[][] values = {{1.1, 0.9}, {2.2, 1.8}, {11, 9}, {1.1001, 0.9}};
        for (int i = 0; i < values.length; i++) {
            pairs.add(new DuplicatePair("D" + i, "O" + i, "B1", QcRole.PULP_DUPLICATE,
                    AssayValue.detected(values[i][0], 0.005), AssayValue.detected(values[i][1], 0.005)));
        }
        DuplicateReport r = DuplicateAnalysis.run("Au", "g/t", pairs, List.of(), new double[0],
                DuplicateSettings.DEFAULTS);
        List<OutlierPair> flagged = r.sets().get(0).outliers();
        assertEquals(List.of("D3"), flagged.stream().map(OutlierPair::id).toList());
        assertEquals(List.of(OutlierPair.Test.OUTSIDE_HARD_LIMIT), flagged.get(0).tests());
    }

    @Test
    void aDifferenceOnTheControlLineIsNotAboveIt() {
        // σ_c = 0.7 at every grade (σ₀ = 0.7, k = 0): the line 3·σ_c is 2.0999999999999996 as a double; |d| = 2.1
        // (pair 3.1 / 1.0 in decimals, |d| computed here as 2.1) is on it. 2.101 is above it.
        PrecisionModel flat = new PrecisionModel(0.7, 0);
        assertFalse(ThompsonHowarth.aboveLine(2.05, 2.1, 3, flat));
        assertTrue(ThompsonHowarth.aboveLine(2.05, 2.101, 3, flat));
        // A line clipped at zero (negative σ_c) is exceeded by any positive difference, not by zero.
        PrecisionModel negative = new PrecisionModel(-0.1, 0);
        assertTrue(ThompsonHowarth.aboveLine(1, 1e-6, 3, negative));
        assertFalse(ThompsonHowarth.aboveLine(1, 0, 3, negative));
    }
}
