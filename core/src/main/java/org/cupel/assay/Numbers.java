package org.cupel.assay;

import java.math.BigDecimal;
import java.math.RoundingMode;

/** Formatting of numbers for display; locale-independent so reports are identical everywhere. */
public final class Numbers {
    private Numbers() {
    }

    /** The shortest plain decimal that reads back as the same double: 0.005, 12.5, 1500. */
    public static String compact(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return new BigDecimal(Double.toString(v)).stripTrailingZeros().toPlainString();
    }

    /** Decimals of a number whose written form is not known (computed, or read in exponent notation). */
    public static final int UNKNOWN_DECIMALS = -1;

    /**
     * {@code v} with exactly {@code decimals} decimals (half-up on the shortest decimal that reads back as
     * {@code v}, so 1.2365 gives 1.237 as on paper), or {@link #compact} when {@code decimals} is
     * {@link #UNKNOWN_DECIMALS}: 0.07 with 3 decimals is {@code 0.070}, as the lab wrote it.
     */
    public static String fixed(double v, int decimals) {
        if (decimals < 0 || !Double.isFinite(v)) {
            return compact(v);
        }
        return BigDecimal.valueOf(v).setScale(decimals, RoundingMode.HALF_UP).toPlainString();
    }

    /**
     * The decimals of a number written with {@code decimals} decimals after multiplying it by
     * {@code factor}: a power of ten moves the decimal mark ({@code 5} ppb is {@code 0.005} ppm, 3 decimals;
     * never fewer than 0), any other factor (ounces per ton) leaves the written precision unknown.
     */
    public static int decimalsAfterScaling(int decimals, double factor) {
        if (decimals < 0 || factor == 1.0) {
            return decimals;
        }
        if (!(factor > 0) || Double.isInfinite(factor)) {
            return UNKNOWN_DECIMALS;
        }
        long k = Math.round(Math.log10(factor));
        // The unit factors are quotients of decimal literals (1e-3 / 1.0), exact to a few ulps.
        if (Math.abs(factor / Math.pow(10, k) - 1) > 1e-12) {
            return UNKNOWN_DECIMALS;
        }
        return (int) Math.max(0, decimals - k);
    }

    /** {@code v} with {@code digits} significant digits, plain notation. */
    public static String significant(double v, int digits) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        if (v == 0) {
            return "0";
        }
        BigDecimal bd = new BigDecimal(v).round(new java.math.MathContext(digits));
        return bd.stripTrailingZeros().toPlainString();
    }
}
