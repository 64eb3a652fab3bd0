package org.cupel.assay;

import java.math.BigDecimal;

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
