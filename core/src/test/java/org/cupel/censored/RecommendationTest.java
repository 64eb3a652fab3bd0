package org.cupel.censored;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The choice follows Helsel (2012), "Statistics for Censored Environmental Data Using Minitab and R",
 * 2nd ed., ch. 8 (cut-offs recalled from memory): KM below 50 % censored; ROS at 50–80 % for n < 50,
 * MLE for n ≥ 50; no mean above 80 %; MLE whenever values are above range or in intervals.
 */
class RecommendationTest {

    @Test
    void manganeseAt24PercentCensoredUsesKaplanMeier() {
        CensoredAnalysis a = CensoredAnalysis.of(Reference.manganese(), CensoredSettings.DEFAULTS);
        assertEquals(KaplanMeier.METHOD, a.recommendation().method());
        assertTrue(a.recommendation().reason().contains("Helsel 2012"));
        assertEquals(a.kaplanMeier().summary(), a.recommended());
    }

    @Test
    void heavierCensoringSmallNUsesRos() {
        assertEquals(Ros.METHOD, choose(10, 12, 50).method());
    }

    @Test
    void heavierCensoringLargeNUsesLognormalMle() {
        assertEquals(CensoredMle.method(CensoredMle.Distribution.LOGNORMAL), choose(30, 40, 50).method());
    }

    @Test
    void above80PercentNoMean() {
        assertEquals(Recommendation.NONE, choose(3, 20, 50).method());
    }

    @Test
    void overLimitsNeedMaximumLikelihood() {
        CensoredAnalysis a = CensoredAnalysis.of(Reference.mixed(), CensoredSettings.DEFAULTS);
        assertEquals(CensoredMle.method(CensoredMle.Distribution.LOGNORMAL), a.recommendation().method());
    }

    /** {@code detects} lognormal-ish detects 1..; {@code below} nondetects at {@code limit}. */
    private static Recommendation choose(int detects, int below, double limit) {
        CensoredSample.Builder b = CensoredSample.builder();
        for (int i = 0; i < detects; i++) {
            b.detected(limit * Math.exp(0.1 * i));
        }
        for (int i = 0; i < below; i++) {
            b.below(limit);
        }
        return CensoredAnalysis.of(b.build(), CensoredSettings.DEFAULTS).recommendation();
    }
}
