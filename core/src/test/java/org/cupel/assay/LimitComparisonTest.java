package org.cupel.assay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Hand-worked edge cases of the shared limit comparison. Every double below was checked with Python 3
 * ({@code (1.1 - 1.0) / 0.05} and so on): a decimal tie lands a few ulps to either side of its limit.
 */
class LimitComparisonTest {

    @Test
    void aResultExactlyTwoSdAwayIsOnTheLimitOnBothSides() {
        // 1.100 and 0.900 on 1.000 ± 0.050 are exactly ±2 SD in decimals; the doubles are not.
        double high = (1.100 - 1.000) / 0.050;
        double low = (0.900 - 1.000) / 0.050;
        assertEquals(2.0000000000000018, high, 0);
        assertEquals(-1.9999999999999996, low, 0);
        assertFalse(LimitComparison.beyond(high, 2), "1.100 is on +2 SD, not beyond it");
        assertFalse(LimitComparison.beyond(low, 2), "0.900 is on -2 SD, not beyond it");
        assertFalse(LimitComparison.within(high, 2), "on the limit is not within it either");
        assertFalse(LimitComparison.within(low, 2));
    }

    @Test
    void exactlyThreeSdIsNotBeyondThreeButAtLeastThree() {
        // 1.377 on 1.236 ± 0.047: (1.377 - 1.236) / 0.047 = 0.141 / 0.047 = 3 exactly; the double is
        // 3.0000000000000004.
        double z = (1.377 - 1.236) / 0.047;
        assertEquals(3.0000000000000004, z, 0);
        assertFalse(LimitComparison.beyond(z, 3));
        assertTrue(LimitComparison.atLeast(Math.abs(z), 3));
        // 1.378 is 0.142 / 0.047 = 3.021 SD: a real difference of one reported digit.
        assertTrue(LimitComparison.beyond((1.378 - 1.236) / 0.047, 3));
    }

    @Test
    void aHairBeyondTheLimitIsStillBeyond() {
        // 1.1001 on 1.000 ± 0.050: z = 0.1001 / 0.05 = 2.002, 1e-3 relative, six orders above the tolerance.
        assertTrue(LimitComparison.beyond((1.1001 - 1.000) / 0.050, 2));
        assertTrue(LimitComparison.above(2 * (1 + 1e-8), 2), "1e-8 relative is ten times the tolerance");
        assertFalse(LimitComparison.above(2 * (1 + 1e-10), 2), "1e-10 relative is inside the tolerance");
    }

    @Test
    void hardOfExactlyTenPercentIsWithinTheLimit() {
        // |1.1 - 0.9| / (1.1 + 0.9) = 0.2 / 2 = 0.1 in decimals; the double is 0.10000000000000003, while
        // |11 - 9| / 20 is exactly 0.1. Both must be within a 10 % limit (10 / 100.0 = 0.1).
        double h1 = Math.abs(1.1 - 0.9) / (1.1 + 0.9);
        double h2 = Math.abs(2.2 - 1.8) / (2.2 + 1.8);
        double h3 = Math.abs(11.0 - 9.0) / 20.0;
        assertEquals(0.10000000000000003, h1, 0);
        assertEquals(0.10000000000000003, h2, 0);
        assertEquals(0.1, h3, 0);
        for (double h : new double[] {h1, h2, h3}) {
            assertTrue(LimitComparison.atMost(h, 10 / 100.0), "HARD " + h);
            assertFalse(LimitComparison.above(h, 10 / 100.0), "HARD " + h);
        }
        // 1.1001 / 0.9: HARD = 0.2001 / 2.0001 = 0.10004: beyond.
        assertTrue(LimitComparison.above(Math.abs(1.1001 - 0.9) / (1.1001 + 0.9), 0.1));
    }

    @Test
    void multiplesOfADetectionLimit() {
        // 3 × 0.3 is 0.8999999999999999 as a double; a blank reported 0.9 is on the 3×DL level.
        assertFalse(LimitComparison.above(0.9, 3 * 0.3));
        assertTrue(LimitComparison.atLeast(0.9, 3 * 0.3));
        assertFalse(LimitComparison.above(0.3, 3 * 0.1), "0.3 vs 0.30000000000000004");
    }

    @Test
    void aZeroLimitIsExact() {
        // The centre line of a run rule and a control line clipped at zero: only zero is on them.
        assertTrue(LimitComparison.onLimit(0, 0));
        assertTrue(LimitComparison.above(1e-300, 0));
        assertTrue(LimitComparison.below(-1e-300, 0));
        assertFalse(LimitComparison.above(0, 0));
    }

    @Test
    void notANumberIsNeverOnAboveOrBelow() {
        double nan = Double.NaN;
        assertFalse(LimitComparison.onLimit(nan, 1));
        assertFalse(LimitComparison.above(nan, 1));
        assertFalse(LimitComparison.below(nan, 1));
        assertFalse(LimitComparison.atMost(nan, 1));
        assertFalse(LimitComparison.atLeast(nan, 1));
        assertFalse(LimitComparison.beyond(nan, 2));
        assertFalse(LimitComparison.within(nan, 2));
    }

    /**
     * Property over seeded random certificates: a result exactly k SD from the certified value in decimals
     * (computed in BigDecimal) is never beyond k SD, on either side; one unit more in its last reported
     * digit is beyond, one unit less is within. Certificates as on real sheets: a value of 3 decimals
     * between 0.05 and 50 and an SD of 0.5–15 % of it, given to 3 decimals.
     */
    @Test
    void decimalTiesAreOnTheLimitAndOneDigitDecides() {
        long seed = 20260214L;
        Random random = new Random(seed);
        BigDecimal unit = new BigDecimal("0.001");
        for (int trial = 0; trial < 20_000; trial++) {
            BigDecimal certified = BigDecimal.valueOf(50 + random.nextInt(50_000)).multiply(unit);
            double sdShare = 0.005 + 0.145 * random.nextDouble();
            int sdUnits = Math.max(1, (int) Math.round(certified.doubleValue() * 1000 * sdShare));
            BigDecimal sd = BigDecimal.valueOf(sdUnits).multiply(unit);
            int k = 1 + random.nextInt(3);
            int sign = random.nextBoolean() ? 1 : -1;
            BigDecimal onLimit = certified.add(sd.multiply(BigDecimal.valueOf((long) sign * k)));
            String input = "seed " + seed + ", trial " + trial + ": certified " + certified + ", SD " + sd
                    + ", k " + (sign * k) + ", result " + onLimit;
            double c = certified.doubleValue();
            double s = sd.doubleValue();
            double zOn = (onLimit.doubleValue() - c) / s;
            double zOut = (onLimit.add(unit.multiply(BigDecimal.valueOf(sign))).doubleValue() - c) / s;
            double zIn = (onLimit.subtract(unit.multiply(BigDecimal.valueOf(sign))).doubleValue() - c) / s;
            assertFalse(LimitComparison.beyond(zOn, k), input + " is on the limit (z = " + zOn + ")");
            assertFalse(LimitComparison.within(zOn, k), input + " is on the limit (z = " + zOn + ")");
            assertTrue(LimitComparison.beyond(zOut, k), input + " plus one digit is beyond (z = " + zOut + ")");
            assertTrue(LimitComparison.within(zIn, k), input + " minus one digit is within (z = " + zIn + ")");
        }
    }
}
