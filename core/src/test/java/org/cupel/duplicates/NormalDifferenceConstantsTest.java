package org.cupel.duplicates;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class NormalDifferenceConstantsTest {
    // Published to 6 decimals: Thompson and Howarth (1976, Analyst 101, 690-698) give the median |d|
    // factor and its inverse; the percentile factors are the standard normal quantiles 1.644854, 1.959964
    // and 2.575829 (any normal table, e.g. Abramowitz and Stegun 1964, Table 26.5) times sqrt(2).
    // Tolerance 5e-7: half a unit in the sixth decimal.
    private static final double SIX_DECIMALS = 5e-7;

    @Test
    void medianOfAbsoluteDifferenceIs0953873Sigma() {
        assertEquals(0.953873, NormalDifferenceConstants.MEDIAN_ABS_DIFF, SIX_DECIMALS);
    }

    @Test
    void thompsonHowarthFactorIs1048358() {
        assertEquals(1.048358, NormalDifferenceConstants.SIGMA_PER_MEDIAN, SIX_DECIMALS);
    }

    @Test
    void percentileFactorsOfAbsoluteDifference() {
        assertEquals(2.326174, NormalDifferenceConstants.P90, SIX_DECIMALS);
        assertEquals(2.771808, NormalDifferenceConstants.P95, SIX_DECIMALS);
        assertEquals(3.642773, NormalDifferenceConstants.P99, SIX_DECIMALS);
    }
}
