package org.cupel.control.crm;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** Tabular CUSUM and EWMA on the data of Montgomery, Introduction to Statistical Quality Control, Table 9.1. */
class CusumEwmaTest {
    /** Montgomery, Table 9.1: 30 observations, μ₀ = 10, σ = 1, a 1σ shift after observation 22. */
    static final double[] TABLE_9_1 = {9.45, 7.99, 9.29, 11.66, 12.16, 10.18, 8.04, 11.46, 9.20, 10.34, 9.03,
        11.47, 10.51, 9.40, 10.08, 9.37, 10.62, 10.31, 8.52, 10.84, 10.90, 9.33, 12.29, 11.50, 10.60, 11.08,
        10.38, 11.62, 11.31, 10.52};

    @Test
    void cusumFirstSignalsAtObservation29AsInMontgomery() {
        TabularCusum c = TabularCusum.of(TABLE_9_1, 10, 1, 0.5, 5);
        // Montgomery (tabular CUSUM example on Table 9.1): first C⁺ above H = 5 at observation 29, C⁺₂₉ = 5.28.
        assertEquals(28, c.firstSignal());
        // 1e-9: the sums of two-decimal data are exact up to rounding of binary doubles.
        assertEquals(5.28, c.upper().get(28), 1e-9);
        assertEquals(30, c.n());
    }

    @Test
    void cusumMatchesIndependentPythonComputation() throws IOException {
        Map<String, double[]> ref = ReferenceData.columns("montgomery_cusum_ewma.csv");
        TabularCusum c = TabularCusum.of(TABLE_9_1, 10, 1, 0.5, 5);
        for (int i = 0; i < 30; i++) {
            // 1e-12: same recursion in double precision, only summation rounding may differ.
            assertEquals(ref.get("cusum_upper")[i], c.upper().get(i), 1e-12);
            assertEquals(ref.get("cusum_lower")[i], c.lower().get(i), 1e-12);
        }
    }

    @Test
    void ewmaMatchesNistFormulaComputedInPython() throws IOException {
        Map<String, double[]> ref = ReferenceData.columns("montgomery_cusum_ewma.csv");
        check(Ewma.of(TABLE_9_1, 10, 1, 0.1, 2.7), ref, "ewma01");
        check(Ewma.of(TABLE_9_1, 10, 1, 0.2, 3), ref, "ewma02");
    }

    private static void check(Ewma e, Map<String, double[]> ref, String col) {
        int first = -1;
        for (int i = 0; i < 30; i++) {
            // 1e-12: closed-form limits and the same recursion; only rounding differs.
            assertEquals(ref.get(col)[i], e.values().get(i), 1e-12);
            assertEquals(ref.get(col + "_lcl")[i], e.lowerLimits().get(i), 1e-12);
            assertEquals(ref.get(col + "_ucl")[i], e.upperLimits().get(i), 1e-12);
            if (first < 0 && ref.get(col)[i] > ref.get(col + "_ucl")[i]) {
                first = i;
            }
        }
        assertEquals(first, e.firstSignal());
    }
}
