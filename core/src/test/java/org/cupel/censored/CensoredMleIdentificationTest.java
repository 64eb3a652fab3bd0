package org.cupel.censored;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * Maximum likelihood on data with at most one distinct detected value, fitted whenever the likelihood has a
 * finite maximum (the condition in {@link CensoredMle}), against R 4.2 survival 3.5-3
 * {@code survreg(Surv(lo, hi, type = "interval2") ~ 1)} (identification_reference.R, rel.tolerance 1e-13).
 * Tolerances: μ and σ 1e-7 and standard errors 1e-6 (both fits converge to the same maximum; R's variance is
 * its Newton–Raphson information at the last step), log-likelihood 1e-8.
 */
class CensoredMleIdentificationTest {
    private static final Map<String, Double> R = Reference.identification();

    /**
     * fitdistrplus 1.1-8 smokedfish (Busschaert et al. 2010): 103 values, a single exact value (15), the rest
     * below 0.04, 1 or 100, above 1 or 100, or in classes (0.04, 1], (0.04, 10], (0.04, 100], (1, 100]. The
     * former rule refused it ("fewer than two different detected values").
     */
    @ParameterizedTest
    @CsvSource({"smokedfish.csv, smokedfish", "one_detect.csv, one_detect", "intervals_only.csv, intervals_only"})
    void fitsAsRSurvregDoes(String file, String key) {
        CensoredSample s = Reference.intervals(file);
        assertNull(CensoredMle.unidentified(s), file);
        for (CensoredMle.Distribution d : CensoredMle.Distribution.values()) {
            String p = key + (d == CensoredMle.Distribution.LOGNORMAL ? "_lognormal" : "_normal");
            CensoredMle.Result r = CensoredMle.fit(s, d);
            assertTrue(r.summary().isApplicable(), p + ": " + r.summary().notes());
            assertEquals(R.get(p + "_mu"), r.mu(), 1e-7, p);
            assertEquals(R.get(p + "_sigma"), r.sigma(), 1e-7, p);
            assertEquals(R.get(p + "_se_mu"), r.seMu(), 1e-6, p);
            assertEquals(R.get(p + "_se_logsigma"), r.seLogSigma(), 1e-6, p);
            assertEquals(R.get(p + "_loglik"), r.logLikelihood(), 1e-8, p);
        }
    }

    /** Left-censored input (R Surv(type = "left")): one_detect.csv and the three-value set {<1, <1, 3}. */
    @Test
    void leftCensoredFormAgrees() {
        CensoredSample s = CensoredSample.builder().detected(2).detected(2).below(0.5).below(0.5).below(0.5)
                .below(0.5).below(1).below(1).below(1).below(3).below(3).build();
        CensoredMle.Result r = CensoredMle.fit(s, CensoredMle.Distribution.LOGNORMAL);
        assertEquals(R.get("one_detect_left_lognormal_mu"), r.mu(), 1e-7);
        assertEquals(R.get("one_detect_left_lognormal_sigma"), r.sigma(), 1e-7);
        CensoredMle.Result tiny = CensoredMle.fit(CensoredSample.builder().below(1).below(1).detected(3).build(),
                CensoredMle.Distribution.LOGNORMAL);
        assertEquals(R.get("tiny_lognormal_mu"), tiny.mu(), 1e-7);
        assertEquals(R.get("tiny_lognormal_sigma"), tiny.sigma(), 1e-7);
    }

    /**
     * Hand-worked refusals. One detect 2 with values below 2 and 5: c = 2 is allowed by all three (2 ≤ 2,
     * 2 ≤ 5), so the likelihood grows without bound as σ → 0 at μ = 2. All below 1 or 3: any c ≤ 1 is allowed.
     * Below 1 and above 2 only: no common value, but no bounded observation (the supremum is approached as
     * σ → ∞). Intervals (1, 2] and (2, 4]: c = 2 lies in both closures.
     */
    @Test
    void unidentifiedDataAreRefusedWithTheReason() {
        assertRefused(CensoredSample.builder().detected(2).below(2).below(5).build(), "one detected value (2)");
        assertRefused(CensoredSample.builder().below(1).below(3).below(3).build(), "at or below 1");
        assertRefused(CensoredSample.builder().below(1).below(1).above(2).above(2).build(),
                "no interval with two finite ends");
        assertRefused(CensoredSample.builder().between(1, 2).between(2, 4).build(), "of 2");
    }

    /** One detect 2 and one value above 3: 2 is not in [3, ∞), so the maximum exists. */
    @Test
    void oneDetectAndALimitThatExcludesItIsIdentified() {
        CensoredSample s = CensoredSample.builder().detected(2).detected(2).above(3).below(5).build();
        assertNull(CensoredMle.unidentified(s));
        assertTrue(CensoredMle.fit(s, CensoredMle.Distribution.NORMAL).summary().isApplicable());
    }

    private static void assertRefused(CensoredSample s, String reason) {
        String why = CensoredMle.unidentified(s);
        assertTrue(why != null && why.contains(reason), why);
        for (CensoredMle.Distribution d : CensoredMle.Distribution.values()) {
            CensoredSummary r = CensoredMle.fit(s, d).summary();
            assertFalse(r.isApplicable());
            assertTrue(r.mean().note().contains(reason), r.mean().note());
        }
    }
}
