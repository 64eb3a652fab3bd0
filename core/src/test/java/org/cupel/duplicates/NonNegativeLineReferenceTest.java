package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

/**
 * σ₀ ≥ 0 and k ≥ 0 against scipy 1.10 {@code lsq_linear(bounds=(0, inf), method="bvls")}
 * (nonnegative_line_reference.py). Tolerance 1e-12: both solve the same small quadratic programme exactly
 * (Cupel by its Karush–Kuhn–Tucker cases, scipy by bounded-variable least squares).
 */
class NonNegativeLineReferenceTest {
    private static final JsonNode REF = ReferenceData.json("nonnegative_line_reference.json");

    @Test
    void linesMatchScipyBoundedLeastSquares() {
        for (JsonNode c : REF.get("lines")) {
            double[] x = array(c.get("x"));
            double[] y = array(c.get("y"));
            NonNegativeLine line = NonNegativeLine.fit(x, y);
            assertEquals(c.get("intercept").asDouble(), line.intercept(), 1e-12, c.toString());
            assertEquals(c.get("slope").asDouble(), line.slope(), 1e-12, c.toString());
            assertEquals(c.get("free_intercept").asDouble(), line.unconstrainedIntercept(), 1e-12, c.toString());
            assertEquals(c.get("free_slope").asDouble(), line.unconstrainedSlope(), 1e-12, c.toString());
            boolean freeFeasible = line.unconstrainedIntercept() >= 0 && line.unconstrainedSlope() >= 0;
            assertEquals(!freeFeasible, line.constrained(), c.toString());
        }
    }

    /**
     * 330 pairs with multiplicative errors (true σ₀ = 0) whose ordinary lines have negative intercepts
     * (−0.0232 for Thompson–Howarth, −0.0163 for the RMS SD line): both are refitted through the origin, the
     * fit says so, and the counts above the 90 % and 99 % lines of the constrained model and their binomial
     * tails match scipy's (17 and 0 pairs; upper tails 0.9995 and 1, lower tail of the 90 % count 0.0011, so
     * the result says the model does not fit).
     */
    @Test
    void thompsonHowarthWithANegativeInterceptIsRefittedThroughTheOrigin() {
        JsonNode t = REF.get("thompsonHowarth");
        double[][] p = ReferenceData.pairs("nonnegative_line_pairs.csv");
        PrecisionModelResult r = ThompsonHowarth.fit(p[0], p[1], new double[] {0.5}, DuplicateSettings.DEFAULTS);
        assertTrue(t.get("free_sigma0").asDouble() < 0 && t.get("rms_free_sigma0").asDouble() < 0);
        assertEquals(0.0, r.thompsonHowarth().model().sigma0(), 0);
        assertEquals(t.get("k").asDouble(), r.thompsonHowarth().model().k(), 1e-12);
        assertEquals(0.0, r.rmsRegression().model().sigma0(), 0);
        assertEquals(t.get("rms_k").asDouble(), r.rmsRegression().model().k(), 1e-12);
        assertTrue(r.thompsonHowarth().constraint().contains("refitted through the origin")
                && r.thompsonHowarth().constraint().contains("σ₀ = -0.0232"), r.thompsonHowarth().constraint());
        assertEquals(t.get("above90").asInt(), r.line90().exceedances());
        assertEquals(t.get("above99").asInt(), r.line99().exceedances());
        assertEquals(t.get("p90").asDouble(), r.line90().pValue(), 1e-10);
        assertEquals(t.get("p99").asDouble(), r.line99().pValue(), 1e-10);
        assertEquals(t.get("p90_lower").asDouble(), r.line90().pValueLower(), 1e-10);
        assertEquals(t.get("p99_lower").asDouble(), r.line99().pValueLower(), 1e-10);
        // Through the origin σ_c is overstated at low grades: 17 above the 90 % line where 33 are expected.
        assertTrue(r.fitNote().contains("17 pairs above the 90 % line where 33 are expected")
                && r.fitNote().contains("lower tail"), r.fitNote());
        // The bootstrap fits each resample with the same bounds: no interval reaches below 0.
        assertTrue(r.thompsonHowarth().sigma0().ciLow() >= 0 && r.rmsRegression().sigma0().ciLow() >= 0);
        assertFalse(Double.isNaN(r.thompsonHowarth().k().ciLow()));
    }

    /**
     * Lack of fit, tails from Commons Math's binomial (the distribution itself checked against scipy's
     * binom.sf in BiasReferenceTest). 18 pairs above the 99 % line of 81 (expected 0.81): upper tail far below
     * 0.01, the model does not fit. 9 above the 90 % line of 81 (expected 8.1): neither tail small. 1 above the
     * 90 % line of 124 (expected 12.4): lower tail P(X ≤ 1) = 0.9^124 + 124·0.1·0.9^123 ≈ 3.2e-5, σ_c overstated.
     */
    @Test
    void exceedancesFarFromExpectationSayTheModelDoesNotFit() {
        ControlLineCheck l90 = ControlLineCheck.of(90, NormalDifferenceConstants.P90, 81, 9);
        ControlLineCheck l99 = ControlLineCheck.of(99, NormalDifferenceConstants.P99, 81, 18);
        assertFalse(l90.tooMany() || l90.tooFew());
        assertTrue(l99.tooMany());
        String note = ControlLineCheck.fitNote(l90, l99);
        assertTrue(note.startsWith("the model does not fit these pairs: 18 pairs above the 99 % line where 0.8 are "
                + "expected"), note);
        assertEquals("", ControlLineCheck.fitNote(l90, l90));
        ControlLineCheck few = ControlLineCheck.of(90, NormalDifferenceConstants.P90, 124, 1);
        double byHand = Math.pow(0.9, 124) + 124 * 0.1 * Math.pow(0.9, 123);
        assertEquals(byHand, few.pValueLower(), 1e-12 * byHand);
        assertTrue(few.tooFew());
        assertTrue(ControlLineCheck.fitNote(few, ControlLineCheck.of(99, NormalDifferenceConstants.P99, 124, 0))
                .contains("overstated"));
    }

    private static double[] array(JsonNode a) {
        double[] out = new double[a.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = a.get(i).asDouble();
        }
        return out;
    }
}
