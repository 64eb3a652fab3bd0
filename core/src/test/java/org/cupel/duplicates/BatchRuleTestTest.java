package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.cupel.assay.AssayValue;
import org.cupel.assay.QcRole;
import org.cupel.testing.SpecialFunctionReference;
import org.junit.jupiter.api.Test;

/**
 * The per-batch acceptance rule as a one-sided exact binomial test, against scipy.stats.binomtest (scipy 1.10,
 * alternative='less'; testdata/reference/duplicates/batch_rule_binomial.py), and its outcomes at the edges.
 */
class BatchRuleTestTest {

    @Test
    void pValuesMatchScipyBinomtest() throws Exception {
        // 2,016 (n, k, p0) cases, n = 1..30, 50, 125, p0 = 0.8, 0.9, 0.95. Tolerance 1e-12 relative (plus 1e-300
        // absolute): both take the tail from Boost's incomplete beta algorithm (scipy's C++ Boost, Commons
        // Numbers' Java port), to near double precision.
        List<String> lines = Files.readAllLines(ReferenceData.dir().resolve("batch_rule_binomial.csv"));
        double worst = 0;
        for (String line : lines.subList(1, lines.size())) {
            String[] c = line.split(",");
            int n = Integer.parseInt(c[0]);
            int k = Integer.parseInt(c[1]);
            double p0 = Double.parseDouble(c[2]);
            double expected = Double.parseDouble(c[3]);
            double got = BatchRuleTest.of(k, n, 100 * p0, 0.05).pValue();
            double err = Math.abs(got - expected) / Math.max(expected, 1e-300);
            worst = Math.max(worst, err);
            assertEquals(expected, got, 1e-12 * expected + 1e-300, "n " + n + ", k " + k + ", p0 " + p0);
        }
        assertTrue(worst < 1e-12, "worst relative error " + worst);
    }

    /**
     * P(X ≤ k) against exact sums in 50-digit mpmath, n = 1–50 every k and n = 100, 250, 1,000 at both ends
     * and around np, p from 0.01 to 0.99 (testdata/reference/special-functions/binomial_tails.csv). Tolerance
     * 1e-12 relative wherever the tail is above 1e-280 (measured 4.4e-14); nearer the bottom of the double
     * range the incomplete beta loses digits (6.5e-10 relative at 1.6e-298), where no p-value is read.
     */
    @Test
    void lowerTailMatchesExactSums() {
        for (Map<String, Double> r : SpecialFunctionReference.rows("binomial_tails.csv")) {
            double expected = r.get("lower");
            if (expected > 1e-280) {
                int n = r.get("n").intValue();
                int k = r.get("k").intValue();
                assertEquals(expected, BatchRuleTest.lowerTail(k, n, r.get("p")), 1e-12 * expected,
                        () -> "n " + n + ", k " + k + ", p " + r.get("p"));
            }
        }
    }

    /** The case that made Cupel sum point probabilities by hand: Commons Math 3 gave 1.0000000050e-8 for 0.1⁸. */
    @Test
    void eightPairsNoneWithin() {
        // By hand: P(X ≤ 0) = (1 − 0.9)⁸ = 1e-8 (the double 0.9 makes it 1e-8 · (1 − 1.8e-15)).
        assertEquals(1e-8, BatchRuleTest.lowerTail(0, 8, 0.9), 1e-14 * 1e-8);
    }

    @Test
    void largeBatchesMatchScipyBinomtest() throws Exception {
        // 70 (n, k, p0) cases, n = 1,001 to 1,000,000, k from 1,000 (far lower tail) through the mode to n,
        // p0 = 0.9, 0.8 (testdata/reference/duplicates/batch_rule_binomial_large.py, scipy 1.10.1). Above 1,000
        // terms the sum stops where the remaining terms cannot change it, from k down below the mode and as
        // 1 − P(X > k) from the mode up. Tolerance 1e-10 relative plus 1e-15 absolute: near the mode of n = 10⁶
        // the terms shrink by a ratio close to 1, so up to ~10⁵ terms are summed (relative rounding below
        // 10⁵ × 1.1e-16 ≈ 1e-11, each term a few ulps); the complement 1 − P(X > k) has an absolute error of a
        // few ulps of 1; scipy's value comes from Boost's incomplete beta, to near double precision.
        List<String> lines = Files.readAllLines(ReferenceData.dir().resolve("batch_rule_binomial_large.csv"));
        for (String line : lines.subList(1, lines.size())) {
            String[] c = line.split(",");
            int n = Integer.parseInt(c[0]);
            int k = Integer.parseInt(c[1]);
            double p0 = Double.parseDouble(c[2]);
            double expected = Double.parseDouble(c[3]);
            double got = BatchRuleTest.of(k, n, 100 * p0, 0.05).pValue();
            assertEquals(expected, got, 1e-10 * expected + 1e-15, "n " + n + ", k " + k + ", p0 " + p0);
        }
    }

