package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import org.junit.jupiter.api.Test;

class BatchDispersionTest {
    @Test
    void upperTailMatchesScipyChiSquare() {
        // Batch RMS CV twice the set's over 5 pairs: T = 5·4 = 20 on 5 df; p = scipy.stats.chi2.sf(20, 5)
        // (testdata/reference/duplicates/bias_reference.py). 1e-9 relative: both evaluate the regularized
        // gamma function, to different series truncations.
        BatchDispersion d = BatchDispersion.test(Estimate.of(0.2, 0.1, 0.3, 5, ""), Estimate.of(0.1, 0.09, 0.11, 100, ""));
        assertEquals(20.0, d.statistic(), 1e-12);
        assertEquals(5, d.df());
        double p = ReferenceData.json("bias_reference.json").get("chiSquareUpperTail").get("x20_df5").asDouble();
        assertEquals(p, d.pValue(), 1e-9 * p);
    }

    @Test
    void noSetCvMeansNoTest() {
        BatchDispersion d = BatchDispersion.test(Estimate.of(0.2, 0.1, 0.3, 5, ""), Estimate.unavailable(1, "few"));
        assertFalse(d.available());
    }
}
