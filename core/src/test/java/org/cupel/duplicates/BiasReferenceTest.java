package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import org.cupel.assay.QcRole;
import org.junit.jupiter.api.Test;

/**
 * Bias statistics against scipy 1.10 / statsmodels 0.13 (testdata/reference/duplicates/bias_reference.py).
 * Tolerances: 1e-10 relative where both sides evaluate the same closed form and only rounding differs.
 */
class BiasReferenceTest {
    private static final JsonNode REF = ReferenceData.json("bias_reference.json");

    private static void close(JsonNode node, String field, double actual) {
        double expected = node.get(field).asDouble();
        assertEquals(expected, actual, 1e-10 * Math.max(1e-3, Math.abs(expected)), field);
    }

    @Test
    void reducedMajorAxisMatchesTheIndependentRoute() {
        double[][] p = ReferenceData.pairs("rma_pairs.csv");
        RmaFit fit = ReducedMajorAxis.fit(p[0], p[1]);
        JsonNode rma = REF.get("rma");
        close(rma, "slope", fit.slope());
        close(rma, "intercept", fit.intercept());
        close(rma, "slopeSe", fit.slopeSe());
        close(rma, "interceptSe", fit.interceptSe());
        close(rma, "slopeCiLow", fit.slopeCi95()[0]);
        close(rma, "slopeCiHigh", fit.slopeCi95()[1]);
        close(rma, "interceptCiLow", fit.interceptCi95()[0]);
        close(rma, "interceptCiHigh", fit.interceptCi95()[1]);
        close(rma, "r", fit.r());
    }

    @Test
    void pairedTMatchesScipyTtestRel() {
        double[][] p = ReferenceData.pairs("rma_pairs.csv");
        TestResult t = PairedTests.pairedT(p[0], p[1]);
        close(REF.get("pairedT"), "t", t.statistic());
        close(REF.get("pairedT"), "p", t.pValue());
        assertEquals(39, t.df());
        double[][] q = ReferenceData.pairs("wilcoxon_ties_pairs.csv");
        TestResult t2 = PairedTests.pairedT(q[0], q[1]);
        close(REF.get("pairedTTies"), "t", t2.statistic());
        close(REF.get("pairedTTies"), "p", t2.pValue());
    }

    @Test
    void meanRelativeBiasIntervalMatchesStudentT() {
        double[][] p = ReferenceData.pairs("rma_pairs.csv");
        BiasResult bias = BiasAnalysis.compare(QcRole.UMPIRE, p[0], p[1]);
        JsonNode ref = REF.get("meanRelativeBias");
        close(ref, "mean", bias.meanRelativeBias().value());
        close(ref, "ciLow", bias.meanRelativeBias().ciLow());
        close(ref, "ciHigh", bias.meanRelativeBias().ciHigh());
        // The interval includes zero here, so the verdict must not claim a bias.
        assertTrue(bias.verdict().startsWith("umpire lab reads 2.7 % ± 3.7 % higher than primary lab"), bias.verdict());
        assertTrue(bias.verdict().contains("no bias is shown"), bias.verdict());
    }

    @Test
    void wilcoxonExactMatchesScipy() {
        double[][] p = ReferenceData.pairs("wilcoxon_exact_pairs.csv");
        TestResult w = PairedTests.wilcoxon(p[0], p[1]);
        JsonNode ref = REF.get("wilcoxonExact");
        assertEquals("exact distribution", w.method());
        assertEquals(ref.get("n").asInt(), w.n());
        close(ref, "statistic", w.statistic());
        close(ref, "p", w.pValue());
    }

    @Test
    void wilcoxonWithTiesAndZerosMatchesScipyNormalApproximation() {
        double[][] p = ReferenceData.pairs("wilcoxon_ties_pairs.csv");
        TestResult w = PairedTests.wilcoxon(p[0], p[1]);
        JsonNode ref = REF.get("wilcoxonTies");
        assertEquals(ref.get("nNonZero").asInt(), w.n());
        close(ref, "statistic", w.statistic());
        close(ref, "p", w.pValue());
    }
}
