package org.cupel.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.cupel.testing.Gen;
import org.cupel.testing.SeededTries;
import org.junit.jupiter.api.Test;

/**
 * The scanner's exact fast path gives the same double as {@link Double#parseDouble} (bit for bit), and the
 * scanner as a whole reads every text as the straightforward reference below does: validate, clean the
 * text to Java's syntax, then {@link Double#parseDouble} (the scanner before the fast path).
 */
class NumberScannerProperties {
    private static final NumberScanner POINT = new NumberScanner(false, true);
    private static final NumberScanner COMMA = new NumberScanner(true, true);
    private static final NumberScanner PLAIN = new NumberScanner(false, false);

    private static final Gen<String> SIGN = Gen.of("", "-", "+");
    private static final Gen<String> DIGITS = Gen.strings("0123456789", 0, 24);
    private static final Gen<String> MARK = Gen.of("", ".");
    private static final Gen<String> SIGNED_DIGITS_MARK_DIGITS = r -> SIGN.next(r) + DIGITS.next(r) + MARK.next(r)
            + DIGITS.next(r);

    /** An optional sign, digits, an optional point and digits: at least one digit. */
    private static final Gen<String> DECIMALS = SIGNED_DIGITS_MARK_DIGITS
            .filter(s -> s.chars().anyMatch(Character::isDigit));

    @Test
    void decimalsReadAsParseDouble() {
        // Signed zeros, a bare fraction, a trailing point, and the longest digit strings (past the fast path).
        List<Gen<String>> edges = List.of(Gen.constant("0"), Gen.constant("-0"), Gen.constant("+.5"),
                Gen.constant("7."), Gen.constant("9".repeat(24) + "." + "9".repeat(24)),
                Gen.constant("-" + "0".repeat(24) + "." + "0".repeat(23) + "1"));
        SeededTries.forAll(5000, edges, DECIMALS, s -> assertEquals(Double.doubleToRawLongBits(Double.parseDouble(s)),
                Double.doubleToRawLongBits(POINT.scan(s, 0, s.length())), s));
    }

    /**
     * A well-formed number without exponent reports as its decimals the count of digits after its decimal
     * mark (the count the lab wrote, so that 0.070 is shown as 0.070), whatever path read it.
     */
    @Test
    void decimalsAreTheDigitsAfterTheMark() {
        List<Gen<String>> edges = List.of(Gen.constant("0.070"), Gen.constant("7."), Gen.constant("12"),
                Gen.constant("9".repeat(24) + "." + "9".repeat(24)));
        SeededTries.forAll(3000, edges, DECIMALS, s -> {
            double v = POINT.scan(s, 0, s.length());
            SeededTries.assume(!Double.isNaN(v));
            int mark = s.indexOf('.');
            int expected = mark < 0 ? 0 : s.length() - mark - 1;
            assertEquals(expected, POINT.decimals(), s);
        });
    }

    @Test
    void exponentNotationHasNoCountOfDecimals() {
        assertEquals(7e-2, POINT.scan("7.0e-2", 0, 6), 0.0);
        assertEquals(-1, POINT.decimals(), "7.0e-2 is not written with a count of decimals");
    }

    /** Digits (weighted), both marks, signs, exponents, spaces (ordinary and no-break) and a stray letter. */
    private static final Gen<String> TEXTS = Gen.strings("0123456789012345678901234567890.,.,+-eE \u00a0x", 0, 30);

    @Test
    void everyTextReadsAsTheReference() {
        List<Gen<String>> edges = List.of(Gen.constant(""), Gen.constant("1,234.5"), Gen.constant("1.234,5"),
                Gen.constant("1\u00a0234,5"), Gen.constant("1e"), Gen.constant("-.e5"));
        SeededTries.forAll(5000, edges, TEXTS, s -> {
            for (boolean comma : new boolean[] {false, true}) {
                for (boolean grouping : new boolean[] {false, true}) {
                    NumberScanner n = grouping ? (comma ? COMMA : POINT)
                            : (comma ? new NumberScanner(true, false) : PLAIN);
                    assertEquals(Double.doubleToRawLongBits(reference(s, comma, grouping)),
                            Double.doubleToRawLongBits(n.scan(s, 0, s.length())),
                            s + " comma=" + comma + " grouping=" + grouping);
                }
            }
        });
    }

    /**
     * The scanner as it was, with the range rule of issue 15: checks the grammar while copying the cleaned
     * characters, then parseDouble.
     */
    private static double reference(String s, boolean decimalComma, boolean grouping) {
        char decimalMark = decimalComma ? ',' : '.';
        char groupMark = decimalComma ? '.' : ',';
        StringBuilder out = new StringBuilder();
        int i = 0;
        int to = s.length();
        if (i < to && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
            if (s.charAt(i) == '-') {
                out.append('-');
            }
            i++;
        }
        int intStart = out.length();
        int groupLen = 0;
        int firstGroupLen = -1;
        boolean grouped = false;
        for (; i < to; i++) {
            char c = s.charAt(i);
            boolean isGroup = c == groupMark || (decimalMark == ',' && (c == ' ' || c == '\u00A0' || c == '\u202F'));
            if (c >= '0' && c <= '9') {
                out.append(c);
                groupLen++;
            } else if (grouping && isGroup) {
                if (firstGroupLen < 0) {
                    if (groupLen < 1 || groupLen > 3 || out.charAt(intStart) == '0') {
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
        int intDigits = out.length() - intStart;
        if (grouped && groupLen != 3) {
            return Double.NaN;
        }
        int fracDigits = 0;
        if (i < to && s.charAt(i) == decimalMark) {
            out.append('.');
            i++;
            for (; i < to && s.charAt(i) >= '0' && s.charAt(i) <= '9'; i++) {
                out.append(s.charAt(i));
                fracDigits++;
            }
        }
        if (intDigits + fracDigits == 0) {
            return Double.NaN;
        }
        if (i < to && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
            out.append('e');
            i++;
            if (i < to && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
                out.append(s.charAt(i++));
            }
            int expDigits = 0;
            for (; i < to && s.charAt(i) >= '0' && s.charAt(i) <= '9'; i++) {
                out.append(s.charAt(i));
                expDigits++;
            }
            if (expDigits == 0) {
                return Double.NaN;
            }
        }
        if (i != to) {
            return Double.NaN;
        }
        double v = Double.parseDouble(out.toString());
        // Out of a double's range: overflow, or non-zero digits that underflow to 0 or a subnormal (digits lost).
        boolean nonZeroDigits = out.chars().limit(out.indexOf("e") < 0 ? out.length() : out.indexOf("e"))
                .anyMatch(c -> c >= '1' && c <= '9');
        return Double.isFinite(v) && (!nonZeroDigits || Math.abs(v) >= Double.MIN_NORMAL) ? v : Double.NaN;
    }
}
