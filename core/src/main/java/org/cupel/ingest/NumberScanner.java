package org.cupel.ingest;

/**
 * Reads a decimal number as labs write it, by scanning characters once: optional sign, digits with
 * optional thousands grouping (groups of three after a first group of one to three digits, the first
 * not 0), one decimal mark, optional exponent. The cleaned digits go to {@link Double#parseDouble}. No
 * regular expressions: this runs for every cell of a million-row file.
 */
final class NumberScanner {
    private final char decimalMark;
    private final char groupMark;
    private final boolean grouping;

    NumberScanner(boolean decimalComma, boolean thousandsSeparator) {
        this.decimalMark = decimalComma ? ',' : '.';
        this.groupMark = decimalComma ? '.' : ',';
        this.grouping = thousandsSeparator;
    }

    /** The number {@code s[from, to)} spells, or NaN when it is not a well-formed number. */
    double scan(String s, int from, int to) {
        char[] out = new char[to - from + 1];
        int n = 0;
        int i = from;
        if (i < to && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
            if (s.charAt(i) == '-') {
                out[n++] = '-';
            }
            i++;
        }
        int intStart = n;
        int groupLen = 0;
        int firstGroupLen = -1;
        boolean grouped = false;
        for (; i < to; i++) {
            char c = s.charAt(i);
            if (c >= '0' && c <= '9') {
                out[n++] = c;
                groupLen++;
            } else if (grouping && isGroupMark(c)) {
                if (firstGroupLen < 0) {
                    if (groupLen < 1 || groupLen > 3 || out[intStart] == '0') {
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
        int intDigits = n - intStart;
        if (grouped && groupLen != 3) {
            return Double.NaN;
        }
        int fracDigits = 0;
        if (i < to && s.charAt(i) == decimalMark) {
            out[n++] = '.';
            i++;
            for (; i < to && s.charAt(i) >= '0' && s.charAt(i) <= '9'; i++) {
                out[n++] = s.charAt(i);
                fracDigits++;
            }
        }
        if (intDigits + fracDigits == 0) {
            return Double.NaN;
        }
        if (i < to && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
            out[n++] = 'e';
            i++;
            if (i < to && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
                out[n++] = s.charAt(i++);
            }
            int expDigits = 0;
            for (; i < to && s.charAt(i) >= '0' && s.charAt(i) <= '9'; i++) {
                out[n++] = s.charAt(i);
                expDigits++;
            }
            if (expDigits == 0) {
                return Double.NaN;
            }
        }
        if (i != to) {
            return Double.NaN;
        }
        double v = Double.parseDouble(new String(out, 0, n));
        return Double.isFinite(v) ? v : Double.NaN;
    }

    private boolean isGroupMark(char c) {
        // A space-like grouping (1 234,5) is only safe with a decimal comma, where ',' cannot group.
        return c == groupMark || (decimalMark == ',' && (c == ' ' || c == '\u00A0' || c == '\u202F'));
    }
}
