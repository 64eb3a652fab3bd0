package org.cupel.censored;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.junit.jupiter.api.Test;

class KaplanMeierTest {
    private static final CensoredSample MN = Reference.manganese();
    private static final Map<String, Double> R = Reference.survival();

    @Test
    void unifiedGuidanceExample15_1() {
        // USEPA (2009) Unified Guidance, Example 15-1: KM mean 19.867, SD 25.318, with the mass below the
        // lowest detect at the lowest detection limit. 5e-4: published to three decimals.
        CensoredSummary s = KaplanMeier.fit(MN, KaplanMeier.Options.DEFAULTS).summary();
        assertEquals(19.867, s.mean().value(), 5e-4);
        assertEquals(25.318, s.sd().value(), 5e-4);
        assertEquals(25, s.n());
        assertEquals(6, s.nCensored());
    }

    @Test
    void meanAndStandardErrorMatchRSurvfitOnFlippedData() {
        // R survival::survfit on 200 − x, restricted mean to the last time (censored_reference.R).
        // 1e-9: the same closed-form sums; R's value is printed to 12 significant digits.
        CensoredSummary s = KaplanMeier.fit(MN, KaplanMeier.Options.DEFAULTS).summary();
        assertEquals(R.get("km_mean"), s.mean().value(), 1e-9);
        assertEquals(R.get("km_mean_se"), s.mean().standardError(), 1e-9);
    }

    @Test
    void distributionFunctionMatchesRSurvfit() {
        // R survfit on flipped data: F(x_j) = S(t_j−). 1e-12: products of the same fractions.
        KaplanMeier.Result r = KaplanMeier.fit(MN, KaplanMeier.Options.DEFAULTS);
        for (KaplanMeier.Step step : r.steps()) {
            String key = "km_cdf_at_" + org.cupel.assay.Numbers.compact(step.value());
            assertTrue(R.containsKey(key), key);
            assertEquals(R.get(key), step.cdf(), 1e-12, key);
        }
        assertEquals(0.21, r.remainingMass(), 1e-12);
    }

    @Test
    void percentilesMatchRSurvfitQuantiles() {
        // R quantile(survfit) on flipped data, 25th/50th/75th percentiles; exact detects, so 1e-12.
        CensoredSummary s = KaplanMeier.fit(MN, KaplanMeier.Options.DEFAULTS).summary();
        assertEquals(R.get("km_p50"), s.median().value(), 1e-12);
        assertEquals(R.get("km_p25"), s.percentiles().get(1).estimate().value(), 1e-12);
        assertEquals(R.get("km_p75"), s.percentiles().get(2).estimate().value(), 1e-12);
        // The 10th percentile lies in the 21 % below the lowest detect: not estimated, and says so.
        Estimate p10 = s.percentiles().get(0).estimate();
        assertFalse(p10.isAvailable());
        assertTrue(p10.note().contains("below the lowest detect"));
    }

    @Test
    void massAtLowestDetectOptionMovesOnlyTheCensoredMass() {
        // Derived here: moving mass 0.21 from 2 to 3.3 raises the mean by 0.21 × 1.3 = 0.273.
        KaplanMeier.Options opt = new KaplanMeier.Options(KaplanMeier.LowestMass.AT_LOWEST_DETECT,
                KaplanMeier.SdDivisor.DISTRIBUTION);
        double atLimit = KaplanMeier.fit(MN, KaplanMeier.Options.DEFAULTS).summary().mean().value();
        double atDetect = KaplanMeier.fit(MN, opt).summary().mean().value();
        assertEquals(0.21 * 1.3, atDetect - atLimit, 1e-12);
    }

    @Test
    void allCensoredAndOverLimitsAreNotApplicableWithReasons() {
        CensoredSample all = CensoredSample.builder().below(1).below(2).build();
        CensoredSummary s = KaplanMeier.fit(all, KaplanMeier.Options.DEFAULTS).summary();
        assertFalse(s.isApplicable());
        assertTrue(s.mean().note().contains("every value is below detection"));
        CensoredSample over = CensoredSample.builder().detected(1).detected(2).above(10).build();
        assertTrue(KaplanMeier.fit(over, KaplanMeier.Options.DEFAULTS).summary().notes().get(0)
                .contains("maximum likelihood"));
    }
}
