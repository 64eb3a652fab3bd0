package org.cupel.demo;

import java.math.BigDecimal;

/**
 * Fixed-decimal number text without {@code String.format}: the scaled project writes about ten million
 * numbers, and the output must not depend on the default locale.
 */
final class FixedDecimal {

    private static final long[] POW10 = {1, 10, 100, 1_000, 10_000, 100_000, 1_000_000};

    private FixedDecimal() {
    }

    /** Appends {@code value} rounded half-up to {@code decimals} places, with a dot as decimal mark. */
    static StringBuilder append(StringBuilder sb, double value, int decimals) {
        long scale = POW10[decimals];
        long scaled = Math.round(Math.abs(value) * scale);
        if (value < 0 && scaled != 0) {
            sb.append('-');
        }
        sb.append(scaled / scale);
        if (decimals > 0) {
            sb.append('.');
            long frac = scaled % scale;
            for (long digit = scale / 10; digit > 0; digit /= 10) {
                sb.append((char) ('0' + frac / digit));
                frac %= digit;
            }
        }
        return sb;
    }

    static String format(double value, int decimals) {
        return append(new StringBuilder(12), value, decimals).toString();
    }

    /** Rounds half-up to {@code decimals} places, as {@link #append} writes it. */
    static double round(double value, int decimals) {
        return Math.round(value * POW10[decimals]) / (double) POW10[decimals];
    }

    /** The shortest plain text of a limit such as 0.005 or 10 (no exponent, no trailing zeros). */
    static String plain(double value) {
        return BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }
}
