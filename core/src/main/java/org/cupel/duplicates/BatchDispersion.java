package org.cupel.duplicates;

import org.apache.commons.statistics.distribution.ChiSquaredDistribution;

/**
 * Whether one batch's pairs are less precise than the set they belong to: the chi-square test for a
 * variance against a known value (NIST/SEMATECH e-Handbook of Statistical Methods, 2012, section 7.2.3.1,
 * "Chi-square test for the variance"), applied to relative errors. With nᵢ pair CVs in the batch, a set RMS
 * CV of s₀ and batch RMS CV s, T = n·s²/s₀² is compared with χ²(n) (each CVᵢ² = dᵢ²/(2mᵢ²) estimates the
 * relative variance with one degree of freedom); the p-value is the upper tail. s₀ is estimated from the
 * whole set, so the test is approximate and conservative when the batch is a large part of the set. It
 * assumes one relative error over the set's grade range: where precision worsens towards the detection limit,
 * batches of mostly low-grade pairs read as less precise, and with many batches about α of them are flagged
 * by chance. (A form standardised by the fitted σ_c model was tried and rejected: it is dominated by the
 * model's misfit near zero, where σ_c is small and lab rounding is not.)
 *
 * @param ratio s / s₀
 * @param statistic T
 * @param df n
 * @param pValue upper-tail p-value, NaN when not computed (see note)
 * @param note empty when computed; else why not
 */
public record BatchDispersion(double ratio, double statistic, int df, double pValue, String note) {

    public BatchDispersion {
        note = note == null ? "" : note;
    }

    public static BatchDispersion test(Estimate batchRmsCv, Estimate setRmsCv) {
        if (!batchRmsCv.available() || !setRmsCv.available() || !(setRmsCv.value() > 0)) {
            return new BatchDispersion(Double.NaN, Double.NaN, batchRmsCv.n(), Double.NaN,
                    "needs the RMS CV of the batch and of the set");
        }
        int n = batchRmsCv.n();
        double ratio = batchRmsCv.value() / setRmsCv.value();
        double t = n * ratio * ratio;
        return new BatchDispersion(ratio, t, n, upperTail(n, t), "");
    }

    /**
     * P(χ²(df) &gt; t): the survival function of Commons Statistics' {@link ChiSquaredDistribution} (the upper
     * regularized incomplete gamma function Q(df/2, t/2) of Commons Numbers, Boost's algorithm). Against 50-digit
     * mpmath values (testdata/reference/special-functions/chi2_upper.csv) it is within 1.5e-14 relative down to
     * 1e-100 and 4.9e-14 down to 1.8e-219. The
     * 1 − P(df/2, t/2) of Commons Math 3 that Cupel computed here before lost every digit below about 1e-16
     * (it returned 0 for a true 5.4e-17 at df = 10, t = 100; scipy.stats.chi2.sf(100, 10) = 5.45e-17).
     */
    static double upperTail(int df, double t) {
        return ChiSquaredDistribution.of(df).survivalProbability(t);
    }

    public boolean available() {
        return note.isEmpty();
    }
}
