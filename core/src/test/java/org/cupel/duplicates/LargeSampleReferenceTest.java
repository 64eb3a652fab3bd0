package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The large-sample intervals against statsmodels 0.13 / scipy 1.10 (testdata/reference/duplicates/
 * large_sample_reference.py): HC3 covariance of a least-squares line (MacKinnon, J.G. and White, H., 1985,
 * Journal of Econometrics 29, 305–325, HC3 as statsmodels implements it), normal 95 % intervals of the
 * Thompson–Howarth and RMS SD coefficients and of P_c, and the normal interval of the mean squared pair CV.
 * Tolerance 1e-9 relative: the same formulas evaluated in another order of summation, in double precision,
 * over at most 1,325 terms, agree to about 1e-13; 1e-9 leaves room without admitting a wrong formula (the
 * HC3/HC0 difference checked below is of order 10 %).
 */
class LargeSampleReferenceTest {
    private static final double REL = 1e-9;
    private static final JsonNode REF = ReferenceData.json("large_sample_reference.json");
    /** 1,325 pairs, above a bootstrap budget of 1,000: the large-sample intervals apply. */
    private static final DuplicateSettings SETTINGS = DuplicateSettings.withDefaults().bootstrapMaxPairs(1000).build();
    private static final double[] GRADES = {0.5, 2.0};

    @Test
    void normalQuantileMatchesScipy() {
        assertClose(REF.get("z975").asDouble(), NormalInterval.Z975);
    }

    @Test
    void smallLineHasTheHc3CovarianceOfStatsmodels() {
        JsonNode s = REF.get("smallLine");
        RobustLine line = RobustLine.fit(doubles(s.get("x")), doubles(s.get("y")));
        JsonNode hc3 = s.get("hc3_cov");
        assertClose(s.get("params").get(0).asDouble(), line.intercept());
        assertClose(s.get("params").get(1).asDouble(), line.slope());
        assertClose(hc3.get(0).get(0).asDouble(), line.interceptVariance());
        assertClose(hc3.get(1).get(1).asDouble(), line.slopeVariance());
        assertClose(hc3.get(0).get(1).asDouble(), line.covariance());
        // The check tells HC3 from White's HC0 on this leveraged set.
        double hc0 = s.get("hc0_cov").get(1).get(1).asDouble();
        assertTrue(Math.abs(hc0 - line.slopeVariance()) > 0.1 * hc0, hc0 + " vs " + line.slopeVariance());
    }

    @Test
    void thompsonHowarthAndRmsSdIntervalsMatchStatsmodelsHc3() {
        double[][] p = ReferenceData.pairs("large_sample_pairs.csv");
        PrecisionModelResult r = ThompsonHowarth.fit(p[0], p[1], GRADES, SETTINGS);
        assertEquals(REF.get("groups").asInt(), r.groups().groups());
        check(REF.get("thompsonHowarth"), r.thompsonHowarth(), r.atGrades().stream()
                .map(GradePrecision::thompsonHowarth).toList());
        check(REF.get("rmsRegression"), r.rmsRegression(), r.atGrades().stream()
                .map(GradePrecision::rmsRegression).toList());
        assertTrue(r.thompsonHowarth().sigma0().note().contains("HC3"), r.thompsonHowarth().sigma0().note());
    }

    @Test
    void rmsCvIntervalMatchesTheNormalIntervalOfTheMeanSquare() {
        double[][] p = ReferenceData.pairs("large_sample_pairs.csv");
        Estimate cv = PrecisionMeasures.rmsCv(p[0], p[1], SETTINGS);
        JsonNode ref = REF.get("rmsCv");
        assertEquals(ref.get("n").asInt(), cv.n());
        assertClose(ref.get("value").asDouble(), cv.value());
        assertClose(ref.get("ci").get(0).asDouble(), cv.ciLow());
        assertClose(ref.get("ci").get(1).asDouble(), cv.ciHigh());
        assertTrue(cv.note().contains("bootstrapMaxPairs = 1000"), cv.note());
    }

    private static void check(JsonNode ref, ModelFit fit, List<Estimate> atGrades) {
        assertClose(ref.get("sigma0").asDouble(), fit.sigma0().value());
        assertClose(ref.get("k").asDouble(), fit.k().value());
        assertClose(ref.get("sigma0_ci").get(0).asDouble(), fit.sigma0().ciLow());
        assertClose(ref.get("sigma0_ci").get(1).asDouble(), fit.sigma0().ciHigh());
        assertClose(ref.get("k_ci").get(0).asDouble(), fit.k().ciLow());
        assertClose(ref.get("k_ci").get(1).asDouble(), fit.k().ciHigh());
        for (int i = 0; i < GRADES.length; i++) {
            JsonNode g = ref.get("precision").get(String.valueOf(GRADES[i]));
            assertClose(g.get("value").asDouble(), atGrades.get(i).value());
            assertClose(g.get("ci").get(0).asDouble(), atGrades.get(i).ciLow());
            assertClose(g.get("ci").get(1).asDouble(), atGrades.get(i).ciHigh());
        }
    }

    private static void assertClose(double expected, double actual) {
        assertEquals(expected, actual, REL * Math.abs(expected));
    }

    private static double[] doubles(JsonNode array) {
        double[] out = new double[array.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = array.get(i).asDouble();
        }
        return out;
    }
}
