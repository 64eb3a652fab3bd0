package org.cupel.duplicates;

import java.util.Locale;
import java.util.function.Supplier;
import org.apache.commons.math3.distribution.TDistribution;
import org.cupel.assay.QcRole;

/**
 * Bias between duplicates and originals: the reduced major axis line ({@link ReducedMajorAxis}), the mean
 * relative difference (b − a)/m with m = (a + b)/2, the mean difference, a paired t-test and a Wilcoxon
 * signed-rank test ({@link PairedTests}), and a plain-language verdict.
 */
final class BiasAnalysis {
    private BiasAnalysis() {
    }

    /** Uses the pairs fit for relative measures ({@code a} originals, {@code b} duplicates). */
    public static BiasResult compare(QcRole type, double[] a, double[] b) {
        return compare(type, a, b, () -> PairedTests.wilcoxon(a, b));
    }

    /**
     * As {@link #compare(QcRole, double[], double[])}, with the Wilcoxon test of the same pairs from
     * {@code wilcoxon}, asked for last: the set's analysis computes it on another core meanwhile.
     */
    static BiasResult compare(QcRole type, double[] a, double[] b, Supplier<TestResult> wilcoxon) {
        int n = a.length;
        double[] rel = new double[n];
        double[] diff = new double[n];
        for (int i = 0; i < n; i++) {
            diff[i] = b[i] - a[i];
            rel[i] = diff[i] / PairMeasures.mean(a[i], b[i]);
        }
        Estimate relBias = meanWithInterval(rel, "mean of (b − a)/m with Student-t 95 % interval");
        Estimate meanDiff = meanWithInterval(diff, "mean of b − a with Student-t 95 % interval");
        boolean significant = relBias.hasInterval() && (relBias.ciLow() > 0 || relBias.ciHigh() < 0);
        RmaFit rma = ReducedMajorAxis.fit(a, b);
        TestResult pairedT = PairedTests.pairedT(a, b);
        return new BiasResult(type, n, rma, relBias, meanDiff, pairedT, wilcoxon.get(), significant,
                verdict(type, relBias, significant));
    }

    /**
     * Mean x̄ with interval x̄ ± t(0.975, n − 1)·s/√n (Student 1908, "The probable error of a mean",
     * Biometrika 6, 1–25).
     */
    public static Estimate meanWithInterval(double[] x, String how) {
        int n = x.length;
        if (n < 2) {
            return Estimate.unavailable(n, "needs at least 2 pairs, has " + n);
        }
        double mean = 0;
        for (double v : x) {
            mean += v;
        }
        mean /= n;
        double ss = 0;
        for (double v : x) {
            ss += (v - mean) * (v - mean);
        }
        double half = new TDistribution(null, n - 1, 1e-14).inverseCumulativeProbability(0.975)
                * Math.sqrt(ss / (n - 1) / n);
        return Estimate.of(mean, mean - half, mean + half, n, how);
    }

    /** "umpire reads 3.1 % ± 1.2 % higher than primary (95 % interval; n = 48)". */
    static String verdict(QcRole type, Estimate relBias, boolean significant) {
        String second = type == QcRole.UMPIRE ? "umpire lab" : "duplicate";
        String first = type == QcRole.UMPIRE ? "primary lab" : "original";
        if (!relBias.hasInterval()) {
            return "bias of " + second + " against " + first + " not estimated: " + relBias.note();
        }
        double pct = 100 * relBias.value();
        double half = 100 * (relBias.ciHigh() - relBias.ciLow()) / 2;
        String dir = pct >= 0 ? "higher" : "lower";
        String core = String.format(Locale.ROOT, "%s reads %.1f %% ± %.1f %% %s than %s (95 %% interval; n = %d)",
                second, Math.abs(pct), half, dir, first, relBias.n());
        return significant ? core : core + "; the interval includes zero, so no bias is shown";
    }
}