    @Test
    void outcomesAtTheEdgesForTheDefaultRule() {
        // p0 = 0.9, α = 0.05. By hand: P(X ≤ 0 | 1) = 0.1; P(X ≤ 0 | 2) = 0.01; P(X ≤ 1 | 2) = 1 − 0.81 = 0.19;
        // P(X ≤ 2 | 5) = 0.00856; P(X ≤ 3 | 5) = 0.08146; P(X ≤ 4 | 5) = 1 − 0.9^5 = 0.40951.
        assertEquals(RuleOutcome.TOO_FEW_PAIRS, BatchRuleTest.of(0, 1, 90, 0.05).outcome(), "one wide pair of one");
        assertEquals(RuleOutcome.FAIL, BatchRuleTest.of(0, 2, 90, 0.05).outcome());
        assertEquals(RuleOutcome.TOO_FEW_PAIRS, BatchRuleTest.of(1, 2, 90, 0.05).outcome());
        assertEquals(RuleOutcome.FAIL, BatchRuleTest.of(2, 5, 90, 0.05).outcome());
        assertEquals(RuleOutcome.TOO_FEW_PAIRS, BatchRuleTest.of(3, 5, 90, 0.05).outcome());
        assertEquals(RuleOutcome.TOO_FEW_PAIRS, BatchRuleTest.of(4, 5, 90, 0.05).outcome());
        assertEquals(RuleOutcome.PASS, BatchRuleTest.of(5, 5, 90, 0.05).outcome());
        assertEquals(RuleOutcome.PASS, BatchRuleTest.of(9, 10, 90, 0.05).outcome(), "9 of 10 is exactly 90 %");
        assertEquals(RuleOutcome.NOT_JUDGED, BatchRuleTest.of(0, 0, 90, 0.05).outcome());
        assertEquals(0.40951, BatchRuleTest.of(4, 5, 90, 0.05).pValue(), 1e-12);
        assertTrue(BatchRuleTest.of(4, 5, 90, 0.05).note().startsWith("too few pairs to judge: 4 of 5 within"));
    }

    @Test
    void aBatchWithOneWidePairIsNotFlagged() {
        // Before: "0.0 % of 1 pairs within HARD 30 % (fails the rule)". One field pair 1.0 / 2.0 (HARD 33 %) in
        // batch J2 beside 20 tight pairs in J1.
        List<DuplicatePair> pairs = new ArrayList<>();
        for (int i = 0; i < 20; i++) {
            pairs.add(pair("J1", 1.0 + 0.01 * i, 1.02 + 0.01 * i));
        }
        pairs.add(pair("J2", 1.0, 2.0));
        DuplicateSetResult set = DuplicateAnalysis.run("Au", "g/t", pairs, List.of(), new double[0],
                DuplicateSettings.DEFAULTS).sets().get(0);
        BatchPrecision j2 = set.batches().stream().filter(b -> b.batch().equals("J2")).findFirst().orElseThrow();
        assertFalse(j2.failsRule());
        assertTrue(j2.tooFewPairs());
        assertEquals(RuleOutcome.TOO_FEW_PAIRS, j2.precision().rule());
        assertEquals(0.1, j2.rule().pValue(), 1e-12);
    }

    private static DuplicatePair pair(String batch, double a, double b) {
        return new DuplicatePair("D", "O", batch, QcRole.FIELD_DUPLICATE, AssayValue.detected(a, 0.005),
                AssayValue.detected(b, 0.005));
    }
}
