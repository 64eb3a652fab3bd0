package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Whether the large-sample intervals used above {@link DuplicateSettings#bootstrapMaxPairs()} are right, on
 * simulated sets just above the default budget of 5,000 pairs (where the approximation is worst). Pairs are two
 * normal measurements with SD σ_c = 0.02 + 0.05·c at lognormal grades, reported to 3 decimals.
 */
class LargeSampleAgreementTest {
    private static final DuplicateSettings LARGE_SAMPLE = DuplicateSettings.DEFAULTS;
    private static final DuplicateSettings BOOTSTRAP = DuplicateSettings.withDefaults().bootstrapMaxPairs(20_000).build();

    static double[][] simulate(Random random, int n, double gradeSpread) {
        double[] a = new double[n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            double c = Math.exp(gradeSpread * random.nextGaussian());
            double sd = 0.02 + 0.05 * c;
            a[i] = Math.max(0.001, Math.round(1000 * (c + sd * random.nextGaussian())) / 1000.0);
            b[i] = Math.max(0.001, Math.round(1000 * (c + sd * random.nextGaussian())) / 1000.0);
        }
        return new double[][] {a, b};
    }

    /**
     * RMS CV: the root of the normal interval of the mean square against the 1000-resample percentile bootstrap
     * (Efron and Tibshirani 1993, ch. 13). Tolerance: each bootstrap end is a 2.5 % (97.5 %) quantile of 1000
     * replicates, whose Monte Carlo SE is √(p(1 − p)/R)/φ(z) = 0.0845 replicate SDs, i.e. 0.043 half-widths of
     * the interval; the ends must agree within 4 such SEs, 0.17 half-widths.
     */
    @Test
    void rmsCvIntervalAgreesWithTheBootstrapWithinMonteCarloError() {
        double[][] p = simulate(new Random(20261202L), 6000, 1.2);
        Estimate normal = PrecisionMeasures.rmsCv(p[0], p[1], LARGE_SAMPLE);
        Estimate boot = PrecisionMeasures.rmsCv(p[0], p[1], BOOTSTRAP);
        assertTrue(boot.note().contains("bootstrap over pairs") && normal.note().contains("normal"));
        assertEquals(boot.value(), normal.value(), 0.0);
        double half = (normal.ciHigh() - normal.ciLow()) / 2;
        assertEquals(boot.ciLow(), normal.ciLow(), 0.17 * half);
        assertEquals(boot.ciHigh(), normal.ciHigh(), 0.17 * half);
    }

    /**
     * Thompson–Howarth and RMS SD lines: the HC3 standard error, averaged over 200 simulated sets of 5,500 pairs,
     * against the actual spread (SD) of the estimates over those sets. This is checked against the truth rather
     * than against the pair bootstrap because the bootstrap of these grouped statistics is itself biased: in the
     * simulation of testdata/reference/duplicates/line_se_simulation.py its SE is about 15 % above the true
     * spread at this grade spread (and 10–25 % above at a lognormal spread of 1.2), while HC3 is within 1 %
     * (resp. 10–15 % below). Tolerance: 3 combined Monte Carlo SEs, computed here: the SD of 200 estimates has
     * relative SE 1/√(2·199) and the mean of 200 standard errors has SE sd(SE)/√200.
     */
    @Test
    void hc3StandardErrorsMatchTheSpreadOfTheLineEstimates() {
        int sets = 200;
        Random random = new Random(424242L);
        double[][] estimates = new double[4][sets];
        double[][] errors = new double[4][sets];
        for (int s = 0; s < sets; s++) {
            double[][] p = simulate(random, 5500, 0.6);
            PrecisionModelResult r = ThompsonHowarth.fit(p[0], p[1], new double[0], LARGE_SAMPLE);
            Estimate[] e = {r.thompsonHowarth().sigma0(), r.thompsonHowarth().k(), r.rmsRegression().sigma0(),
                r.rmsRegression().k()};
            for (int j = 0; j < 4; j++) {
                estimates[j][s] = e[j].value();
                errors[j][s] = (e[j].ciHigh() - e[j].ciLow()) / (2 * NormalInterval.Z975);
            }
        }
        String[] names = {"TH sigma0", "TH k", "RMS sigma0", "RMS k"};
        for (int j = 0; j < 4; j++) {
            double spread = sd(estimates[j]);
            double meanSe = mean(errors[j]);
            double mcSe = Math.hypot(spread / Math.sqrt(2.0 * (sets - 1)), sd(errors[j]) / Math.sqrt(sets));
            assertEquals(spread, meanSe, 3 * mcSe, names[j] + ": spread " + spread + ", mean HC3 SE " + meanSe);
        }
    }

    private static double mean(double[] x) {
        double s = 0;
        for (double v : x) {
            s += v;
        }
        return s / x.length;
    }

    private static double sd(double[] x) {
        double m = mean(x);
        double s = 0;
        for (double v : x) {
            s += (v - m) * (v - m);
        }
        return Math.sqrt(s / (x.length - 1));
    }
}
