package org.cupel.ingest;

import org.cupel.assay.Numbers;

/**
 * Reads a decimal number as labs write it, by scanning characters once: optional sign, digits with
 * optional thousands grouping (groups of three after a first group of one to three digits, the first
 * not 0), one decimal mark, optional exponent. No regular expressions and no String: this runs for
 * every cell of a million-row file.
 *
 * <p>A number of at most 2^53 in its digits and at most 22 decimals, without exponent (every assay value
 * in practice), is the exact quotient {@code digits / 10^decimals} of two doubles, which IEEE 754
 * division rounds correctly (Clinger, 1990, "How to read floating point numbers accurately", the fast
 * path), so it equals {@link Double#parseDouble}; anything else is handed to {@link Double#parseDouble}.
 * A number outside the range of a double, too large (overflow to infinity) or too small (non-zero digits
 * that underflow to 0 or to a subnormal double, which has lost digits), is not read: it gives NaN, and
 * {@link #outOfRange} tells it from a malformed number.
 */
final class NumberScanner {
    private static final long MAX_EXACT = 1L << 53;
    private static final double[] POWERS_OF_TEN = new double[23];

    static {
        double p = 1;
        for (int i = 0; i < POWERS_OF_TEN.length; i++) {
            POWERS_OF_TEN[i] = p;
            p *= 10;
        }
    }

    private final char decimalMark;
    private final char groupMark;
    private final boolean grouping;
    /** Set when a scan refused a well-formed number for its range; read by {@link #outOfRange}. */
    private boolean outOfRange;
    /** The decimals written in the last well-formed number scanned; see {@link #decimals()}. */
    private int decimals = Numbers.UNKNOWN_DECIMALS;

    NumberScanner(boolean decimalComma, boolean thousandsSeparator) {
        this.decimalMark = decimalComma ? ',' : '.';
        this.groupMark = decimalComma ? '.' : ',';
        this.grouping = thousandsSeparator;
    }

    /** The number {@code s[from, to)} spells, or NaN when it is not a well-formed number. */
    double scan(String s, int from, int to) {
        return scan(s.toCharArray(), from, to);
    }

    /** The number {@code s[from, to)} spells, or NaN when it is not a well-formed number. */
    double scan(char[] s, int from, int to) {
        return scan(s, from, to, grouping);
    }

    /** {@link #scan(char[], int, int)} with thousands grouping allowed only when {@code allowGrouping}. */
    double scan(char[] s, int from, int to, boolean allowGrouping) {
        int i = from;
        boolean negative = false;
        if (i < to && (s[i] == '+' || s[i] == '-')) {
            negative = s[i] == '-';
            i++;
        }
        long digits = 0;
        int significant = 0;
        char firstDigit = 0;
        int intDigits = 0;
        int groupLen = 0;
        int firstGroupLen = -1;
        boolean grouped = false;
        for (; i < to; i++) {
            char c = s[i];
            if (c >= '0' && c <= '9') {
                if (intDigits++ == 0) {
                    firstDigit = c;
                }
                if (digits != 0 || c != '0') {
                    significant++;
                    digits = digits * 10 + (c - '0');
                }
                groupLen++;
            } else if (allowGrouping && isGroupMark(c)) {
                if (firstGroupLen < 0) {
                    if (groupLen < 1 || groupLen > 3 || firstDigit == '0') {
                        return Double.NaN;
                    }
                    firstGroupLen = groupLen;
                } else if (groupLen != 3) {
                    return Double.NaN;
                }
                grouped = true;
                groupLen = 0;
            } else {
                break;
            }
        }
        if (grouped && groupLen != 3) {
            return Double.NaN;
        }
        int fracDigits = 0;
        if (i < to && s[i] == decimalMark) {
            i++;
            for (; i < to && s[i] >= '0' && s[i] <= '9'; i++) {
                if (digits != 0 || s[i] != '0') {
                    significant++;
                    digits = digits * 10 + (s[i] - '0');
                }
                fracDigits++;
            }
        }
        if (intDigits + fracDigits == 0) {
            return Double.NaN;
        }
        boolean exponent = i < to && (s[i] == 'e' || s[i] == 'E');
        if (exponent) {
            i++;
            if (i < to && (s[i] == '+' || s[i] == '-')) {
                i++;
            }
            int expDigits = 0;
            for (; i < to && s[i] >= '0' && s[i] <= '9'; i++) {
                expDigits++;
            }
            if (expDigits == 0) {
                return Double.NaN;
            }
        }
        if (i != to) {
            return Double.NaN;
        }
        // A byte per value keeps the written precision; more decimals than that are not a lab's.
        decimals = exponent || fracDigits > Byte.MAX_VALUE ? Numbers.UNKNOWN_DECIMALS : fracDigits;
        // 18 significant digits cannot overflow a long; the bound 2^53 keeps the digits an exact double.
        if (!exponent && significant <= 18 && digits <= MAX_EXACT && fracDigits < POWERS_OF_TEN.length) {
            double v = digits / POWERS_OF_TEN[fracDigits];
            return negative ? -v : v;
        }
        double v = Double.parseDouble(cleaned(s, from, to));
        if (!inRange(v, significant)) {
            outOfRange = true;
            return Double.NaN;
        }
        return v;
    }

    /** Whether a parsed value kept its digits: finite, and not underflowed when its digits are not all zero. */
    private static boolean inRange(double v, int significantDigits) {
        return Double.isFinite(v) && (significantDigits == 0 || Math.abs(v) >= Double.MIN_NORMAL);
    }

    /**
     * Whether {@code s} is a well-formed number that {@link #scan} refuses only because a double cannot hold
     * it (1e400, 1e-400). Error path only.
     */
    boolean outOfRange(String s) {
        outOfRange = false;
        scan(s, 0, s.length());
        return outOfRange;
    }

    /**
     * How many decimals the last well-formed number {@link #scan} read was written with ({@code 0.070}: 3,
     * {@code 12}: 0); {@link Numbers#UNKNOWN_DECIMALS} for exponent notation ({@code 7e-2}), whose written
     * precision is not a count of decimals. Valid right after a scan that returned a number.
     */
    int decimals() {
        return decimals;
    }

    /** The character that groups thousands: ',' with a decimal point, '.' with a decimal comma. */
    char groupMark() {
        return groupMark;
    }

    /** The well-formed number as {@link Double#parseDouble} reads it: grouping dropped, decimal mark '.'. */
    private String cleaned(char[] s, int from, int to) {
        StringBuilder out = new StringBuilder(to - from);
        boolean exponent = false;
        for (int i = from; i < to; i++) {
            char c = s[i];
            if (c >= '0' && c <= '9' || c == '-') {
                out.append(c);
            } else if (c == 'e' || c == 'E') {
                out.append('e');
                exponent = true;
            } else if (c == '+') {
                if (exponent) {
                    out.append('+');
                }
            } else if (!exponent && c == decimalMark) {
                out.append('.');
            }
        }
        return out.toString();
    }

    private boolean isGroupMark(char c) {
        // A space-like grouping (1 234,5) is only safe with a decimal comma, where ',' cannot group.
        return c == groupMark || (decimalMark == ',' && (c == ' ' || c == '\u00A0' || c == '\u202F'));
    }
}
