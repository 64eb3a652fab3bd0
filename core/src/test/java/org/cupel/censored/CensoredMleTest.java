package org.cupel.censored;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.Map;
import org.junit.jupiter.api.Test;

class CensoredMleTest {
    private static final Map<String, Double> R = Reference.survival();

    @Test
    void unifiedGuidanceExample15_1Lognormal() {
        // USEPA (2009) Unified Guidance, Example 15-1: lognormal MLE mean 23.004, CV 2.3008.
        // 5e-4 and 5e-5: published to three and four decimals.
        CensoredSummary s = CensoredMle.fit(Reference.manganese(), CensoredMle.Distribution.LOGNORMAL).summary();
        assertEquals(23.004, s.mean().value(), 5e-4);
        assertEquals(2.3008, s.cv(), 5e-5);
    }

    @Test
    void lognormalLeftCensoredMatchesRSurvreg() {
        // R survival::survreg(Surv(x, !cen, type = "left") ~ 1, dist = "lognormal"). Both converge to the
        // same maximum; 1e-7 allows for R's convergence criterion (relative change in log-lik 1e-9).
        CensoredMle.Result r = CensoredMle.fit(Reference.manganese(), CensoredMle.Distribution.LOGNORMAL);
        assertEquals(R.get("mle_lognormal_mu"), r.mu(), 1e-7);
        assertEquals(R.get("mle_lognormal_sigma"), r.sigma(), 1e-7);
        assertEquals(R.get("mle_lognormal_se_mu"), r.seMu(), 1e-6);
        assertEquals(R.get("mle_lognormal_se_logsigma"), r.seLogSigma(), 1e-6);
        assertEquals(R.get("mle_lognormal_loglik"), r.logLikelihood(), 1e-8);
    }

    @Test
    void profileIntervalForLognormalMeanMatchesR() {
        // Profile likelihood computed in R with optimize/uniroot (censored_reference.R). 1e-4 relative:
        // two independent one-dimensional optimisations nested in root finding.
        Estimate mean = CensoredMle.fit(Reference.manganese(), CensoredMle.Distribution.LOGNORMAL).summary().mean();
        double lo = R.get("mle_lognormal_mean_profile_lower");
        double hi = R.get("mle_lognormal_mean_profile_upper");
        assertEquals(lo, mean.lower(), 1e-4 * lo);
        assertEquals(hi, mean.upper(), 1e-4 * hi);
    }

    @Test
    void normalLeftCensoredMatchesRSurvreg() {
        // survreg(..., dist = "gaussian"); tolerances as above.
        CensoredMle.Result r = CensoredMle.fit(Reference.manganese(), CensoredMle.Distribution.NORMAL);
        assertEquals(R.get("mle_normal_mu"), r.mu(), 1e-6);
        assertEquals(R.get("mle_normal_sigma"), r.sigma(), 1e-6);
        assertEquals(R.get("mle_normal_se_mu"), r.seMu(), 1e-6);
        assertEquals(R.get("mle_normal_se_logsigma"), r.seLogSigma(), 1e-6);
    }

    @Test
    void intervalAndRightCensoringMatchRSurvreg() {
        // survreg(Surv(lo, hi, type = "interval2") ~ 1) on mixed.csv, lognormal and gaussian.
        CensoredSample mixed = Reference.mixed();
        CensoredMle.Result ln = CensoredMle.fit(mixed, CensoredMle.Distribution.LOGNORMAL);
        assertEquals(R.get("mixed_lognormal_mu"), ln.mu(), 1e-7);
        assertEquals(R.get("mixed_lognormal_sigma"), ln.sigma(), 1e-7);
        assertEquals(R.get("mixed_lognormal_se_mu"), ln.seMu(), 1e-6);
        assertEquals(R.get("mixed_lognormal_se_logsigma"), ln.seLogSigma(), 1e-6);
        CensoredMle.Result no = CensoredMle.fit(mixed, CensoredMle.Distribution.NORMAL);
        assertEquals(R.get("mixed_normal_mu"), no.mu(), 1e-6);
        assertEquals(R.get("mixed_normal_sigma"), no.sigma(), 1e-6);
        assertEquals(R.get("mixed_normal_se_mu"), no.seMu(), 1e-6);
        assertEquals(R.get("mixed_normal_se_logsigma"), no.seLogSigma(), 1e-6);
    }

    /**
     * One detect 1 and two values below 3: the value 1 is consistent with every observation, so the
     * likelihood grows without bound as σ → 0 (R's survreg does not converge on it). The mirror case, two
     * values below 1 and a detect 3, is identified (CensoredMleIdentificationTest).
     */
    @Test
    void allCensoredIsNotApplicable() {
        CensoredSample s = CensoredSample.builder().below(3).below(3).detected(1).build();
        CensoredSummary r = CensoredMle.fit(s, CensoredMle.Distribution.LOGNORMAL).summary();
        assertFalse(r.isApplicable());
        assertFalse(r.mean().note().isEmpty());
    }
}
