package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Map;
import org.cupel.testing.SpecialFunctionReference;
import org.junit.jupiter.api.Test;

/** The binomial p-values of the count of pairs above a control line. */
class ControlLineCheckTest {

    /**
     * P(X ≥ count) and P(X ≤ count), X ~ Binomial(n, 1 − percentile/100), against exact sums in 50-digit mpmath
     * for the 90 % and 99 % lines (p = 0.1 and 0.01 in testdata/reference/special-functions/binomial_tails.csv),
     * wherever the tail is above 1e-280. Tolerance 1e-12 relative: the library's tails are within 4.4e-14, and the
     * exceedance probability here is 1 − 90/100 in doubles, 2.8e-17 from 0.1, which moves a tail of n ≤ 1,000 by
     * at most n·2.8e-17/0.1 = 2.8e-13 relative. Before, the upper p was 1 − F, which was 0 (or a multiple of
     * 1.1e-16) wherever the true tail is below about 1e-16.
     */
    @Test
    void pValuesMatchExactBinomialSums() {
        for (Map<String, Double> r : SpecialFunctionReference.rows("binomial_tails.csv")) {
            double p = r.get("p");
            if (p != 0.1 && p != 0.01) {
                continue;
            }
            int n = r.get("n").intValue();
            int k = r.get("k").intValue();
            ControlLineCheck c = ControlLineCheck.of(p == 0.1 ? 90 : 99, 1, n, k);
            String where = "n " + n + ", count " + k + ", p " + p;
            if (r.get("upper") > 1e-280) {
                assertEquals(r.get("upper"), c.pValue(), 1e-12 * r.get("upper"), where);
            }
            if (r.get("lower") > 1e-280) {
                assertEquals(r.get("lower"), c.pValueLower(), 1e-12 * r.get("lower"), where);
            }
        }
    }
}
