package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.List;
import java.util.Map;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.cupel.testing.SpecialFunctionReference;
import org.junit.jupiter.api.Test;

class BatchDispersionTest {
    @Test
    void upperTailMatchesScipyChiSquare() {
        // Batch RMS CV twice the set's over 5 pairs: T = 5·4 = 20 on 5 df; p = scipy.stats.chi2.sf(20, 5)
        // (testdata/reference/duplicates/bias_reference.py). 1e-9 relative: both evaluate the regularized
        // gamma function, with different algorithms.
        BatchDispersion d = BatchDispersion.test(Estimate.of(0.2, 0.1, 0.3, 5, ""), Estimate.of(0.1, 0.09, 0.11, 100, ""));
        assertEquals(20.0, d.statistic(), 1e-12);
        assertEquals(5, d.df());
        double p = ReferenceData.json("bias_reference.json").get("chiSquareUpperTail").get("x20_df5").asDouble();
        assertEquals(p, d.pValue(), 1e-9 * p);
    }

    /**
     * P(χ²(df) &gt; x) against 50-digit mpmath values, df 1–400, x up to 1,000, tails down to 1.8e-219
     * (testdata/reference/special-functions/chi2_upper.csv). Tolerance 1e-13 relative: the upper regularized
     * gamma function of Commons Numbers is documented to a few hundred ulps at worst (Boost's accuracy
     * tables); measured 4.9e-14, at the far end (1.8e-219 at df 1, x 1,000). The 1 − P(df/2, x/2) computed here
     * before was 0 where the true tail is 5.4e-17 (df 10, x 100).
     */
    @Test
    void upperTailMatchesMpmathDeepInTheTail() {
        for (Map<String, Double> r : SpecialFunctionReference.rows("chi2_upper.csv")) {
            int df = r.get("df").intValue();
            double expected = r.get("upper");
            assertEquals(expected, BatchDispersion.upperTail(df, r.get("x")), 1e-13 * expected,
                    () -> "df " + df + ", x " + r.get("x"));
        }
    }

    /**
     * Away from the far tail the value is what 1 − F of Commons Math 3 (used here before) gave, to 1e-12
     * absolute: Commons Math's series for P is itself only good to about 1e-13 at large df (at df 400,
     * t 400 it gives 0.4905965819928606 where mpmath at 40 digits gives 0.49059658199276367 and the value
     * here is 0.4905965819927637).
     */
    @Test
    void agreesWithOneMinusTheCommonsMathCdfInAbsoluteTerms() {
        Gen<Integer> df = Gen.ints(1, 400);
        Gen<Double> t = Gen.doubles(0, 1000);
        List<Gen<Chi>> edges = List.of(Gen.constant(new Chi(1, 0)), Gen.constant(new Chi(400, 0)),
                Gen.constant(new Chi(1, 1000)), Gen.constant(new Chi(400, 1000)), Gen.constant(new Chi(400, 400)));
        SeededTries.forAll(2000, edges, r -> new Chi(df.next(r), t.next(r)),
                in -> assertEquals(1.0 - new ChiSquaredDistribution(null, in.df()).cumulativeProbability(in.t()),
                        BatchDispersion.upperTail(in.df(), in.t()), 1e-12));
    }

    /** Degrees of freedom and a statistic. */
    record Chi(int df, double t) {
    }

    @Test
    void noSetCvMeansNoTest() {
        BatchDispersion d = BatchDispersion.test(Estimate.of(0.2, 0.1, 0.3, 5, ""), Estimate.unavailable(1, "few"));
        assertFalse(d.available());
    }
}
