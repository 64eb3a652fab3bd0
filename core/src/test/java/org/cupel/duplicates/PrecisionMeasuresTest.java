package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.cupel.assay.AssayValue;
import org.cupel.assay.QcRole;
import org.junit.jupiter.api.Test;

class PrecisionMeasuresTest {
    // The ten-pair example of paired measurements on the influentialpoints.com statistics pages
    // ("Repeatability / paired measurements" worked example), which gives RMS CV 5.96 % and grand mean 30.05.
    private static final double[] A = {33, 26, 29, 32, 31, 31, 31, 31, 35, 21};
    private static final double[] B = {35, 23, 29, 35, 28, 31, 34, 29, 33, 24};

    @Test
    void tenPairExampleGivesRmsCv596Percent() {
        Estimate cv = PrecisionMeasures.rmsCv(A, B, 1000, 1L);
        // Published to two decimals of a percent: tolerance half a unit there, 0.00005 as a fraction.
        assertEquals(0.0596, cv.value(), 0.00005);
        assertEquals(10, cv.n());
        assertTrue(cv.ciLow() <= cv.value() && cv.value() <= cv.ciHigh());
    }

    @Test
    void tenPairExampleGrandMeanIs3005() {
        double sum = 0;
        for (int i = 0; i < A.length; i++) {
            sum += PairMeasures.mean(A[i], B[i]);
        }
        // Exact in decimal; 1e-12 covers binary rounding only.
        assertEquals(30.05, sum / A.length, 1e-12);
    }

    @Test
    void arithmeticMeanCvIsBelowRmsCv() {
        // Stanley and Lawie (2007): the arithmetic mean of pair CVs is biased low against the RMS CV
        // (by Jensen's inequality it can never exceed it).
        assertTrue(PrecisionMeasures.meanCv(A, B).value() < PrecisionMeasures.rmsCv(A, B, 100, 1L).value());
    }

    @Test
    void repeatabilityOfTenPairs() {
        // s_r = sqrt(sum d^2 / 2n): sum d^2 = 4+9+0+9+9+0+9+4+4+9 = 57, so s_r = sqrt(57/20); r = 2.8 s_r
        // (ISO 5725-6:1994, 4.1.4). Closed form: 1e-12.
        Estimate sr = PrecisionMeasures.repeatabilitySd(A, B);
        assertEquals(Math.sqrt(57.0 / 20.0), sr.value(), 1e-12);
    }

    @Test
    void percentWithinLimitCountsPairsAtOrBelowTheLimit() {
        // HARD = |a-b|/(a+b) by hand: (26,23) 3/49 = 0.061, (31,28) 3/59 = 0.051 and (21,24) 3/45 = 0.067
        // exceed 5 %; the other seven are at most 3/65 = 0.046. So 7 of 10 are within: 70 %.
        Estimate within = PrecisionMeasures.percentWithin(A, B, 0.05);
        assertEquals(70.0, within.value(), 1e-12);
    }

    @Test
    void summaryFailsTheRuleWhenFewerThan90PercentAreWithin() {
        List<DuplicatePair> pairs = new ArrayList<>();
        for (int i = 0; i < A.length; i++) {
            pairs.add(new DuplicatePair("D" + i, "S" + i, "B1", QcRole.PULP_DUPLICATE,
                    AssayValue.detected(A[i], 0.01), AssayValue.detected(B[i], 0.01)));
        }
        DuplicateSettings tight = DuplicateSettings.withDefaults().pulpHardLimitPercent(5).bootstrapResamples(200)
                .bootstrapSeed(7L).build();
        PrecisionSummary s = PrecisionMeasures.summarise(QcRole.PULP_DUPLICATE,
                PairScreen.screen(pairs, tight), tight);
        assertEquals(RuleOutcome.FAIL, s.rule());
        assertEquals(10, s.usedRelative());
        PrecisionSummary loose = PrecisionMeasures.summarise(QcRole.PULP_DUPLICATE,
                PairScreen.screen(pairs, DuplicateSettings.DEFAULTS), DuplicateSettings.DEFAULTS);
        assertEquals(RuleOutcome.PASS, loose.rule());
    }

    @Test
    void emptySetCarriesReasonsNotBareNaN() {
        Estimate cv = PrecisionMeasures.rmsCv(new double[0], new double[0], 100, 1L);
        assertFalse(cv.available());
        assertFalse(cv.note().isEmpty());
    }
}
